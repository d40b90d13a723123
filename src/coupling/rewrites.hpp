// The recoupling stage's rewrites as identity objects (model/identity.hpp): each instance's
// left side is a recoupling coefficient by its definition, the right side the closed form as
// published.
#pragma once

#include "model/identity.hpp"

namespace couplet::coupling {

// <(a, b) e, c; f | a, (b, c) g; f> = (-1)^(a+b+c+f) sqrt((2e+1)(2g+1)) {a b e; c f g}.
const identity& three_angular_momenta_identity();
// <(a, b) e, (c, d) g; f | (a, c) h, (b, d) k; f> = sqrt((2e+1)(2g+1)(2h+1)(2k+1)) {a b e; c d g; h k f}.
const identity& two_pairs_identity();
// <(a, b) c, d; J | (b, a) c, d; J> = (-1)^(a+b-c): exchanging the parts of a coupling.
const identity& exchanged_parts_identity();
// <(a, b) c, d; J | (a, b) e, d; J> = delta(c, e): coupled states are orthonormal.
const identity& orthonormal_states_identity();
// The whole stage on one coefficient: a path of the above, here ((a b) e, c) f, d; J to
// (a, (b, (c, d) h) k); J, two 6j and no sum.
const identity& recoupling_by_trees_identity();

}  // namespace couplet::coupling
