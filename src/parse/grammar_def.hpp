// Definition of the statement grammar; grammar/couplet.ebnf is the normative description and
// the rule names below follow it.  Rule names double as the "expected ..." words in messages.
#pragma once

#include <type_traits>

#include "parse/ast_adapted.hpp"
#include "parse/grammar.hpp"

namespace couplet::parser {

// Records where a located node starts (after leading whitespace), for diagnostics.
struct annotate_offset {
    template <typename Iterator, typename Attribute, typename Context>
    void on_success(Iterator const& first, Iterator const&, Attribute& attr, Context const& ctx) const {
        if constexpr (std::is_base_of_v<ast::located, Attribute>)
            attr.offset = static_cast<std::size_t>(first - x3::get<source_begin_tag>(ctx));
    }
};

#define COUPLET_RULE(name, attribute, label)  \
    struct name##_class : annotate_offset {}; \
    x3::rule<name##_class, attribute> const name = label;

COUPLET_RULE(identifier, ast::identifier, "name")
COUPLET_RULE(name_text, std::string, "name")
COUPLET_RULE(number, ast::number, "number")
COUPLET_RULE(expression, ast::expression, "expression")
COUPLET_RULE(multiplicative, ast::expression, "expression")
COUPLET_RULE(power, ast::expression, "expression")
COUPLET_RULE(unary, ast::operand, "expression")
COUPLET_RULE(negated, ast::negated, "expression")
COUPLET_RULE(primary, ast::operand, "expression")
COUPLET_RULE(parenthesized, ast::operand, "expression")
COUPLET_RULE(args, std::vector<ast::expression>, "argument")
COUPLET_RULE(call, ast::call, "function call")
COUPLET_RULE(row, std::vector<ast::expression>, "entry")
COUPLET_RULE(rows, std::vector<std::vector<ast::expression>>, "entry")
COUPLET_RULE(round_symbol, ast::bracket_symbol, "3j symbol")
COUPLET_RULE(curly_symbol, ast::bracket_symbol, "6j or 9j symbol")
COUPLET_RULE(cg_atom, ast::operand, "Clebsch-Gordan entry")
COUPLET_RULE(cg_negated, ast::negated, "Clebsch-Gordan entry")
COUPLET_RULE(cg_number, ast::expression, "number")
COUPLET_RULE(number_operand, ast::operand, "number")
COUPLET_RULE(cg_divisor, ast::operation, "number")
COUPLET_RULE(clebsch_gordan, ast::clebsch_gordan, "Clebsch-Gordan symbol")
COUPLET_RULE(coupling_tree, ast::coupling_tree, "coupling tree")
COUPLET_RULE(coupled_pair, ast::coupled_pair, "coupling tree")
COUPLET_RULE(coupling_side, ast::coupling_side, "coupled state")
COUPLET_RULE(recoupling, ast::recoupling, "recoupling coefficient")
COUPLET_RULE(tensor_operator, ast::tensor_operator, "tensor operator like T^(k)")
COUPLET_RULE(reduced_element, ast::reduced_element, "reduced matrix element")
COUPLET_RULE(matrix_element, ast::matrix_element, "matrix element")
COUPLET_RULE(acted_part, ast::number, "part the operator acts on, like (1)")
COUPLET_RULE(operator_component, ast::operand, "component")
COUPLET_RULE(acted_operator, ast::acted_operator, "operator on a part, like T^(k)(1)")
COUPLET_RULE(operator_product, ast::operator_product, "tensor product like [T^(k1)(1) x U^(k2)(2)]^(k)")
COUPLET_RULE(times_sign, x3::unused_type, "'x' between the two operators of a tensor product")
COUPLET_RULE(operator_factor, ast::operator_factor, "operator on a part, like T^(k)(1)")
COUPLET_RULE(coupled_operator, std::vector<ast::operator_factor>, "operator on a part, like T^(k)(1)")
COUPLET_RULE(coupled_matrix_element, ast::coupled_matrix_element, "matrix element between coupled states")
COUPLET_RULE(coupled_reduced_element, ast::coupled_reduced_element, "reduced matrix element between coupled states")
COUPLET_RULE(index_list, std::vector<ast::identifier>, "summation index")
COUPLET_RULE(sum, ast::sum, "sum")
COUPLET_RULE(name_list, std::vector<ast::identifier>, "name")
COUPLET_RULE(declaration, ast::declaration, "declaration")
COUPLET_RULE(definition, ast::definition, "definition")
COUPLET_RULE(check_request, ast::check_request, "check")
COUPLET_RULE(assignment, ast::assignment, "assignment")
COUPLET_RULE(assignment_list, std::vector<ast::assignment>, "assignment")
COUPLET_RULE(eval_request, ast::eval_request, "eval")
COUPLET_RULE(simplify_request, ast::simplify_request, "simplify")
COUPLET_RULE(bare_check, ast::check_request, "statement")
COUPLET_RULE(bare_eval, ast::eval_request, "statement")
COUPLET_RULE(bare_expression, ast::simplify_request, "statement")
COUPLET_RULE(end_of_statement, x3::unused_type, "end of statement")
#undef COUPLET_RULE

struct statement_class : annotate_offset {};
statement_type const statement_rule = "statement";

using x3::char_;
using x3::lexeme;
using x3::lit;

auto const word_end = !(x3::alnum | '_' | '\'');
inline auto kw(char const* k) { return lexeme[lit(k) >> word_end]; }
auto const reserved =
    kw("int") | kw("half") | kw("let") | kw("simplify") | kw("check") | kw("eval") | kw("at") | kw("sum");

auto const name_text_def = x3::raw[lexeme[(x3::alpha | char_('_')) >> *(x3::alnum | char_('_')) >> *char_('\'')]];
auto const identifier_def = !reserved >> name_text;
auto const number_def = lexeme[+x3::digit];

auto const expression_def = multiplicative >> *(char_("+-") > multiplicative);
auto const multiplicative_def = unary >> *(char_("*/") > unary);
auto const unary_def = negated | power;
auto const negated_def = lit('-') > unary;
// The exponent is a unary, so a^b^c groups as a^(b^c) and a^-b is accepted.
auto const power_def = primary >> *(char_('^') > unary);
auto const primary_def = round_symbol | curly_symbol | recoupling | coupled_matrix_element | coupled_reduced_element |
                         reduced_element | matrix_element | clebsch_gordan | sum | number | call | identifier |
                         parenthesized;
auto const parenthesized_def = lit('(') > expression > ')';

auto const args_def = expression % ',';
auto const call_def = identifier >> '(' > args > ')';

auto const row_def = expression % ',';
auto const rows_def = row % ';';
auto const round_symbol_def = lexeme[x3::string("3j") >> word_end] > '(' > rows > ')';
auto const curly_symbol_def = lexeme[(x3::string("6j") | x3::string("9j")) >> word_end] > '{' > rows > '}';

// Entries of <j1 m1, j2 m2 | J M> are separated by blanks, so each must be an atom.
auto const cg_negated_def = lit('-') > cg_atom;
auto const number_operand_def = number;
auto const cg_divisor_def = char_('/') > number_operand;
auto const cg_number_def = number_operand >> x3::repeat(0, 1)[cg_divisor];
auto const cg_atom_def = cg_negated | cg_number | identifier | parenthesized;
auto const clebsch_gordan_def = lit('<') > cg_atom > cg_atom > ',' > cg_atom > cg_atom > '|' > cg_atom > cg_atom > '>';

// <tree, tree; J | tree, tree; J>.  Up to the ';' of the first side every step may fail
// without an error, so that a Clebsch-Gordan symbol, which also opens with '<', is tried next.
auto const coupling_tree_def = coupled_pair | identifier;
auto const coupled_pair_def = lit('(') >> coupling_tree >> ',' >> coupling_tree >> ')' >> cg_atom;
auto const coupling_side_def = coupling_tree >> ',' >> coupling_tree >> ';' > cg_atom;
auto const recoupling_def = lit('<') >> coupling_side > '|' > coupling_side > '>';

// <a || T^(k) || b> and <j m | T^(k)_q | j' m'>.  Up to the "||", or the '|' after two
// entries, a step may fail without an error: a Clebsch-Gordan symbol has a ',' there.
auto const tensor_operator_def = identifier > '^' > '(' > expression > ')';
auto const reduced_element_def = lit('<') >> cg_atom >> "||" > tensor_operator > "||" > cg_atom > '>';
auto const matrix_element_def =
    lit('<') >> cg_atom >> cg_atom >> '|' > tensor_operator > '_' > cg_atom > '|' > cg_atom > cg_atom > '>';

// Between coupled states: <(j1, j2) J M | T^(k)_q(1) | (j1', j2') J' M'> and
// <(j1, j2) J || T^(k)(1) || (j1', j2') J'>, with [A x B]^(k)_q or A . B for the operator.
// Tried before the elements above, whose first entry cannot open a coupling; up to the bar
// every step may fail without an error.
auto const acted_part_def = lit('(') > number > ')';
auto const operator_component_def = lit('_') > cg_atom;
auto const acted_operator_def = tensor_operator >> -operator_component > acted_part;
auto const times_sign_def = kw("x");
auto const operator_product_def = lit('[') > operator_factor > times_sign > operator_factor > ']' > '^' > '(' > expression
                                  > ')' > -operator_component;
auto const operator_factor_def = operator_product | acted_operator;
auto const coupled_operator_def = operator_factor % '.';
auto const coupled_matrix_element_def =
    lit('<') >> coupled_pair >> cg_atom >> '|' > coupled_operator > '|' > coupled_pair > cg_atom > '>';
auto const coupled_reduced_element_def =
    lit('<') >> coupled_pair >> "||" > coupled_operator > "||" > coupled_pair > '>';

auto const index_list_def = identifier % ',';
auto const sum_def = kw("sum") > '(' > index_list > ':' > expression > ')';

auto const name_list_def = identifier % ',';
auto const declaration_def = lexeme[(x3::string("int") | x3::string("half")) >> word_end] > name_list;
auto const definition_def = kw("let") > identifier > '=' > expression;
auto const check_request_def = kw("check") > expression > "==" > expression;
auto const assignment_def = identifier > '=' > expression;
auto const assignment_list_def = assignment % ',';
auto const eval_request_def = kw("eval") > expression > -(kw("at") > assignment_list);
auto const simplify_request_def = kw("simplify") > expression;
// A bare `A == B` is a check, `E at ...` an evaluation, a bare expression a simplification.
auto const bare_check_def = expression >> "==" > expression;
auto const bare_eval_def = expression >> kw("at") > assignment_list;
auto const bare_expression_def = expression;
auto const end_of_statement_def = x3::eoi;
auto const statement_rule_def = (declaration | definition | check_request | eval_request | simplify_request |
                                 bare_check | bare_eval | bare_expression) > end_of_statement;

BOOST_SPIRIT_DEFINE(identifier, name_text, number, expression, multiplicative, power, unary, negated, primary,
                    parenthesized, args, call, row, rows, round_symbol, curly_symbol, cg_atom, cg_negated, cg_number,
                    number_operand, cg_divisor, clebsch_gordan, coupling_tree, coupled_pair, coupling_side, recoupling,
                    tensor_operator, reduced_element, matrix_element, acted_part, operator_component, acted_operator,
                    operator_product, times_sign, operator_factor, coupled_operator, coupled_matrix_element,
                    coupled_reduced_element, index_list, sum, name_list, declaration, definition, check_request,
                    assignment, assignment_list, eval_request, simplify_request, bare_check, bare_eval, bare_expression,
                    end_of_statement)
BOOST_SPIRIT_DEFINE(statement_rule)

}  // namespace couplet::parser
