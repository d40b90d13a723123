// Among the exponents that give the same sign as a fitted one at every sample point, the one
// printed: fewest terms, then (like the phase group's readability order) fewest negative
// coefficients, fewest 2s, no constant, earlier variables, coefficient 1 before 2 before -1,
// constant 0, 1/2, 1, -1/2.  The phase group may later replace this choice.
#pragma once

#include <vector>

#include "verify/phase_fit.hpp"

namespace couplet::verify::detail {

// A sample point reduced to what a phase can see: t_i mod 4 and the sign needed there.
struct phase_class {
    std::vector<int> residues;
    sign_need need;
};

bool fits(const phase_exponent& e, const std::vector<phase_class>& classes);

// `fallback` fits the classes; the result fits them too and reads at least as well.
phase_exponent readable_phase(const std::vector<phase_class>& classes, const phase_exponent& fallback);

}  // namespace couplet::verify::detail
