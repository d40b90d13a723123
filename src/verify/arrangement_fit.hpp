// A 6j written in an arrangement its symmetries do not reach: of the 720 orders of its six
// entries, the 24 symmetries of the tetrahedron (DLMF §34.5) leave the value alone and the rest fall into 29
// other classes with other values.  Each other order is tried in place of each 6j of either
// side; the first with which the identity holds at the points compared and at fresh ones is
// the diagnosis.
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

struct arrangement {
    GiNaC::ex written, needed;  // the 6j as written, and in the order that makes the identity hold
    bool on_left = false;
};

std::string describe(const arrangement& a);  // "it holds with 6j{...} in place of 6j{...} on the right side"

std::optional<arrangement> find_arrangement(const GiNaC::ex& lhs, const GiNaC::ex& rhs, const quantum_numbers& numbers,
                                            const sampling_domain& d, const std::vector<point>& points,
                                            const std::vector<exact::number>& lhs_values,
                                            const std::vector<exact::number>& rhs_values,
                                            const sampling_options& options);

}  // namespace couplet::verify
