#include "network/match.hpp"

#include <algorithm>
#include <cstdint>

#include "canonical/symmetries.hpp"
#include "model/same_value.hpp"
#include "model/symbols.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

bool in_list(const ex& x, const lst& l) {
    for (const ex& y : l)
        if (x.is_equal(y)) return true;
    return false;
}

// A pattern bottom entry: sign * symbol.
std::pair<symbol, int> pattern_entry(const ex& e) {
    if (is_a<symbol>(e)) return {ex_to<symbol>(e), 1};
    return {ex_to<symbol>((-e).expand()), -1};
}

class matcher {
public:
    matcher(const move& m, const msum_term& t, const move_options& options)
        : move_(m), term_(t), accept_(options.accept), options_(options) {
        orbits_.resize(t.threejs.size());  // filled when a vertex is first tried
        // Per term vertex: the summed projections it holds.  Per pattern vertex: how many
        // summed slots it has, which its image must at least match.
        for (const ex& s : t.threejs) {
            std::vector<ex> held;
            for (int c = 3; c < 6; ++c) {
                ex b = is_a<symbol>(s.op(c)) ? s.op(c) : (-s.op(c)).expand();
                if (in_list(b, t.summed)) held.push_back(b);
            }
            lines_at_.push_back(held);
        }
        for (const ex& p : m.threejs) {
            std::size_t n = 0;
            for (int c = 3; c < 6; ++c) n += in_list(pattern_entry(p.op(c)).first, m.summed);
            summed_slots_.push_back(n);
        }
        used_.assign(t.threejs.size(), false);
        chosen_.assign(m.threejs.size(), {-1, -1});
        count_lines();
    }

    std::optional<ex> run() {
        if (move_.threejs.size() > term_.threejs.size() || move_.summed.nops() > term_.lines.size())
            return std::nullopt;
        // Most moves do not fit most terms; the graph alone says so, without any symbolic work.
        std::vector<int> image(move_.threejs.size(), -1);
        if (!embeds(0, image)) return std::nullopt;
        return place(0, exmap{});
    }

private:
    // Lines between each pair of vertices (a loop counts on the diagonal), of the pattern and of
    // the term: a pattern line can only land on a term line between the images of its ends.
    void count_lines() {
        const std::size_t p = move_.threejs.size(), n = term_.threejs.size();
        pattern_lines_.assign(p, std::vector<int>(p, 0));
        for (const ex& s : move_.summed) {
            std::vector<std::size_t> at;
            for (std::size_t k = 0; k < p; ++k)
                for (int c = 3; c < 6; ++c)
                    if (ex(pattern_entry(move_.threejs[k].op(c)).first).is_equal(s)) at.push_back(k);
            if (at.size() != 2) continue;
            ++pattern_lines_[at[0]][at[1]];
            if (at[0] != at[1]) ++pattern_lines_[at[1]][at[0]];
        }
        term_lines_.assign(n, std::vector<int>(n, 0));
        for (const line& l : term_.lines) {
            if (l.ends[0] < 0 || l.ends[1] < 0) continue;
            ++term_lines_[l.ends[0]][l.ends[1]];
            if (l.ends[0] != l.ends[1]) ++term_lines_[l.ends[1]][l.ends[0]];
        }
    }

    // Whether term vertex v can be the image of pattern vertex k, given the images of 0..k-1.
    bool fits(std::size_t k, std::size_t v, const std::vector<int>& image) const {
        if (lines_at_[v].size() < summed_slots_[k] || term_lines_[v][v] < pattern_lines_[k][k]) return false;
        for (std::size_t q = 0; q < k; ++q)
            if (image[q] == static_cast<int>(v) || term_lines_[v][image[q]] < pattern_lines_[k][q]) return false;
        return true;
    }

    bool embeds(std::size_t k, std::vector<int>& image) const {
        if (k == image.size()) return true;
        for (std::size_t v = 0; v < term_.threejs.size(); ++v) {
            if (!fits(k, v, image)) continue;
            image[k] = static_cast<int>(v);
            if (embeds(k + 1, image)) return true;
        }
        image[k] = -1;
        return false;
    }

    std::optional<ex> place(std::size_t k, const exmap& binding) {
        if (++visits_ > max_visits || vetoes_ >= max_vetoes) return std::nullopt;
        if (k == move_.threejs.size()) return finish(binding);
        std::vector<int> image(k);
        for (std::size_t q = 0; q < k; ++q) image[q] = chosen_[q].first;
        for (std::size_t v = 0; v < term_.threejs.size(); ++v) {
            if (used_[v] || !fits(k, v, image) || !holds_bound_lines(move_.threejs[k], lines_at_[v], binding)) continue;
            used_[v] = true;
            if (orbits_[v].empty()) orbits_[v] = symmetry::threej_orbit(term_.threejs[v]);
            for (std::size_t o = 0; o < orbits_[v].size(); ++o) {
                exmap b = binding;
                if (!unify(move_.threejs[k], orbits_[v][o].symbol, b)) continue;
                chosen_[k] = {static_cast<int>(v), static_cast<int>(o)};
                if (auto r = place(k + 1, b)) return r;
            }
            used_[v] = false;
        }
        return std::nullopt;
    }

    // A pattern line already placed must run through the candidate vertex too.
    bool holds_bound_lines(const ex& pattern, const std::vector<ex>& candidate_lines, const exmap& b) const {
        for (int c = 3; c < 6; ++c) {
            symbol p = pattern_entry(pattern.op(c)).first;
            if (!in_list(p, move_.summed)) continue;
            auto it = b.find(p);
            if (it == b.end()) continue;
            ex bare = is_a<symbol>(it->second) ? it->second : (-it->second).expand();
            bool held = false;
            for (const ex& l : candidate_lines) held = held || l.is_equal(bare);
            if (!held) return false;
        }
        return true;
    }

    bool bind(const symbol& p, const ex& value, exmap& b) const {
        auto it = b.find(p);
        if (it == b.end()) {
            b[p] = value;
            return true;
        }
        return same_value(it->second, value);
    }

    bool unify(const ex& pattern, const ex& symbol3j, exmap& b) const {
        for (int c = 0; c < 3; ++c)
            if (!bind(ex_to<symbol>(pattern.op(c)), symbol3j.op(c), b)) return false;
        for (int c = 0; c < 3; ++c) {
            auto [p, sign] = pattern_entry(pattern.op(3 + c));
            ex value = (sign * symbol3j.op(3 + c)).expand();
            if (in_list(p, move_.summed)) {
                // A summed pattern projection lands on a summed projection of the term.
                ex bare = is_a<symbol>(value) ? value : (-value).expand();
                if (!is_a<symbol>(bare) || !in_list(bare, term_.summed)) return false;
            }
            if (!bind(p, value, b)) return false;
        }
        return true;
    }

    std::optional<ex> finish(exmap b) {
        if (options_.where && !options_.where(b)) return std::nullopt;
        lst eliminated;
        for (const ex& p : move_.summed) {
            ex v = b.at(p);
            ex bare = is_a<symbol>(v) ? v : (-v).expand();
            if (in_list(bare, eliminated)) return std::nullopt;
            eliminated.append(bare);
        }
        // sum_term = (-1)^(E + orbit phases) * product of arranged 3j * unmatched
        ex exponent = term_.exponent;
        for (const auto& [v, o] : chosen_) exponent += orbits_[v][o].phase;
        exponent = (exponent - move_.phase.subs(b)).expand();
        std::uint64_t used_vertices = 0;
        auto residue = free_of(exponent, eliminated, used_vertices);
        if (!residue) return std::nullopt;

        lst introduced_projections;
        if (!bind_introduced(b, introduced_projections)) return std::nullopt;
        ex body = term_.rest * make_phase(*residue) * move_.result.subs(b);
        std::vector<bool> matched(term_.threejs.size(), false);
        for (const auto& [v, o] : chosen_) matched[v] = true;
        for (std::size_t v = 0; v < term_.threejs.size(); ++v)
            if (!matched[v]) body *= term_.threejs[v];
        // The residue used m1+m2+m3 = 0 of these vertices, an integer only where their triad
        // holds; a consumed vertex leaves its triad behind (the term vanishes without it) so
        // that the phase stays an integer wherever the result's factors allow.
        for (std::size_t v = 0; v < term_.threejs.size(); ++v) {
            const ex& t = term_.threejs[v];
            if (matched[v] && (used_vertices & (std::uint64_t(1) << v)) && !triad_present(body, t))
                body *= triangle(t.op(0), t.op(1), t.op(2));
        }
        lst remaining;
        for (const ex& i : term_.summed)
            if (!in_list(i, eliminated)) remaining.append(i);
        for (const ex& i : introduced_projections) remaining.append(i);
        auto out = close_sum(body, remaining);
        if (out && move_.introduced_angular.nops() > 0) {
            lst outer;
            for (const ex& x : move_.introduced_angular) outer.append(b.at(x));
            out = make_sum(*out, outer);
        }
        if (out && accept_ && !accept_(*out)) {
            ++vetoes_;
            return std::nullopt;
        }
        return out;
    }

