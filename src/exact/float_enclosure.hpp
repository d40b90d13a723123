#pragma once
// A certified floating-point enclosure of a number: |value - x| <= bound.

#include "exact/number.hpp"

#include <cln/float.h>

namespace couplet::exact::detail {

struct float_enclosure {
    cln::cl_F value;
    cln::cl_F bound;
};

// Evaluates with `bits` of mantissa (CLN long floats, so no exponent overflow).
float_enclosure enclose(const number::term_map& terms, unsigned bits);

}  // namespace couplet::exact::detail
