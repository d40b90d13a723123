// A phase missing inside a sum: an identity such as Racah's sum rule written without the
// (-1)^(p+q+x) of its summand fails by no factor of the whole side, since the phase changes
// each term differently.  Phases (-1)^E are tried in the summand of each sum of either side,
// E a sum of up to four of the free quantum numbers and the sum's indices (fewest first),
// plus 0 or 1; the first that makes both sides agree at the points already compared and at
// fresh ones is the diagnosis.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <string>
#include <vector>

#include "exact/number.hpp"
#include "model/quantum.hpp"
#include "verify/domain.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify {

struct summand_site {
    std::vector<GiNaC::ex> indices;  // of the sum whose summand lacks the phase
    bool on_left = true;
};
std::string describe(const summand_site& s);  // "the summand of the sum over x on the left side"

struct summand_phase {
    GiNaC::ex exponent;  // E: the summand lacks (-1)^E
    summand_site site;
};

// `points` with the values of both sides there (the comparison's, in its order).
std::optional<summand_phase> find_summand_phase(const GiNaC::ex& lhs, const GiNaC::ex& rhs,
                                                const quantum_numbers& numbers, const sampling_domain& d,
                                                const std::vector<point>& points,
                                                const std::vector<exact::number>& lhs_values,
                                                const std::vector<exact::number>& rhs_values,
                                                const sampling_options& options);

}  // namespace couplet::verify
