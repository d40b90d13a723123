#include "couplet/model/rewrite.hpp"

#include <algorithm>

#include "couplet/model/symbols.hpp"

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

ex replaced(const ex& e, const ex& target, const ex& by) {
    if (e.is_equal(target)) return by;
    if (is_a<index_sum>(e)) {
        const auto& s = ex_to<index_sum>(e);
        return make_sum(replaced(s.body(), target, by), s.indices());
    }
    if (is_a<add>(e) || is_a<mul>(e) || is_a<power>(e)) {
        exvector ops;
        for (const ex& o : e) ops.push_back(replaced(o, target, by));
        if (is_a<add>(e)) return add(ops);
        if (is_a<mul>(e)) return mul(ops);
        return pow(ops[0], ops[1]);
    }
    return e;
}

}  // namespace couplet
