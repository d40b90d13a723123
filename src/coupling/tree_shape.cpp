#include "coupling/tree_shape.hpp"

#include <algorithm>

namespace couplet::coupling {

bool tree_shape::has(leaf_set s) const { return std::binary_search(couplings.begin(), couplings.end(), s); }

std::pair<leaf_set, leaf_set> tree_shape::parts_of(leaf_set s) const {
    // The larger proper sub-coupling of s that no other lies between is one part; if there is
    // none, both parts are leaves.
    leaf_set part = 0;
    for (leaf_set c : couplings)
        if (c != s && (c & s) == c && __builtin_popcount(c) > __builtin_popcount(part)) part = c;
    if (part == 0) part = static_cast<leaf_set>(s & -s);
    const leaf_set other = static_cast<leaf_set>(s & ~part);
    return part < other ? std::make_pair(part, other) : std::make_pair(other, part);
}

leaf_set tree_shape::parent_of(leaf_set s) const {
    leaf_set best = 0;
    for (leaf_set c : couplings)
        if (c != s && (c & s) == s && (best == 0 || __builtin_popcount(c) < __builtin_popcount(best))) best = c;
    return best;
}

tree_shape tree_shape::replaced(leaf_set removed, leaf_set added) const {
    tree_shape out = *this;
    auto it = std::lower_bound(out.couplings.begin(), out.couplings.end(), removed);
    out.couplings.erase(it);
    out.couplings.insert(std::lower_bound(out.couplings.begin(), out.couplings.end(), added), added);
    return out;
}

}  // namespace couplet::coupling
