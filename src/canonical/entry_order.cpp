#include "canonical/entry_order.hpp"

#include "model/readable_order.hpp"
#include "print/print.hpp"

#include <algorithm>
#include <cctype>
#include <tuple>

namespace couplet::symmetry {

using namespace GiNaC;

entry_order::entry_order(const quantum_numbers& numbers) {
    std::vector<const quantum_number*> all;
    for (const quantum_number& q : numbers.all()) all.push_back(&q);
    std::sort(all.begin(), all.end(), [](const quantum_number* a, const quantum_number* b) {
        bool pa = a->role == qn_role::projection, pb = b->role == qn_role::projection;
        if (pa != pb) return pb;
        return readable_name_less(a->name, b->name);
    });
    for (std::size_t k = 0; k < all.size(); ++k) rank_.emplace(all[k]->name, static_cast<long>(k));
}

long entry_order::rank(const std::string& name) const {
    auto it = rank_.find(name);
    return it == rank_.end() ? 2'000'000 : it->second;
}

entry_order::key entry_order::of(const ex& entry, bool projection_row) const {
    key terms;
    numeric constant = 0;
    ex x = entry.expand();
    auto take = [&](const ex& t) {
        if (is_a<numeric>(t)) {
            constant += ex_to<numeric>(t);
        } else if (is_a<symbol>(t)) {
            terms.emplace_back(rank(ex_to<symbol>(t).get_name()), numeric(1));
        } else if (is_a<mul>(t) && t.nops() == 2 && is_a<numeric>(t.op(1)) && is_a<symbol>(t.op(0))) {
            terms.emplace_back(rank(ex_to<symbol>(t.op(0)).get_name()), ex_to<numeric>(t.op(1)));
        } else {
            terms.emplace_back(3'000'000, numeric(1));  // not a linear form: after all others
        }
    };
    if (is_a<add>(x))
        for (const ex& t : x) take(t);
    else
        take(x);
    std::sort(terms.begin(), terms.end(), [](const auto& a, const auto& b) { return a.first < b.first; });
    // A projection row prefers m to -m: compare a negative entry by its magnitude, after.
    bool negative_lead =
        projection_row && (terms.empty() ? constant.is_negative() : terms.front().second.is_negative());
    numeric sign = negative_lead ? -1 : 1;
    key k{{negative_lead ? 1 : 0, numeric(0)}};
    for (const auto& [r, c] : terms) k.emplace_back(r, c * sign);
    if (terms.empty()) k.emplace_back(4'000'000, 0);  // pure numbers after quantum numbers
    k.emplace_back(5'000'000, constant * sign);
    return k;
}

bool key_less(const entry_order::key& a, const entry_order::key& b) {
    return std::lexicographical_compare(a.begin(), a.end(), b.begin(), b.end(), [](const auto& x, const auto& y) {
        if (x.first != y.first) return x.first < y.first;
        return x.second < y.second;
    });
}

}  // namespace couplet::symmetry
