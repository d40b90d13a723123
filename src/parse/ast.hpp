// Syntax tree of the couplet language (grammar/couplet.ebnf).  Plain data: no semantics here;
// lowering to GiNaC lives in src/model.  Every node that can be blamed for an error carries
// the byte offset of its first character in the source text.
#pragma once

#include <boost/optional.hpp>
#include <boost/spirit/home/x3/support/ast/variant.hpp>
#include <cstddef>
#include <list>
#include <string>
#include <vector>

namespace couplet::ast {

namespace x3 = boost::spirit::x3;

struct located {
    std::size_t offset = 0;
};

struct nil {};
struct number;
struct identifier;
struct call;
struct bracket_symbol;
struct clebsch_gordan;
struct recoupling;
struct reduced_element;
struct matrix_element;
struct coupled_matrix_element;
struct coupled_reduced_element;
struct sum;
struct negated;
struct expression;

struct operand
    : x3::variant<nil, x3::forward_ast<number>, x3::forward_ast<identifier>, x3::forward_ast<call>,
                  x3::forward_ast<bracket_symbol>, x3::forward_ast<clebsch_gordan>, x3::forward_ast<recoupling>,
                  x3::forward_ast<reduced_element>, x3::forward_ast<matrix_element>,
                  x3::forward_ast<coupled_matrix_element>, x3::forward_ast<coupled_reduced_element>,
                  x3::forward_ast<sum>, x3::forward_ast<negated>, x3::forward_ast<expression>> {
    using base_type::base_type;
    using base_type::operator=;
};

// An integer literal; the digits are kept as text so that big integers stay exact.
struct number : located {
    std::string digits;
};

struct identifier : located {
    std::string name;
};

struct operation : located {
    char op = '+';  // one of + - * / ^
    operand rhs;
};

// A left-to-right chain `first op rhs op rhs ...` at one precedence level; the parser nests
// chains so that precedence and associativity are already resolved in the tree.
struct expression : located {
    operand first;
    std::list<operation> rest;
};

struct negated : located {
    operand value;
};

// name(args): sqrt, delta, tri; the name is checked during lowering.
struct call : located {
    identifier function;
    std::vector<expression> args;
};

// 3j(..; ..), 6j{..; ..}, 9j{..; ..; ..}: rows of entries, counted during lowering so that a
// wrong count is reported with a position and a plain message.
struct bracket_symbol : located {
    std::string kind;  // "3j", "6j" or "9j"
    std::vector<std::vector<expression>> rows;
};

// <j1 m1, j2 m2 | J M>
struct clebsch_gordan : located {
    operand j1, m1, j2, m2, j, m;
};

// A coupling tree: a leaf (a name) or two trees coupled to a label, `(tree, tree) label`.
struct coupled_pair;
struct coupling_tree : x3::variant<identifier, x3::forward_ast<coupled_pair>> {
    using base_type::base_type;
    using base_type::operator=;
};

struct coupled_pair : located {
    coupling_tree left, right;
    operand label;
};

// One side of a recoupling coefficient: `tree, tree; J`.
struct coupling_side : located {
    coupling_tree left, right;
    operand total;
};

// <(j1, j2) j12, j3; J | j1, (j2, j3) j23; J>
struct recoupling : located {
    coupling_side bra, ket;
};

// A tensor operator of rank k, `T^(k)`.
struct tensor_operator : located {
    identifier name;
    expression rank;
};

// `<a || T^(k) || b>`.
struct reduced_element : located {
    operand bra;
    tensor_operator op;
    operand ket;
};

// `<j m | T^(k)_q | j' m'>`.
struct matrix_element : located {
    operand j, m;
    tensor_operator op;
    operand component;
    operand j_ket, m_ket;
};

// The operator between coupled states: a named operator on one part, `T^(k)(1)` or, as a
// whole operator with its component, `T^(k)_q(1)`; a tensor product `[A x B]^(k)`, with `_q`
// as a whole operator; joined by '.', the scalar product of two.  Where a component may
// stand is checked during lowering.
struct acted_operator : located {
    tensor_operator op;
    boost::optional<operand> component;
    number part;
};
struct operator_product;
struct operator_factor : x3::variant<acted_operator, x3::forward_ast<operator_product>> {
    using base_type::base_type;
    using base_type::operator=;
};
struct operator_product : located {
    operator_factor left, right;
    expression rank;
    boost::optional<operand> component;
};

// `<(j1, j2) J M | T^(k)_q(1) | (j1', j2') J' M'>`: the operator acts on leaves, counted from
// the left, of two states coupled alike.
struct coupled_matrix_element : located {
    coupled_pair bra;
    operand m;
    std::vector<operator_factor> op;  // two for a scalar product
    coupled_pair ket;
    operand m_ket;
};

// `<(j1, j2) J || T^(k)(1) || (j1', j2') J'>`.
struct coupled_reduced_element : located {
    coupled_pair bra;
    std::vector<operator_factor> op;
    coupled_pair ket;
};

struct sum : located {
    std::vector<identifier> indices;
    expression body;
};

struct declaration : located {
    std::string parity;  // "int" or "half"
    std::vector<identifier> names;
};

struct definition : located {
    identifier name;
    expression value;
};

struct simplify_request : located {
    expression value;
};

struct check_request : located {
    expression lhs, rhs;
};

struct assignment : located {
    identifier name;
    expression value;
};

struct eval_request : located {
    expression value;
    std::vector<assignment> at;
};

struct statement : x3::variant<declaration, definition, check_request, eval_request, simplify_request> {
    using base_type::base_type;
    using base_type::operator=;
};

}  // namespace couplet::ast
