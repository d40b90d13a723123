// The fallback of the representative search for classes without a form of four terms or
// fewer: steepest descent in the readability order by null moves, single ones first, then pairs.
// A deterministic function of its start, which is the class's unique Howell-reduced form.
#pragma once

#include "phase/phase_level.hpp"

namespace couplet::phase::detail {

int_vector descend_by_null_moves(const phase_level& level, const int_vector& start);

}  // namespace couplet::phase::detail
