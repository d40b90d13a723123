#pragma once
// numerator/denominator as a cln::cl_RA when the two are known to be coprime.

#include <cln/integer.h>
#include <cln/rational.h>

namespace couplet::exact::detail {

// Precondition: denominator > 0 and gcd(numerator, denominator) = 1 (not checked).
// CLN's public a/b recomputes the gcd, which for word-sized operands cost about 0.5 us,
// the largest single cost of a small exact 6j; this skips it where the library allows.
cln::cl_RA coprime_ratio(const cln::cl_I& numerator, const cln::cl_I& denominator);

}  // namespace couplet::exact::detail
