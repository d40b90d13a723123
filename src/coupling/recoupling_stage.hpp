// The simplifier's first stage: every recoupling coefficient held whole in the input
// (model/coupling_tree.hpp) replaced by its closed form (recoupling_form.hpp).
#pragma once

#include <ginac/ginac.h>

#include <vector>

#include "model/identity.hpp"
#include "model/quantum.hpp"

namespace couplet::coupling {

GiNaC::ex reduce_recouplings(const GiNaC::ex& e, const quantum_numbers& numbers,
                             std::vector<derivation_step>* steps = nullptr);

}  // namespace couplet::coupling
