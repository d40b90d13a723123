#include "coupling/recoupling_path.hpp"

#include <algorithm>
#include <limits>
#include <optional>
#include <queue>
#include <string>
#include <tuple>
#include <unordered_map>

#include "limits/run_limits.hpp"

namespace couplet::coupling {

std::vector<recoupling_step> steps_from(const tree_shape& shape, bool use_ninej) {
    std::vector<recoupling_step> out;
    for (leaf_set parent : shape.couplings) {
        const auto [x, y] = shape.parts_of(parent);
        // A 6j: a coupled part (a b) of the parent gives one of a, b to its other part c.
        for (auto [inner, other] : {std::make_pair(x, y), std::make_pair(y, x)}) {
            if (is_single_leaf(inner)) continue;
            const auto [a, b] = shape.parts_of(inner);
            out.push_back({parent, {inner}, {static_cast<leaf_set>(b | other)}});
            out.push_back({parent, {inner}, {static_cast<leaf_set>(a | other)}});
        }
        // A 9j: both parts coupled, (a b) and (c d) become (a c), (b d) or (a d), (b c).
        if (use_ninej && !is_single_leaf(x) && !is_single_leaf(y)) {
            const auto [a, b] = shape.parts_of(x);
            const auto [c, d] = shape.parts_of(y);
            out.push_back({parent, {x, y}, {static_cast<leaf_set>(a | c), static_cast<leaf_set>(b | d)}});
            out.push_back({parent, {x, y}, {static_cast<leaf_set>(a | d), static_cast<leaf_set>(b | c)}});
        }
    }
    return out;
}

namespace {

recoupling_cost operator+(recoupling_cost a, recoupling_cost b) { return {a.sums + b.sums, a.symbols + b.symbols}; }

// A search state: the shape, and which of T1's couplings it still has as T1 gave them.
struct state {
    tree_shape shape;
    std::vector<leaf_set> original;  // sorted
};

std::string key_of(const state& s) {
    std::string k;
    for (leaf_set c : s.shape.couplings) k.append(reinterpret_cast<const char*>(&c), sizeof c);
    k.push_back('|');
    for (leaf_set c : s.original) k.append(reinterpret_cast<const char*>(&c), sizeof c);
    return k;
}

recoupling_cost lower_bound(const state& s, const tree_shape& to) {
    int foreign = 0, introduced_foreign = 0;
    for (leaf_set c : s.shape.couplings) {
        if (to.has(c)) continue;
        ++foreign;
        if (!std::binary_search(s.original.begin(), s.original.end(), c)) ++introduced_foreign;
    }
    return {introduced_foreign, (foreign + 1) / 2};
}

struct visit {
    recoupling_cost cost;
    bool expanded = false;
    std::string parent_key;
    recoupling_step step;
    state at;
};

}  // namespace

namespace {

// One step's cost, and the state it leads to.
recoupling_cost take_step(state& s, const recoupling_step& step) {
    recoupling_cost cost{0, 1};
    for (std::size_t i = 0; i < step.removed.size(); ++i) {
        auto it = std::lower_bound(s.original.begin(), s.original.end(), step.removed[i]);
        if (it != s.original.end() && *it == step.removed[i])
            s.original.erase(it);
        else
            ++cost.sums;
        s.shape = s.shape.replaced(step.removed[i], step.added[i]);
    }
    return cost;
}

}  // namespace

recoupling_path constructed_recoupling(const tree_shape& from, const tree_shape& to) {
    recoupling_path path;
    path.cheapest = false;
    state current{from, from.couplings};
    // T2's couplings smallest first: both parts of each exist when it is built.
    std::vector<leaf_set> wanted = to.couplings;
    std::stable_sort(wanted.begin(), wanted.end(),
                     [](leaf_set a, leaf_set b) { return __builtin_popcount(a) < __builtin_popcount(b); });
    for (leaf_set target : wanted) {
        const auto [p, q] = to.parts_of(target);
        // Raise p until its parent is the smallest coupling holding both parts, then q, by 6j
        // steps at a grandparent: ((x s) u, c) w -> (x, (s c)) w, or, where c is the other
        // part, -> (s, (x c)) w, which builds the coupling.
        while (!current.shape.has(target)) {
            const bool p_raised = (current.shape.parent_of(p) & target) == target;
            const leaf_set part = p_raised ? q : p, other = p_raised ? p : q;
            const leaf_set up = current.shape.parent_of(part);
            const leaf_set grand = current.shape.parent_of(up);
            const leaf_set sibling = static_cast<leaf_set>(up & ~part);
            const leaf_set uncle = static_cast<leaf_set>(grand & ~up);
            const leaf_set added = static_cast<leaf_set>((uncle == other ? part : sibling) | uncle);
            const recoupling_step step{grand, {up}, {added}};
            path.cost = path.cost + take_step(current, step);
            path.steps.push_back(step);
        }
    }
    return path;
}

namespace {

// The order in which states leave the queue.
enum class search_order {
    cheapest_first,  // A*: cost so far plus the lower bound; the first path found is the cheapest
    cost_only,       // Dijkstra: every cheaper state first
    // Sums so far plus the sums still needed, then the fewest couplings still foreign to T2:
    // within the fewest sums it heads for T2 instead of trying every cheaper symbol count,
    // and finds a path in a few hundred states where A* has not finished after 20 000.
    sums_then_progress,
};

// Nothing when `budget` states were taken from the queue first.
std::optional<recoupling_path> searched(const tree_shape& from, const tree_shape& to, bool use_ninej, search_order by,
                                        std::size_t budget) {
    using entry = std::tuple<recoupling_cost, recoupling_cost, std::size_t, std::string>;  // f, g, order, key
    auto later = [](const entry& a, const entry& b) {
        if (std::get<0>(b) < std::get<0>(a)) return true;
        if (std::get<0>(a) < std::get<0>(b)) return false;
        return std::get<2>(a) > std::get<2>(b);  // first in, first out: deterministic
    };
    std::priority_queue<entry, std::vector<entry>, decltype(later)> queue(later);
    std::unordered_map<std::string, visit> seen;

    const state start{from, from.couplings};
    const std::string start_key = key_of(start);
    seen[start_key] = {{}, false, "", {}, start};
    std::size_t order = 0;
    // The queue's key: a (sums, symbols) pair compared in that order.
    auto key_for = [&](const state& s, recoupling_cost g) -> recoupling_cost {
        switch (by) {
            case search_order::cheapest_first:
                return g + lower_bound(s, to);
            case search_order::cost_only:
                return g;
            case search_order::sums_then_progress:
            default: {
                const recoupling_cost h = lower_bound(s, to);
                return {g.sums + h.sums, h.symbols};
            }
        }
    };
    queue.emplace(key_for(start, {}), recoupling_cost{}, order++, start_key);
    std::size_t expanded = 0;
    while (!queue.empty()) {
        auto [f, g, ignored, key] = queue.top();
        queue.pop();
        visit& here = seen.at(key);
        if (here.expanded) continue;
        here.expanded = true;
        if (here.at.shape == to) {
            recoupling_path path;
            path.cost = g;
            path.cheapest = by != search_order::sums_then_progress;
            for (std::string k = key; k != start_key; k = seen.at(k).parent_key) path.steps.push_back(seen.at(k).step);
            std::reverse(path.steps.begin(), path.steps.end());
            return path;
        }
        if (++expanded > budget) return std::nullopt;
        if (expanded % 1024 == 0) check_deadline();
        const state current = here.at;
        for (const recoupling_step& step : steps_from(current.shape, use_ninej)) {
            state next = current;
            const recoupling_cost cost = g + take_step(next, step);
            const std::string next_key = key_of(next);
            auto found = seen.find(next_key);
            if (found != seen.end() && !(cost < found->second.cost)) continue;
            seen[next_key] = {cost, found != seen.end() && found->second.expanded, key, step, next};
            queue.emplace(key_for(next, cost), cost, order++, next_key);
        }
    }
    return std::nullopt;  // not reached: T2 is always reachable
}

}  // namespace

recoupling_path cheapest_recoupling(const tree_shape& from, const tree_shape& to, const search_options& options) {
    const bool always = __builtin_popcount(to.couplings.back()) <= static_cast<int>(options.always_cheapest_up_to);
    const std::size_t budget = always ? std::numeric_limits<std::size_t>::max() : options.max_expanded;
    const search_order exact = options.use_lower_bound ? search_order::cheapest_first : search_order::cost_only;
    if (auto cheapest = searched(from, to, options.use_ninej, exact, budget)) return *cheapest;
    // The built path is the last resort: at 10 leaves it can have 17 sums where the quick
    // search finds 4.
    recoupling_path built = constructed_recoupling(from, to);
    auto quick = searched(from, to, options.use_ninej, search_order::sums_then_progress, options.fallback_max_expanded);
    return quick && quick->cost < built.cost ? *quick : built;
}

}  // namespace couplet::coupling
