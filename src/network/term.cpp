#include "network/term.hpp"

#include <array>

#include "model/symbols.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

bool is_phase(const ex& f) { return is_a<phase_factor>(f); }

bool has_any(const ex& e, const lst& indices) {
    for (const ex& i : indices)
        if (e.has(i)) return true;
    return false;
}

// +-index for an entry that is exactly an index or its negative.
std::optional<std::pair<symbol, int>> signed_index(const ex& entry, const lst& indices) {
    for (const ex& i : indices) {
        if ((entry - i).expand().is_zero()) return std::make_pair(ex_to<symbol>(i), 1);
        if ((entry + i).expand().is_zero()) return std::make_pair(ex_to<symbol>(i), -1);
    }
    return std::nullopt;
}

// Whether x_u + x_v = parity (mod 2) for every equation (u, v, parity) has a solution.
bool parities_solvable(std::size_t n, const std::vector<std::array<int, 3>>& equations) {
    std::vector<int> value(n, -1);
    std::vector<std::vector<std::pair<int, int>>> next(n);
    for (const auto& [u, v, p] : equations) {
        if (u == v) {
            if (p) return false;
            continue;
        }
        next[u].push_back({v, p});
        next[v].push_back({u, p});
    }
    for (std::size_t root = 0; root < n; ++root) {
        if (value[root] >= 0) continue;
        value[root] = 0;
        std::vector<int> stack{static_cast<int>(root)};
        while (!stack.empty()) {
            int u = stack.back();
            stack.pop_back();
            for (auto [v, p] : next[u]) {
                int want = value[u] ^ p;
                if (value[v] < 0) {
                    value[v] = want;
                    stack.push_back(v);
                } else if (value[v] != want) {
                    return false;
                }
            }
        }
    }
    return true;
}

}  // namespace

term_analysis analyze_term(const ex& body, const lst& indices, const quantum_numbers& numbers) {
    term_analysis out;
    msum_term t;
    t.summed = indices;
    for (const ex& i : indices) {
        if (!is_a<symbol>(i)) return {std::nullopt, "an index is not a name"};
        // An unregistered index is one a move introduced (a fresh projection); the slot checks
        // below confine it to bottom rows like any other.
        const quantum_number* q = numbers.find(ex_to<symbol>(i));
        if (q && q->role != qn_role::projection) return {std::nullopt, "an index is not a projection"};
    }
    exvector factors;
    if (is_a<mul>(body))
        for (const ex& f : body) factors.push_back(f);
    else
        factors.push_back(body);
    for (const ex& f : factors) {
        if (is_a<power>(f) && kind_of(f.op(0)) == symbol_kind::threej && is_a<numeric>(f.op(1)) &&
            ex_to<numeric>(f.op(1)).is_pos_integer() && ex_to<numeric>(f.op(1)) <= 8) {
            for (int k = 0; k < ex_to<numeric>(f.op(1)).to_int(); ++k) t.threejs.push_back(f.op(0));
        } else if (kind_of(f) == symbol_kind::threej) {
            t.threejs.push_back(f);
        } else if (is_phase(f)) {
            t.exponent += f.op(0);
        } else if (is_a<power>(f) && is_phase(f.op(0)) && is_a<numeric>(f.op(1)) &&
                   ex_to<numeric>(f.op(1)).is_integer()) {
            t.exponent += f.op(0).op(0) * f.op(1);
        } else if (has_any(f, indices)) {
            return {std::nullopt, "a factor other than a 3j or a phase involves a summed projection"};
        } else {
            t.rest *= f;
        }
    }
    for (const ex& i : indices) {
        line l{ex_to<symbol>(i), {-1, -1}, 0};
        t.lines.push_back(l);
    }
    for (std::size_t v = 0; v < t.threejs.size(); ++v) {
        const ex& s = t.threejs[v];
        for (int c = 0; c < 3; ++c) {
            const ex& entry = s.op(3 + c);
            if (has_any(s.op(c), indices)) return {std::nullopt, "a summed projection in a top row"};
            if (!has_any(entry, indices)) {
                t.open_ends.push_back(entry);
                continue;
            }
            auto si = signed_index(entry, indices);
            if (!si) return {std::nullopt, "a bottom-row entry mixes a summed projection with more"};
            for (auto& l : t.lines) {
                if (!l.projection.is_equal(si->first)) continue;
                if (l.ends[0] < 0) {
                    l.ends[0] = static_cast<int>(v);
                    l.angular = s.op(c);
                } else if (l.ends[1] < 0) {
                    l.ends[1] = static_cast<int>(v);
                } else {
                    return {std::nullopt, "a summed projection in more than two slots"};
                }
            }
        }
    }
    for (const auto& l : t.lines)
        if (l.ends[1] < 0) return {std::nullopt, "a summed projection in fewer than two slots"};
    out.term = t;
    return out;
}

bool is_proper_network(const msum_term& t) {
    std::vector<std::array<int, 3>> flips, rules;
    for (const line& l : t.lines) {
        // The signs of the line's two slots: both in one vertex for a loop.
        std::vector<int> signs;
        int vertices[2] = {l.ends[0], l.ends[0] == l.ends[1] ? -1 : l.ends[1]};
        for (int v : vertices) {
            if (v < 0) continue;
            for (int c = 3; c < 6; ++c) {
                ex entry = t.threejs[v].op(c);
                if ((entry - l.projection).expand().is_zero())
                    signs.push_back(1);
                else if ((entry + l.projection).expand().is_zero())
                    signs.push_back(-1);
            }
        }
        if (signs.size() != 2) return false;
        int sign[2] = {signs[0], signs[1]}, k = 2;
        if (k < 2) return false;
        ex c = t.exponent.expand().coeff(l.projection, 1);
        if (!is_a<numeric>(c) || !ex_to<numeric>(c).is_integer()) return false;
        flips.push_back({l.ends[0], l.ends[1], sign[0] == sign[1] ? 1 : 0});
        rules.push_back({l.ends[0], l.ends[1], ex_to<numeric>(c).is_odd() ? 0 : 1});
    }
    return parities_solvable(t.threejs.size(), flips) && parities_solvable(t.threejs.size(), rules);
}

ex summand_of(const msum_term& t) {
    ex p = t.rest * make_phase(t.exponent);
    for (const ex& s : t.threejs) p *= s;
    return p;
}

}  // namespace couplet::network
