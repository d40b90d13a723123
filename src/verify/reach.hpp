// How far a verification reached: the largest j among the points evaluated, and which values
// 0, 1/2, ..., cover_max_j each free angular momentum took at a point where the expression is
// nonzero (marginal coverage).  A defect confined to one value of one j (a factor 1 + delta(J, 7))
// shows only at a point with that value, so a verdict must have seen every value it claims.
#pragma once

#include <chrono>
#include <cstddef>
#include <cstdint>
#include <functional>
#include <utility>
#include <vector>

#include "verify/domain.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify {

struct reach_summary {
    long largest_twice_j = -1;  // -1: no point with a free angular momentum was evaluated
    int cover_max_j = 0;
    std::size_t covered = 0, wanted = 0;  // (j, value) pairs seen at a nonzero point, and asked for
};

class reach_tracker {
public:
    reach_tracker(const sampling_domain& domain, int cover_max_j);

    // A point evaluated; `nonzero` when some side (or the input) is nonzero there.
    void record(const point& t, bool nonzero);

    // The (variable, doubled value) pairs not yet seen at a nonzero point, each variable's
    // values in increasing order, the variables interleaved.
    std::vector<std::pair<std::size_t, long>> missing() const;
    bool covered(std::size_t k, long twice) const;  // seen at a nonzero point, or not asked for
    // No admissible point has this value (the triads fix its parity): not asked for.
    void exclude(std::size_t k, long twice);

    reach_summary summary() const;

private:
    const sampling_domain& d_;
    int cover_max_j_;
    std::vector<std::size_t> angular_;     // indices of the free angular momenta
    std::vector<std::vector<char>> seen_;  // per angular momentum, per doubled value: 0 no, 1 yes, 2 excluded
    long largest_ = -1;
};

// Up to `count` points with free j number k at doubled value `twice` (none of them in
// `avoid`); where no admissible point has that value at all, the pair is excluded from `reach`.
std::vector<point> covering_points(const sampling_domain& domain, const sampling_options& options, reach_tracker& reach,
                                   std::size_t k, long twice, std::size_t count, std::uint64_t seed,
                                   const std::vector<point>& avoid);

// Evaluates far_points random points with j up to far_max_j, then looks for each missing
// (j, value) pair among a few pinned points until one is nonzero, for at most reach_time.  `observe` evaluates a point
// (records it in `reach`, skips it when it costs too much) and returns false to stop; so does
// this function.  `seen` is the points already drawn; pinned and far points avoid them.
bool reach_further(const sampling_domain& domain, const sampling_options& options, reach_tracker& reach,
                   const std::vector<point>& seen, const std::function<bool(const point&)>& observe);

}  // namespace couplet::verify
