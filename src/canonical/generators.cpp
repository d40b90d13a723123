// The generating symmetries as named transformations, each with its reference; the tests
// check every one by exact evaluation at random admissible points.
#include "canonical/symmetries.hpp"
#include "model/symbols.hpp"

namespace couplet::symmetry {

using namespace GiNaC;

namespace {

ex threej_sum(const ex& s) { return s.op(0) + s.op(1) + s.op(2); }

transformed threej_cyclic(const ex& s) { return {wigner3j(s.op(1), s.op(2), s.op(0), s.op(4), s.op(5), s.op(3)), 0}; }
transformed threej_swap_first_two(const ex& s) {
    return {wigner3j(s.op(1), s.op(0), s.op(2), s.op(4), s.op(3), s.op(5)), threej_sum(s)};
}
transformed threej_reverse_projections(const ex& s) {
    return {wigner3j(s.op(0), s.op(1), s.op(2), -s.op(3), -s.op(4), -s.op(5)), threej_sum(s)};
}
// Regge's square  [ -j1+j2+j3  j1-j2+j3  j1+j2-j3 ; j1-m1 j2-m2 j3-m3 ; j1+m1 j2+m2 j3+m3 ]
// is invariant under transposition; read back, column k gives j = (row2+row3)/2 and
// m = (row3-row2)/2.  From memory; the tests confirm it exactly.
transformed threej_regge(const ex& s) {
    const ex &j1 = s.op(0), &j2 = s.op(1), &j3 = s.op(2), &m1 = s.op(3), &m2 = s.op(4), &m3 = s.op(5);
    ex r[3][3] = {
        {-j1 + j2 + j3, j1 - j2 + j3, j1 + j2 - j3}, {j1 - m1, j2 - m2, j3 - m3}, {j1 + m1, j2 + m2, j3 + m3}};
    // Transposed square: row k of the old square becomes column k.
    exvector j(3), m(3);
    for (int k = 0; k < 3; ++k) {
        j[k] = ((r[k][1] + r[k][2]) / 2).expand();
        m[k] = ((r[k][2] - r[k][1]) / 2).expand();
    }
    return {wigner3j(j[0], j[1], j[2], m[0], m[1], m[2]), 0};
}

transformed sixj_column_cycle(const ex& s) {
    return {wigner6j(s.op(1), s.op(2), s.op(0), s.op(4), s.op(5), s.op(3)), 0};
}
transformed sixj_column_swap(const ex& s) {
    return {wigner6j(s.op(1), s.op(0), s.op(2), s.op(4), s.op(3), s.op(5)), 0};
}
transformed sixj_exchange_rows_in_two_columns(const ex& s) {
    return {wigner6j(s.op(3), s.op(4), s.op(2), s.op(0), s.op(1), s.op(5)), 0};
}
// {a b c; d e f} = {a, s-b, s-c; d, s-e, s-f} with s = (b+c+e+f)/2.  From memory; the tests
// confirm it exactly.
transformed sixj_regge(const ex& x) {
    ex s = (x.op(1) + x.op(2) + x.op(4) + x.op(5)) / 2;
    return {wigner6j(x.op(0), (s - x.op(1)).expand(), (s - x.op(2)).expand(), x.op(3), (s - x.op(4)).expand(),
                     (s - x.op(5)).expand()),
            0};
}

ex ninej_sum(const ex& s) {
    ex t = 0;
    for (std::size_t k = 0; k < 9; ++k) t += s.op(k);
    return t;
}
transformed ninej_transpose(const ex& s) {
    return {wigner9j(s.op(0), s.op(3), s.op(6), s.op(1), s.op(4), s.op(7), s.op(2), s.op(5), s.op(8)), 0};
}
transformed ninej_row_cycle(const ex& s) {
    return {wigner9j(s.op(3), s.op(4), s.op(5), s.op(6), s.op(7), s.op(8), s.op(0), s.op(1), s.op(2)), 0};
}
transformed ninej_row_swap(const ex& s) {
    return {wigner9j(s.op(3), s.op(4), s.op(5), s.op(0), s.op(1), s.op(2), s.op(6), s.op(7), s.op(8)), ninej_sum(s)};
}
transformed ninej_column_swap(const ex& s) {
    return {wigner9j(s.op(1), s.op(0), s.op(2), s.op(4), s.op(3), s.op(5), s.op(7), s.op(6), s.op(8)), ninej_sum(s)};
}

}  // namespace

const std::vector<named_symmetry>& threej_symmetries() {
    static const std::vector<named_symmetry> s{
        {"3j cyclic permutation of the columns", "DLMF 34.3.8", threej_cyclic},
        {"3j exchange of two columns", "DLMF 34.3.9", threej_swap_first_two},
        {"3j reversal of the projections", "DLMF 34.3.10", threej_reverse_projections},
        {"3j Regge transposition", "DLMF 34.3.11", threej_regge},
    };
    return s;
}

const std::vector<named_symmetry>& sixj_symmetries() {
    static const std::vector<named_symmetry> s{
        {"6j cyclic permutation of the columns", "DLMF 34.5.8", sixj_column_cycle},
        {"6j exchange of two columns", "DLMF 34.5.8", sixj_column_swap},
        {"6j exchange of upper and lower entries in two columns", "DLMF 34.5.8", sixj_exchange_rows_in_two_columns},
        {"6j Regge symmetry", "DLMF 34.5.9", sixj_regge},
    };
    return s;
}

const std::vector<named_symmetry>& ninej_symmetries() {
    static const std::vector<named_symmetry> s{
        {"9j transposition", "DLMF 34.7(ii)", ninej_transpose},
        {"9j cyclic permutation of the rows", "DLMF 34.7(ii)", ninej_row_cycle},
        {"9j exchange of two rows", "DLMF 34.7(ii)", ninej_row_swap},
        {"9j exchange of two columns", "DLMF 34.7(ii)", ninej_column_swap},
    };
    return s;
}

}  // namespace couplet::symmetry
