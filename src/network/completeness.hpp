// The second 3j orthogonality relation, the completeness of the coupled states (DLMF 34.3.17):
//   sum(J, M : (2J+1) 3j(j1, j2, J; m1, m2, M) 3j(j1, j2, J; n1, n2, M)) = delta(m1, n1) delta(m2, n2).
// It sums over an angular momentum together with its projection, so neither the network moves
// (projections only) nor the j-sum rules (no 3j) can see it; simplify runs it before expanding,
// which would split the (2J+1) weight across two sums.
#pragma once

#include <ginac/ginac.h>

#include <vector>

#include "model/quantum.hpp"
#include "network/reduce.hpp"

namespace couplet::network {

// Every sum over an angular momentum J and a projection M (in one sum or two nested ones)
// whose summand is (2J+1) times two 3j holding (J, M) in one column, a phase and factors free of
// J and M.  Applied only where each free projection of the two 3j is a name of its own column's
// angular momentum (or its negative), so that the deltas cannot count a projection out of range.
GiNaC::ex reduce_completeness(const GiNaC::ex& e, const quantum_numbers& numbers,
                              std::vector<reduction_step>* steps = nullptr);

}  // namespace couplet::network
