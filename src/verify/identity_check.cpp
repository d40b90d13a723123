#include "verify/identity_check.hpp"

#include "limits/run_limits.hpp"

#include <algorithm>
#include <sstream>
#include <stdexcept>

#include "eval/evaluate.hpp"
#include "model/symbols.hpp"
#include "simplify/simplify.hpp"
#include "verify/domain.hpp"
#include "verify/factor_fit.hpp"
#include "verify/hat_fit.hpp"
#include "verify/phase_fit.hpp"
#include "verify/reach.hpp"
#include "verify/tolerant_evaluation.hpp"

namespace couplet::verify {

using GiNaC::ex;

std::string describe(const counterexample& c) {
    std::string out;
    for (const auto& [name, value] : c.at) {
        std::ostringstream os;
        os << name << "=" << value;
        out += (out.empty() ? "" : ", ") + os.str();
    }
    return out.empty() ? "(no free quantum numbers)" : out;
}

const char* verdict_name(verdict v) {
    switch (v) {
        case verdict::holds:
            return "holds";
        case verdict::fails_by_phase:
            return "fails by a phase";
        case verdict::fails_by_factor:
            return "fails by a factor";
        case verdict::undecided:
            return "undecided";
        default:
            return "fails";
    }
}

namespace {

counterexample make_counterexample(const sampling_domain& d, const point& t, const exact::number& l,
                                   const exact::number& r) {
    counterexample c{{}, l, r};
    for (std::size_t k = 0; k < t.size(); ++k)
        c.at.emplace_back(d.numbers[k].symbol.get_name(), GiNaC::numeric(t[k], 2));
    return c;
}

// Both sides at every point, in order, stopping once no diagnosis can survive.
class comparison {
public:
    comparison(const sampling_domain& d, const tolerant_expression& lhs, const tolerant_expression& rhs,
               const tolerant_expression& bounded_lhs, const tolerant_expression& bounded_rhs, reach_tracker& reach)
        : d_(d), lhs_(lhs), rhs_(rhs), bounded_lhs_(bounded_lhs), bounded_rhs_(bounded_rhs), reach_(reach) {}

    // False once the comparison has stopped (no diagnosis can survive).
    bool run(const std::vector<point>& points, const progress_callback& progress) {
        for (std::size_t i = 0; i < points.size(); ++i) {
            if (progress) progress(i, points.size());
            check_deadline();
            if (!observe(points[i], false)) return false;
        }
        if (progress) progress(points.size(), points.size());
        return true;
    }

    bool reach_further(const sampling_options& o) {
        return verify::reach_further(d_, o, reach_, seen_, [this](const point& t) { return observe(t, true); });
    }