    // The caller's fresh names for the symbols the result introduces.
    bool bind_introduced(exmap& b, lst& projections) const {
        std::size_t k = 0;
        for (const lst* l : {&move_.introduced_angular, &move_.introduced_projections})
            for (const ex& p : *l) {
                if (k == options_.fresh.size()) return false;
                b[p] = options_.fresh[k];
                if (l == &move_.introduced_projections) projections.append(options_.fresh[k]);
                ++k;
            }
        return true;
    }

    // The exponent rewritten free of the eliminated projections, if the vertex rules allow.
    std::optional<ex> free_of(const ex& exponent, const lst& eliminated, std::uint64_t& chosen) const {
        const std::size_t n = term_.threejs.size();
        if (n > 63) return std::nullopt;
        std::vector<ex> vertex_sum(n);
        for (std::size_t v = 0; v < n; ++v)
            vertex_sum[v] = (term_.threejs[v].op(3) + term_.threejs[v].op(4) + term_.threejs[v].op(5)).expand();
        // Rows: one equation per eliminated projection, over GF(2): which vertex sums to add.
        struct row {
            std::uint64_t vertices = 0;
            bool target = false;
        };
        std::vector<row> rows;
        for (const ex& m : eliminated) {
            row r;
            numeric c = ex_to<numeric>(exponent.coeff(m, 1));
            if (!c.is_integer()) return std::nullopt;
            r.target = c.is_odd();
            for (std::size_t v = 0; v < n; ++v) {
                ex cv = vertex_sum[v].coeff(m, 1);
                if (!is_a<numeric>(cv) || !ex_to<numeric>(cv).is_integer()) return std::nullopt;
                if (ex_to<numeric>(cv).is_odd()) r.vertices |= std::uint64_t(1) << v;
            }
            rows.push_back(r);
        }
        chosen = 0;
        std::vector<std::size_t> pivots;
        std::size_t rank = 0;
        for (std::size_t v = 0; v < n && rank < rows.size(); ++v) {
            std::uint64_t bit = std::uint64_t(1) << v;
            std::size_t r = rank;
            while (r < rows.size() && !(rows[r].vertices & bit)) ++r;
            if (r == rows.size()) continue;
            std::swap(rows[r], rows[rank]);
            for (std::size_t q = 0; q < rows.size(); ++q)
                if (q != rank && (rows[q].vertices & bit)) {
                    rows[q].vertices ^= rows[rank].vertices;
                    rows[q].target ^= rows[rank].target;
                }
            pivots.push_back(v);
            ++rank;
        }
        for (std::size_t r = rank; r < rows.size(); ++r)
            if (rows[r].target) return std::nullopt;
        for (std::size_t r = 0; r < rank; ++r)
            if (rows[r].target) chosen |= std::uint64_t(1) << pivots[r];
        ex x = exponent;
        for (std::size_t v = 0; v < n; ++v)
            if (chosen & (std::uint64_t(1) << v)) x -= vertex_sum[v];  // each vertex sum is 0
        x = x.expand();
        // Now every eliminated projection has an even coefficient: (-1)^(2m) = (-1)^(2j).
        for (const ex& m : eliminated) {
            ex c = x.coeff(m, 1);
            if (!is_a<numeric>(c) || !ex_to<numeric>(c).is_even()) return std::nullopt;
            const line* l = nullptr;
            for (const auto& candidate : term_.lines)
                if (ex(candidate.projection).is_equal(m)) l = &candidate;
            if (!l) return std::nullopt;
            x = (x - c * m + c * l->angular).expand();
        }
        return x;
    }

