// The simplification pipeline, as one call: normalize, canonicalize symbols and phases, and
// (as the engines grow) reduce m-sums and j-sums.  The result equals the input at every
// admissible assignment; callers verify that by exact evaluation before printing.
#pragma once

#include <ginac/ginac.h>

#include "couplet/model/quantum.hpp"

namespace couplet {

GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet
