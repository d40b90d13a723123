// Source text -> statements.  Errors are couplet::user_error with the offending offset.
#pragma once

#include <cstddef>
#include <vector>

#include "parse/ast.hpp"
#include "source/source.hpp"

namespace couplet {

// How deep brackets, exponent chains and prefix minus signs may nest in one statement.  The
// parser and the printers recurse, so the bound keeps hostile input from exhausting the stack.
constexpr std::size_t max_nesting = 200;

struct statement_span {
    std::size_t begin = 0, end = 0;  // byte offsets into the source, end exclusive
};

struct parsed_statement {
    ast::statement tree;
    statement_span span;
};

// Where statements end: at a newline or `;` outside every bracket.  Checks bracket balance and
// nesting depth on the way.
std::vector<statement_span> split_statements(const source_file& src);

// With `errors`, a statement that does not parse is recorded there and left out; without, its
// error is thrown.  An unclosed bracket or nesting beyond the bound is thrown either way.
struct unparsed_statement {
    statement_span span;
    user_error error;
};
std::vector<parsed_statement> parse_program(const source_file& src, std::vector<unparsed_statement>* errors = nullptr);

}  // namespace couplet
