// Integer solutions of congruences and exact equations: the set of admissible doubled quantum
// numbers, as an origin plus an integer basis.
#pragma once

#include <cln/integer.h>

#include <cstddef>
#include <cstdint>
#include <vector>

namespace couplet::phase::detail {

using int_vector = std::vector<std::int64_t>;

// row . (u, 1) == 0 (mod modulus); modulus 0 asks for exact equality.  row has n + 1 entries,
// the last one multiplying the constant 1.
struct integer_constraint {
    std::vector<cln::cl_I> row;
    cln::cl_I modulus;
};

// {origin + sum_k t_k basis[k] : t in Z^r}; the basis vectors are linearly independent and in
// Hermite form, which keeps their entries and the origin small.
struct affine_lattice {
    bool empty = true;
    int_vector origin;
    std::vector<int_vector> basis;
};

using big_vector = std::vector<cln::cl_I>;

// A matrix kept as columns, because every operation on it is a column operation.
struct column_matrix {
    std::vector<big_vector> columns;
};

// Unimodular column operations (Euclid along each row) bringing `work` to column echelon form,
// so its columns keep generating the same lattice; `companion` receives the same operations (it
// may be empty).  Returns, for each pivot column in order, its pivot row; the columns after the
// pivot columns are zero.
std::vector<std::size_t> column_echelon(column_matrix& work, column_matrix* companion);

// Throws std::overflow_error when a reduced entry does not fit in 62 bits.
affine_lattice solve_affine_lattice(std::size_t n, const std::vector<integer_constraint>& constraints);

// Converts with a range check (CLN's own conversion silently wraps).
std::int64_t to_int64(const cln::cl_I& x);

}  // namespace couplet::phase::detail
