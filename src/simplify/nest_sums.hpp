// sum(J, M, m : ...) over angular momenta and projections together, read as
// sum(J : sum(M, m : ...)): the m-sum stage reduces only sums over projections, and the j-sum
// stage then sees a sum over J alone.  The value is the same: a sum over all the indices is the
// iterated sum, whatever the order.
#pragma once

#include <ginac/ginac.h>

#include "model/quantum.hpp"

namespace couplet {

GiNaC::ex nest_projection_sums(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet
