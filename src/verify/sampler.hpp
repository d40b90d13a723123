// Admissible sample points for the free quantum numbers of a domain: every admissible point
// with all free j <= depth that keeps the selection rules, a few small points that break them,
// then random points with larger j.
#pragma once

#include <chrono>
#include <cstddef>
#include <cstdint>
#include <vector>

#include "eval/evaluate.hpp"
#include "verify/domain.hpp"

namespace couplet::verify {

struct sampling_options {
    int depth = 2;         // exhaustive: every free j (and |m|, plain x) <= depth
    int samples = 200;     // random points beyond the exhaustive ones
    int random_max_j = 0;  // largest j of random points; 0 means depth + 4
    // Beyond this many exhaustive points a uniform random subset is kept.
    std::size_t exhaustive_limit = 4000;
    // Small points that break a selection rule: symbols vanish there, and an identity whose
    // sides vanish in different places is caught.
    std::size_t outside_limit = 300;
    std::uint64_t seed = 0x5eed'c0de;
    // Reach beyond the small points: each free j is looked for at every value 0, 1/2, ...,
    // cover_max_j at a point where the expression is nonzero, and far_points random points
    // have j up to far_max_j.  Such a point that would cost more than far_work summands is
    // skipped, and looking for them stops after reach_time, so reach never makes a
    // verification unbounded (an m-sum costs (2j+1) per index summed at each point).
    int cover_max_j = 20;
    int far_max_j = 100;
    std::size_t far_points = 6;
    long far_work = 50'000;
    std::chrono::steady_clock::duration reach_time = std::chrono::milliseconds(500);
};

using point = std::vector<long>;  // doubled values, in the domain's variable order

struct sample_set {
    std::vector<point> points;   // sorted: smaller points first
    std::size_t exhaustive = 0;  // points from the exhaustive pass
    std::size_t outside = 0;     // points that break a selection rule
    std::size_t random = 0;      // random larger points
    bool complete = true;        // the exhaustive pass kept every point it found
    // The admissible points are finitely many (no free j; projections of numbers only) and
    // `points` is every one of them: agreement there is a proof.
    bool finite = false;
};

sample_set sample_points(const sampling_domain& domain, const sampling_options& options);

// `count` further random points with j <= max_j (plain variables 0 <= x <= plain_max) that keep
// the selection rules where the sampler manages, none of them in `avoid`.
std::vector<point> random_points(const sampling_domain& domain, std::size_t count, int max_j, std::uint64_t seed,
                                 const std::vector<point>& avoid, int plain_max = 2);

// Up to `count` admissible points with every j <= depth that break a selection rule, none of
// them in `avoid`.
std::vector<point> outside_points(const sampling_domain& domain, std::size_t count, int depth, std::uint64_t seed,
                                  const std::vector<point>& avoid);

// Up to `count` points with variable k at doubled value `twice`, the others drawn at random
// with j up to about that value, keeping the selection rules where the sampler manages; none
// of them in `avoid`.
std::vector<point> pinned_points(const sampling_domain& domain, std::size_t k, long twice, std::size_t count,
                                 std::uint64_t seed, const std::vector<point>& avoid);

// The order in which points are checked and the smallest counterexample is chosen: by the
// sum of |2x|, then the largest |2x|, then lexicographically.
bool smaller_point(const point& a, const point& b);

assignment to_assignment(const sampling_domain& domain, const point& p);

}  // namespace couplet::verify
