// Moving a witness point to a small, fully admissible place without losing what it witnesses.
//
// A witness u shows that w . (u, 1) is not 0 mod `modulus` (X not an integer: modulus 2D; two
// exponents differing: modulus 4D applied to X - Y).  Adding a lattice direction z with
// w . (z, 0) = 0 mod modulus keeps both the congruences and that property, so the search walks
// through such directions, preferring j >= 0, |m| <= j, the triangles, and small values.
#pragma once

#include "phase/phase_lattice.hpp"

#include <cstdint>

namespace couplet::phase::detail {

int_vector polish_witness(const phase_lattice& lattice, int_vector start, const int_vector& w, std::int64_t modulus);

// How far u is from satisfying the inequalities of the geometry (0 when it does).
double inequality_violation(const witness_geometry& geometry, const int_vector& u);

}  // namespace couplet::phase::detail
