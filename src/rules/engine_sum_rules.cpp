#include "rules/engine_class.hpp"

#include <cln/rational.h>

#include <algorithm>
#include <map>
#include <set>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "limits/run_limits.hpp"
#include "model/fresh_index.hpp"
#include "model/normalize.hpp"
#include "model/readable_order.hpp"
#include "model/result_shape.hpp"
#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "rules/matcher.hpp"
#include "rules/rewrites.hpp"
#include "rules/roots.hpp"
#include "rules/structure.hpp"

namespace couplet::rules {

using namespace GiNaC;

std::optional<ex> engine::local_rewrite(const ex& term) {
    for (const_preorder_iterator it = term.preorder_begin(); it != term.preorder_end(); ++it) {
        for (const local_rule& r : local_rules()) {
            if (auto rewritten = match_local_rule(r, *it)) {
                ex after = replaced(term, *it, *rewritten);
                record(r, term, after);
                return after;
            }
        }
    }
    return std::nullopt;
}

bool engine::index_range_is_full(const ex& term, const symbol& x) {
    const quantum_number* q = numbers_.find(x);
    if (!q || q->parity == qn_parity::any) return true;
    phase::context ctx = context_for(term, numbers_, x);
    phase::linear_form f = phase::linear_form::variable(x.get_name());
    if (q->parity == qn_parity::half_odd) f += phase::linear_form(cln::cl_RA(1) / 2);
    return ctx.is_integer(f);
}

std::optional<ex> engine::sum_rewrite(const ex& term, const std::vector<ex>& factors, size_t at) {
    const auto& s = ex_to<index_sum>(factors[at]);
    std::vector<ex> outside = factors;
    outside.erase(outside.begin() + static_cast<long>(at));
    ex body = regroup(s.body());
    if (is_a<add>(body)) {
        // A sum of a sum of products is a sum of sums of products: each can meet its rule.
        // Split only where a piece then meets a rule, so that other sums keep their shape.
        std::vector<ex> pieces;
        for (const ex& b : body) pieces.push_back(product_of(outside) * make_sum(b, s.indices()));
        size_t before_split = trace.size();
        for (ex& piece : pieces) {
            if (auto rewritten = step_on_term(piece)) {
                ex split = 0;
                for (const ex& p : pieces) split += p;
                trace.insert(trace.begin() + static_cast<long>(before_split),
                             step_by(sum_split_identity(), term, split));
                piece = *rewritten;
                ex after = 0;
                for (const ex& p : pieces) after += p;
                return after;
            }
        }
        return std::nullopt;
    }
    std::vector<symbol> indices;
    for (const ex& i : s.indices()) indices.push_back(ex_to<symbol>(i));
    // The summand split into what involves the chosen indices and the rest, and the term
    // rebuilt with the chosen part replaced.
    struct choice {
        std::vector<ex> with, without;
        lst remaining;
    };
    auto choose = [&](const std::vector<symbol>& xs) {
        choice c;
        auto involves = [&](const ex& f) {
            return std::any_of(xs.begin(), xs.end(), [&](const symbol& x) { return f.has(x); });
        };
        for (const ex& f : factors_of(body)) (involves(f) ? c.with : c.without).push_back(f);
        for (const symbol& j : indices)
            if (!involves(j)) c.remaining.append(j);
        return c;
    };
    auto rebuild = [&](const choice& c, const ex& replacement) {
        ex inner = product_of(c.without) * replacement;
        return product_of(outside) * (c.remaining.nops() == 0 ? inner : make_sum(inner, c.remaining));
    };
    auto full_range = [&](const std::vector<symbol>& xs) {
        return std::all_of(xs.begin(), xs.end(), [&](const symbol& x) { return index_range_is_full(term, x); });
    };
    auto try_rules = [&](const std::vector<symbol>& xs) -> std::optional<ex> {
        choice c = choose(xs);
        if (xs.size() == 1)
            if (auto collapsed = collapse_delta(term, xs[0], c.with)) {
                ex after = rebuild(c, *collapsed);
                record(delta_collapse_identity(), term, after);
                return after;
            }
        if (!full_range(xs)) return std::nullopt;
        for (const sum_rule& r : sum_rules()) {
            if (r.indices().size() != xs.size()) continue;
            if (auto replacement = match_sum_rule(r, xs, c.with, term, numbers_)) {
                ex after = rebuild(c, *replacement);
                record(r, term, after);
                return after;
            }
        }
        return std::nullopt;
    };
    for (const symbol& x : indices)
        if (auto after = try_rules({x})) return after;
    for (const symbol& x : indices)
        for (const symbol& y : indices)
            if (!x.is_equal(y))
                if (auto after = try_rules({x, y})) return after;
    for (const symbol& y : indices)
        if (auto after = expand_ninej_for(term, outside, s, body, y)) return after;
    return std::nullopt;
}

std::optional<ex> engine::expand_ninej_for(const ex& term, const std::vector<ex>& outside, const index_sum& s,
                                           const ex& body, const symbol& y) {
    struct outcome {
        ex candidate, fired, shape;  // shape: fired in canonical arrangements, to spot repeats
        std::vector<rule_step> steps;
    };
    std::vector<outcome> outcomes;
    std::vector<ex> factors = factors_of(body);
    for (size_t k = 0; k < factors.size(); ++k) {
        if (kind_of(factors[k]) != symbol_kind::ninej || !factors[k].has(y)) continue;
        symbol x = fresh_index(term, numbers_);
        std::vector<ex> others = factors;
        others.erase(others.begin() + static_cast<long>(k));
        for (const auto& image : symmetry::ninej_orbit(factors[k])) {
            ex expanded = make_phase(image.phase) * ninej_summand(image.symbol, x);
            lst bound = s.indices();
            bound.append(x);
            ex candidate = product_of(outside) * make_sum(merge_phases(product_of(others) * expanded), bound);
            engine probe(numbers_);
            auto fired = probe.rule_on_index(candidate, y);
            if (!fired) continue;
            ex shape = symmetry::canonicalize_symbols(*fired, numbers_);
            bool seen = std::any_of(outcomes.begin(), outcomes.end(),
                                    [&](const outcome& o) { return o.shape.is_equal(shape); });
            if (seen) continue;
            outcomes.push_back({candidate, *fired, shape, probe.trace});
        }
    }
    if (outcomes.empty()) return std::nullopt;
    size_t best = 0;
    if (outcomes.size() > 1) {
        std::vector<result_shape> ends;
        for (const outcome& o : outcomes) {
            engine ahead(numbers_);
            ends.push_back(shape_of(ahead.run(o.fired)));
        }
        best = static_cast<size_t>(std::min_element(ends.begin(), ends.end(), fewer_sums_then_symbols) - ends.begin());
    }
    const outcome& chosen = outcomes[best];
    record(ninej_expansion_identity(), term, chosen.candidate);
    trace.insert(trace.end(), chosen.steps.begin(), chosen.steps.end());
    return chosen.fired;
}

std::optional<ex> engine::rule_on_index(const ex& term, const symbol& y) {
    std::vector<ex> factors = factors_of(term);
    for (size_t k = 0; k < factors.size(); ++k) {
        if (!is_a<index_sum>(factors[k])) continue;
        const auto& s = ex_to<index_sum>(factors[k]);
        std::vector<ex> with_y, without_y;
        for (const ex& f : factors_of(s.body())) (f.has(y) ? with_y : without_y).push_back(f);
        if (!index_range_is_full(term, y)) return std::nullopt;
        lst remaining;
        for (const ex& j : s.indices())
            if (!j.is_equal(y)) remaining.append(j);
        for (const sum_rule& r : sum_rules()) {
            // Not the rule that forms a 9j: it would undo the expansion being probed.
            if (r.indices().size() != 1 || kind_of(r.result) == symbol_kind::ninej) continue;
            if (auto replacement = match_sum_rule(r, {y}, with_y, term, numbers_)) {
                std::vector<ex> outside = factors;
                outside.erase(outside.begin() + static_cast<long>(k));
                ex after = product_of(outside) * make_sum(product_of(without_y) * *replacement, remaining);
                record(r, term, after);
                return after;
            }
        }
    }
    return std::nullopt;
}

}  // namespace couplet::rules
