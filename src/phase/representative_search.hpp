// The readable representative of a phase class (the order is in readability.hpp).
//
// Exact up to four variable terms: every form with at most four terms is found through tables
// of the signatures of all one- and two-term forms (meet in the middle), and the best of the
// shortest is taken.  A class with no such form starts from its unique Howell-reduced form and
// descends by null moves (single and paired) while the order improves.  Both routes depend only
// on the class, never on the exponent it was asked for, so equal exponents always print alike.
#pragma once

#include "phase/phase_level.hpp"

#include <memory>

namespace couplet::phase::detail {

// Signatures of all one- and two-term forms of a level, built once per level.  The layout
// depends on the modulus (bit-sliced for q = 4, the usual case), so it stays private to the
// search; the level only owns it.
struct small_term_tables {
    virtual ~small_term_tables() = default;
};

std::unique_ptr<small_term_tables> build_small_term_tables(const phase_level& level);

// `reduced` must come from level.reduce(); the result is cached per class in the level.
const int_vector& readable_representative(const phase_level& level, const int_vector& reduced);

}  // namespace couplet::phase::detail
