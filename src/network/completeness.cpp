#include "network/completeness.hpp"

#include <algorithm>
#include <optional>

#include "canonical/symmetries.hpp"
#include "model/normalize.hpp"
#include "model/same_value.hpp"
#include "model/symbols.hpp"
#include "network/rewrites.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

// The summand split into its (-1) exponent, the 3j that hold J or M, and the rest.
struct split_summand {
    ex exponent = 0;
    exvector threejs;
    ex rest = 1;
};

std::optional<split_summand> split(const ex& summand, const symbol& j, const symbol& m) {
    split_summand out;
    exvector factors;
    if (is_a<mul>(summand))
        for (const ex& f : summand) factors.push_back(f);
    else
        factors.push_back(summand);
    for (const ex& f : factors) {
        if (is_a<phase_factor>(f)) {
            out.exponent += f.op(0);
        } else if (is_a<power>(f) && is_a<phase_factor>(f.op(0)) && is_a<numeric>(f.op(1)) &&
                   ex_to<numeric>(f.op(1)).is_integer()) {
            out.exponent += f.op(0).op(0) * f.op(1);
        } else if (kind_of(f) == symbol_kind::threej && (f.has(j) || f.has(m))) {
            out.threejs.push_back(f);
        } else if (is_a<power>(f) && kind_of(f.op(0)) == symbol_kind::threej && f.op(1).is_equal(2) &&
                   (f.has(j) || f.has(m))) {
            out.threejs.push_back(f.op(0));
            out.threejs.push_back(f.op(0));
        } else if (f.has(j) || f.has(m)) {
            return std::nullopt;
        } else {
            out.rest *= f;
        }
    }
    if (out.threejs.size() != 2) return std::nullopt;
    return out;
}

// The arrangements of a 3j with exactly (J, M) in its last column and neither elsewhere.
std::vector<symmetry::transformed> with_last_column(const ex& threej, const symbol& j, const symbol& m) {
    std::vector<symmetry::transformed> out;
    for (const auto& t : symmetry::threej_orbit(threej)) {
        const ex& s = t.symbol;
        if (!s.op(2).is_equal(j) || !s.op(5).is_equal(m)) continue;
        bool elsewhere = false;
        for (int k : {0, 1, 3, 4}) elsewhere = elsewhere || s.op(k).has(j) || s.op(k).has(m);
        if (!elsewhere) out.push_back(t);
    }
    return out;
}

// A free projection the deltas may compare: +-name whose owner is the column's angular momentum,
// so its range is that of the column and a delta never counts a value the 3j would reject.  A
// name some sum binds is refused: the 3j were what bounded that sum.
bool projection_of(const ex& entry, const ex& angular, const quantum_numbers& numbers, const lst& bound) {
    ex name = is_a<symbol>(entry) ? entry : (-entry).expand();
    if (!is_a<symbol>(name) || std::find(bound.begin(), bound.end(), name) != bound.end()) return false;
    const quantum_number* q = numbers.find(ex_to<symbol>(name));
    return q && q->role == qn_role::projection && q->owner && same_value(*q->owner, angular);
}

// (-1)^exponent over the support of 3j(j1, j2, J; m1, m2, M): M is -(m1+m2) there, and an even
// multiple of J may become the same multiple of j1+j2 since J-j1-j2 is an integer.  Empty when
// an odd multiple of J remains, which the identity cannot absorb.
std::optional<ex> exponent_free_of(const ex& exponent, const ex& first, const symbol& j, const symbol& m) {
    ex e = exponent.subs(m == -(first.op(3) + first.op(4))).expand();
    if (e.degree(j) > 1 || e.ldegree(j) < 0) return std::nullopt;
    ex c = e.coeff(j, 1);
    if (!is_a<numeric>(c) || !ex_to<numeric>(c).is_even()) return std::nullopt;
    e = (e - c * j + c * (first.op(0) + first.op(1))).expand();
    if (e.has(j) || e.has(m)) return std::nullopt;
    return e;
}

// delta(-x, -y) read as delta(x, y).
ex delta_of(const ex& x, const ex& y) {
    ex nx = (-x).expand();
    return is_a<symbol>(nx) ? kdelta(nx, (-y).expand()) : kdelta(x, y);
}

std::optional<ex> apply(const ex& body, const symbol& j, const symbol& m, const quantum_numbers& numbers,
                        const lst& bound) {
    // normal() treats the symbols and phases as opaque, so this also rejoins a weight that an
    // earlier expansion split into 2J and 1.
    ex summand = normal(body / (2 * j + 1));
    if (denom(summand).has(j)) return std::nullopt;
    auto parts = split(summand, j, m);
    if (!parts) return std::nullopt;
    for (const auto& a : with_last_column(parts->threejs[0], j, m))
        for (const auto& b : with_last_column(parts->threejs[1], j, m)) {
            const ex &x = a.symbol, &y = b.symbol;
            if (!same_value(x.op(0), y.op(0)) || !same_value(x.op(1), y.op(1))) continue;
            bool ranged = true;
            for (int c : {0, 1})
                ranged = ranged && projection_of(x.op(3 + c), x.op(c), numbers, bound) &&
                         projection_of(y.op(3 + c), y.op(c), numbers, bound);
            if (!ranged) continue;
            auto exponent = exponent_free_of(parts->exponent + a.phase + b.phase, x, j, m);
            if (!exponent) continue;
            return make_phase(*exponent) * delta_of(x.op(3), y.op(3)) * delta_of(x.op(4), y.op(4)) * parts->rest;
        }
    return std::nullopt;
}

