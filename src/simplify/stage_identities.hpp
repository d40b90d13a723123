// The rewrites of the pipeline itself (simplify.cpp), each as an identity with an instance
// (model/identity.hpp), so that the trace's first and last steps come from objects with a
// reference and a self-test like every rule's.
#pragma once

#include "model/identity.hpp"

namespace couplet {

// <j1 m1, j2 m2 | J M> = (-1)^(j1-j2+M) sqrt(2J+1) 3j(j1, j2, J; m1, m2, -M)  (DLMF 34.1.1).
const identity& clebsch_as_threej_identity();
// A phase rewritten to the phase group's representative of its class.
const identity& phase_reduction_identity();
// Like terms collected; a triangle that a symbol of the same product imposes dropped.
const identity& closed_form_identity();
// proj(j, m) added where a phase holds a projection whose columns the reduction removed.
const identity& projection_range_identity();
// The input in its canonical arrangement, where no reduction is shorter (the symbols'
// symmetries, here DLMF 34.5.8).
const identity& input_form_identity();

}  // namespace couplet
