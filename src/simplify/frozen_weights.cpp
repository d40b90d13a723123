#include "simplify/frozen_weights.hpp"

#include <set>
#include <string>

#include "model/rewrite.hpp"
#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

// A factor that expansion would split or multiply out: a polynomial that is not a monomial,
// any power of one, or a root of a polynomial.
bool is_weight(const ex& e) {
    if (is_a<add>(e)) return is_polynomial(e);
    if (is_a<power>(e) && is_a<numeric>(e.op(1))) {
        const numeric& n = ex_to<numeric>(e.op(1));
        if (n.is_integer()) return is_a<add>(e.op(0)) && is_polynomial(e.op(0));
        return n.is_rational() && is_polynomial(e.op(0)) && !is_a<numeric>(e.op(0));
    }
    return false;
}

bool touches(const ex& e, const std::set<std::string>& names, const quantum_numbers& numbers) {
    for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
        if (!is_a<symbol>(*it)) continue;
        const auto& s = ex_to<symbol>(*it);
        if (names.count(s.get_name())) return true;
        const quantum_number* q = numbers.find(s);
        if (q && q->role == qn_role::projection) return true;
    }
    return false;
}

}  // namespace

// The placeholder wraps its weight in a function, not a new symbol: a new name would enter every
// phase lattice the m-sum stage builds (one more variable each, measurably slower), while the
// names inside a weight are the expression's own.  Expansion does not enter a function.
DECLARE_FUNCTION_1P(held_weight)
static ex held_weight_eval(const ex& w) { return held_weight(w).hold(); }
REGISTER_FUNCTION(held_weight, eval_func(held_weight_eval))

ex freeze_weights(const ex& e, const quantum_numbers& numbers) {
    struct walker {
        const quantum_numbers& numbers;
        std::set<std::string> bound;
        ex operator()(const ex& x) {
            if (is_weight(x) && !touches(x, bound, numbers)) return held_weight(x).hold();
            if (is_a<index_sum>(x)) {
                const auto& s = ex_to<index_sum>(x);
                std::set<std::string> outer = bound;
                for (const ex& i : s.indices()) bound.insert(ex_to<symbol>(i).get_name());
                ex body = (*this)(s.body());
                bound = outer;
                return make_sum(body, s.indices());
            }
            if (is_a<add>(x) || is_a<mul>(x) || is_a<power>(x)) {
                exvector ops;
                for (const ex& o : x) ops.push_back((*this)(o));
                if (is_a<add>(x)) return add(ops);
                if (is_a<mul>(x)) return mul(ops);
                return pow(ops[0], ops[1]);
            }
            return x;
        }
    };
    walker w{numbers, {}};
    return w(e);
}

ex thaw_weights(const ex& e) {
    struct thaw : map_function {
        ex operator()(const ex& x) override {
            if (is_ex_the_function(x, held_weight)) return x.op(0);
            return x.map(*this);  // a sum's body is its operand
        }
    } t;
    return t(e);
}

}  // namespace couplet
