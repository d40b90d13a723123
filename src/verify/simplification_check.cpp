#include "verify/simplification_check.hpp"

#include <algorithm>
#include <memory>
#include <random>
#include <stdexcept>

#include "eval/evaluate.hpp"
#include "limits/run_limits.hpp"
#include "verify/domain.hpp"
#include "verify/reach.hpp"
#include "verify/tolerant_evaluation.hpp"

namespace couplet::verify {

namespace {

counterexample at_point(const sampling_domain& d, const point& t, const exact::number& x, const exact::number& y) {
    counterexample c{{}, x, y};
    for (std::size_t k = 0; k < t.size(); ++k)
        c.at.emplace_back(d.numbers[k].symbol.get_name(), GiNaC::numeric(t[k], 2));
    return c;
}

// A time-limited run draws fresh points in small batches instead of enumerating the whole
// sample first: small ones (j <= depth), larger ones (j <= depth + 2) and ones that break a
// selection rule, in turn, so that whatever fits the budget sees all three kinds.
std::vector<point> next_batch(const sampling_domain& d, const sampling_options& o, std::uint64_t round,
                              std::vector<point>& seen) {
    std::uint64_t seed = o.seed + 0x9e3779b97f4a7c15ULL * (round + 1);
    std::vector<point> small = random_points(d, 8, o.depth, seed, seen, o.depth);
    seen.insert(seen.end(), small.begin(), small.end());
    std::vector<point> large = random_points(d, 4, o.depth + 2, seed + 1, seen, o.depth);
    seen.insert(seen.end(), large.begin(), large.end());
    std::vector<point> outside = outside_points(d, 4, o.depth, seed + 2, seen);
    seen.insert(seen.end(), outside.begin(), outside.end());
    std::vector<point> out;
    for (std::size_t i = 0, j = 0, k = 0; i < small.size() || j < large.size() || k < outside.size();) {
        for (int n = 0; n < 2 && i < small.size(); ++n) out.push_back(small[i++]);
        if (j < large.size()) out.push_back(large[j++]);
        if (k < outside.size()) out.push_back(outside[k++]);
    }
    return out;
}

// A time-limited run's share of reach in each round: a point for each of the next two
// (j, value) pairs not yet seen at a nonzero point, and one point further out.
std::vector<point> reach_batch(const sampling_domain& d, const sampling_options& o, std::uint64_t round,
                               reach_tracker& reach, std::vector<point>& drawn) {
    std::vector<point> out;
    std::size_t wanted = 0;
    for (const auto& [k, twice] : reach.missing()) {
        if (wanted == 2) break;
        std::vector<point> p =
            covering_points(d, o, reach, k, twice, 1, o.seed ^ (round * 0x9e3779b97f4a7c15ULL + twice), drawn);
        if (p.empty()) continue;
        ++wanted;
        drawn.push_back(p.front());
        out.push_back(p.front());
    }
    // A point's cost grows with its j: the far point reaches further with each round, so a
    // budget that allows only a few rounds is not spent on one point at j = 100.
    const int far_j =
        std::min<int>(o.far_max_j, o.depth + 4 * static_cast<int>(std::min<std::uint64_t>(round + 2, 64)));
    for (const point& t : random_points(d, 1, far_j, o.seed + 31 * (round + 1), drawn, o.depth)) {
        drawn.push_back(t);
        out.push_back(t);
    }
    return out;
}

}  // namespace

verification_budget matching_budget(std::chrono::steady_clock::duration simplification_time) {
    verification_budget b;
    b.time = std::max<std::chrono::steady_clock::duration>(simplification_time, std::chrono::microseconds(1));
    return b;
}

simplification_check verify_simplification(const GiNaC::ex& input, const GiNaC::ex& result,
                                           const quantum_numbers& numbers, const sampling_options& options,
                                           const progress_callback& progress, const verification_budget& budget) {
    const auto started = std::chrono::steady_clock::now();
    simplification_check out;
    // Sampled over the free numbers of both: a result that lost or gained a free quantum number
    // is caught where its value depends on it.
    sampling_domain d = build_domain({input, result}, numbers);
    const bool limited = budget.time.count() > 0;
    evaluation_limits bounded;
    bounded.max_sum_terms = options.far_work;
    // Under a time budget one point of reach must not outlast it: about five summands per
    // microsecond of budget (a summand of a few 3j takes a fraction of a microsecond).
    if (limited) {
        const long micros = std::chrono::duration_cast<std::chrono::microseconds>(budget.time).count();
        bounded.max_sum_terms = std::clamp(5 * micros, 200L, options.far_work);
    }
    tolerant_expression before(input, numbers), far_before(input, numbers, bounded);
    std::unique_ptr<tolerant_expression> after, far_after;
    try {
        after = std::make_unique<tolerant_expression>(result, numbers);
        far_after = std::make_unique<tolerant_expression>(result, numbers, bounded);
    } catch (const evaluation_error& e) {
        out.agrees = false;
        out.result_error = e.what();
        return out;
    }
    reach_tracker reach(d, options.cover_max_j);
    std::vector<point> seen;
    std::string undefined_divisor;
    // False once the two disagree.  `far`: a point of reach, skipped where it costs too much.
    auto agree_at = [&](const point& t, bool far) {
        check_deadline();
        assignment at = to_assignment(d, t);
        exact::number x, y;
        try {
            x = (far ? far_before : before).at(at);
        } catch (const division_by_zero& e) {
            if (out.undefined++ == 0) undefined_divisor = e.divisor;
            return true;  // the input is undefined here; nothing to agree with
        } catch (const work_limit_exceeded&) {
            if (!far) throw;
            return true;
        } catch (const std::domain_error&) {
            ++out.undefined;
            return true;
        }
        std::string failure;
        try {
            y = (far ? *far_after : *after).at(at);
        } catch (const work_limit_exceeded&) {
            if (!far) throw;
            return true;
        } catch (const evaluation_error& e) {
            failure = e.what();
        } catch (const std::domain_error& e) {
            failure = e.what();
        }
        ++out.points;
        const bool nonzero = !x.is_zero() || !y.is_zero();
        if (nonzero) ++out.nonzero;
        reach.record(t, nonzero);
        seen.push_back(t);
        if (x == y && failure.empty()) return true;
        out.agrees = false;
        out.result_error = failure;
        out.counter = at_point(d, t, x, y);
        return false;
    };

    // The input undefined wherever it was evaluated is an error, not an agreement.
    auto finish = [&]() {
        out.reach = reach.summary();
        if (out.points == 0 && out.undefined > 0) throw undefined_everywhere(undefined_divisor, out.undefined);
        return out;
    };

    if (limited) {
        out.complete = false;
        std::vector<point> drawn;
        auto out_of_time = [&] {
            return out.points >= budget.min_points && std::chrono::steady_clock::now() - started > budget.time;
        };
        for (std::uint64_t round = 0;; ++round) {
            std::vector<point> batch = next_batch(d, options, round, drawn);
            std::vector<point> far = reach_batch(d, options, round, reach, drawn);
            if (batch.empty() && far.empty()) break;  // every point within reach has been drawn
            // The small points are all drawn and the time is spent: the input is undefined at
            // most points, and far ones alone would be drawn without end.
            if (batch.empty() && std::chrono::steady_clock::now() - started > budget.time) break;
            out.sampled += batch.size() + far.size();
            for (const point& t : batch) {
                if (out_of_time()) return finish();
                if (!agree_at(t, false)) return finish();
            }
            for (const point& t : far) {
                if (out_of_time()) return finish();
                if (!agree_at(t, true)) return finish();
            }
        }
        return finish();
    }

    sample_set samples = sample_points(d, options);
    out.complete = samples.complete;
    out.sampled = samples.points.size();
    const std::vector<point>& order = samples.points;
    bool agreed = true;
    for (std::size_t i = 0; i < order.size() && agreed; ++i) {
        if (progress) progress(i, order.size());
        agreed = agree_at(order[i], false);
    }
    if (progress) progress(order.size(), order.size());
    if (agreed && !samples.finite)
        reach_further(d, options, reach, seen, [&](const point& t) {
            ++out.sampled;
            return agree_at(t, true);
        });
    return finish();
}

}  // namespace couplet::verify
