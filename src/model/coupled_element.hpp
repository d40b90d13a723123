// Matrix elements between coupled states of an operator that acts on their parts
// (model/composite_operator.hpp):
//   <(j1, j2) J M | T^(k)_q(1) | (j1', j2') J' M'>   and   <(j1, j2) J || T^(k)(1) || (j1', j2') J'>,
// and likewise for [T^(k1)(1) x U^(k2)(2)]^(k) and T^(k)(1) . U^(k)(2).  Each is held whole for
// printing, together with its expansion: the coupled states written by the Clebsch-Gordan
// coefficients that build them (as in model/coupling_tree.hpp), the operator's components
// through the named operators' components, each named operator on the uncoupled states of its
// part, and the identity on every part that no operator acts on.  The simplifier starts from
// that expansion, so an answer is derived, never looked up.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <functional>

#include "model/coupling_tree.hpp"

namespace couplet {

// coupled_element(O, q, bra, M, ket, M', expansion); O an operator expression, bra and ket
// held trees (as_held_tree).
DECLARE_FUNCTION_7P(coupled_element)
// coupled_reduced_element(O, bra, ket, expansion).
DECLARE_FUNCTION_4P(coupled_reduced_element)

bool is_coupled_element(const GiNaC::ex& e);
bool is_coupled_reduced_element(const GiNaC::ex& e);
// Either of the two: what it means, as a sum over projections.
GiNaC::ex expansion_of(const GiNaC::ex& coupled);

// Where the new projections come from: called once per leaf (ket_side for the ket's leaves
// that an operator acts on), once per coupling below the top on each side, once per component
// of an inner operator (with its rank), once per intermediate state of a part that two
// operators act on, and for the reduced element once for each total and once for the
// component.
using projection_source = std::function<GiNaC::ex(const GiNaC::ex& label, bool ket_side)>;

// Where an intermediate angular momentum comes from, between two operators on one part:
// called with the bra's j of that part.
using angular_source = std::function<GiNaC::ex(const GiNaC::ex& like)>;

// Both sides must have the same shape, the operator's parts must be leaves (checked by the
// caller).  For one operator T on part p:
// <bra M | T^(k)_q(p) | ket M'> = sum over the leaves' and inner labels' projections of
//   CG(bra) CG(ket) <j_p m_p | T^(k)_q | j_p' m_p'> prod_{i != p} delta(j_i, j_i'),
// with m_i shared by both sides for i != p (the identity on that part); for a product, the
// sum over its components of one such element per part, and where two operators act on one
// part, sum_{j'', m''} <j m | A | j'' m''> <j'' m'' | B | j' m'> (the closure of that part's
// states).
GiNaC::ex make_coupled_element(const GiNaC::ex& op, const GiNaC::ex& component, const coupling_tree& bra,
                               const GiNaC::ex& m_bra, const coupling_tree& ket, const GiNaC::ex& m_ket,
                               const projection_source& projection_for, const angular_source& angular_for);

// <bra || T^(k)(part) || ket> = sum_{M, q, M'} (-1)^(J-M) 3j(J, k, J'; -M, q, M') <bra M | T^(k)_q | ket M'>,
// which the Wigner-Eckart theorem (Edmonds 5.4.1) and the orthogonality of the 3j (DLMF 34.3.18)
// make the reduced element wherever the triangle (J, k, J') holds, and 0 elsewhere.
GiNaC::ex make_coupled_reduced_element(const GiNaC::ex& op, const coupling_tree& bra, const coupling_tree& ket,
                                       const projection_source& projection_for, const angular_source& angular_for);

// Two trees couple alike: leaves at the same places.
bool same_shape(const coupling_tree& a, const coupling_tree& b);

}  // namespace couplet
