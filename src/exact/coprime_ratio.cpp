#include "exact/coprime_ratio.hpp"

// CLN builds its own reduced fractions with I_I_to_RA(a, b) ("b > 0 and gcd(a, b) = 1"),
// exported by libcln but declared only in its private headers.  It is referenced weakly:
// should a future libcln drop it, the pointer is null and the public (gcd-computing)
// division is used instead.  test_number_arithmetic.cpp compares both on random inputs.
namespace cln {
extern const cl_RA I_I_to_RA(const cl_I& a, const cl_I& b) __attribute__((weak));
}

namespace couplet::exact::detail {

cln::cl_RA coprime_ratio(const cln::cl_I& numerator, const cln::cl_I& denominator) {
    if (denominator == 1) return numerator;
    if (&cln::I_I_to_RA != nullptr) return cln::I_I_to_RA(numerator, denominator);
    return numerator / denominator;
}

}  // namespace couplet::exact::detail
