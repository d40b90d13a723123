// Whether one side of an identity, changed by a proposed repair, equals the other side at the
// points already compared (their values known) and at fresh random points: the one test that
// every structural diagnosis (a phase inside a sum, another arrangement of a symbol) passes.
#pragma once

#include <ginac/ginac.h>

#include <vector>

#include "exact/number.hpp"
#include "model/quantum.hpp"
#include "verify/domain.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify {

struct compared_points {
    const std::vector<point>& points;
    const std::vector<exact::number>& other_values;  // the unchanged side at each point
};

// False also where the repaired side cannot be evaluated (a phase exponent that is not an
// integer, a division by 0).
bool repaired_side_holds(const GiNaC::ex& repaired, const GiNaC::ex& other, const quantum_numbers& numbers,
                         const sampling_domain& d, const compared_points& seen, const sampling_options& options);

}  // namespace couplet::verify
