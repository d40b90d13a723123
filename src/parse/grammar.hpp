// Declaration of the statement grammar (Spirit X3 declare / define / instantiate split:
// this header declares, grammar_def.hpp defines, grammar.cpp instantiates).
#pragma once

#include <boost/spirit/home/x3.hpp>
#include <string>
#include <type_traits>

#include "parse/ast.hpp"

namespace couplet::parser {

namespace x3 = boost::spirit::x3;

using iterator_type = std::string::const_iterator;

// Whitespace (newlines included: the statement splitter has already decided where statements
// end) and `#` comments to the end of a line.
inline auto const skipper = x3::ascii::space | x3::lexeme['#' >> *(x3::char_ - x3::eol)];
using skipper_type = std::remove_const_t<decltype(skipper)>;

// The source's first character, so that rules can record byte offsets in the AST.
struct source_begin_tag;
using context_type = x3::context<source_begin_tag, const iterator_type, x3::phrase_parse_context<skipper_type>::type>;

struct statement_class;
using statement_type = x3::rule<statement_class, ast::statement>;
BOOST_SPIRIT_DECLARE(statement_type)

statement_type const& statement();

}  // namespace couplet::parser
