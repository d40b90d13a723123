// The order in which a summand binds its summation indices, fixed once at compile time: every
// slot that is not one of the indices is known when the sum is entered, so which rules can
// bound or determine an index at each stage does not depend on the point.
#pragma once

#include <string>
#include <vector>

#include "eval/compiled.hpp"

namespace couplet::eval_detail {

// Greedy: an index that a zero rule determines (m3 = -m1 - m2 of a 3j) is solved, never looped;
// otherwise the loop goes over the bounded index after which most indices follow by solving.
// Each rule is checked, and each factor evaluated, as soon as its slots are bound.
summand_plan make_plan(const std::vector<selection_rule>& rules, const std::vector<const node*>& factors,
                       const std::vector<int>& indices, const std::vector<std::string>& slot_names);

}  // namespace couplet::eval_detail
