// The missing phase of an identity that holds up to sign: a phase (-1)^E, E linear in the free
// quantum numbers, with the needed sign at every sample point.
//
// The GF(2) basis.  A sign function is a bit per point, and the bits of a sum of exponents
// add, but only for exponents that are integers at every point; the bits of the values x_i
// themselves are no basis (x_i is half-odd at some points, and (-1)^x for an integer x is not
// determined by the bit of 2x).  So the basis is a generating set of the lattice of exponents
// that are integers at every sample point: with t_i = 2x_i, E = (sum c_i t_i + d)/2 is an
// integer exactly when sum c_i t_i + d is even, a linear condition on (c mod 2, d mod 2)
// whose solutions are found as a null space over GF(2).  Their lifts (entries 0 or 1), the
// exponents 2x_i and the constant 1 generate the lattice; the bit of each generator at each
// point is (its exponent mod 2).  Any integer exponent is an integer combination of the
// generators, so its sign function is the GF(2) combination of theirs: solving over these
// features finds a phase whenever one exists, and no phase exists when they cannot.
// (Integer coefficients on the x_i suffice: E mod 2 depends only on c_i mod 4.)
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <string>
#include <vector>

#include "verify/domain.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify {

// E = sum_i coefficients[i] x_i + twice_constant / 2, coefficients in {-1, 0, 1, 2} (they
// matter mod 4) and twice_constant in {-1, 0, 1, 2} (the constant matters mod 2).
struct phase_exponent {
    std::vector<int> coefficients;
    int twice_constant = 0;
};

// What the phase must do at a point: keep the sign, flip it, or anything (both sides vanish;
// the exponent must still be an integer there).
enum class sign_need : signed char { any = -1, keep = 0, flip = 1 };

// A phase with the needed sign at every point whose exponent is an integer at all of them,
// the most readable one that fits; nothing when no phase (-1)^(linear) fits.
std::optional<phase_exponent> fit_phase(const std::vector<point>& points, const std::vector<sign_need>& needs);

GiNaC::ex exponent_ex(const phase_exponent& e, const sampling_domain& domain);

// The one place a missing phase is turned into text: "(-1)^(a+b+J)", "-1" for a constant flip.
std::string phase_text(const GiNaC::ex& exponent);

}  // namespace couplet::verify
