// Normalization that needs no identity: merge the phases of each product into one (-1)^(...)
// and let GiNaC collect like factors.  Later stages build on a normalized expression.
#pragma once

#include <ginac/ginac.h>

namespace couplet {

GiNaC::ex merge_phases(const GiNaC::ex& e);
GiNaC::ex normalize(const GiNaC::ex& e);

}  // namespace couplet
