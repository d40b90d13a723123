#include "model/rewrite.hpp"

#include <algorithm>

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

std::vector<ex> terms_of(const ex& e) {
    if (is_a<add>(e)) return {e.begin(), e.end()};
    return {e};
}

std::vector<ex> factors_of(const ex& term) {
    if (is_a<mul>(term)) return {term.begin(), term.end()};
    return {term};
}

bool is_polynomial(const ex& e) {
    if (is_a<numeric>(e) || is_a<symbol>(e)) return true;
    if (is_a<add>(e) || is_a<mul>(e))
        return std::all_of(e.begin(), e.end(), [](const ex& o) { return is_polynomial(o); });
    if (is_a<power>(e))
        return is_polynomial(e.op(0)) && is_a<numeric>(e.op(1)) && ex_to<numeric>(e.op(1)).is_pos_integer();
    return false;
}

ex rewritten(const ex& e, const std::function<std::optional<ex>(const ex&)>& at) {
    if (std::optional<ex> by = at(e)) return *by;
    if (is_a<index_sum>(e)) {
        const auto& s = ex_to<index_sum>(e);
        return make_sum(rewritten(s.body(), at), s.indices());
    }
    if (is_a<add>(e) || is_a<mul>(e) || is_a<power>(e)) {
        exvector ops;
        for (const ex& o : e) ops.push_back(rewritten(o, at));
        if (is_a<add>(e)) return add(ops);
        if (is_a<mul>(e)) return mul(ops);
        return pow(ops[0], ops[1]);
    }
    return e;
}

ex replaced(const ex& e, const ex& target, const ex& by) {
    return rewritten(e, [&](const ex& x) { return x.is_equal(target) ? std::optional<ex>(by) : std::nullopt; });
}

bool is_linear_form(const ex& e) {
    ex x = e.expand();
    auto linear_term = [](const ex& t) {
        if (is_a<numeric>(t)) return ex_to<numeric>(t).is_rational();
        if (is_a<symbol>(t)) return true;
        if (is_a<mul>(t) && t.nops() == 2) {
            const ex& a = t.op(0);
            const ex& b = t.op(1);
            return (is_a<symbol>(a) && is_a<numeric>(b) && ex_to<numeric>(b).is_rational()) ||
                   (is_a<symbol>(b) && is_a<numeric>(a) && ex_to<numeric>(a).is_rational());
        }
        return false;
    };
    if (is_a<add>(x)) {
        for (const ex& t : x)
            if (!linear_term(t)) return false;
        return true;
    }
    return linear_term(x);
}

}  // namespace couplet
