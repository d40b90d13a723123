#include "verify/simplification_check.hpp"

#include <algorithm>
#include <memory>
#include <random>
#include <stdexcept>

#include "eval/evaluate.hpp"
#include "limits/run_limits.hpp"
#include "verify/domain.hpp"
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
    tolerant_expression before(input, numbers);
    std::unique_ptr<tolerant_expression> after;
    try {
        after = std::make_unique<tolerant_expression>(result, numbers);
    } catch (const evaluation_error& e) {
        out.agrees = false;
        out.result_error = e.what();
        return out;
    }
    // False once the two disagree.
    auto agree_at = [&](const point& t) {
        check_deadline();
        assignment at = to_assignment(d, t);
        exact::number x, y;
        try {
            x = before.at(at);
        } catch (const std::domain_error&) {
            return true;  // the input divides by zero here; nothing to agree with
        }
        std::string failure;
        try {
            y = after->at(at);
        } catch (const evaluation_error& e) {
            failure = e.what();
        } catch (const std::domain_error& e) {
            failure = e.what();
        }
        ++out.points;
        if (!x.is_zero() || !y.is_zero()) ++out.nonzero;
        if (x == y && failure.empty()) return true;
        out.agrees = false;
        out.result_error = failure;
        out.counter = at_point(d, t, x, y);
        return false;
    };

    if (limited) {
        out.complete = false;
        std::vector<point> seen;
        for (std::uint64_t round = 0;; ++round) {
            std::vector<point> batch = next_batch(d, options, round, seen);
            if (batch.empty()) break;  // every small point has been drawn
            out.sampled += batch.size();
            for (const point& t : batch) {
                if (out.points >= budget.min_points && std::chrono::steady_clock::now() - started > budget.time)
                    return out;
                if (!agree_at(t)) return out;
            }
        }
        return out;
    }

    sample_set samples = sample_points(d, options);
    out.complete = samples.complete;
    out.sampled = samples.points.size();
    const std::vector<point>& order = samples.points;
    for (std::size_t i = 0; i < order.size(); ++i) {
        if (progress) progress(i, order.size());
        if (!agree_at(order[i])) break;
    }
    if (progress) progress(order.size(), order.size());
    return out;
}

}  // namespace couplet::verify
