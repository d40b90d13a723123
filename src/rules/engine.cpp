#include "rules/engine.hpp"

#include <cln/rational.h>

#include <algorithm>
#include <map>
#include <set>

#include "model/fresh_index.hpp"
#include "model/normalize.hpp"
#include "model/rewrite.hpp"
#include "model/result_shape.hpp"
#include "limits/run_limits.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "canonical/symmetries.hpp"
#include "rules/matcher.hpp"
#include "rules/rewrites.hpp"
#include "rules/roots.hpp"
#include "rules/structure.hpp"
#include "canonical/phase_reduction.hpp"
#include "model/readable_order.hpp"

namespace couplet::rules {

using namespace GiNaC;

namespace {

// A bound guard only: the termination argument in engine.hpp is what stops the loop.
constexpr int step_limit = 500;

ex product_of(const std::vector<ex>& factors) {
    ex out = 1;
    for (const ex& f : factors) out *= f;
    return out;
}

ex without_polynomial_factors(const ex& term) {
    ex out = 1;
    for (const ex& f : factors_of(term))
        if (!is_polynomial(f)) out *= f;  // roots stay with the structure: factor() cannot see through them
    return out;
}

// An expanded summand such as S + 2x S back to (2x+1) S: like coupling structures collected,
// their polynomial coefficients factored, so that the weights (2x+1)^n are visible again.
ex regroup(const ex& body) {
    if (!is_a<add>(body)) return body;
    std::vector<std::pair<ex, ex>> groups;  // structure, coefficient
    for (const ex& term : body) {
        ex coefficient = 1, structure = 1;
        for (const ex& f : factors_of(term)) (is_polynomial(f) ? coefficient : structure) *= f;
        auto it = std::find_if(groups.begin(), groups.end(),
                               [&](const auto& g) { return g.first.is_equal(structure); });
        if (it == groups.end())
            groups.emplace_back(structure, coefficient);
        else
            it->second += coefficient;
    }
    ex out = 0;
    for (const auto& [structure, coefficient] : groups) out += factor(coefficient.expand()) * structure;
    return out;
}

class engine {
public:
    explicit engine(const quantum_numbers& numbers) : numbers_(numbers) {}

    ex run(const ex& e) {
        // Roots split before every step: a rule's result or a substitution can leave
        // sqrt((2p+1)(2p+1)) or sqrt(2y+1)^2 behind.
        ex x = split_roots(e, numbers_);
        for (int step = 0; step < step_limit; ++step) {
            check_deadline();
            std::optional<ex> next = step_on_sum(x);
            if (!next) break;
            x = split_roots(*next, numbers_);
        }
        return x;
    }

    std::vector<rule_step> trace;

private:
    std::optional<ex> step_on_sum(const ex& e) {
        std::vector<ex> terms;
        if (is_a<add>(e))
            for (const ex& t : e) terms.push_back(t);
        else
            terms.push_back(e);
        if (auto merged = merge_sums(terms)) return merged;
        for (size_t k = 0; k < terms.size(); ++k) {
            if (auto t = step_on_term(terms[k])) {
                terms[k] = *t;
                ex out = 0;
                for (const ex& u : terms) out += u;
                return out;
            }
        }
        return std::nullopt;
    }

    // Expansion may have spread one summand over several sums (sum(x : S) + sum(x : 2x S)),
    // possibly under different index names (sum(x : S) + sum(y : 2y S)); together, with the
    // indices renamed to agree, they may be a rule's left side again.
    std::optional<ex> merge_sums(const std::vector<ex>& terms) {
        struct group {
            lst indices;
            ex structure;  // of the first member's summand, to align the others' index names
            std::vector<size_t> members;
            ex body = 0;
            bool renamed = false;
        };
        std::vector<group> groups;
        for (size_t k = 0; k < terms.size(); ++k) {
            std::vector<ex> factors = factors_of(terms[k]);
            auto sums = std::count_if(factors.begin(), factors.end(), [](const ex& f) { return is_a<index_sum>(f); });
            if (sums != 1) continue;
            auto at = std::find_if(factors.begin(), factors.end(), [](const ex& f) { return is_a<index_sum>(f); });
            const auto& s = ex_to<index_sum>(*at);
            ex outside = 1;
            for (auto f = factors.begin(); f != factors.end(); ++f)
                if (f != at) outside *= *f;
            bool captures = std::any_of(s.indices().begin(), s.indices().end(),
                                        [&](const ex& i) { return outside.has(i); });
            if (captures) continue;
            bool joined = false;
            for (group& g : groups) {
                if (g.indices.nops() != s.indices().nops()) continue;
                auto body = renamed_into(terms[k], s, g.indices, g.structure);
                if (!body) continue;
                g.members.push_back(k);
                g.body += outside * *body;
                g.renamed = g.renamed || !s.indices().is_equal(g.indices);
                joined = true;
                break;
            }
            if (!joined) groups.push_back({s.indices(), summand_structure(s.body()), {k}, outside * s.body(), false});
        }
        for (const group& g : groups) {
            if (g.members.size() < 2) continue;
            ex merged = make_sum(g.body, g.indices);
            size_t before_merge = trace.size();
            auto rewritten = step_on_term(merged);
            if (!rewritten) continue;
            ex rest = 0, before = 0;
            for (size_t k = 0; k < terms.size(); ++k)
                (std::count(g.members.begin(), g.members.end(), k) ? before : rest) += terms[k];
            const identity& used = g.renamed ? sums_merged_renamed_identity() : sums_merged_identity();
            trace.insert(trace.begin() + static_cast<long>(before_merge), step_by(used, before, merged));
            return rest + *rewritten;
        }
        return std::nullopt;
    }

