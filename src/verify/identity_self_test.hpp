// The one self-test of every identity the simplifier applies: its instance's two sides compared
// by exact evaluation at the points the verifier samples (every admissible point with small j,
// random larger ones, and points that break a selection rule, where both sides must vanish).
#pragma once

#include <cstddef>
#include <string>

#include "model/identity.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify {

struct identity_test {
    bool holds = false;
    std::size_t points = 0, nonzero = 0;
    std::string disagreement;  // where and how the sides differ, when they do
};

identity_test self_test(const identity& id, const sampling_options& options = {});

}  // namespace couplet::verify
