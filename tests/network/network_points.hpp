// Random points for checking an m-sum identity exactly: values for the free quantum numbers of
// an expression such that every 3j top row of free j's is a triad (assigned one j at a time with
// backtracking), and each free projection lies in the range of a j whose column it fills, chosen
// where possible so that each 3j bottom row of free projections sums to zero (points where the
// symbols can be nonzero, so that the comparison tests something).
#pragma once

#include "exact/admissibility.hpp"

#include <ginac/ginac.h>

#include <algorithm>
#include <array>
#include <map>
#include <optional>
#include <random>
#include <set>
#include <vector>

#include "canonical/symmetries.hpp"
#include "eval/evaluate.hpp"
#include "model/quantum.hpp"
#include "model/symbols.hpp"

namespace couplet::testing {

class network_points {
public:
    // CG symbols count as their 3j (DLMF 34.1.1) for finding triads and columns.
    network_points(const GiNaC::ex& e, const quantum_numbers& numbers, unsigned seed, int twice_max)
        : rng_(seed), max_(twice_max) {
        std::set<GiNaC::ex, GiNaC::ex_is_less> bound;
        collect(symmetry::canonicalize_symbols(e, numbers), bound);
        for (const auto& q : numbers.all()) {
            if (!e.has(q.symbol) || bound.count(q.symbol)) continue;
            (q.role == qn_role::projection ? projections_ : angulars_).push_back(q.symbol);
        }
        for (const auto& t : threejs_) {
            std::array<int, 3> triad{}, row{};
            std::array<int, 3> sign{};
            bool plain = true, free_row = true;
            for (int c = 0; c < 3; ++c) {
                triad[c] = index_of(angulars_, t.op(c));
                plain = plain && triad[c] >= 0;
                GiNaC::ex m = t.op(3 + c);
                sign[c] = index_of(projections_, m) >= 0 ? 1 : -1;
                row[c] = index_of(projections_, sign[c] * m);
                if (m.is_zero()) row[c] = -2;
                free_row = free_row && row[c] != -1;
                if (row[c] >= 0 && triad[c] >= 0 && !owner_.count(row[c])) owner_[row[c]] = triad[c];
            }
            if (plain) triads_.push_back(triad);
            if (free_row) rows_.push_back({row, sign});
        }
    }

    std::optional<assignment> next() {
        for (int attempt = 0; attempt < 200; ++attempt) {
            std::vector<int> j(angulars_.size(), -1);
            if (!assign_angular(j, 0)) continue;
            for (int tries = 0; tries < 200; ++tries) {
                std::vector<int> m(projections_.size(), 0);
                bool ok = true;
                for (std::size_t k = 0; k < m.size() && ok; ++k) {
                    auto it = owner_.find(static_cast<int>(k));
                    if (it == owner_.end())
                        ok = false;
                    else
                        m[k] = -j[it->second] + 2 * uniform(0, j[it->second]);
                }
                if (!ok) break;
                if (tries < 199 && !rows_vanish(m)) continue;
                assignment at;
                for (std::size_t k = 0; k < j.size(); ++k) at[angulars_[k]] = GiNaC::numeric(j[k], 2);
                for (std::size_t k = 0; k < m.size(); ++k) at[projections_[k]] = GiNaC::numeric(m[k], 2);
                return at;
            }
        }
        return std::nullopt;
    }

private:
    static int index_of(const std::vector<GiNaC::symbol>& v, const GiNaC::ex& x) {
        for (std::size_t k = 0; k < v.size(); ++k)
            if (GiNaC::ex(v[k]).is_equal(x)) return static_cast<int>(k);
        return -1;
    }

    void collect(const GiNaC::ex& e, std::set<GiNaC::ex, GiNaC::ex_is_less>& bound) {
        if (GiNaC::is_a<index_sum>(e))
            for (const auto& i : GiNaC::ex_to<index_sum>(e).indices()) bound.insert(i);
        if (kind_of(e) == symbol_kind::threej) threejs_.push_back(e);
        for (std::size_t k = 0; k < e.nops(); ++k) collect(e.op(k), bound);
    }

    // Doubled arguments, as exact::triangle takes them.
    static bool fits(int a, int b, int c) { return exact::triangle(a, b, c); }

    bool assign_angular(std::vector<int>& j, std::size_t k) {
        if (k == j.size()) return true;
        std::vector<int> values(max_ + 1);
        for (int v = 0; v <= max_; ++v) values[v] = v;
        std::shuffle(values.begin(), values.end(), rng_);
        for (int v : values) {
            j[k] = v;
            bool ok = true;
            for (const auto& t : triads_) {
                if (j[t[0]] < 0 || j[t[1]] < 0 || j[t[2]] < 0) continue;
                if (!fits(j[t[0]], j[t[1]], j[t[2]])) {
                    ok = false;
                    break;
                }
            }
            if (ok && assign_angular(j, k + 1)) return true;
        }
        j[k] = -1;
        return false;
    }

    bool rows_vanish(const std::vector<int>& m) const {
        for (const auto& [row, sign] : rows_) {
            int s = 0;
            for (int c = 0; c < 3; ++c)
                if (row[c] >= 0) s += sign[c] * m[row[c]];
            if (s != 0) return false;
        }
        return true;
    }

    int uniform(int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng_); }

    std::mt19937 rng_;
    int max_;
    std::vector<GiNaC::ex> threejs_;
    std::vector<GiNaC::symbol> angulars_, projections_;
    std::vector<std::array<int, 3>> triads_;
    std::vector<std::pair<std::array<int, 3>, std::array<int, 3>>> rows_;
    std::map<int, int> owner_;  // projection -> angular momentum of a column it fills
};

// How many random points were drawn, at how many the two sides agree exactly, and how many
// of those were nonzero.  (Named apart from rules/jsum_check.hpp's compare_at_points: two
// inline functions with one signature in one program would be an ODR violation.)
struct agreement {
    int points = 0, equal = 0, nonzero = 0;
};

inline agreement network_agreement_at_points(const GiNaC::ex& lhs, const GiNaC::ex& rhs, const quantum_numbers& numbers,
                                             unsigned seed, int samples, int twice_max) {
    compiled_expression left(lhs, numbers), right(rhs, numbers);
    network_points points(lhs, numbers, seed, twice_max);
    agreement a;
    for (int k = 0; k < samples; ++k) {
        auto at = points.next();
        if (!at) break;
        ++a.points;
        auto x = left.at(*at);
        if (x == right.at(*at)) ++a.equal;
        if (!x.is_zero()) ++a.nonzero;
    }
    return a;
}

}  // namespace couplet::testing
