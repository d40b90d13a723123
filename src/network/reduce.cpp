#include "network/reduce.hpp"

#include <deque>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "model/fresh_index.hpp"
#include "model/normalize.hpp"
#include "model/symbols.hpp"
#include "network/cut.hpp"
#include "network/fixed_projection.hpp"
#include "network/match.hpp"
#include "network/rewrites.hpp"
#include "network/term.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

// Each closing move removes at least one summation index, so the loop ends; the cap only guards.
constexpr int max_moves_per_term = 64;
// Each interchange shortens a shortest cycle; the cap bounds the nesting it builds.
constexpr int max_interchanges = 48;

// A cycle of the network: vertices v[0..k-1], line k joining v[k] and v[k+1 mod k].
struct cycle {
    std::vector<int> vertices, lines;
};

// Shortest simple cycles (length >= 3, parallel lines and loops ignored: the closing moves
// handle those), at most one per root, shortest first.
std::vector<cycle> shortest_cycles(const msum_term& t) {
    const int n = static_cast<int>(t.threejs.size());
    std::vector<std::vector<std::pair<int, int>>> next(n);  // (neighbour, line)
    for (int l = 0; l < static_cast<int>(t.lines.size()); ++l) {
        int u = t.lines[l].ends[0], w = t.lines[l].ends[1];
        if (u == w) continue;
        bool parallel = false;
        for (auto [x, k] : next[u]) parallel = parallel || x == w;
        if (parallel) continue;
        next[u].push_back({w, l});
        next[w].push_back({u, l});
    }
    std::vector<cycle> out;
    for (int root = 0; root < n; ++root) {
        std::vector<int> depth(n, -1), parent(n, -1), via(n, -1);
        std::deque<int> queue{root};
        depth[root] = 0;
        std::optional<cycle> best;
        while (!queue.empty() && !best) {
            int u = queue.front();
            queue.pop_front();
            for (auto [w, l] : next[u]) {
                if (l == via[u]) continue;
                if (depth[w] < 0) {
                    depth[w] = depth[u] + 1;
                    parent[w] = u;
                    via[w] = l;
                    queue.push_back(w);
                    continue;
                }
                // Two tree paths from the root meet across line l: a cycle if they share only the root.
                std::vector<int> left, right, left_lines, right_lines;
                for (int x = u; x != root; x = parent[x]) left.push_back(x), left_lines.push_back(via[x]);
                for (int x = w; x != root; x = parent[x]) right.push_back(x), right_lines.push_back(via[x]);
                bool simple = true;
                for (int x : left)
                    for (int y : right) simple = simple && x != y;
                if (!simple) continue;
                cycle c;
                c.vertices.push_back(root);
                for (auto it = left.rbegin(); it != left.rend(); ++it) c.vertices.push_back(*it);
                for (auto it = left_lines.rbegin(); it != left_lines.rend(); ++it) c.lines.push_back(*it);
                c.lines.push_back(l);
                for (int x : right) c.vertices.push_back(x);
                for (int x : right_lines) c.lines.push_back(x);
                if (c.vertices.size() >= 3) best = c;
                break;
            }
        }
        if (best) out.push_back(*best);
    }
    std::stable_sort(out.begin(), out.end(),
                     [](const cycle& a, const cycle& b) { return a.vertices.size() < b.vertices.size(); });
    return out;
}

ex bare(const ex& e) { return is_a<symbol>(e) ? e : (-e).expand(); }

bool sits_in_threej(const ex& e, const ex& index) {
    for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
        if (kind_of(*it) == symbol_kind::threej && it->has(index)) return true;
    return false;
}

