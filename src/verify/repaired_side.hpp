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

// Built once per side: the unchanged side is compiled and evaluated at the fresh points here,
// so that each of the many candidate repairs costs only its own evaluations.
class repaired_side_test {
public:
    // `seen_values`: the unchanged side at each of `seen`.
    repaired_side_test(const GiNaC::ex& unchanged, const quantum_numbers& numbers, const sampling_domain& d,
                       const std::vector<point>& seen, const std::vector<exact::number>& seen_values,
                       const sampling_options& options);

    // False also where the repaired side cannot be evaluated (a phase exponent that is not an
    // integer, a division by 0) at a point where the unchanged side is defined.
    bool holds(const GiNaC::ex& repaired) const;

private:
    const quantum_numbers& numbers_;
    const sampling_domain& d_;
    std::vector<point> points_;  // the seen ones compared, then the fresh ones
    std::vector<exact::number> values_;
};

}  // namespace couplet::verify