    // The coupling structure of a summand (its first term without the polynomial factors).
    // The polynomial factors are dropped before anything is expanded: expanding the whole
    // summand would multiply out its (2x+1) weights, 2^n copies of everything else, and descend
    // into every inner sum (minutes on the nested sums a 30-vertex network leaves).
    static ex summand_structure(const ex& body) {
        const ex structure = without_polynomial_factors(body);
        const std::vector<ex> factors = factors_of(structure);
        if (std::none_of(factors.begin(), factors.end(), [](const ex& f) { return is_a<add>(f); })) return structure;
        return without_polynomial_factors(terms_of(structure.expand()).front());
    }

    // The summand of s with its indices renamed to `target`, in an order that captures no name
    // of `term` and gives the summand `structure` (only like structures can collect into a
    // rule's summand); under the same names as they are.
    static std::optional<ex> renamed_into(const ex& term, const index_sum& s, const lst& target, const ex& structure) {
        if (s.indices().is_equal(target)) return s.body();
        std::vector<ex> own(s.indices().begin(), s.indices().end());
        for (const ex& t : target)
            if (term.has(t) && std::none_of(own.begin(), own.end(), [&](const ex& i) { return i.is_equal(t); }))
                return std::nullopt;
        std::vector<size_t> order(own.size());
        for (size_t i = 0; i < order.size(); ++i) order[i] = i;
        do {
            exmap rename;
            for (size_t i = 0; i < order.size(); ++i) rename[own[order[i]]] = target.op(i);
            ex body = s.body().subs(rename);
            if (summand_structure(body).is_equal(structure)) return body;
        } while (std::next_permutation(order.begin(), order.end()));
        return std::nullopt;
    }

    void record(const identity& used, const ex& before, const ex& after) { trace.push_back(step_by(used, before, after)); }

    std::optional<ex> step_on_term(const ex& term) {
        if (auto t = vanishing_by_parity(term)) return t;
        if (auto t = local_rewrite(term)) return t;
        if (auto t = eliminate_delta(term)) return t;
        std::vector<ex> factors = factors_of(term);
        for (size_t k = 0; k < factors.size(); ++k) {
            if (!is_a<index_sum>(factors[k])) continue;
            if (auto t = sum_rewrite(term, factors, k)) return t;
        }
        return std::nullopt;
    }

    // A symbol equal to minus itself by one of its symmetries, given the parities the term implies.
    std::optional<ex> vanishing_by_parity(const ex& term) {
        phase::context ctx = context_for(term, numbers_);
        for (const_preorder_iterator it = term.preorder_begin(); it != term.preorder_end(); ++it) {
            symbol_kind kind = kind_of(*it);
            std::vector<symmetry::transformed> images;
            if (kind == symbol_kind::threej) images = symmetry::threej_orbit(*it);
            if (kind == symbol_kind::ninej) images = symmetry::ninej_orbit(*it);
            for (const auto& image : images) {
                if (!image.symbol.is_equal(*it) || image.phase.is_zero()) continue;
                if (same_phase(ctx, image.phase, 1)) {
                    record(odd_symbol_identity(), term, 0);
                    return ex(0);
                }
            }
        }
        return std::nullopt;
    }