// sum(m : delta(+-m, x) f(m)) = f(+-x) where a 3j still holds m: that 3j vanishes wherever x
// lies outside m's range or parity, as the sum would be empty.  A move's result can leave such a
// delta on a negated projection, which no network analysis accepts.
std::optional<std::pair<ex, lst>> resolve_projection_delta(const ex& body, const lst& indices) {
    if (!is_a<mul>(body)) return std::nullopt;
    exvector factors(body.begin(), body.end());
    for (std::size_t k = 0; k < factors.size(); ++k) {
        if (kind_of(factors[k]) != symbol_kind::delta) continue;
        for (int side = 0; side < 2; ++side) {
            const ex &entry = factors[k].op(side), &other = factors[k].op(1 - side);
            for (const ex& i : indices) {
                int sign = (entry - i).expand().is_zero() ? 1 : (entry + i).expand().is_zero() ? -1 : 0;
                if (sign == 0 || other.has(i)) continue;
                ex rest = 1;
                for (std::size_t q = 0; q < factors.size(); ++q)
                    if (q != k) rest *= factors[q];
                if (!sits_in_threej(rest, i)) continue;
                lst kept;
                for (const ex& x : indices)
                    if (!x.is_equal(i)) kept.append(x);
                return std::make_pair(rest.subs(i == (sign * other).expand()), kept);
            }
        }
    }
    return std::nullopt;
}

class reducer : public map_function {
public:
    reducer(const quantum_numbers& numbers, std::vector<reduction_step>* steps) : numbers_(numbers), steps_(steps) {
        phases_provable_ = [this](const ex& candidate) {
            try {
                prove_phases_integral(merge_phases(candidate), numbers_);
                return true;
            } catch (const phase_not_integer&) {
                return false;
            }
        };
    }

    ex operator()(const ex& e) override {
        if (!is_a<index_sum>(e)) return e.map(*this);
        const auto& s = ex_to<index_sum>(e);
        const ex inner = (*this)(s.body());
        const ex body = inner.expand();
        if (!is_a<add>(body)) return reduce_term(body, s.indices());
        for (const ex& t : body)
            for (const ex& i : s.indices())
                if (!t.has(i)) return make_sum(inner, s.indices());  // a term the sum does not bound
        // Split into one sum per term only where some term's network reduces: a sum no move
        // changes keeps its summand as written, weights and all.
        ex out = 0;
        bool changed = false;
        for (const ex& t : body) {
            const ex r = reduce_term(t, s.indices());
            changed = changed || !r.is_equal(make_sum(t, s.indices()));
            out += r;
        }
        return changed ? out : make_sum(inner, s.indices());
    }

private:
    ex reduce_term(ex body, lst indices) {
        bool changed = false;
        for (int round = 0; round < max_moves_per_term; ++round) {
            const ex before = make_sum(body, indices);
            if (auto d = resolve_projection_delta(body, indices)) {
                ex n = merge_phases(d->second.nops() ? make_sum(d->first, d->second) : d->first);
                if (phases_provable_(n)) {
                    note(projection_delta_identity(), before, n);
                    changed = true;
                    if (!is_a<index_sum>(n)) return tidy(n);
                    body = ex_to<index_sum>(n).body();
                    indices = ex_to<index_sum>(n).indices();
                    continue;
                }
            }
            term_analysis a = analyze_term(body, indices, numbers_);
            if (!a.term) break;
            std::optional<ex> next;
            const identity* taken = nullptr;
            for (const move& m : network_moves()) {
                next = apply_move(m, *a.term, phases_provable_);
                if (next) {
                    taken = &m;
                    break;
                }
            }
            // A cut adds no sum and leaves two independent smaller networks: before any interchange.
            if (!next)
                if (auto separated = separate_on_a_cut(*a.term, body, before)) return *separated;
            // Only on a proper network: elsewhere the closing moves cannot finish what it starts.
            if (!next && interchanges_ < max_interchanges && is_proper_network(*a.term)) {
                next = interchange_on_a_shortest_cycle(*a.term, body);
                if (next) {
                    ++interchanges_;
                    ex n = merge_phases(*next);
                    note(interchange_move(), before, n);
                    if (is_a<index_sum>(n)) return tidy(reduce_inside(ex_to<index_sum>(n)));
                    return tidy(n);
                }
            }
            if (!next) {
                // Last resort, since it leaves entries the moves do not match.
                next = fix_projection_by_vertex(*a.term);
                if (next && !phases_provable_(*next)) next.reset();
                taken = &fixed_projection_identity();
            }
            if (!next) break;
            changed = true;
            ex n = merge_phases(*next);
            note(*taken, before, n);
            if (!is_a<index_sum>(n)) return tidy(n);
            body = ex_to<index_sum>(n).body();
            indices = ex_to<index_sum>(n).indices();
        }
        ex out = make_sum(body, indices);
        return changed ? tidy(out) : out;
    }

