#include "simplify/closed_form.hpp"

#include <algorithm>
#include <array>
#include <vector>

#include "canonical/symmetries.hpp"
#include "model/rewrite.hpp"
#include "model/same_value.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

// Expansion of the top level only: sums, roots, phases and polynomial factors such as (2x+1) are
// held as atoms, so that a summand, a root or a product of weights is not multiplied out along
// with the products around it (a product of n weights would become 2^n monomials).
ex expand_top_level(const ex& e) {
    exmap back;
    struct holder : map_function {
        exmap& back;
        const ex& top;
        holder(exmap& b, const ex& t) : back(b), top(t) {}
        ex operator()(const ex& x) override {
            const bool root = is_a<power>(x) && is_a<numeric>(x.op(1)) && !ex_to<numeric>(x.op(1)).is_integer();
            const bool weight = is_a<add>(x) && is_polynomial(x) && !x.is_equal(top);
            if (is_a<index_sum>(x) || root || is_a<phase_factor>(x) || weight) {
                for (const auto& [a, v] : back)
                    if (v.is_equal(x)) return a;
                ex a = symbol("#atom" + std::to_string(back.size() + 1));
                back[a] = x;
                return a;
            }
            return x.map(*this);
        }
    } h(back, e);
    return h(e).expand().subs(back, subs_options::no_pattern);
}

struct split_term {
    ex coefficient = 1;  // numbers and polynomial factors
    ex structure = 1;    // everything else
};

split_term split(const ex& term) {
    split_term out;
    for (const ex& f : factors_of(term)) (is_polynomial(f) ? out.coefficient : out.structure) *= f;
    return out;
}

// Whether exactly one of a structure's factors is a sum: that sum, and the product of the rest.
bool single_sum(const ex& structure, ex& sum, ex& rest) {
    int count = 0;
    rest = 1;
    for (const ex& f : factors_of(structure)) {
        if (is_a<index_sum>(f)) {
            sum = f;
            ++count;
        } else {
            rest *= f;
        }
    }
    return count == 1;
}

// Whether a sum can take `outside` into its summand without capturing a name.
bool can_enter(const ex& sum, const ex& outside) {
    for (const ex& i : ex_to<index_sum>(sum).indices())
        if (outside.has(i)) return false;
    return true;
}

// base^exponent of a factor, the exponent a positive rational (1 for a plain factor), or none.
bool positive_power(const ex& f, ex& base, numeric& exponent) {
    if (is_a<numeric>(f)) return false;
    if (is_a<power>(f)) {
        if (!is_a<numeric>(f.op(1)) || !ex_to<numeric>(f.op(1)).is_rational() || !ex_to<numeric>(f.op(1)).is_positive())
            return false;
        base = f.op(0);
        exponent = ex_to<numeric>(f.op(1));
        return true;
    }
    base = f;
    exponent = 1;
    return true;
}

// A sum of terms with a factor in common written as that factor times the rest:
// (-1)^x S A + (-1)^x S B -> (-1)^x S (A + B).  Only whole factors and positive powers of them
// are taken out, so nothing is divided; not where a cofactor is itself a sum of terms, which
// would merge into the others ((2a+1) S + T S stays as it is).
ex common_factors_out(const ex& e) {
    if (!is_a<add>(e)) return e;
    std::vector<std::pair<ex, numeric>> common;
    bool first = true;
    for (const ex& t : e) {
        std::vector<std::pair<ex, numeric>> here;
        for (const ex& f : factors_of(t)) {
            ex b;
            numeric n;
            if (positive_power(f, b, n)) here.emplace_back(b, n);
        }
        if (first) {
            common = here;
            first = false;
            continue;
        }
        std::vector<std::pair<ex, numeric>> kept;
        for (const auto& entry : common) {
            auto it =
                std::find_if(here.begin(), here.end(), [&](const auto& h) { return h.first.is_equal(entry.first); });
            if (it != here.end()) kept.emplace_back(entry.first, std::min(entry.second, it->second));
        }
        common = kept;
    }
    if (common.empty()) return e;
    ex taken = 1;
    for (const auto& [b, n] : common) taken *= pow(b, n);
    ex rest = 0;
    for (const ex& t : e) {
        const ex cofactor = t / taken;
        if (is_a<add>(cofactor)) return e;
        rest += cofactor;
    }
    return taken * rest;
}

ex collect_level(const ex& e);

// Sums' bodies first, so that like summands are already collected when sums are compared.
struct inner_sums : map_function {
    ex operator()(const ex& x) override {
        if (is_a<index_sum>(x)) {
            const auto& s = ex_to<index_sum>(x);
            return make_sum(collect_level(s.body()), s.indices());
        }
        return x.map(*this);
    }
};