bool has_role(const ex& index, qn_role role, const quantum_numbers& numbers) {
    if (!is_a<symbol>(index)) return false;
    const quantum_number* q = numbers.find(ex_to<symbol>(index));
    return q && q->role == role;
}

// body == factor * sum(I : inner), with the factor outside the inner sum, as in
// sum(J : (2J+1) sum(M : ...)); or a sum of such terms over the same I, as normalization leaves
// sum(J : 2J sum(M : X) + sum(M : X)).  Returns (I, the body over both).
std::optional<std::pair<lst, ex>> nested_sum(const ex& body) {
    if (is_a<index_sum>(body)) return std::make_pair(ex_to<index_sum>(body).indices(), ex_to<index_sum>(body).body());
    if (is_a<add>(body)) {
        std::optional<lst> indices;
        ex merged = 0;
        for (const ex& t : body) {
            auto inner = nested_sum(t);
            if (!inner || is_a<add>(t)) return std::nullopt;
            if (!indices)
                indices = inner->first;
            else if (!inner->first.is_equal(*indices))
                return std::nullopt;
            merged += inner->second;
        }
        if (!indices) return std::nullopt;
        return std::make_pair(*indices, merged);
    }
    if (!is_a<mul>(body)) return std::nullopt;
    std::optional<index_sum> inner;
    ex outside = 1;
    for (const ex& f : body) {
        if (is_a<index_sum>(f) && !inner)
            inner = ex_to<index_sum>(f);
        else
            outside *= f;
    }
    if (!inner) return std::nullopt;
    for (const ex& i : inner->indices())
        if (outside.has(i)) return std::nullopt;
    return std::make_pair(inner->indices(), outside * inner->body());
}

// One sum over several indices, however nested: outside * sum(I : body).
struct flat_sum {
    lst indices;
    ex body;
};

std::optional<flat_sum> flatten(const ex& term) {
    flat_sum out{lst{}, term};
    while (auto inner = nested_sum(out.body)) {
        for (const ex& i : inner->first) out.indices.append(i);
        out.body = inner->second;
    }
    if (out.indices.nops() == 0) return std::nullopt;
    return out;
}

bool same_indices(const lst& a, const lst& b) {
    if (a.nops() != b.nops()) return false;
    for (const ex& i : a)
        if (std::find(b.begin(), b.end(), i) == b.end()) return false;
    return true;
}

class completeness_pass : public map_function {
public:
    completeness_pass(const quantum_numbers& numbers, std::vector<reduction_step>* steps)
        : numbers_(numbers), steps_(steps) {}

    ex operator()(const ex& e) override {
        if (is_a<add>(e)) return merged_terms(e.map(*this));
        if (!is_a<index_sum>(e)) return e.map(*this);
        auto s = flatten(e);
        if (auto r = reduce(*s)) return *r;
        // Inside, the sum's indices are bound.
        const auto depth = bound_.nops();
        for (const ex& i : ex_to<index_sum>(e).indices()) bound_.append(i);
        ex out = e.map(*this);
        while (bound_.nops() > depth) bound_.remove_last();
        return out;
    }

private:
    // Normalization distributes sum(J, M : (2J+1) X) into sum(2J X) + sum(X); terms that sum
    // over the same indices are read as one sum, and kept apart again unless the identity fires.
    ex merged_terms(const ex& e) {
        if (!is_a<add>(e)) return e;
        std::vector<ex> terms(e.begin(), e.end());
        std::vector<bool> used(terms.size(), false);
        ex out = 0;
        for (std::size_t k = 0; k < terms.size(); ++k) {
            if (used[k]) continue;
            auto first = flatten(terms[k]);
            if (!first) continue;
            flat_sum group{first->indices, first->body};
            std::vector<std::size_t> members{k};
            for (std::size_t l = k + 1; l < terms.size(); ++l) {
                if (used[l]) continue;
                auto other = flatten(terms[l]);
                if (!other || !same_indices(other->indices, group.indices)) continue;
                group.body += other->body;
                members.push_back(l);
            }
            if (auto r = reduce(group)) {
                for (std::size_t l : members) used[l] = true;
                out += *r;
            }
        }
        for (std::size_t k = 0; k < terms.size(); ++k)
            if (!used[k]) out += terms[k];
        return out;
    }

    std::optional<ex> reduce(const flat_sum& s) {
        for (const ex& j : s.indices) {
            if (!has_role(j, qn_role::angular, numbers_)) continue;
            for (const ex& m : s.indices) {
                if (!has_role(m, qn_role::projection, numbers_)) continue;
                lst bound = bound_;
                for (const ex& i : s.indices) bound.append(i);
                auto reduced = apply(s.body, ex_to<symbol>(j), ex_to<symbol>(m), numbers_, bound);
                if (!reduced) continue;
                lst rest;
                for (const ex& i : s.indices)
                    if (!i.is_equal(j) && !i.is_equal(m)) rest.append(i);
                ex after = rest.nops() == 0 ? *reduced : make_sum(*reduced, rest);
                if (steps_)
                    steps_->push_back(step_by(completeness_identity(), merge_phases(make_sum(s.body, s.indices)),
                                              merge_phases(after)));
                if (rest.nops() == 0) return after;
                return (*this)(after);  // another pair may remain
            }
        }
        return std::nullopt;
    }

    const quantum_numbers& numbers_;
    std::vector<reduction_step>* steps_;
    lst bound_;  // indices of the sums enclosing the current subexpression
};

}  // namespace

ex reduce_completeness(const ex& e, const quantum_numbers& numbers, std::vector<reduction_step>* steps) {
    completeness_pass pass(numbers, steps);
    return pass(e);
}

}  // namespace couplet::network