    // The step is recorded when it is taken, so a move inside a part it made follows it.
    void note(const identity& used, const ex& before, const ex& after) {
        if (steps_) steps_->push_back(step_by(used, before, after));
    }

    // The first cut of two lines, else of three, that separates with provable phases; each
    // closed part is reduced on its own, the other part kept from capture.
    std::optional<ex> separate_on_a_cut(const msum_term& t, const ex& body, const ex& before) {
        ex context = body;
        for (const ex& o : outer_) context *= o;
        std::vector<symbol> fresh;
        for (int k = 0; k < 3; ++k) {
            ex taken = context;
            for (const symbol& f : fresh) taken *= f;
            fresh.push_back(fresh_index(taken, numbers_));
        }
        for (int size : {2, 3}) {
            for (const line_cut& c : find_cuts(t, size)) {
                auto s = separate(t, c, fresh);
                if (!s || !phases_provable_(joined(*s))) continue;
                note(*s->used, before, merge_phases(joined(*s)));
                outer_.push_back(make_sum(s->body_b, s->indices_b));
                ex a = reduce_term(s->body_a, s->indices_a);
                outer_.back() = a;
                ex b = reduce_term(s->body_b, s->indices_b);
                outer_.pop_back();
                return tidy(s->factor * a * b);
            }
        }
        return std::nullopt;
    }

    // Recoupling on a line of a shortest cycle, pairing the cycle's two neighbouring lines on
    // one new vertex: the cycle loses that line.
    std::optional<ex> interchange_on_a_shortest_cycle(const msum_term& t, const ex& body) {
        const move& m = interchange_move();
        const ex alpha = m.threejs[0].op(3), epsilon = m.threejs[0].op(5), gamma = m.threejs[1].op(4);
        ex context = body;
        for (const ex& o : outer_) context *= o;
        symbol x = fresh_index(context, numbers_);
        symbol xi = fresh_index(context * x, numbers_);
        // No phase veto: the 6j keeps the triads (a b e), (e c d) of the two 3j it replaces and
        // the new 3j keep every (j, m) pair but the summed one's, so the phase group proves the
        // residue's integrality exactly as before the move (and proving it each time is costly).
        move_options options;
        options.fresh = {x, xi};
        for (const cycle& c : shortest_cycles(t)) {
            const std::size_t k = c.lines.size();
            for (std::size_t i = 0; i < k; ++i) {
                const ex e = t.lines[c.lines[i]].projection;
                const ex p = t.lines[c.lines[(i + k - 1) % k]].projection;
                const ex q = t.lines[c.lines[(i + 1) % k]].projection;
                options.where = [&](const exmap& b) {
                    return bare(b.at(epsilon)).is_equal(e) && bare(b.at(alpha)).is_equal(p) &&
                           bare(b.at(gamma)).is_equal(q);
                };
                if (auto r = apply_move(m, t, options)) return r;
            }
        }
        return std::nullopt;
    }

    // sum(x : sum(m's : ...)) after an interchange: the inner m-sum is reduced further.
    ex reduce_inside(const index_sum& s) {
        outer_.push_back(s.indices());
        // Not through operator(): expanding (2x+1) would split the term in two.
        ex inner = s.body();
        if (is_a<index_sum>(inner))
            inner = reduce_term(ex_to<index_sum>(inner).body(), ex_to<index_sum>(inner).indices());
        else
            inner = (*this)(inner);
        outer_.pop_back();
        return make_sum(inner, s.indices());
    }

    ex tidy(const ex& e) const { return merge_phases(symmetry::canonicalize_symbols(e, numbers_)); }

    const quantum_numbers& numbers_;
    std::vector<reduction_step>* steps_;
    result_check phases_provable_;
    int interchanges_ = 0;
    std::vector<ex> outer_;  // the indices of enclosing sums introduced here, kept from capture
};

}  // namespace

ex reduce_msums(const ex& e, const quantum_numbers& numbers, std::vector<reduction_step>* steps) {
    reducer r(numbers, steps);
    return r(e);
}

}  // namespace couplet::network
