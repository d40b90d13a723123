// Matrix elements of a tensor operator that acts on one part of a coupled state:
//   <(j1, j2) J M | T^(k)_q(1) | (j1', j2') J' M'>   and   <(j1, j2) J || T^(k)(1) || (j1', j2') J'>.
// Each is held whole for printing, together with its expansion: the coupled states written by
// the Clebsch-Gordan coefficients that build them (as in model/coupling_tree.hpp), the operator
// on the uncoupled states of the part it acts on, and the identity on every other part.  The
// simplifier starts from that expansion, so an answer is derived, never looked up.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <functional>
#include <string>

#include "model/coupling_tree.hpp"

namespace couplet {

// coupled_element(T, k, q, part, bra, M, ket, M', expansion); bra and ket are held trees
// (as_held_tree), part counts leaves from 1 on the left.
DECLARE_FUNCTION_9P(coupled_element)
// coupled_reduced_element(T, k, part, bra, ket, expansion).
DECLARE_FUNCTION_6P(coupled_reduced_element)

bool is_coupled_element(const GiNaC::ex& e);
bool is_coupled_reduced_element(const GiNaC::ex& e);
// Either of the two: what it means, as a sum over projections.
GiNaC::ex expansion_of(const GiNaC::ex& coupled);

// Where the new projections come from: called once per leaf (ket_side for the acted-on leaf
// of the ket), once per coupling below the top on each side, and for the reduced element once
// for each total and once for the component.
using projection_source = std::function<GiNaC::ex(const GiNaC::ex& label, bool ket_side)>;

struct acted_on {
    std::string op;
    GiNaC::ex rank;
    std::size_t part;  // from 1
};

// Both sides must have the same shape (checked by the caller).
// <bra M | T^(k)_q(part) | ket M'> = sum over the leaves' and inner labels' projections of
//   CG(bra) CG(ket) <j_p m_p | T^(k)_q | j_p' m_p'> prod_{i != p} delta(j_i, j_i'),
// with m_i shared by both sides for i != p (the identity on that part).
GiNaC::ex make_coupled_element(const acted_on& t, const GiNaC::ex& component, const coupling_tree& bra,
                               const GiNaC::ex& m_bra, const coupling_tree& ket, const GiNaC::ex& m_ket,
                               const projection_source& projection_for);

// <bra || T^(k)(part) || ket> = sum_{M, q, M'} (-1)^(J-M) 3j(J, k, J'; -M, q, M') <bra M | T^(k)_q | ket M'>,
// which the Wigner-Eckart theorem (Edmonds 5.4.1) and the orthogonality of the 3j (DLMF 34.3.18)
// make the reduced element wherever the triangle (J, k, J') holds, and 0 elsewhere.
GiNaC::ex make_coupled_reduced_element(const acted_on& t, const coupling_tree& bra, const coupling_tree& ket,
                                       const projection_source& projection_for);

// Two trees couple alike: leaves at the same places.
bool same_shape(const coupling_tree& a, const coupling_tree& b);

}  // namespace couplet
