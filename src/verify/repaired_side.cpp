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

repaired_side_test::repaired_side_test(const GiNaC::ex& unchanged, const quantum_numbers& numbers,
                                       const sampling_domain& d, const std::vector<point>& seen,
                                       const std::vector<exact::number>& seen_values, const sampling_options& options)
    : numbers_(numbers), d_(d) {
    const std::size_t compared = std::min(seen.size(), points_compared);
    points_.assign(seen.begin(), seen.begin() + static_cast<long>(compared));
    values_.assign(seen_values.begin(), seen_values.begin() + static_cast<long>(compared));
    try {
        tolerant_expression side(unchanged, numbers);
        for (const point& t :
             random_points(d, fresh_points, options.depth + 4, options.seed ^ 0x5a5a, seen, options.depth)) {
            try {
                values_.push_back(side.at(to_assignment(d, t)));
                points_.push_back(t);
            } catch (const division_by_zero&) {
                // undefined here: the identity says nothing at this point
            }
        }
    } catch (const evaluation_error&) {
        // the unchanged side cannot be evaluated at fresh points: the seen ones must do
    }
}

bool repaired_side_test::holds(const GiNaC::ex& repaired) const {
    check_deadline();
    try {
        tolerant_expression candidate(repaired, numbers_);
        for (std::size_t k = 0; k < points_.size(); ++k)
            if (candidate.at(to_assignment(d_, points_[k])) != values_[k]) return false;
    } catch (const evaluation_error&) {
        return false;
    } catch (const std::domain_error&) {
        return false;
    }
    return true;
}

}  // namespace couplet::verify
