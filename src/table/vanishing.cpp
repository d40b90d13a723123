#include "table/vanishing.hpp"

#include "model/rewrite.hpp"
#include "model/symbols.hpp"

namespace couplet::table_detail {

using namespace GiNaC;

namespace {

bool is_coupling_symbol(const ex& f) {
    switch (kind_of(f)) {
        case symbol_kind::threej:
        case symbol_kind::sixj:
        case symbol_kind::ninej:
        case symbol_kind::clebsch_gordan:
        case symbol_kind::triangle:
            return true;
        default:
            return false;
    }
}

ex vanishing_part(const ex& term) {
    ex part = 1;
    for (const ex& f : factors_of(term)) {
        // A positive power of a symbol vanishes with it; a negative one is a divisor.
        const bool positive_power =
            is_a<power>(f) && is_a<numeric>(f.op(1)) && ex_to<numeric>(f.op(1)).is_pos_integer();
        const ex base = positive_power ? f.op(0) : f;
        if (is_coupling_symbol(base)) {
            part *= base;
        } else if (is_a<index_sum>(base)) {
            const auto& s = ex_to<index_sum>(base);
            const auto summands = terms_of(s.body());
            if (summands.size() != 1) continue;
            const ex inner = vanishing_part(summands.front());
            // Built directly: the inner part may not hold every index, and the indices stay
            // bound so that no rule is read off a name the sum binds.
            if (!inner.is_equal(1)) part *= index_sum(inner, s.indices());
        }
    }
    return part;
}

}  // namespace

std::vector<ex> vanishing_parts(const ex& e) {
    std::vector<ex> out;
    for (const ex& t : terms_of(e)) out.push_back(vanishing_part(t));
    return out;
}

}  // namespace couplet::table_detail