    bool all_equal() const { return all_equal_; }
    std::size_t evaluated() const { return seen_.size(); }
    std::size_t nonzero() const { return nonzero_; }
    const std::vector<point>& seen() const { return seen_; }
    const std::vector<exact::number>& rhs_values() const { return rhs_values_; }
    const std::vector<exact::number>& lhs_values() const { return lhs_values_; }
    const std::optional<counterexample>& first_mismatch() const { return mismatch_; }
    bool one_side_vanishes() const { return one_side_vanishes_; }
    std::size_t undefined() const { return undefined_; }
    // LHS/RHS at each point seen (nothing where both vanish); empty where one side alone
    // vanishes somewhere, since then no factor repairs the identity.
    std::vector<std::optional<exact::number>> ratios() const {
        std::vector<std::optional<exact::number>> out;
        if (!ratios_everywhere_) return out;
        for (std::size_t k = 0; k < seen_.size(); ++k)
            if (lhs_values_[k].is_zero() && rhs_values_[k].is_zero())
                out.emplace_back();
            else
                out.emplace_back(lhs_values_[k] / rhs_values_[k]);
        return out;
    }
    const std::string& first_undefined() const { return first_undefined_; }
    std::vector<detail::factor_candidate>& candidates() { return candidates_; }

private:
    // `bounded`: a point of reach, skipped where it would cost more than far_work summands.
    bool observe(const point& t, bool bounded) {
        assignment at = to_assignment(d_, t);
        exact::number l, r;
        try {
            l = (bounded ? bounded_lhs_ : lhs_).at(at);
            r = (bounded ? bounded_rhs_ : rhs_).at(at);
        } catch (const division_by_zero& e) {
            if (undefined_++ == 0) first_undefined_ = e.divisor;
            return true;  // a side is undefined here: the identity says nothing at this point
        } catch (const work_limit_exceeded&) {
            if (!bounded) throw;
            return true;  // too costly: reach skips it
        } catch (const std::domain_error&) {
            ++undefined_;
            return true;
        }
        reach_.record(t, !(l.is_zero() && r.is_zero()));
        seen_.push_back(t);
        lhs_values_.push_back(l);
        rhs_values_.push_back(r);
        bool vanish = l.is_zero() && r.is_zero();
        if (!vanish) ++nonzero_;
        if (l != r && !mismatch_) {
            mismatch_ = make_counterexample(d_, t, l, r);
            one_side_vanishes_ = l.is_zero() || r.is_zero();
            if (one_side_vanishes_) return stop();
            // Diagnosis starts at the first mismatch: replay the points before it.
            candidates_ = detail::simple_factors(d_);
            for (std::size_t k = 0; k + 1 < seen_.size(); ++k) feed(seen_[k], lhs_values_[k], rhs_values_[k]);
            mismatch_seen_ = seen_.size();
        }
        if (l != r) all_equal_ = false;
        if (mismatch_) {
            if (!vanish && (l.is_zero() || r.is_zero())) return stop();
            feed(t, l, r);
            // Without a simple candidate, enough further points for the fit of hats.
            if (std::none_of(candidates_.begin(), candidates_.end(), [](const auto& c) { return c.alive(); }))
                return seen_.size() < mismatch_seen_ + hat_fit_points;
        }
        return true;
    }

    void feed(const point& t, const exact::number& l, const exact::number& r) {
        if (l.is_zero() && r.is_zero()) {
            for (auto& c : candidates_) c.observe_vanishing();
            return;
        }
        exact::number ratio = l == r ? exact::number(1L) : l / r;
        for (auto& c : candidates_) c.observe(ratio, t);
    }

    bool stop() {
        all_equal_ = false;
        ratios_everywhere_ = false;
        for (auto& c : candidates_) c.kill();
        return false;
    }

