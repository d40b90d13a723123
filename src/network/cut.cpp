#include "network/cut.hpp"

#include <algorithm>
#include <array>
#include <numeric>

#include "model/same_value.hpp"
#include "model/symbols.hpp"
#include "network/rewrites.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

bool has_any(const ex& e, const lst& indices) {
    for (const ex& i : indices)
        if (e.has(i)) return true;
    return false;
}

// One of the two bottom-row slots a line fills.
struct slot {
    int vertex = -1, column = -1, sign = 0;
};

std::vector<slot> slots_of(const msum_term& t, const line& l) {
    std::vector<slot> out;
    int vertices[2] = {l.ends[0], l.ends[0] == l.ends[1] ? -1 : l.ends[1]};
    for (int v : vertices) {
        if (v < 0) continue;
        for (int c = 0; c < 3; ++c) {
            const ex& entry = t.threejs[v].op(3 + c);
            if ((entry - l.projection).expand().is_zero())
                out.push_back({v, c, 1});
            else if ((entry + l.projection).expand().is_zero())
                out.push_back({v, c, -1});
        }
    }
    return out;
}

bool has_open_end(const msum_term& t, int v) {
    for (int c = 3; c < 6; ++c)
        if (!has_any(t.threejs[v].op(c), t.summed)) return true;
    return false;
}

// A solution of x_u + x_v = parity (mod 2) over the vertices the equations name, or nothing.
std::optional<std::vector<int>> solve_parities(std::size_t n, const std::vector<std::array<int, 3>>& equations) {
    std::vector<int> value(n, -1);
    std::vector<std::vector<std::pair<int, int>>> next(n);
    for (const auto& [u, v, p] : equations) {
        if (u == v) {
            if (p) return std::nullopt;
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
                    return std::nullopt;
                }
            }
        }
    }
    return value;
}

int find_root(std::vector<int>& parent, int x) {
    while (parent[x] != x) x = parent[x] = parent[parent[x]];
    return x;
}

// The cut made of `chosen` lines, if it is one.
std::optional<line_cut> as_cut(const msum_term& t, const std::vector<int>& chosen, const std::vector<bool>& open) {
    const int n = static_cast<int>(t.threejs.size());
    std::vector<int> parent(n);
    std::iota(parent.begin(), parent.end(), 0);
    int parts = n;
    for (int l = 0; l < static_cast<int>(t.lines.size()); ++l) {
        if (std::find(chosen.begin(), chosen.end(), l) != chosen.end()) continue;
        int a = find_root(parent, t.lines[l].ends[0]), b = find_root(parent, t.lines[l].ends[1]);
        if (a != b) parent[a] = b, --parts;
    }
    if (parts != 2) return std::nullopt;
    for (int l : chosen)
        if (find_root(parent, t.lines[l].ends[0]) == find_root(parent, t.lines[l].ends[1])) return std::nullopt;
    int first = find_root(parent, 0);
    std::vector<bool> side(n);
    int size0 = 0;
    bool open0 = false, open1 = false;
    for (int v = 0; v < n; ++v) {
        side[v] = find_root(parent, v) == first;
        size0 += side[v];
        (side[v] ? open0 : open1) = (side[v] ? open0 : open1) || open[v];
    }
    if (open0 && open1) return std::nullopt;
    // A is the part without open ends; of two closed parts, the smaller.
    bool a_is_first = !open0 && (open1 || size0 <= n - size0);
    int size_a = a_is_first ? size0 : n - size0;
    if (size_a < 2 || (chosen.size() == 3 && n - size_a < 2)) return std::nullopt;
    line_cut c;
    c.lines = chosen;
    for (int v = 0; v < n; ++v) c.in_a.push_back(side[v] == a_is_first);
    return c;
}

int smaller_side(const line_cut& c) {
    int a = static_cast<int>(std::count(c.in_a.begin(), c.in_a.end(), true));
    return std::min(a, static_cast<int>(c.in_a.size()) - a);
}

}  // namespace

std::vector<line_cut> find_cuts(const msum_term& t, int size) {
    std::vector<line_cut> out;
    const int n = static_cast<int>(t.threejs.size());
    if (n < 4 || n > 200 || (size != 2 && size != 3)) return out;
    std::vector<bool> open(n);
    for (int v = 0; v < n; ++v) open[v] = has_open_end(t, v);
    std::vector<int> candidates;  // loops never join two parts
    for (int l = 0; l < static_cast<int>(t.lines.size()); ++l)
        if (t.lines[l].ends[0] != t.lines[l].ends[1]) candidates.push_back(l);
    const int k = static_cast<int>(candidates.size());
    for (int a = 0; a < k; ++a)
        for (int b = a + 1; b < k; ++b) {
            if (size == 2) {
                if (auto c = as_cut(t, {candidates[a], candidates[b]}, open)) out.push_back(*c);
                continue;
            }
            for (int d = b + 1; d < k; ++d)
                if (auto c = as_cut(t, {candidates[a], candidates[b], candidates[d]}, open)) out.push_back(*c);
        }
    std::stable_sort(out.begin(), out.end(),
                     [](const line_cut& x, const line_cut& y) { return smaller_side(x) > smaller_side(y); });
    return out;
}

