// The check every simplification passes before it is printed: input and result agree exactly
// at the same sample points that `check` uses.
#pragma once

#include <ginac/ginac.h>

#include <chrono>
#include <optional>
#include <string>

#include "model/quantum.hpp"
#include "verify/identity_check.hpp"
#include "verify/reach.hpp"

namespace couplet::verify {

// How much a verification may evaluate.  Without a time limit every point of the sample is
// checked, smallest first, then the points of reach (far ones, and each free j at every value
// up to cover_max_j).  With one, fresh points are drawn in small batches (random ones with
// j <= depth, larger ones with j <= depth + 2, small ones that break a selection rule, and two
// points of reach, in turn; the seed fixes them) until the time is spent, but never fewer than
// min_points are checked: a cheap simplification then does not pay for an enumeration it will
// not use.
struct verification_budget {
    std::chrono::steady_clock::duration time{0};  // zero: no limit
    std::size_t min_points = 12;
};

// simplify's policy at default settings: check fresh points for as long as the simplification
// took (so verification at most doubles the work), and never fewer than min_points.
verification_budget matching_budget(std::chrono::steady_clock::duration simplification_time);

struct simplification_check {
    bool agrees = true;
    // Points checked where the input is defined (no division by 0), and of which nonzero.
    std::size_t points = 0, nonzero = 0;
    std::size_t undefined = 0;              // points where the input divides by 0
    reach_summary reach;                    // the largest j, and the values each free j took at nonzero points
    std::size_t sampled = 0;                // points the sampler offered
    bool complete = true;                   // every point of a complete exhaustive pass was checked
    std::optional<counterexample> counter;  // lhs: the input's value, rhs: the result's
    // The result could not be evaluated where the input is nonzero (then counter->rhs is 0).
    std::string result_error;
};

// Stops at the first point where the two differ.  Throws evaluation_error when the input
// cannot be evaluated at an admissible point, division_by_zero when it divides by 0 at every
// point; a result that cannot be evaluated is a disagreement.
simplification_check verify_simplification(const GiNaC::ex& input, const GiNaC::ex& result,
                                           const quantum_numbers& numbers, const sampling_options& options,
                                           const progress_callback& progress = {},
                                           const verification_budget& budget = {});

}  // namespace couplet::verify
