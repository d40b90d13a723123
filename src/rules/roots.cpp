#include "rules/roots.hpp"

#include <optional>
#include <set>
#include <string>

#include "model/symbols.hpp"

namespace couplet::rules {

using namespace GiNaC;

namespace {

bool is_half_odd(const ex& exponent) {
    return is_a<numeric>(exponent) && ex_to<numeric>(exponent).is_rational() && ex_to<numeric>(exponent).denom() == 2;
}

class splitter {
public:
    explicit splitter(const quantum_numbers& numbers) : numbers_(numbers) {}

    ex operator()(const ex& e) {
        if (is_a<index_sum>(e)) {
            const auto& s = ex_to<index_sum>(e);
            std::vector<std::string> added;
            for (const ex& i : s.indices())
                if (is_a<symbol>(i) && bound_.insert(ex_to<symbol>(i).get_name()).second)
                    added.push_back(ex_to<symbol>(i).get_name());
            ex body = (*this)(s.body());
            for (const std::string& name : added) bound_.erase(name);
            return make_sum(body, s.indices());
        }
        if (is_a<add>(e) || is_a<mul>(e)) {
            exvector ops;
            for (const ex& o : e) ops.push_back((*this)(o));
            return is_a<add>(e) ? ex(add(ops)) : ex(mul(ops));
        }
        if (is_a<power>(e)) {
            ex base = (*this)(e.op(0));
            const ex& exponent = e.op(1);
            if (is_half_odd(exponent))
                if (auto split = split_root(base, ex_to<numeric>(exponent))) return *split;
            return pow(base, exponent);
        }
        return e;  // symbols, numbers, phases and coupling symbols (their entries are linear)
    }

private:
    // An angular momentum, or a summation index no table knows (a fresh j index of an earlier
    // stage): >= 0 at every admissible point.
    bool nonnegative_symbol(const symbol& s) const {
        const quantum_number* q = numbers_.find(s);
        if (q) return q->role == qn_role::angular;
        return bound_.count(s.get_name()) > 0;
    }

    // A polynomial with coefficients >= 0 in such symbols.
    bool nonnegative(const ex& p) const {
        ex x = p.expand();
        for (const ex& term : is_a<add>(x) ? x : ex(lst{x})) {
            numeric c = 1;
            for (const ex& f : is_a<mul>(term) ? term : ex(lst{term})) {
                if (is_a<numeric>(f)) {
                    c *= ex_to<numeric>(f);
                } else if (is_a<symbol>(f)) {
                    if (!nonnegative_symbol(ex_to<symbol>(f))) return false;
                } else if (is_a<power>(f) && is_a<symbol>(f.op(0)) && is_a<numeric>(f.op(1)) &&
                           ex_to<numeric>(f.op(1)).is_pos_integer()) {
                    if (!nonnegative_symbol(ex_to<symbol>(f.op(0)))) return false;
                } else {
                    return false;
                }
            }
            if (!c.is_rational() || c < 0) return false;
        }
        return true;
    }

    // base^exponent as a product of powers of base's factors; nothing when a factor's sign is
    // unknown.
    std::optional<ex> split_root(const ex& base, const numeric& exponent) const {
        if (is_a<numeric>(base) || !is_polynomial(base)) return std::nullopt;
        ex factored = factor(base.expand());
        numeric coefficient = 1;  // with the signs of the factors turned positive
        ex out = 1;
        for (const ex& f : is_a<mul>(factored) ? factored : ex(lst{factored})) {
            ex b = f;
            numeric k = 1;
            if (is_a<power>(f) && is_a<numeric>(f.op(1)) && ex_to<numeric>(f.op(1)).is_integer()) {
                b = f.op(0);
                k = ex_to<numeric>(f.op(1));
            }
            if (is_a<numeric>(b)) {
                if (!ex_to<numeric>(b).is_rational()) return std::nullopt;
                coefficient *= ex_to<numeric>(b).power(k);
                continue;
            }
            if (!nonnegative(b)) {
                // factor() may write a positive factor as -(...) and move the sign elsewhere.
                if (!nonnegative(-b)) return std::nullopt;
                b = (-b).expand();
                if (!k.is_even()) coefficient = -coefficient;
            }
            out *= pow(b, k * exponent);
        }
        // A negative radicand stays as it is: the evaluator reports it where it matters.
        if (coefficient < 0) return std::nullopt;
        return pow(coefficient, exponent) * out;
    }

    bool is_polynomial(const ex& e) const {
        for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
            if (is_a<symbol>(*it) || is_a<numeric>(*it) || is_a<add>(*it) || is_a<mul>(*it)) continue;
            if (is_a<power>(*it) && is_a<numeric>(it->op(1)) && ex_to<numeric>(it->op(1)).is_pos_integer()) continue;
            return false;
        }
        return true;
    }

    const quantum_numbers& numbers_;
    std::set<std::string> bound_;
};

}  // namespace

ex split_roots(const ex& e, const quantum_numbers& numbers) { return splitter(numbers)(e); }

ex join_roots(const ex& e) {
    if (is_a<index_sum>(e)) {
        const auto& s = ex_to<index_sum>(e);
        return make_sum(join_roots(s.body()), s.indices());
    }
    if (is_a<add>(e)) {
        exvector ops;
        for (const ex& o : e) ops.push_back(join_roots(o));
        return add(ops);
    }
    if (!is_a<mul>(e)) return e;
    ex rest = 1, up = 1, down = 1, unjoined = 1;
    int ups = 0, downs = 0;
    for (const ex& f : e) {
        ex g = join_roots(f);
        unjoined *= g;
        if (is_a<power>(g) && !is_a<numeric>(g.op(0)) && is_half_odd(g.op(1))) {
            numeric k = ex_to<numeric>(g.op(1));
            if (k > 0) {
                rest *= pow(g.op(0), k - numeric(1, 2));
                up *= g.op(0);
                ++ups;
            } else {
                rest *= pow(g.op(0), k + numeric(1, 2));
                down *= g.op(0);
                ++downs;
            }
        } else {
            rest *= g;
        }
    }
    if (ups + downs < 2) return unjoined;
    return rest * sqrt(up) / sqrt(down);
}

}  // namespace couplet::rules
