#include "verify/reach.hpp"

#include <algorithm>

#include "limits/run_limits.hpp"

namespace couplet::verify {

namespace {

enum : char { unseen = 0, seen_nonzero = 1, excluded = 2 };

// A declared parity excludes half the values; a j of any parity may take each.
bool parity_allows(const free_number& f, long twice) {
    switch (f.parity) {
        case qn_parity::integer:
            return twice % 2 == 0;
        case qn_parity::half_odd:
            return twice % 2 != 0;
        default:
            return true;
    }
}

}  // namespace

reach_tracker::reach_tracker(const sampling_domain& domain, int cover_max_j) : d_(domain), cover_max_j_(cover_max_j) {
    for (std::size_t k = 0; k < domain.numbers.size(); ++k) {
        if (domain.numbers[k].role != qn_role::angular) continue;
        angular_.push_back(k);
        std::vector<char> values(static_cast<std::size_t>(2 * std::max(cover_max_j, 0) + 1), unseen);
        for (std::size_t v = 0; v < values.size(); ++v)
            if (!parity_allows(domain.numbers[k], static_cast<long>(v))) values[v] = excluded;
        seen_.push_back(std::move(values));
    }
}

void reach_tracker::record(const point& t, bool nonzero) {
    for (std::size_t a = 0; a < angular_.size(); ++a) {
        long v = t[angular_[a]];
        largest_ = std::max(largest_, v);
        if (nonzero && v >= 0 && v < static_cast<long>(seen_[a].size()) && seen_[a][v] == unseen)
            seen_[a][v] = seen_nonzero;
    }
}

void reach_tracker::exclude(std::size_t k, long twice) {
    for (std::size_t a = 0; a < angular_.size(); ++a)
        if (angular_[a] == k && twice >= 0 && twice < static_cast<long>(seen_[a].size()) && seen_[a][twice] == unseen)
            seen_[a][twice] = excluded;
}

bool reach_tracker::covered(std::size_t k, long twice) const {
    for (std::size_t a = 0; a < angular_.size(); ++a)
        if (angular_[a] == k)
            return twice < 0 || twice >= static_cast<long>(seen_[a].size()) || seen_[a][twice] != unseen;
    return true;
}

std::vector<std::pair<std::size_t, long>> reach_tracker::missing() const {
    std::vector<std::pair<std::size_t, long>> out;
    const long values = 2L * std::max(cover_max_j_, 0) + 1;
    for (long v = 0; v < values; ++v)
        for (std::size_t a = 0; a < angular_.size(); ++a)
            if (seen_[a][v] == unseen) out.emplace_back(angular_[a], v);
    return out;
}

reach_summary reach_tracker::summary() const {
    reach_summary s;
    s.largest_twice_j = largest_;
    s.cover_max_j = cover_max_j_;
    for (const auto& values : seen_)
        for (char c : values) {
            if (c == excluded) continue;
            ++s.wanted;
            if (c == seen_nonzero) ++s.covered;
        }
    return s;
}

std::vector<point> covering_points(const sampling_domain& domain, const sampling_options& options, reach_tracker& reach,
                                   std::size_t k, long twice, std::size_t count, std::uint64_t seed,
                                   const std::vector<point>& avoid) {
    std::vector<point> tries = pinned_points(domain, k, twice, count, seed, avoid);
    // Excluded only where no admissible point has the value, not where every one was seen.
    if (tries.empty() && pinned_points(domain, k, twice, 1, options.seed, {}).empty()) reach.exclude(k, twice);
    return tries;
}

bool reach_further(const sampling_domain& domain, const sampling_options& options, reach_tracker& reach,
                   const std::vector<point>& seen, const std::function<bool(const point&)>& observe) {
    const auto deadline = std::chrono::steady_clock::now() + options.reach_time;
    auto in_time = [&] { return std::chrono::steady_clock::now() < deadline; };
    for (const point& t :
         random_points(domain, options.far_points, options.far_max_j, options.seed + 17, seen, options.depth)) {
        if (!in_time()) return true;
        if (!observe(t)) return false;
    }
    for (const auto& [k, twice] : reach.missing()) {
        if (!in_time()) return true;
        if (reach.covered(k, twice)) continue;  // a point drawn for another pair covered it
        std::vector<point> tries = covering_points(domain, options, reach, k, twice, 4,
                                                   options.seed ^ (0x9e3779b97f4a7c15ULL * (k + 1) + twice), seen);
        for (const point& t : tries) {
            check_deadline();
            if (!observe(t)) return false;
            if (reach.covered(k, twice)) break;
        }
    }
    return true;
}

}  // namespace couplet::verify
