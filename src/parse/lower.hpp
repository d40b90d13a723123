// Lowering: syntax tree -> GiNaC expressions over the program's quantum numbers.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <string>
#include <utility>
#include <vector>

#include "model/quantum.hpp"
#include "parse/parse.hpp"

namespace couplet {

// Bounds on what lowering accepts, so that no literal can exhaust memory.
constexpr std::size_t max_number_digits = 200;
constexpr long max_integer_exponent = 1000;         // |n| in x^n
constexpr long max_computed_digits = 10000;         // a number that a power of numbers makes
constexpr std::size_t max_definition_depth = 1000;  // nesting of a let's value through other lets

enum class request_kind { declaration, definition, simplify, check, eval };

struct value_assignment {
    GiNaC::symbol name;
    GiNaC::numeric value;
    std::size_t offset = 0;
};

struct lowered_statement {
    request_kind kind = request_kind::simplify;
    statement_span span;
    std::string text;                  // the statement's source text
    bool bare = false;                 // an expression or `A == B` without a keyword
    std::string name;                  // definition: the name it defines
    GiNaC::ex value;                   // simplify / eval / check left side / definition value
    GiNaC::ex written;                 // value with its recoupling coefficients held whole
    GiNaC::ex rhs;                     // check right side
    GiNaC::ex written_rhs;             // rhs with its recoupling coefficients held whole
    std::vector<value_assignment> at;  // eval ... at
};

struct lowered_program {
    quantum_numbers numbers;
    std::vector<lowered_statement> statements;
    // Read leniently: the statements that could not be read, in the order of the input; the
    // others are in `statements`.
    std::vector<user_error> errors;
};

// Throws user_error for every semantic error (wrong entry counts, role conflicts, undefined
// names, sum indices absent from their body, inadmissible `at` values, ...).
lowered_program lower_program(const source_file& src, const std::vector<parsed_statement>& parsed, bool lenient = false,
                              const std::vector<std::pair<std::string, std::size_t>>& lost_lets = {});

// parse + lower.
// Lenient: every statement that can be read is, the others go to `errors` (a let that fails
// leaves its name without a value, and a later use says so); strict: the first error is thrown.
lowered_program read_program(const source_file& src, bool lenient = false);

// True when e is c0 + sum c_i * x_i with rational c's and symbols x_i.
}  // namespace couplet
