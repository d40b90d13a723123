#include "print/step_change.hpp"

#include <algorithm>
#include <vector>

#include "model/rewrite.hpp"
#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

struct opened {
    std::vector<ex> indices;
    ex body;
};

opened open_sum(const ex& e) {
    if (!is_a<index_sum>(e)) return {{}, e};
    const auto& s = ex_to<index_sum>(e);
    return {{s.indices().begin(), s.indices().end()}, s.body()};
}

bool holds(const std::vector<ex>& list, const ex& x) {
    return std::any_of(list.begin(), list.end(), [&](const ex& y) { return y.is_equal(x); });
}

ex under_sum(const ex& body, const std::vector<ex>& indices) {
    if (indices.empty()) return body;
    lst l;
    for (const ex& i : indices) l.append(i);
    return make_sum(body, l);
}

}  // namespace

std::pair<ex, ex> changed_parts(const ex& before, const ex& after) {
    const opened b = open_sum(before), a = open_sum(after);
    if (is_a<add>(b.body) || is_a<add>(a.body)) return {before, after};
    std::vector<ex> only_before, only_after, moving;
    for (const ex& i : b.indices)
        if (!holds(a.indices, i)) only_before.push_back(i), moving.push_back(i);
    for (const ex& i : a.indices)
        if (!holds(b.indices, i)) only_after.push_back(i), moving.push_back(i);
    std::vector<ex> rest_after = factors_of(a.body);
    ex kept_before = 1, kept_after = 1;
    for (const ex& f : factors_of(b.body)) {
        const bool touches = std::any_of(moving.begin(), moving.end(), [&](const ex& i) { return f.has(i); });
        auto same = std::find_if(rest_after.begin(), rest_after.end(), [&](const ex& g) { return g.is_equal(f); });
        if (!touches && same != rest_after.end() && !is_a<numeric>(f)) {
            rest_after.erase(same);  // shared: shown by neither side
            continue;
        }
        kept_before *= f;
    }
    for (const ex& g : rest_after) kept_after *= g;
    return {under_sum(kept_before, only_before), under_sum(kept_after, only_after)};
}

}  // namespace couplet