namespace {

// Each line's coefficient in the phase E0 + sum of c_l m_l (it says how the line is
// contracted), its two ends, and its angular momentum (the same at both ends).
struct line_reading {
    std::vector<numeric> coefficient;
    std::vector<std::vector<slot>> slots;
    std::vector<ex> angular;
};

std::optional<line_reading> read_lines(const msum_term& t, const ex& exponent) {
    line_reading r;
    ex lines_part = 0;
    for (const line& l : t.lines) {
        ex k = exponent.coeff(l.projection, 1);
        if (!is_a<numeric>(k) || !ex_to<numeric>(k).is_integer()) return std::nullopt;
        r.coefficient.push_back(ex_to<numeric>(k));
        lines_part += k * l.projection;
    }
    if (has_any((exponent - lines_part).expand(), t.summed)) return std::nullopt;
    for (const line& l : t.lines) {
        auto s = slots_of(t, l);
        if (s.size() != 2) return std::nullopt;
        ex j0 = t.threejs[s[0].vertex].op(s[0].column), j1 = t.threejs[s[1].vertex].op(s[1].column);
        if (!same_value(j0, j1)) return std::nullopt;
        r.slots.push_back(s);
        r.angular.push_back(j0);
    }
    return r;
}

// The flips and vertex rules that make every line of A proper (A is then an invariant), and
// the phase of A's own lines with the integer offset that lets it stand on its own.
struct part_a_form {
    std::vector<int> flip, rule;
    ex lines_phase = 0, lines_offset = 0;
};

std::optional<part_a_form> make_part_a_proper(const msum_term& t, const line_cut& c, const line_reading& r,
                                              const std::vector<bool>& is_cut) {
    std::vector<std::array<int, 3>> flips, rules;
    part_a_form a;
    for (std::size_t l = 0; l < t.lines.size(); ++l) {
        const auto& s = r.slots[l];
        bool a0 = c.in_a[s[0].vertex], a1 = c.in_a[s[1].vertex];
        if (is_cut[l]) {
            if (a0 == a1) return std::nullopt;
            continue;
        }
        if (a0 != a1) return std::nullopt;  // a line across that the cut does not name
        if (!a0) continue;
        flips.push_back({s[0].vertex, s[1].vertex, s[0].sign == s[1].sign ? 1 : 0});
        rules.push_back({s[0].vertex, s[1].vertex, r.coefficient[l].is_odd() ? 0 : 1});
        a.lines_phase += r.coefficient[l] * t.lines[l].projection;
        // Each c (m + j) is an integer, so A's phase stands on its own.
        a.lines_offset += r.coefficient[l] * r.angular[l];
    }
    auto flip = solve_parities(t.threejs.size(), flips), rule = solve_parities(t.threejs.size(), rules);
    if (!flip || !rule) return std::nullopt;
    a.flip = *flip;
    a.rule = *rule;
    return a;
}

// Per cut line: its projection, its angular momentum, its sign in A after A's flips; and the
// vertex-rule phase r_a * sign * p (with its offset) that A's rules leave on the cut lines.
struct cut_reading {
    std::vector<symbol> p;
    std::vector<ex> j;
    std::vector<int> flipped_a;
    ex rule_phase = 0, rule_offset = 0;
};

cut_reading read_cut(const msum_term& t, const line_cut& c, const line_reading& r, const part_a_form& a) {
    cut_reading cut;
    for (int l : c.lines) {
        const slot& s = c.in_a[r.slots[l][0].vertex] ? r.slots[l][0] : r.slots[l][1];
        cut.p.push_back(t.lines[l].projection);
        cut.j.push_back(r.angular[l]);
        cut.flipped_a.push_back(a.flip[s.vertex] ? -s.sign : s.sign);
        if (a.rule[s.vertex]) {
            cut.rule_phase += s.sign * t.lines[l].projection;
            cut.rule_offset += r.angular[l];
        }
    }
    return cut;
}

// One side of the cut as it is being closed: its summand, phase exponent, summed lines (with
// their angular momenta) and the renaming that joins its cut ends.
struct side {
    ex body = 1, exponent = 0;
    std::vector<std::pair<symbol, ex>> lines;
    exmap rename;
};

// The invariant of A is proportional to delta(j1, j2) (-1)^(j1 - m1') delta(m1' + m2', 0) with
// m' the flipped A entries: q = s p on the joined line.  False where the two angular momenta
// differ and neither is a name that the delta can identify with the other.
bool close_on_two_lines(const cut_reading& cut, const separation_variant& variant, side& a, side& b, exmap& identify,
                        separation& out) {
    const auto& p = cut.p;
    const auto& j = cut.j;
    out.used = &two_line_cut_identity();
    const int s = -cut.flipped_a[0] * cut.flipped_a[1];
    ex metric = j[0] - cut.flipped_a[0] * p[0];
    a.exponent += metric;
    if (variant.closing_metric) b.exponent += metric;
    a.rename[p[0]] = s * p[1];
    b.rename[p[1]] = s * p[0];
    a.lines.push_back({p[1], j[1]});
    b.lines.push_back({p[0], j[0]});
    ex kept = j[0], gone = j[1];
    if (same_value(kept, gone)) {
        out.factor = 1 / (2 * kept + 1);
        return true;
    }
    if (!is_a<symbol>(gone)) std::swap(kept, gone);
    if (!is_a<symbol>(gone)) return false;
    identify[gone] = kept;
    out.factor = kdelta(j[0], j[1]) / (2 * kept + 1);
    return true;
}

// The invariant of A is a multiple of the 3j of the cut lines, and sum(m's : 3j^2) = 1 on its
// triad: both sides are closed with that 3j, A's side on new projections.
void close_on_three_lines(const cut_reading& cut, const std::vector<symbol>& fresh, side& a, side& b, separation& out) {
    const auto& p = cut.p;
    const auto& j = cut.j;
    out.used = &three_line_cut_identity();
    ex vertex = wigner3j(j[0], j[1], j[2], cut.flipped_a[0] * p[0], cut.flipped_a[1] * p[1], cut.flipped_a[2] * p[2]);
    a.body *= vertex;
    b.body *= vertex;
    for (int k = 0; k < 3; ++k) {
        a.rename[p[k]] = fresh[k];
        a.lines.push_back({fresh[k], j[k]});
        b.lines.push_back({p[k], j[k]});
    }
    out.factor = 1;
}

// Each part keeps c (m + j) of its lines (an integer where the line's 3j are nonzero); the rest
// of the phase is free of every projection and goes in front, where the phase group finds the
// triads of both parts, which it needs.
void close_part(const side& part, const exmap& identify, ex& factor, ex& body_out, lst& indices) {
    ex body = part.body.subs(part.rename).subs(identify);
    ex x = part.exponent.subs(part.rename).subs(identify).expand();
    ex own = 0;
    for (const auto& [m, jm] : part.lines) {
        own += x.coeff(m, 1) * (m + jm.subs(identify));
        indices.append(m);
    }
    own = own.expand();
    factor *= make_phase((x - own).expand());
    body_out = body * make_phase(own);
}

}  // namespace

