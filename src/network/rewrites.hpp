// The rewrites of the m-sum stage that are code rather than one move's pattern, each as an
// identity with an instance (model/identity.hpp): the trace records them through these objects
// and the shared self-test proves each instance exactly.
#pragma once

#include "model/identity.hpp"

namespace couplet::network {

// sum(m : delta(m, n) f(m)) = f(n): a delta on a summed projection.
const identity& projection_delta_identity();
// A projection that a 3j's m1+m2+m3 = 0 fixes is not summed (DLMF 34.2).
const identity& fixed_projection_identity();
// The factorization theorems: a network joined to the rest by two lines carries
// delta(j1, j2)/(2 j1 + 1), by three lines a closing 3j on each side.
const identity& two_line_cut_identity();
const identity& three_line_cut_identity();
// sum(J, M : (2J+1) 3j 3j) = delta delta (DLMF 34.3.17).
const identity& completeness_identity();

}  // namespace couplet::network
