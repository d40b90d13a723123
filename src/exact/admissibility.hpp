#pragma once
// Selection rules, on doubled arguments (2j, 2m as integers, as in GSL).  A symbol whose
// arguments break any of them is exactly 0.

namespace couplet::exact {

// j >= 0 (any j in N/2 is an angular momentum).
bool angular_momentum_ok(long tj);
// a, b, c >= 0, |a-b| <= c <= a+b and a+b+c integer.
bool triangle(long ta, long tb, long tc);
// j >= 0, |m| <= j and j-m integer.
bool projection_ok(long tj, long tm);

}  // namespace couplet::exact