    const sampling_domain& d_;
    const tolerant_expression& lhs_;
    const tolerant_expression& rhs_;
    const tolerant_expression& bounded_lhs_;
    const tolerant_expression& bounded_rhs_;
    reach_tracker& reach_;
    static constexpr std::size_t hat_fit_points = 96;
    std::size_t mismatch_seen_ = 0;
    bool ratios_everywhere_ = true;  // no point where one side alone vanishes
    std::size_t undefined_ = 0;
    std::string first_undefined_;
    bool all_equal_ = true;
    bool one_side_vanishes_ = false;
    std::size_t nonzero_ = 0;
    std::vector<point> seen_;
    std::vector<exact::number> lhs_values_, rhs_values_;
    std::optional<counterexample> mismatch_;
    std::vector<detail::factor_candidate> candidates_;
};

// The factor that would repair the right side, if candidate `c` explains every point.
std::optional<std::pair<ex, std::optional<ex>>> repair(detail::factor_candidate& c, const std::vector<point>& points,
                                                       const sampling_domain& d) {
    if (!c.alive() || !c.observed()) return std::nullopt;
    const auto& needs = c.needs();
    bool any_flip = std::find(needs.begin(), needs.end(), sign_need::flip) != needs.end();
    bool any_keep = std::find(needs.begin(), needs.end(), sign_need::keep) != needs.end();
    ex size = to_ex(c.magnitude());
    bool unit = c.shape() == detail::factor_shape::constant && c.magnitude() == exact::number(1L);
    if (!any_flip) return std::make_pair(size * c.factor(), std::optional<ex>());
    if (!any_keep && !unit) return std::make_pair(-size * c.factor(), std::optional<ex>());
    std::optional<phase_exponent> fit = fit_phase(points, needs);
    if (!fit) return std::nullopt;
    ex exponent = exponent_ex(*fit, d);
    return std::make_pair(size * c.factor() * make_phase(exponent), std::optional<ex>(exponent));
}

// A product or ratio of hats with a phase that would repair the right side, fitted over
// every point seen.
std::optional<std::pair<ex, std::optional<ex>>> hat_repair(const comparison& cmp, const sampling_domain& d) {
    std::vector<std::optional<exact::number>> ratios = cmp.ratios();
    if (ratios.empty()) return std::nullopt;
    std::optional<hat_factor> hats = fit_hat_factor(d, cmp.seen(), ratios);
    if (!hats) return std::nullopt;
    ex factor = hats->factor(d);
    if (std::find(hats->needs.begin(), hats->needs.end(), sign_need::flip) == hats->needs.end())
        return std::make_pair(factor, std::optional<ex>());
    std::optional<phase_exponent> fit = fit_phase(cmp.seen(), hats->needs);
    if (!fit) return std::nullopt;
    ex exponent = exponent_ex(*fit, d);
    return std::make_pair(factor * make_phase(exponent), std::optional<ex>(exponent));
}

// The repaired identity LHS == RHS * fix, at the points already seen and at fresh ones.
bool repair_holds(const ex& lhs, const ex& rhs, const ex& fix, const quantum_numbers& numbers, const sampling_domain& d,
                  comparison& seen, const check_options& options) {
    try {
        compiled_expression factor(fix, numbers);
        for (std::size_t k = 0; k < seen.evaluated(); ++k)
            if (seen.lhs_values()[k] != seen.rhs_values()[k] * factor.at(to_assignment(d, seen.seen()[k])))
                return false;
        const auto& s = options.sampling;
        std::size_t fresh_count = static_cast<std::size_t>(std::clamp(s.samples / 4, 10, 50));
        int max_j = s.random_max_j > 0 ? s.random_max_j : s.depth + 4;
        tolerant_expression l(lhs, numbers), r(rhs * fix, numbers);
        for (const point& t :
             random_points(d, fresh_count, max_j, s.seed ^ 0x9e3779b97f4a7c15ULL, seen.seen(), s.depth)) {
            assignment at = to_assignment(d, t);
            try {
                if (l.at(at) != r.at(at)) return false;
            } catch (const division_by_zero&) {
                continue;  // undefined here, as in the comparison
            } catch (const std::domain_error&) {
                continue;
            }
        }
    } catch (const evaluation_error&) {
        return false;  // the fitted phase is not an integer somewhere: no repair
    }
    return true;
}

bool symbolically_zero(const ex& difference, const quantum_numbers& numbers, const check_options& options) {
    try {
        ex reduced =
            options.simplifier ? options.simplifier(difference, numbers) : simplify_expression(difference, numbers);
        return reduced.is_zero();
    } catch (const refusal&) {
        return false;  // no proof; evaluation decides, and reports what it cannot evaluate
    }
}

}  // namespace

check_report check_identity(const ex& lhs, const ex& rhs, const quantum_numbers& numbers,
                            const check_options& options) {
    check_report report;
    report.depth = options.sampling.depth;
    if (options.symbolic) report.proved_symbolically = symbolically_zero(lhs - rhs, numbers, options);

    sampling_domain d = build_domain({lhs, rhs}, numbers);
    sample_set samples = sample_points(d, options.sampling);
    report.complete = samples.complete;
    report.finite = samples.finite;
    tolerant_expression left(lhs, numbers), right(rhs, numbers);
    evaluation_limits bounded;
    bounded.max_sum_terms = options.sampling.far_work;
    tolerant_expression far_left(lhs, numbers, bounded), far_right(rhs, numbers, bounded);
    reach_tracker reach(d, samples.finite ? 0 : options.sampling.cover_max_j);
    comparison cmp(d, left, right, far_left, far_right, reach);
    try {
        if (cmp.run(samples.points, options.progress) && !samples.finite) cmp.reach_further(options.sampling);
    } catch (const time_limit_reached&) {
        report.stopped = true;  // what was compared so far still stands
    }
    report.points = cmp.evaluated();
    report.nonzero = cmp.nonzero();
    report.undefined = cmp.undefined();
    report.reach = reach.summary();
    if (report.points == 0 && report.undefined > 0) throw undefined_everywhere(cmp.first_undefined(), report.undefined);

    if (report.stopped) {
        report.counter = cmp.first_mismatch();
        report.result = report.counter ? verdict::fails : verdict::undecided;
        report.note = report.counter ? "the time limit stopped the search for a missing phase or factor"
                                     : "the time limit was reached before every point was checked";
        return report;
    }

    if (cmp.all_equal()) {
        if (report.points == 0)
            report.note =
                "no assignment of the free quantum numbers is admissible (declarations, triads and "
                "projections exclude them all), so the identity says nothing";
        else if (!report.proved_symbolically && !report.finite && report.nonzero < minimum_evidence) {
            report.result = verdict::undecided;
            report.note =
                "only " + std::to_string(report.nonzero) + (report.nonzero == 1 ? " point has" : " points have") +
                " a nonzero side, and \"holds\" without a symbolic proof needs " + std::to_string(minimum_evidence);
        }
        return report;
    }
    report.symbolic_conflict = report.proved_symbolically;
    report.counter = cmp.first_mismatch();
    bool unconfirmed_fit = false;
    for (auto& c : cmp.candidates()) {
        auto fix = repair(c, cmp.seen(), d);
        if (!fix) continue;
        if (!repair_holds(lhs, rhs, fix->first, numbers, d, cmp, options)) {
            unconfirmed_fit = true;
            continue;
        }
        bool phase_only = c.shape() == detail::factor_shape::constant && c.magnitude() == exact::number(1L);
        report.result = phase_only ? verdict::fails_by_phase : verdict::fails_by_factor;
        report.missing_factor = fix->first;
        report.missing_phase = fix->second;
        return report;
    }
    if (auto fix = hat_repair(cmp, d)) {
        if (repair_holds(lhs, rhs, fix->first, numbers, d, cmp, options)) {
            report.result = verdict::fails_by_factor;
            report.missing_factor = fix->first;
            report.missing_phase = fix->second;
            return report;
        }
        unconfirmed_fit = true;
    }
    if (!cmp.one_side_vanishes())
        if (auto inside = find_summand_phase(lhs, rhs, numbers, d, cmp.seen(), cmp.lhs_values(), cmp.rhs_values(),
                                             options.sampling)) {
            report.result = verdict::fails_by_phase;
            report.missing_phase = inside->exponent;
            report.missing_factor = std::nullopt;
            report.phase_site = inside->site;
            return report;
        }
    report.result = verdict::fails;
    if (auto other =
            find_arrangement(lhs, rhs, numbers, d, cmp.seen(), cmp.lhs_values(), cmp.rhs_values(), options.sampling)) {
        report.rearranged = *other;
        report.note = describe(*other);
        return report;
    }
    if (cmp.one_side_vanishes())
        report.note = "one side is 0 where the other is not";
    else if (!cmp.candidates().empty() && cmp.candidates().front().alive())
        report.note = "LHS/RHS is +-" + cmp.candidates().front().magnitude().to_string() + " at every point, " +
                      (unconfirmed_fit ? "and the phases that fit the points checked fail at further ones: too few "
                                         "points to find the missing phase (raise --samples or --depth)"
                                       : "but no phase (-1)^(linear form) gives those signs");
    return report;
}

}  // namespace couplet::verify