std::optional<separation> separate(const msum_term& t, const line_cut& c, const std::vector<symbol>& fresh,
                                   const separation_variant& variant) {
    const std::size_t n = t.threejs.size(), size = c.lines.size();
    if ((size != 2 && size != 3) || c.in_a.size() != n || (size == 3 && fresh.size() < 3)) return std::nullopt;
    const ex exponent = t.exponent.expand();
    auto lines = read_lines(t, exponent);
    if (!lines) return std::nullopt;
    std::vector<bool> is_cut(t.lines.size(), false);
    for (int l : c.lines) is_cut[l] = true;
    auto proper = make_part_a_proper(t, c, *lines, is_cut);
    if (!proper) return std::nullopt;
    const cut_reading cut = read_cut(t, c, *lines, *proper);

    side a, b;
    a.exponent = proper->lines_phase + proper->lines_offset - (cut.rule_phase + cut.rule_offset);
    b.exponent = exponent - proper->lines_phase - proper->lines_offset +
                 (variant.rule_phase ? cut.rule_phase + cut.rule_offset : 0);
    b.body = t.rest;
    for (std::size_t v = 0; v < n; ++v) (c.in_a[v] ? a.body : b.body) *= t.threejs[v];
    for (std::size_t l = 0; l < t.lines.size(); ++l) {
        if (is_cut[l]) continue;
        (c.in_a[lines->slots[l][0].vertex] ? a.lines : b.lines).push_back({t.lines[l].projection, lines->angular[l]});
    }

    separation out;
    exmap identify;
    if (size == 2) {
        if (!close_on_two_lines(cut, variant, a, b, identify, out)) return std::nullopt;
    } else {
        close_on_three_lines(cut, fresh, a, b, out);
    }
    close_part(a, identify, out.factor, out.body_a, out.indices_a);
    close_part(b, identify, out.factor, out.body_b, out.indices_b);
    return out;
}

ex joined(const separation& s) { return s.factor * make_sum(s.body_a, s.indices_a) * make_sum(s.body_b, s.indices_b); }

}  // namespace couplet::network
