// The cheapest way from one coupling tree to another by elementary recouplings, each a 6j
// (Edmonds 6.1.5: ((a b) e, c) f -> (a, (b c) g) f) or a 9j (Edmonds 6.4.2:
// ((a b) e, (c d) g) f -> ((a c) h, (b d) k) f).  A coupling that a step removes and that an
// earlier step introduced is summed over; one that T1 had is not, and the couplings the path
// ends on are T2's.  Cost: the fewest sums, then the fewest symbols.  A* over shapes, with a
// lower bound that every coupling not in T2 must still be removed (at most two per step).
#pragma once

#include <cstddef>
#include <optional>
#include <vector>

#include "coupling/tree_shape.hpp"

namespace couplet::coupling {

struct recoupling_step {
    leaf_set parent = 0;            // the coupling whose parts are regrouped
    std::vector<leaf_set> removed;  // one (6j) or two (9j) couplings
    std::vector<leaf_set> added;    // as many, in the same order
    bool is_ninej() const { return removed.size() == 2; }
};

struct recoupling_cost {
    int sums = 0;
    int symbols = 0;
    bool operator<(const recoupling_cost& o) const { return sums != o.sums ? sums < o.sums : symbols < o.symbols; }
    bool operator==(const recoupling_cost& o) const { return sums == o.sums && symbols == o.symbols; }
};

struct recoupling_path {
    std::vector<recoupling_step> steps;
    recoupling_cost cost;
    bool cheapest = true;  // false: the exact search gave up (cheapest_recoupling)
};

struct search_options {
    bool use_ninej = true;
    bool use_lower_bound = true;  // false: Dijkstra, every cheaper state first
    // States taken from the queue before the search gives up, for more than
    // always_cheapest_up_to leaves; up to that many the search always runs to the end.
    std::size_t max_expanded = 20000;
    std::size_t always_cheapest_up_to = 8;
    // Where it gives up, a second search that heads for T2 within the fewest sums takes at
    // most this many states.
    std::size_t fallback_max_expanded = 20000;
};

// The cheapest path; where the search gives up, the cheaper of a quicker search's path (the
// fewest sums first, then progress towards T2) and one that builds T2's couplings from the leaves up, each by moving
// its two parts next to each other with 6j steps (cheapest false).
recoupling_path cheapest_recoupling(const tree_shape& from, const tree_shape& to, const search_options& options = {});

// The path that builds T2's couplings from the leaves up, on its own.
recoupling_path constructed_recoupling(const tree_shape& from, const tree_shape& to);

// The steps a shape allows, each with the couplings it removes and adds.
std::vector<recoupling_step> steps_from(const tree_shape& shape, bool use_ninej);

}  // namespace couplet::coupling