ex collect_level(const ex& e) {
    inner_sums inner;
    const ex x = expand_top_level(inner(e));
    const std::vector<ex> terms = terms_of(x);

    struct group {
        ex structure;  // for a joined sum: the factors outside it
        ex sum;        // the sum, or 0
        ex coefficient = 0;
        ex bodies = 0;  // coefficient * body of each joined sum
        int members = 0;
    };
    std::vector<group> groups;
    for (const ex& t : terms) {
        split_term p = split(t);
        ex sum, rest;
        if (single_sum(p.structure, sum, rest) && can_enter(sum, rest * p.coefficient)) {
            const auto& s = ex_to<index_sum>(sum);
            auto it = std::find_if(groups.begin(), groups.end(), [&](const group& g) {
                return !g.sum.is_zero() && g.structure.is_equal(rest) &&
                       ex_to<index_sum>(g.sum).indices().is_equal(s.indices());
            });
            if (it == groups.end())
                groups.push_back({rest, sum, p.coefficient, p.coefficient * s.body(), 1});
            else {
                it->coefficient += p.coefficient;
                it->bodies += p.coefficient * s.body();
                ++it->members;
            }
            continue;
        }
        auto it = std::find_if(groups.begin(), groups.end(),
                               [&](const group& g) { return g.sum.is_zero() && g.structure.is_equal(p.structure); });
        if (it == groups.end())
            groups.push_back({p.structure, 0, p.coefficient, 0, 1});
        else {
            it->coefficient += p.coefficient;
            ++it->members;
        }
    }
    // A coefficient is multiplied out and factored only where terms were collected into it.
    auto collected = [](const group& g) { return g.members == 1 ? g.coefficient : factor(g.coefficient.expand()); };
    ex out = 0;
    for (const group& g : groups) {
        if (g.sum.is_zero()) {
            out += collected(g) * g.structure;
        } else if (g.members == 1) {
            out += collected(g) * g.structure * g.sum;
        } else {
            const lst& indices = ex_to<index_sum>(g.sum).indices();
            out += g.structure * make_sum(collect_level(g.bodies), indices);
        }
    }
    return out;
}

// `rewrite` applied bottom up to every subexpression, sums' bodies included (a sum's body is its
// one operand).
template <class Rewrite>
struct bottom_up : map_function {
    Rewrite rewrite;
    explicit bottom_up(Rewrite r) : rewrite(std::move(r)) {}
    ex operator()(const ex& x) override { return rewrite(x.map(*this)); }
};

bool same_triad(const std::array<ex, 3>& a, const std::array<ex, 3>& b) {
    static const int perms[6][3] = {{0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}};
    for (const auto& p : perms)
        if (a[0].is_equal(b[p[0]]) && a[1].is_equal(b[p[1]]) && a[2].is_equal(b[p[2]])) return true;
    return false;
}

// The factor itself, or the base of a positive integer power of it.
ex base_of(const ex& f) {
    if (is_a<power>(f) && is_a<numeric>(f.op(1)) && ex_to<numeric>(f.op(1)).is_pos_integer()) return f.op(0);
    return f;
}

ex drop_in_product(const ex& term) {
    const std::vector<ex> fs = factors_of(term);
    coupling_structure imposed;
    for (const ex& f : fs) {
        const symbol_kind k = kind_of(base_of(f));
        if (k == symbol_kind::threej || k == symbol_kind::sixj || k == symbol_kind::ninej ||
            k == symbol_kind::clebsch_gordan)
            add_structure(base_of(f), imposed);
    }
    ex out = 1;
    for (const ex& f : fs) {
        const ex b = base_of(f);
        if (kind_of(b) == symbol_kind::triangle) {
            const std::array<ex, 3> t{b.op(0), b.op(1), b.op(2)};
            if (std::any_of(imposed.triads.begin(), imposed.triads.end(),
                            [&](const std::array<ex, 3>& s) { return same_triad(t, s); }))
                continue;
        }
        // proj(j, m) beside a column (j, +-m) says nothing the column does not.
        if (kind_of(b) == symbol_kind::projection &&
            std::any_of(imposed.projections.begin(), imposed.projections.end(), [&](const auto& c) {
                return same_value(c.first, b.op(0)) &&
                       (same_value(c.second, b.op(1)) || same_value(c.second, -b.op(1)));
            }))
            continue;
        out *= f;
    }
    return out;
}

}  // namespace

ex without_implied_triangles(const ex& e) {
    bottom_up drop([](const ex& x) { return is_a<mul>(x) ? drop_in_product(x) : x; });
    return drop(e);
}

ex collected_terms(const ex& e) { return collect_level(e); }

ex in_written_arrangement(const ex& result, const ex& input) {
    std::vector<ex> written;
    for (const_preorder_iterator it = input.preorder_begin(); it != input.preorder_end(); ++it) {
        const symbol_kind k = kind_of(*it);
        if (k == symbol_kind::sixj || k == symbol_kind::ninej) written.push_back(*it);
    }
    if (written.empty()) return result;
    bottom_up rearrange([&](const ex& x) -> ex {
        const symbol_kind k = kind_of(x);
        if (k != symbol_kind::sixj && k != symbol_kind::ninej) return x;
        const auto images = k == symbol_kind::sixj ? symmetry::sixj_orbit(x) : symmetry::ninej_orbit(x);
        for (const ex& w : written)
            for (const auto& image : images)
                if (image.symbol.is_equal(w)) return make_phase(image.phase) * image.symbol;
        return x;
    });
    return rearrange(result);
}

// Triangles are dropped before common factors come out, while each still stands in one product
// with the symbols that imply it.
ex closed_form(const ex& e) {
    bottom_up common_out([](const ex& x) { return common_factors_out(x); });
    return common_out(without_implied_triangles(collect_level(e)));
}

}  // namespace couplet
