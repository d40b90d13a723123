// The shape of a coupling tree without its order: the set of leaf subsets that its couplings
// join (each a bit mask over the leaves; the whole set is the root).  Exchanging the two parts
// of a coupling changes a coupled state by a phase only, so the search for a recoupling path
// works on shapes, and the phases are read off the ordered trees afterwards.
#pragma once

#include <cstdint>
#include <utility>
#include <vector>

namespace couplet::coupling {

using leaf_set = std::uint16_t;  // at most 16 leaves; couplet accepts 12

// A tree's couplings, sorted: n - 1 subsets for n leaves, the root among them.
struct tree_shape {
    std::vector<leaf_set> couplings;

    bool has(leaf_set s) const;
    // The two parts that the coupling `s` joins (each a coupling or a single leaf), smaller
    // mask first.
    std::pair<leaf_set, leaf_set> parts_of(leaf_set s) const;
    // The smallest coupling that holds `s` (a coupling or a leaf) as one of its parts.
    leaf_set parent_of(leaf_set s) const;
    // The shape with `removed` replaced by `added`.
    tree_shape replaced(leaf_set removed, leaf_set added) const;

    bool operator==(const tree_shape& o) const { return couplings == o.couplings; }
};

inline bool is_single_leaf(leaf_set s) { return (s & (s - 1)) == 0; }

}  // namespace couplet::coupling
