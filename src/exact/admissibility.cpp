#include "exact/admissibility.hpp"

namespace couplet::exact {

// 128-bit sums: the predicates are public and must not overflow for any long arguments.
using wide = __int128;

bool angular_momentum_ok(long tj) { return tj >= 0; }

bool triangle(long ta, long tb, long tc) {
    if (ta < 0 || tb < 0 || tc < 0) return false;
    constexpr long small = 1L << 60;  // sums of three such cannot overflow a long
    if (ta < small && tb < small && tc < small) {
        const long difference = ta > tb ? ta - tb : tb - ta;
        return difference <= tc && tc <= ta + tb && ((ta + tb + tc) & 1) == 0;
    }
    const wide a = ta, b = tb, c = tc;
    const wide difference = a > b ? a - b : b - a;
    return difference <= c && c <= a + b && (a + b + c) % 2 == 0;
}

bool projection_ok(long tj, long tm) {
    if (tj < 0) return false;
    const wide j = tj, m = tm;
    return (m < 0 ? -m : m) <= j && (j - m) % 2 == 0;
}

}  // namespace couplet::exact
