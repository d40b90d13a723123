#include "verify/sampler.hpp"

#include "limits/run_limits.hpp"

#include <algorithm>
#include <optional>
#include <random>
#include <set>

namespace couplet::verify {

namespace {

long floor_div(long a, long b) {  // b > 0
    return a >= 0 ? a / b : -((-a + b - 1) / b);
}
long ceil_div(long a, long b) { return -floor_div(-a, b); }

// Assigns the variables in index order; each one ranges over the values that the rules whose
// other variables are already known allow, so the enumeration never wanders into a region
// that a rule has closed.
class assigner {
public:
    assigner(const sampling_domain& d, bool keep_selection, int max_j, int small_j)
        : d_(d), max_j_(max_j), small_j_(small_j), pinned_(d.numbers.size()), attached_(d.numbers.size()) {
        attach(d.hard);
        if (keep_selection) attach(d.selection);
    }

    std::size_t size() const { return d_.numbers.size(); }

    // Variable k takes only this doubled value.
    void pin(std::size_t k, long twice) { pinned_ = k, pinned_value_ = twice; }

    // The values variable k may take, given t[0..k-1].
    std::vector<long> candidates(std::size_t k, point& t) const {
        auto [low, high] = static_range(k);
        t[k] = 0;
        for (const rule* r : attached_[k]) {
            if (r->kind == rule_kind::divisible) continue;
            long a = r->form.coefficient_of(k);
            long rest = r->form.value(t);
            if (r->kind == rule_kind::zero) {
                if (rest % a != 0) return {};
                low = std::max(low, -rest / a);
                high = std::min(high, -rest / a);
            } else if (a > 0) {
                low = std::max(low, ceil_div(-rest, a));
            } else {
                high = std::min(high, floor_div(rest, -a));
            }
        }
        std::vector<long> out;
        for (long x = low; x <= high; ++x) {
            t[k] = x;
            bool ok = true;
            for (const rule* r : attached_[k])
                if (r->kind == rule_kind::divisible && !r->holds(t)) {
                    ok = false;
                    break;
                }
            if (ok) out.push_back(x);
        }
        return out;
    }

    // A uniformly chosen value for each variable in turn; false when some variable has none.
    template <typename Rng>
    bool draw(point& t, Rng& rng) const {
        for (std::size_t k = 0; k < size(); ++k) {
            std::vector<long> c = candidates(k, t);
            if (c.empty()) return false;
            t[k] = c[std::uniform_int_distribution<std::size_t>(0, c.size() - 1)(rng)];
        }
        return true;
    }

    // Every point; `leaf` returns false to stop.  False when the node budget ran out.
    template <typename Leaf>
    bool enumerate(Leaf&& leaf, long budget) const {
        point t(size(), 0);
        long nodes = 0;
        return descend(0, t, leaf, nodes, budget);
    }

private:
    void attach(const std::vector<rule>& rules) {
        for (const rule& r : rules) attached_[r.form.last_variable()].push_back(&r);
    }

    std::pair<long, long> static_range(std::size_t k) const {
        if (k == pinned_) return {pinned_value_, pinned_value_};
        const free_number& f = d_.numbers[k];
        switch (f.role) {
            case qn_role::angular:
                return {0, 2L * max_j_};
            case qn_role::projection:
                return {-(2L * max_j_ + f.slack), 2L * max_j_ + f.slack};
            // A name in no coupling symbol is most often a j in a factor like sqrt(2j+1) or
            // 1/(2j+1), where a negative value means nothing: small and non-negative.
            default:
                return {0, 2L * small_j_};
        }
    }

    template <typename Leaf>
    bool descend(std::size_t k, point& t, Leaf& leaf, long& nodes, long budget) const {
        if (++nodes > budget) return false;
        if (nodes % 4096 == 0) check_deadline();
        if (k == size()) return leaf(t);
        for (long x : candidates(k, t)) {
            t[k] = x;
            if (!descend(k + 1, t, leaf, nodes, budget)) return false;
        }
        return true;
    }

