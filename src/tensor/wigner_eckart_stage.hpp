// The simplifier's first stage for tensor operators: every matrix element <j m | T^(k)_q | j' m'>
// held whole in the input (model/tensor_operator.hpp) replaced by its Wigner-Eckart form, so
// that the m-sum engine sees a 3j and a reduced element it carries as a constant.
#pragma once

#include <ginac/ginac.h>

#include <vector>

#include "model/identity.hpp"

namespace couplet::tensor {

// Edmonds (1957) eq. 5.4.1, with its instance the one operator whose every matrix element is
// known without it: the unit operator, rank 0, <j m | 1 | j' m'> = delta(j, j') delta(m, m')
// and <j || 1 || j'> = delta(j, j') sqrt(2j+1).  The self-test so checks the phase and the
// normalization of the convention.
const identity& wigner_eckart_identity();

// Coupled-state elements (model/coupled_element.hpp) first take their expansions, whose
// elementary matrix elements then take the Wigner-Eckart form like any other.
GiNaC::ex apply_wigner_eckart(const GiNaC::ex& e, std::vector<derivation_step>* steps = nullptr);

}  // namespace couplet::tensor
