// The m-sum stage of simplify: every sum over projections whose terms are coupling networks
// is reduced by the network moves until none applies.  A term that is not a network, or that
// no move fits, is left as it stands; the value never changes.
#pragma once

#include <ginac/ginac.h>

#include <string>
#include <vector>

#include "model/quantum.hpp"

namespace couplet::network {

struct reduction_step {
    std::string move;       // the move's name
    std::string reference;  // its DLMF equation
    GiNaC::ex before;       // the term the move changed, as it stood
    GiNaC::ex after;        // and what the move made of it
};

// Expects 3j (not CG) symbols and merged phases, as canonicalize_symbols and merge_phases
// leave them.  Steps taken are appended to `steps` when given.
GiNaC::ex reduce_msums(const GiNaC::ex& e, const quantum_numbers& numbers,
                       std::vector<reduction_step>* steps = nullptr);

}  // namespace couplet::network
