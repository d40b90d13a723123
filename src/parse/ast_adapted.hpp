// Boost.Fusion adaptation of the AST, needed only by the grammar translation units.
#pragma once

#include <boost/fusion/include/adapt_struct.hpp>

#include "parse/ast.hpp"

BOOST_FUSION_ADAPT_STRUCT(couplet::ast::number, digits)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::identifier, name)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::operation, op, rhs)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::expression, first, rest)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::negated, value)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::call, function, args)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::bracket_symbol, kind, rows)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::clebsch_gordan, j1, m1, j2, m2, j, m)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::coupled_pair, left, right, label)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::coupling_side, left, right, total)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::recoupling, bra, ket)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::tensor_operator, name, rank)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::reduced_element, bra, op, ket)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::matrix_element, j, m, op, component, j_ket, m_ket)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::acted_operator, op, component, part)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::operator_product, left, right, rank, component)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::coupled_matrix_element, bra, m, op, ket, m_ket)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::coupled_reduced_element, bra, op, ket)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::sum, indices, body)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::declaration, parity, names)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::definition, name, value)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::simplify_request, value)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::check_request, lhs, rhs)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::assignment, name, value)
BOOST_FUSION_ADAPT_STRUCT(couplet::ast::eval_request, value, at)
