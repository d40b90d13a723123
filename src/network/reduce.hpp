// The m-sum stage of simplify: every sum over projections whose terms are coupling networks
// is reduced by the network moves until none applies.  A term that is not a network, or that
// no move fits, is left as it stands; the value never changes.
#pragma once

#include <ginac/ginac.h>

#include <string>
#include <vector>

#include "model/identity.hpp"
#include "model/quantum.hpp"

namespace couplet::network {

// The move or rewrite applied, with the term it changed as it stood and as it left it.
using reduction_step = derivation_step;

// Expects 3j (not CG) symbols and merged phases, as canonicalize_symbols and merge_phases
// leave them.  Steps taken are appended to `steps` when given.
GiNaC::ex reduce_msums(const GiNaC::ex& e, const quantum_numbers& numbers,
                       std::vector<reduction_step>* steps = nullptr);

}  // namespace couplet::network
