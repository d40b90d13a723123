#include "phase/bounded_projections.hpp"

#include <cln/rational.h>

#include <optional>
#include <utility>

namespace couplet::phase::detail {

namespace {

using rational_form = std::vector<cln::cl_RA>;  // coefficients over x = u_B - v0

// "f(x) is an integer" (exact = false) or "f(x) == 0" as a row over (u, 1).
std::optional<integer_constraint> to_row(const rational_form& f, bool exact, std::size_t n,
                                         const std::vector<bounded_coordinate>& bounded, const int_vector& v0) {
    cln::cl_I scale = 1;
    bool has_terms = false;
    for (const auto& c : f) {
        scale = cln::lcm(scale, cln::denominator(c));
        has_terms = has_terms || !cln::zerop(c);
    }
    if (exact ? !has_terms : scale == 1) return std::nullopt;
    integer_constraint row;
    row.row.assign(n + 1, 0);
    cln::cl_I constant = 0;
    for (std::size_t a = 0; a < f.size(); ++a) {
        const cln::cl_I c = cln::numerator(f[a] * scale);
        row.row[bounded[a].index] = c;
        constant = constant - c * cln::cl_I(static_cast<long>(v0[a]));
    }
    row.row[n] = constant;
    row.modulus = exact ? cln::cl_I(0) : scale;
    return row;
}

bool holds_on(const integer_constraint& c, const affine_lattice& points, std::size_t n) {
    auto fits = [&](const cln::cl_I& s) {
        return cln::zerop(c.modulus) ? cln::zerop(s) : cln::zerop(cln::mod(s, c.modulus));
    };
    cln::cl_I at_origin = c.row[n];
    for (std::size_t i = 0; i < n; ++i)
        at_origin = at_origin + c.row[i] * cln::cl_I(static_cast<long>(points.origin[i]));
    if (!fits(at_origin)) return false;
    for (const auto& b : points.basis) {
        cln::cl_I along = 0;
        for (std::size_t i = 0; i < n; ++i) along = along + c.row[i] * cln::cl_I(static_cast<long>(b[i]));
        if (!fits(along)) return false;
    }
    return true;
}

// Every combination of bounded values the congruences and equations allow, in doubled units.
std::vector<int_vector> admitted_boxes(std::size_t n, const std::vector<integer_constraint>& constraints,
                                       const std::vector<bounded_coordinate>& bounded) {
    const std::size_t k = bounded.size();
    std::vector<int_vector> admitted;
    // u = 2m and m - J is an integer, so u runs over -2J, -2J + 2, ..., 2J.
    int_vector v(k);
    for (std::size_t a = 0; a < k; ++a) v[a] = -bounded[a].twice_bound;
    for (;;) {
        std::vector<integer_constraint> pinned = constraints;
        for (std::size_t a = 0; a < k; ++a) {
            integer_constraint c;
            c.row.assign(n + 1, 0);
            c.row[bounded[a].index] = 1;
            c.row[n] = -v[a];
            c.modulus = 0;
            pinned.push_back(std::move(c));
        }
        if (!solve_affine_lattice(n, pinned).empty) admitted.push_back(v);
        std::size_t a = 0;
        while (a < k && v[a] + 2 > bounded[a].twice_bound) {
            v[a] = -bounded[a].twice_bound;
            ++a;
        }
        if (a == k) break;
        v[a] += 2;
    }
    return admitted;
}

}  // namespace

std::vector<integer_constraint> bound_constraints(std::size_t n, const std::vector<integer_constraint>& constraints,
                                                  const std::vector<bounded_coordinate>& bounded) {
    if (bounded.empty()) return {};
    std::int64_t box = 1;
    for (const auto& b : bounded) {
        if (b.twice_bound < 0 || b.twice_bound + 1 > largest_enumerated_box / box) return {};
        box *= b.twice_bound + 1;
    }
    const affine_lattice all = solve_affine_lattice(n, constraints);
    if (all.empty) return {};
    const std::vector<int_vector> admitted = admitted_boxes(n, constraints, bounded);
    if (admitted.empty()) return {};

    // The affine hull of the admitted values: v0 + the lattice of their differences, whose
    // echelon basis h_1..h_r (pivot rows p_1 < ... < p_r) writes x = v - v0 = sum t_j h_j with
    // t_j = (x_{p_j} - sum_{l<j} t_l h_l[p_j]) / h_j[p_j].  x lies in it exactly when every t_j
    // is an integer and the rows without a pivot match.
    const std::size_t k = bounded.size();
    const int_vector& v0 = admitted.front();
    column_matrix hull;
    for (std::size_t p = 1; p < admitted.size(); ++p) {
        big_vector d(k);
        for (std::size_t a = 0; a < k; ++a) d[a] = admitted[p][a] - v0[a];
        hull.columns.push_back(std::move(d));
    }
    const std::vector<std::size_t> pivot_rows = column_echelon(hull, nullptr);
    std::vector<rational_form> t;
    std::vector<std::optional<integer_constraint>> rows;
    for (std::size_t j = 0; j < pivot_rows.size(); ++j) {
        const std::size_t p = pivot_rows[j];
        rational_form f(k, cln::cl_RA(0));
        f[p] = cln::cl_RA(1);
        for (std::size_t l = 0; l < j; ++l)
            for (std::size_t a = 0; a < k; ++a) f[a] = f[a] - hull.columns[l][p] * t[l][a];
        for (auto& c : f) c = c / hull.columns[j][p];
        rows.push_back(to_row(f, false, n, bounded, v0));
        t.push_back(std::move(f));
    }
    for (std::size_t i = 0, j = 0; i < k; ++i) {
        if (j < pivot_rows.size() && pivot_rows[j] == i) {
            ++j;
            continue;
        }
        rational_form f(k, cln::cl_RA(0));
        f[i] = cln::cl_RA(1);
        for (std::size_t l = 0; l < pivot_rows.size(); ++l)
            for (std::size_t a = 0; a < k; ++a) f[a] = f[a] - hull.columns[l][i] * t[l][a];
        rows.push_back(to_row(f, true, n, bounded, v0));
    }
    std::vector<integer_constraint> cuts;
    for (auto& r : rows)
        if (r && !holds_on(*r, all, n)) cuts.push_back(std::move(*r));
    return cuts;
}

}  // namespace couplet::phase::detail
