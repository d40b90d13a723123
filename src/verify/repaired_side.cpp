#include "verify/repaired_side.hpp"

#include <algorithm>
#include <stdexcept>

#include "eval/evaluate.hpp"
#include "limits/run_limits.hpp"
#include "verify/tolerant_evaluation.hpp"

namespace couplet::verify {

namespace {
constexpr std::size_t points_compared = 200;  // of those already seen: enough to reject a wrong repair
constexpr std::size_t fresh_points = 40;
}  // namespace

bool repaired_side_holds(const GiNaC::ex& repaired, const GiNaC::ex& other, const quantum_numbers& numbers,
                         const sampling_domain& d, const compared_points& seen, const sampling_options& options) {
    check_deadline();
    try {
        tolerant_expression candidate(repaired, numbers);
        const std::size_t compared = std::min(seen.points.size(), points_compared);
        for (std::size_t k = 0; k < compared; ++k)
            if (candidate.at(to_assignment(d, seen.points[k])) != seen.other_values[k]) return false;
        tolerant_expression unchanged(other, numbers);
        for (const point& t :
             random_points(d, fresh_points, options.depth + 4, options.seed ^ 0x5a5a, seen.points, options.depth)) {
            assignment at = to_assignment(d, t);
            if (candidate.at(at) != unchanged.at(at)) return false;
        }
    } catch (const evaluation_error&) {
        return false;
    } catch (const std::domain_error&) {
        return false;
    }
    return true;
}

}  // namespace couplet::verify