    std::optional<ex> local_rewrite(const ex& term) {
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

    // delta(p, q) * f(p, q) -> delta(p, q) * f(p, p): the later name in the readable order goes;
    // delta(p, 0) * f(p) -> delta(p, 0) * f(0), and so for any value that does not hold p.
    // A delta taken twice is taken once: delta^n = delta for n >= 1.
    std::optional<ex> eliminate_delta(const ex& term) {
        std::vector<ex> factors = factors_of(term);
        for (size_t k = 0; k < factors.size(); ++k) {
            const ex& f = factors[k];
            if (!is_a<power>(f) || kind_of(f.op(0)) != symbol_kind::delta || !is_a<numeric>(f.op(1)) ||
                !ex_to<numeric>(f.op(1)).is_pos_integer())
                continue;
            std::vector<ex> others = factors;
            others[k] = f.op(0);
            ex after = product_of(others);
            record(repeated_delta_identity(), term, after);
            return after;
        }
        for (size_t k = 0; k < factors.size(); ++k) {
            if (kind_of(factors[k]) != symbol_kind::delta) continue;
            const ex &u = factors[k].op(0), &v = factors[k].op(1);
            if (u.is_equal(v)) continue;
            const bool both_names = is_a<symbol>(u) && is_a<symbol>(v);
            bool u_stays;
            if (both_names) u_stays = readable_name_less(ex_to<symbol>(u).get_name(), ex_to<symbol>(v).get_name());
            else if (is_a<symbol>(v) && !u.has(v)) u_stays = true;
            else if (is_a<symbol>(u) && !v.has(u)) u_stays = false;
            else continue;
            const ex& keep = u_stays ? u : v;
            const ex& drop = u_stays ? v : u;
            std::vector<ex> others = factors;
            others.erase(others.begin() + static_cast<long>(k));
            ex rest = product_of(others);
            if (!rest.has(drop)) continue;
            ex after = factors[k] * rest.subs(exmap{{drop, keep}});
            record(delta_elimination_identity(), term, after);
            return after;
        }
        return std::nullopt;
    }

    // Whether the sum over x covers every value the x-triads allow: when x is declared integer
    // or half-odd, the triads alone must already force that parity.
    bool index_range_is_full(const ex& term, const symbol& x) {
        const quantum_number* q = numbers_.find(x);
        if (!q || q->parity == qn_parity::any) return true;
        phase::context ctx = context_for(term, numbers_, x);
        phase::linear_form f = phase::linear_form::variable(x.get_name());
        if (q->parity == qn_parity::half_odd) f += phase::linear_form(cln::cl_RA(1) / 2);
        return ctx.is_integer(f);
    }

    std::optional<ex> sum_rewrite(const ex& term, const std::vector<ex>& factors, size_t at) {
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

    // A 9j that involves the summation index y, expanded by DLMF 34.6.2 (in whichever of its 72
    // arrangements) only when a sum rule on y then fires: the expansion alone would undo the
    // recognition rule.  The pair lowers the number of 9j at an unchanged number of indices.
    // Different arrangements can let different rules fire (a 9j with repeated entries may admit
    // orthogonality over y in one and the Racah sum rule in another), and the locally larger
    // step can lead into a dead end; so every distinct outcome is reduced to the end on the side
    // and the one that ends lowest in the termination order is taken.  Each look-ahead runs on a
    // term already lower in that order than this one, so the look-aheads are well founded.
    std::optional<ex> expand_ninej_for(const ex& term, const std::vector<ex>& outside, const index_sum& s,
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

    // Only the single-index sum rules on y, for the expansion probe.
    std::optional<ex> rule_on_index(const ex& term, const symbol& y) {
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

    // sum(x : delta(x, T) f(x)) = f(T): x runs over the half-integers (of its declared parity)
    // that its factors allow, so T must be such a value at every assignment.
    std::optional<ex> collapse_delta(const ex& term, const symbol& x, const std::vector<ex>& with_x) {
        for (size_t k = 0; k < with_x.size(); ++k) {
            const ex& f = with_x[k];
            if (kind_of(f) != symbol_kind::delta) continue;
            ex d = (f.op(0) - f.op(1)).expand();
            if (d.degree(x) != 1) continue;
            ex c = d.coeff(x, 1);
            if (!c.is_equal(1) && !c.is_equal(-1)) continue;
            ex value = (-(d - c * x) / c).expand();
            phase::linear_form form;
            try {
                form = form_of(value);
            } catch (const std::invalid_argument&) {
                continue;
            }
            bool half_integral = cln::denominator(2 * form.constant()) == 1;
            for (const auto& [name, coefficient] : form.coefficients())
                half_integral = half_integral && cln::denominator(coefficient) == 1;
            if (!half_integral) continue;
            const quantum_number* q = numbers_.find(x);
            if (q && q->parity != qn_parity::any) {
                phase::context ctx = context_for(term, numbers_, x);
                phase::linear_form want = form;
                if (q->parity == qn_parity::half_odd) want += phase::linear_form(cln::cl_RA(1) / 2);
                if (!ctx.is_integer(want)) continue;
            }
            std::vector<ex> rest = with_x;
            rest.erase(rest.begin() + static_cast<long>(k));
            return product_of(rest).subs(exmap{{x, value}});
        }
        return std::nullopt;
    }

    const quantum_numbers& numbers_;
};

}  // namespace

jsum_result reduce_jsums(const ex& e, const quantum_numbers& numbers) {
    engine en(numbers);
    ex x = en.run(e);
    if (!en.trace.empty()) {
        // The rules leave their results in whatever arrangement the pattern had; bring them
        // into the printed form the other stages use.
        // No expand: it would multiply out the (2a+1)(2b+1) the rules produce.
        x = symmetry::canonicalize_symbols(x, numbers);
        x = merge_phases(x);
        x = reduce_phases(x, numbers);
        x = merge_phases(x);
    }
    return {join_roots(x), std::move(en.trace)};
}

}  // namespace couplet::rules