    const sampling_domain& d_;
    int max_j_, small_j_;
    std::size_t pinned_;  // size(): none
    long pinned_value_ = 0;
    std::vector<std::vector<const rule*>> attached_;
};

constexpr long node_budget = 4'000'000;

}  // namespace

bool smaller_point(const point& a, const point& b) {
    auto size = [](const point& p) {
        long sum = 0, top = 0;
        for (long v : p) {
            sum += std::labs(v);
            top = std::max(top, std::labs(v));
        }
        return std::make_pair(sum, top);
    };
    auto sa = size(a), sb = size(b);
    if (sa != sb) return sa < sb;
    return a < b;
}

std::vector<point> random_points(const sampling_domain& domain, std::size_t count, int max_j, std::uint64_t seed,
                                 const std::vector<point>& avoid, int plain_max) {
    std::mt19937_64 rng(seed);
    std::set<point> seen(avoid.begin(), avoid.end());
    assigner keeping(domain, true, max_j, plain_max);
    assigner loose(domain, false, max_j, plain_max);
    std::vector<point> out;
    const std::size_t attempts = 40 * count + 40;
    for (std::size_t a = 0; a < attempts && out.size() < count; ++a) {
        if (a % 1024 == 0) check_deadline();  // a large --samples must not outlast --time-limit
        point t(domain.numbers.size(), 0);
        // Mostly points where every symbol can be nonzero; now and then any admissible one.
        bool ok = (a % 40 == 39) ? loose.draw(t, rng) : keeping.draw(t, rng);
        if (ok && seen.insert(t).second) out.push_back(t);
    }
    return out;
}

std::vector<point> pinned_points(const sampling_domain& domain, std::size_t k, long twice, std::size_t count,
                                 std::uint64_t seed, const std::vector<point>& avoid) {
    std::mt19937_64 rng(seed);
    std::set<point> seen(avoid.begin(), avoid.end());
    std::vector<point> out;
    // The others' range grows with the attempts: a triad with the pinned j needs partners of
    // about its size, and a wider range finds the points a narrow one cannot.
    const int base = static_cast<int>(std::max(2L, (twice + 1) / 2));
    for (std::size_t a = 0; a < 12 * count + 12 && out.size() < count; ++a) {
        if (a % 256 == 0) check_deadline();
        int reach = base + static_cast<int>(a / 4);
        assigner draw(domain, a % 12 != 11, reach, std::min(reach, 2));
        draw.pin(k, twice);
        point t(domain.numbers.size(), 0);
        if (draw.draw(t, rng) && seen.insert(t).second) out.push_back(t);
    }
    return out;
}

std::vector<point> outside_points(const sampling_domain& domain, std::size_t count, int depth, std::uint64_t seed,
                                  const std::vector<point>& avoid) {
    std::vector<point> out;
    if (domain.selection.empty()) return out;
    std::mt19937_64 rng(seed);
    std::set<point> seen(avoid.begin(), avoid.end());
    assigner loose(domain, false, depth, depth);
    for (std::size_t a = 0; a < 8 * count && out.size() < count; ++a) {
        point t(domain.numbers.size(), 0);
        if (loose.draw(t, rng) && !domain.preferred(t) && seen.insert(t).second) out.push_back(t);
    }
    return out;
}

namespace {

// Every admissible point, where there are few: the hard rules alone bound each free number
// (a projection of a number is bounded by |m| <= j; a j or a plain variable never is), so the
// points found with j up to 50 and up to 100 are the same.
std::optional<std::vector<point>> every_admissible_point(const sampling_domain& domain) {
    for (const free_number& f : domain.numbers)
        if (f.role != qn_role::projection) return std::nullopt;
    constexpr long budget = 20'000;
    auto all = [&](int max_j) {
        std::vector<point> found;
        assigner loose(domain, false, max_j, 0);
        bool done = loose.enumerate(
            [&](const point& t) {
                found.push_back(t);
                return true;
            },
            budget);
        return done ? std::optional<std::vector<point>>(std::move(found)) : std::nullopt;
    };
    auto near = all(50), far = all(100);
    if (!near || !far || near->size() != far->size()) return std::nullopt;
    return far;
}

}  // namespace

sample_set sample_points(const sampling_domain& domain, const sampling_options& options) {
    sample_set s;
    if (auto every = every_admissible_point(domain)) {
        s.points = std::move(*every);
        std::sort(s.points.begin(), s.points.end(), smaller_point);
        s.exhaustive = s.points.size();
        s.finite = true;
        return s;
    }
    std::mt19937_64 rng(options.seed);
    std::vector<point> kept;
    std::size_t seen_count = 0;
    assigner exhaustive(domain, true, options.depth, options.depth);
    bool finished = exhaustive.enumerate(
        [&](const point& t) {
            ++seen_count;
            if (kept.size() < options.exhaustive_limit) {
                kept.push_back(t);
            } else {  // reservoir: each point found is kept with equal probability
                std::size_t slot = std::uniform_int_distribution<std::size_t>(0, seen_count - 1)(rng);
                if (slot < kept.size()) kept[slot] = t;
            }
            return true;
        },
        node_budget);
    s.complete = finished && seen_count <= options.exhaustive_limit;
    s.exhaustive = kept.size();

    std::vector<point> all = kept;
    std::vector<point> outside = outside_points(domain, options.outside_limit, options.depth, rng(), all);
    s.outside = outside.size();
    all.insert(all.end(), outside.begin(), outside.end());

    int max_j = options.random_max_j > 0 ? options.random_max_j : options.depth + 4;
    std::vector<point> extra =
        random_points(domain, static_cast<std::size_t>(std::max(options.samples, 0)), max_j, rng(), all, options.depth);
    s.random = extra.size();
    all.insert(all.end(), extra.begin(), extra.end());
    std::sort(all.begin(), all.end(), smaller_point);
    s.points = std::move(all);
    return s;
}

assignment to_assignment(const sampling_domain& domain, const point& p) {
    assignment a;
    for (std::size_t k = 0; k < p.size(); ++k) a[domain.numbers[k].symbol] = GiNaC::numeric(p[k], 2);
    return a;
}

}  // namespace couplet::verify
