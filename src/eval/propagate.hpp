// The propagating enumeration of sums (sum_enumeration::propagating) on doubled values held
// in machine integers.
#pragma once

#include <cln/rational.h>

#include <optional>
#include <utility>
#include <vector>

#include "eval/compiled.hpp"
#include "eval/evaluate.hpp"

namespace couplet::eval_detail {

// The value with every free slot assigned; nothing when some value is not a multiple of 1/2
// or too large for machine integers (the caller then uses the rational path).
std::optional<exact::number> run_propagating(program& p, const evaluation_limits& limits,
                                             const std::vector<std::pair<int, cln::cl_RA>>& values);

}  // namespace couplet::eval_detail
