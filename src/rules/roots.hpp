// Square roots brought into one form before matching: sqrt(4p^2+4p+1) is (2p+1), and
// sqrt((2p+1)(2y+1)) * sqrt((2y+1)(2q+1)) is (2y+1) sqrt((2p+1)(2q+1)), so that the (2x+1)
// weights a rule looks for are visible however the input or an expansion wrote them.
#pragma once

#include <ginac/ginac.h>

#include "model/quantum.hpp"

namespace couplet::rules {

// Every root split into roots of its polynomial factors (GiNaC's factor) where each factor is
// >= 0 at every admissible point, so that sqrt(u v) = sqrt(u) sqrt(v) holds; roots of equal
// bases then merge by GiNaC's own power rules.  Roots with a factor of unknown sign stay.
GiNaC::ex split_roots(const GiNaC::ex& e, const quantum_numbers& numbers);

// The printed form: in each product the roots left over joined into one sqrt of a product
// (and one 1/sqrt), the inverse of split_roots on what it could not cancel.
GiNaC::ex join_roots(const GiNaC::ex& e);

}  // namespace couplet::rules
