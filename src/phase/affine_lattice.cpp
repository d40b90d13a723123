#include "phase/affine_lattice.hpp"

#include <stdexcept>
#include <utility>

namespace couplet::phase::detail {

namespace {

void subtract_multiple(big_vector& target, const cln::cl_I& factor, const big_vector& source) {
    if (cln::zerop(factor)) return;
    // The columns, and the transform's above all, are mostly zero: skip those entries.
    for (std::size_t i = 0; i < target.size(); ++i)
        if (!cln::zerop(source[i])) target[i] = target[i] - factor * source[i];
}

void negate(big_vector& v) {
    for (auto& x : v) x = -x;
}

}  // namespace

std::vector<std::size_t> column_echelon(column_matrix& work, column_matrix* companion) {
    const std::size_t cols = work.columns.size();
    const std::size_t rows = cols == 0 ? 0 : work.columns[0].size();
    std::vector<std::size_t> pivot_rows;
    std::size_t next = 0;
    auto swap_columns = [&](std::size_t a, std::size_t b) {
        std::swap(work.columns[a], work.columns[b]);
        if (companion) std::swap(companion->columns[a], companion->columns[b]);
    };
    auto reduce_column = [&](std::size_t target, const cln::cl_I& factor, std::size_t source) {
        subtract_multiple(work.columns[target], factor, work.columns[source]);
        if (companion) subtract_multiple(companion->columns[target], factor, companion->columns[source]);
    };
    for (std::size_t i = 0; i < rows && next < cols; ++i) {
        for (;;) {
            // Euclid across the row: the smallest nonzero entry divides the others away.
            std::size_t best = cols;
            for (std::size_t j = next; j < cols; ++j) {
                const cln::cl_I& x = work.columns[j][i];
                if (cln::zerop(x)) continue;
                if (best == cols || cln::abs(x) < cln::abs(work.columns[best][i])) best = j;
            }
            if (best == cols) break;
            swap_columns(best, next);
            bool cleared = true;
            for (std::size_t j = next + 1; j < cols; ++j) {
                if (cln::zerop(work.columns[j][i])) continue;
                reduce_column(j, cln::floor1(work.columns[j][i], work.columns[next][i]), next);
                if (!cln::zerop(work.columns[j][i])) cleared = false;
            }
            if (cleared) break;
        }
        if (next < cols && !cln::zerop(work.columns[next][i])) {
            if (cln::minusp(work.columns[next][i])) {
                negate(work.columns[next]);
                if (companion) negate(companion->columns[next]);
            }
            pivot_rows.push_back(i);
            ++next;
        }
    }
    return pivot_rows;
}

namespace {

int_vector to_int_vector(const big_vector& v) {
    int_vector out;
    out.reserve(v.size());
    for (const auto& x : v) out.push_back(to_int64(x));
    return out;
}

}  // namespace

std::int64_t to_int64(const cln::cl_I& x) {
    if (cln::integer_length(x) > 62) throw std::overflow_error("phase: lattice entry too large for 64-bit arithmetic");
    return cln::cl_I_to_long(x);
}

affine_lattice solve_affine_lattice(std::size_t n, const std::vector<integer_constraint>& constraints) {
    // Unknowns: u (n of them) and one quotient t_k per congruence, so that every constraint
    // becomes an exact equation  row_u . u - modulus * t_k = -row_const.
    std::size_t congruences = 0;
    for (const auto& c : constraints)
        if (!cln::zerop(c.modulus)) ++congruences;
    const std::size_t unknowns = n + congruences;
    const std::size_t rows = constraints.size();

    column_matrix work, transform;
    work.columns.assign(unknowns, big_vector(rows, 0));
    transform.columns.assign(unknowns, big_vector(unknowns, 0));
    for (std::size_t j = 0; j < unknowns; ++j) transform.columns[j][j] = 1;
    big_vector rhs(rows, 0);
    std::size_t quotient = n;
    for (std::size_t i = 0; i < rows; ++i) {
        const auto& c = constraints[i];
        if (c.row.size() != n + 1) throw std::invalid_argument("phase: constraint row has wrong size");
        for (std::size_t j = 0; j < n; ++j) work.columns[j][i] = c.row[j];
        rhs[i] = -c.row[n];
        if (!cln::zerop(c.modulus)) work.columns[quotient++][i] = -c.modulus;
    }

    const std::vector<std::size_t> pivot_rows = column_echelon(work, &transform);
    const std::size_t rank = pivot_rows.size();

    // Forward substitution in the echelon form, then a check of the rows without pivots.
    big_vector y(rank, 0);
    for (std::size_t k = 0; k < rank; ++k) {
        const std::size_t i = pivot_rows[k];
        cln::cl_I s = rhs[i];
        for (std::size_t l = 0; l < k; ++l) s = s - work.columns[l][i] * y[l];
        const cln::cl_I& p = work.columns[k][i];
        if (!cln::zerop(cln::mod(s, p))) return {};
        y[k] = cln::exquo(s, p);
    }
    for (std::size_t i = 0; i < rows; ++i) {
        cln::cl_I s = 0;
        for (std::size_t l = 0; l < rank; ++l) s = s + work.columns[l][i] * y[l];
        if (s != rhs[i]) return {};
    }

    big_vector origin(n, 0);
    for (std::size_t l = 0; l < rank; ++l)
        for (std::size_t j = 0; j < n; ++j) origin[j] = origin[j] + y[l] * transform.columns[l][j];

    // The quotients t are functions of u, so projecting the kernel onto u keeps it independent.
    column_matrix basis;
    for (std::size_t l = rank; l < unknowns; ++l)
        basis.columns.emplace_back(transform.columns[l].begin(), transform.columns[l].begin() + n);
    const std::vector<std::size_t> basis_pivots = column_echelon(basis, nullptr);
    if (basis_pivots.size() != basis.columns.size())
        throw std::logic_error("phase: solution lattice basis is dependent");
    // Hermite reduction: entries beside each pivot, and the origin, modulo the pivot.
    for (std::size_t k = 0; k < basis_pivots.size(); ++k) {
        const std::size_t i = basis_pivots[k];
        const cln::cl_I& p = basis.columns[k][i];
        for (std::size_t l = 0; l < k; ++l)
            subtract_multiple(basis.columns[l], cln::floor1(basis.columns[l][i], p), basis.columns[k]);
        subtract_multiple(origin, cln::floor1(origin[i], p), basis.columns[k]);
    }

    affine_lattice result;
    result.empty = false;
    result.origin = to_int_vector(origin);
    for (const auto& b : basis.columns) result.basis.push_back(to_int_vector(b));
    return result;
}

}  // namespace couplet::phase::detail
