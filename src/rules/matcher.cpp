#include "rules/matcher.hpp"

#include "model/same_value.hpp"
#include "model/symbols.hpp"
#include "rules/structure.hpp"

namespace couplet::rules {

using namespace GiNaC;

namespace {

// Extends `bind` so that the pattern symbol's entries become the term symbol's; each pattern
// index must meet exactly its summation index (indices maps one to the other), and no other
// pattern symbol may take a value involving a summation index.
bool unify(const ex& pattern, const ex& term, exmap& bind, const exmap& indices) {
    if (kind_of(pattern) != kind_of(term) || pattern.nops() != term.nops()) return false;
    for (size_t k = 0; k < pattern.nops(); ++k) {
        const ex& p = pattern.op(k);
        const ex& t = term.op(k);
        auto index = indices.find(p);
        if (index != indices.end()) {
            if (!t.is_equal(index->second)) return false;
        } else if (is_a<symbol>(p)) {
            auto it = bind.find(p);
            if (it != bind.end()) {
                if (!same_value(it->second, t)) return false;
            } else {
                for (const auto& i : indices)
                    if (t.has(i.second)) return false;
                bind[p] = t;
            }
        } else if (!same_value(p, t)) {
            return false;
        }
    }
    return true;
}

struct summand_parts {
    std::vector<int> weights;  // of (2x+1) for each summation index
    ex phase = 0;
    std::vector<ex> symbols;
};

// (2x+1)^n, (-1)^X and coupling symbols; anything else involving an index defeats every sum rule.
std::optional<summand_parts> split(const std::vector<symbol>& xs, const std::vector<ex>& factors) {
    summand_parts out;
    out.weights.assign(xs.size(), 0);
    auto weight_of = [&](const ex& base) -> int* {
        // Only a polynomial can be 2x+1; expanding a nested sum or a symbol to find out costs
        // as much as the whole term (minutes on a reduced network of 30 vertices).
        if (!base.info(GiNaC::info_flags::polynomial)) return nullptr;
        for (size_t k = 0; k < xs.size(); ++k)
            if (same_value(base, 2 * xs[k] + 1)) return &out.weights[k];
        return nullptr;
    };
    for (const ex& f : factors) {
        if (is_a<phase_factor>(f)) {
            out.phase += f.op(0);
        } else if (int* w = weight_of(f)) {
            *w += 1;
        } else if (is_a<power>(f) && is_a<numeric>(f.op(1)) && ex_to<numeric>(f.op(1)).is_integer()) {
            int n = ex_to<numeric>(f.op(1)).to_int();
            if (int* w2 = weight_of(f.op(0))) {
                *w2 += n;
            } else if (n > 0 && kind_of(f.op(0)) != symbol_kind::none) {
                for (int k = 0; k < n; ++k) out.symbols.push_back(f.op(0));
            } else {
                return std::nullopt;
            }
        } else if (kind_of(f) == symbol_kind::sixj || kind_of(f) == symbol_kind::ninej ||
                   kind_of(f) == symbol_kind::triangle) {
            out.symbols.push_back(f);
        } else {
            return std::nullopt;
        }
    }
    return out;
}

class search {
public:
    search(const sum_rule& r, const std::vector<symbol>& xs, const summand_parts& parts, const phase::context& ctx)
        : r_(r), xs_(xs), parts_(parts), ctx_(ctx), used_(parts.symbols.size(), false), matched_(r.factors.size()) {
        for (const ex& s : parts.symbols) orbits_.push_back(arrangements(s));
        std::vector<symbol> pattern = r.indices();
        for (size_t k = 0; k < pattern.size(); ++k) indices_[pattern[k]] = xs[k];
    }

    std::optional<ex> run() {
        if (parts_.symbols.size() != r_.factors.size() || xs_.size() != r_.indices().size()) return std::nullopt;
        for (int w : parts_.weights)
            if (w != r_.weight) return std::nullopt;
        if (!place(0)) return std::nullopt;
        return found_;
    }

private:
    bool place(size_t i) {
        if (i == r_.factors.size()) return finish();
        for (size_t j = 0; j < orbits_.size(); ++j) {
            if (used_[j]) continue;
            used_[j] = true;
            for (const auto& arrangement : orbits_[j]) {
                exmap saved = bind_;
                if (unify(r_.factors[i], arrangement.symbol, bind_, indices_)) {
                    ex saved_phase = orbit_phase_;
                    orbit_phase_ += arrangement.phase;
                    matched_[i] = arrangement.symbol;
                    if (place(i + 1)) return true;
                    orbit_phase_ = saved_phase;
                }
                bind_ = saved;
            }
            used_[j] = false;
        }
        return false;
    }

    bool free_of_indices(const ex& e) const {
        for (const symbol& x : xs_)
            if (e.has(x)) return false;
        return true;
    }

    // term = (-1)^(leftover) * [rule's left side]; the leftover must be free of the indices,
    // possibly after trading 2x for 2(u+v) along a triad (u, v, x) of a matched symbol.
    bool finish() {
        exmap full = bind_;
        for (const auto& i : indices_) full[i.first] = i.second;
        ex leftover = (parts_.phase + orbit_phase_ - r_.phase.subs(full)).expand();
        std::vector<ex> candidates{leftover};
        for (const symbol& x : xs_) {
            std::vector<ex> next;
            for (const ex& candidate : candidates) {
                ex c = candidate.coeff(x, 1);
                ex without = (candidate - c * x).expand();
                next.push_back(without);
                if (c.is_zero()) continue;
                for (const ex& s : matched_)
                    for (const triad& t : triads_of(s))
                        for (int k = 0; k < 3; ++k) {
                            const ex &u = t[(k + 1) % 3], &v = t[(k + 2) % 3];
                            if (t[k].is_equal(x) && free_of_indices(u) && free_of_indices(v))
                                next.push_back((without + c * (u + v)).expand());
                        }
            }
            candidates = next;
        }
        for (const ex& candidate : candidates) {
            if (!free_of_indices(candidate) || !same_phase(ctx_, leftover, candidate)) continue;
            found_ = r_.result.subs(bind_) * make_phase(candidate);
            return true;
        }
        return false;
    }

    const sum_rule& r_;
    std::vector<symbol> xs_;
    const summand_parts& parts_;
    const phase::context& ctx_;
    exmap indices_;  // pattern index -> summation index
    std::vector<std::vector<symmetry::transformed>> orbits_;
    std::vector<bool> used_;
    std::vector<ex> matched_;
    exmap bind_;
    ex orbit_phase_ = 0;
    ex found_;
};

}  // namespace

std::optional<ex> match_sum_rule(const sum_rule& r, const std::vector<symbol>& xs, const std::vector<ex>& factors,
                                 const ex& term, const quantum_numbers& numbers) {
    auto parts = split(xs, factors);
    if (!parts) return std::nullopt;
    phase::context ctx = context_for(term, numbers);
    return search(r, xs, *parts, ctx).run();
}

std::optional<ex> match_local_rule(const local_rule& r, const ex& symbol) {
    if (kind_of(symbol) != kind_of(r.pattern)) return std::nullopt;
    for (const auto& arrangement : arrangements(symbol)) {
        exmap bind;
        if (unify(r.pattern, arrangement.symbol, bind, exmap{}))
            return r.result.subs(bind) * make_phase(arrangement.phase);
    }
    return std::nullopt;
}

}  // namespace couplet::rules