    std::optional<ex> close_sum(ex body, lst remaining) const {
        // Deltas between a remaining index and anything else: substitute and drop the index,
        // provided the index still sits in a 3j, whose selection rules then keep its range.
        bool changed = true;
        while (changed) {
            changed = false;
            exvector factors;
            if (is_a<mul>(body))
                for (const ex& f : body) factors.push_back(f);
            else
                factors.push_back(body);
            for (std::size_t k = 0; k < factors.size() && !changed; ++k) {
                if (kind_of(factors[k]) != symbol_kind::delta) continue;
                for (int side = 0; side < 2 && !changed; ++side) {
                    const ex& index = factors[k].op(side);
                    const ex& other = factors[k].op(1 - side);
                    if (!in_list(index, remaining) || other.has(index)) continue;
                    ex rest = 1;
                    for (std::size_t q = 0; q < factors.size(); ++q)
                        if (q != k) rest *= factors[q];
                    if (!sits_in_threej(rest, index)) continue;
                    body = rest.subs(index == other);
                    lst kept;
                    for (const ex& i : remaining)
                        if (!i.is_equal(index)) kept.append(i);
                    remaining = kept;
                    changed = true;
                }
            }
        }
        // A delta between two free names: the second becomes the first everywhere else.
        body = identify_delta_sides(body, remaining);
        // An index the summand no longer involves contributes the size of its range, 2j+1.
        lst kept;
        for (const ex& i : remaining) {
            if (body.has(i)) {
                kept.append(i);
                continue;
            }
            for (const auto& l : term_.lines)
                if (ex(l.projection).is_equal(i)) body *= 2 * l.angular + 1;
        }
        // An index left outside every 3j has lost the range its 3j gave it: not this way.
        for (const ex& i : kept)
            if (!sits_in_threej(body, i)) return std::nullopt;
        if (kept.nops() == 0) return body;
        return make_sum(body, kept);
    }

    // Whether a factor of e already demands the triad of the 3j t.
    static bool triad_present(const ex& e, const ex& t) {
        auto same_triad = [&](const ex& a, const ex& b, const ex& c) {
            exvector x{t.op(0), t.op(1), t.op(2)}, y{a, b, c};
            std::sort(x.begin(), x.end(), ex_is_less());
            std::sort(y.begin(), y.end(), ex_is_less());
            for (int k = 0; k < 3; ++k)
                if (!same_value(x[k], y[k])) return false;
            return true;
        };
        for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
            const ex& f = *it;
            switch (kind_of(f)) {
                case symbol_kind::threej:
                case symbol_kind::triangle:
                    if (same_triad(f.op(0), f.op(1), f.op(2))) return true;
                    break;
                case symbol_kind::sixj:
                    // {a b c; d e f}: triads (abc) (aef) (dbf) (dec).
                    if (same_triad(f.op(0), f.op(1), f.op(2)) || same_triad(f.op(0), f.op(4), f.op(5)) ||
                        same_triad(f.op(3), f.op(1), f.op(5)) || same_triad(f.op(3), f.op(4), f.op(2)))
                        return true;
                    break;
                default:
                    break;
            }
        }
        return false;
    }

    static ex identify_delta_sides(const ex& body, const lst& remaining) {
        if (!is_a<mul>(body)) return body;
        exvector factors(body.begin(), body.end());
        for (std::size_t k = 0; k < factors.size(); ++k) {
            if (kind_of(factors[k]) != symbol_kind::delta) continue;
            ex x = factors[k].op(0), y = factors[k].op(1);
            if (!is_a<symbol>(x) && !is_a<symbol>(y)) {
                x = (-x).expand();  // delta(-x, -y) is delta(x, y)
                y = (-y).expand();
            }
            if (!is_a<symbol>(x) || !is_a<symbol>(y)) continue;
            if (in_list(x, remaining) || in_list(y, remaining)) continue;
            ex rest = 1;
            for (std::size_t q = 0; q < factors.size(); ++q)
                if (q != k) rest *= factors[q];
            return identify_delta_sides(rest.subs(y == x), remaining) * kdelta(x, y);
        }
        return body;
    }

    static bool sits_in_threej(const ex& e, const ex& index) {
        for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
            if (kind_of(*it) == symbol_kind::threej && it->has(index)) return true;
        return false;
    }

    const move& move_;
    const msum_term& term_;
    const result_check& accept_;
    const move_options& options_;
    std::vector<std::vector<symmetry::transformed>> orbits_;
    std::vector<std::vector<ex>> lines_at_;
    std::vector<std::size_t> summed_slots_;
    std::vector<bool> used_;
    std::vector<std::pair<int, int>> chosen_;
    std::vector<std::vector<int>> pattern_lines_, term_lines_;
    long visits_ = 0;
    int vetoes_ = 0;
    // The search is bounded: a vetoed result is usually vetoed in every arrangement.
    static constexpr long max_visits = 5000;
    static constexpr int max_vetoes = 3;
};

}  // namespace

std::optional<ex> apply_move(const move& m, const msum_term& term, const result_check& accept) {
    move_options options;
    options.accept = accept;
    return matcher(m, term, options).run();
}

std::optional<ex> apply_move(const move& m, const msum_term& term, const move_options& options) {
    return matcher(m, term, options).run();
}

}  // namespace couplet::network
