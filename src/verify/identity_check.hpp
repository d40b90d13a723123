// Deciding an identity LHS == RHS: symbolically when the simplifier reduces the difference to
// 0, and always by exact evaluation at sample points.  A failing identity is diagnosed: a
// missing phase (LHS = +-RHS everywhere), a missing factor (LHS/RHS a constant, or (2j+1),
// sqrt(2j+1) or an inverse for one free j, possibly times a phase), or a counterexample.
#pragma once

#include <ginac/ginac.h>

#include <functional>
#include <optional>
#include <string>
#include <utility>
#include <vector>

#include "exact/number.hpp"
#include "model/quantum.hpp"
#include "verify/arrangement_fit.hpp"
#include "verify/progress.hpp"
#include "verify/reach.hpp"
#include "verify/sampler.hpp"
#include "verify/summand_phase.hpp"

namespace couplet::verify {

struct counterexample {
    std::vector<std::pair<std::string, GiNaC::numeric>> at;  // every free quantum number
    exact::number lhs, rhs;
};

std::string describe(const counterexample& c);  // "j=1, m=-1/2"

// Without a symbolic proof, "holds" needs this many points with a nonzero side (unless every
// admissible point was checked); with fewer the verdict is undecided.
constexpr std::size_t minimum_evidence = 12;

// undecided: too few nonzero points for "holds" (minimum_evidence), or the time limit (--time-limit) stopped the
// comparison before any mismatch.
enum class verdict { holds, fails_by_phase, fails_by_factor, fails, undecided };
const char* verdict_name(verdict v);  // "holds", "fails by a phase", "fails by a factor", "fails", "undecided"

using simplifier_function = std::function<GiNaC::ex(const GiNaC::ex&, const quantum_numbers&)>;

struct check_options {
    sampling_options sampling;
    bool symbolic = true;            // try simplify(LHS - RHS) == 0 first
    simplifier_function simplifier;  // empty: simplify_expression
    progress_callback progress;
};

struct check_report {
    verdict result = verdict::holds;
    bool proved_symbolically = false;
    // The simplifier reduced LHS - RHS to 0 but evaluation disagrees: a bug, never a verdict.
    bool symbolic_conflict = false;
    std::size_t points = 0;     // points evaluated (where a side divides by zero not counted)
    std::size_t nonzero = 0;    // of which some side is nonzero
    std::size_t undefined = 0;  // admissible points where a side divides by zero
    bool finite = false;        // every admissible point was checked: agreement is a proof
    reach_summary reach;        // the largest j, and the values each free j took at nonzero points
    bool complete = true;       // every selection-respecting point with j <= depth was among them
    int depth = 2;
    std::optional<GiNaC::ex> missing_phase;   // exponent E: the right side lacks (-1)^E
    std::optional<summand_site> phase_site;   // where (-1)^E belongs, when not on the whole right side
    std::optional<arrangement> rearranged;    // a 6j in an order that makes the identity hold
    std::optional<GiNaC::ex> missing_factor;  // the whole factor the right side lacks
    std::optional<counterexample> counter;    // the smallest point where the sides differ
    std::string note;                         // a hint for a plain failure, or a caveat
    bool stopped = false;                     // the time limit ended the comparison early
};

// Throws evaluation_error when a side cannot be evaluated at an admissible point, and
// division_by_zero when a side divides by 0 at every admissible point checked.
check_report check_identity(const GiNaC::ex& lhs, const GiNaC::ex& rhs, const quantum_numbers& numbers,
                            const check_options& options = {});

}  // namespace couplet::verify
