// The m-sum acceptance inputs, each written away from its textbook form.  One list for the
// acceptance tests (test_network_acceptance.cpp) and the verification benchmark
// (bench/bench_verify_ratio.cpp), so the benchmark measures exactly what the tests accept.
#pragma once

#include <vector>

namespace couplet::testing::acceptance {

// DLMF 34.3.16 through DLMF 34.1.1.
inline const char* const cg_orthogonality = "sum(m1, m2 : <b m2, a m1 | c M> * <a m1, b m2 | d Mp>)";
// DLMF 34.3.16 summed over m3.
inline const char* const threej_squared =
    "sum(m1, m2, m3 : 3j(b, a, c; m2, m1, m3) * (-1)^(2*a+2*m1) * 3j(c, b, a; -m3, -m2, -m1))";
// DLMF 34.4.1, columns permuted, one 3j as a CG (DLMF 34.1.1), metrics written as (j+m).
inline const char* const four_threej_sixj =
    "sum(m1, m2, m3, u1, u2, u3 : (-1)^(l1 + l2 + l3 - u1 - u2 - u3) * (-1)^(j1 - j2 - m3) / sqrt(2*j3 + 1)"
    " * <j1 m1, j2 m2 | j3 -m3> * 3j(l3, j1, l2; -u3, m1, u2) * 3j(l1, l3, j2; -u1, u3, m2)"
    " * 3j(j3, l2, l1; m3, -u2, u1))";
// DLMF 34.5.23 with every vertex flipped (m -> -m) and columns reordered.
inline const char* const three_threej_threej_sixj =
    "sum(u1, u2, u3 : (-1)^(l1 + l2 + l3 + u1 + u2 + u3) * 3j(l3, l2, j1; u3, -u2, -m1)"
    " * 3j(j2, l1, l3; -m2, u1, -u3) * 3j(l2, j3, l1; u2, -m3, -u1))";
// DLMF 34.3.1 with 34.3.16.
inline const char* const loop_on_a_vertex = "sum(m : (-1)^(j + m) * 3j(j, c, j; m, g, -m))";
// DLMF 34.3.16 on two vertices of a larger network, then DLMF 34.2 fixes the last index.
inline const char* const bubble_in_a_network =
    "sum(m1, m2, m3, m4 : 3j(a, b, c; m1, m2, m3) * 3j(b, a, d; -m2, -m1, -m4) * 3j(c, e, f; -m3, M, N)"
    " * 3j(d, e, f; m4, -M, -N) * (-1)^(c - m3 + d - m4))";
// Not networks the moves close: an entry mixing a summed m with a free one; a loop whose phase
// no move matches.
inline const char* const mixed_entry = "sum(m : 3j(a, b, c; m, -M, M - m) * 3j(a, b, c; m, M, N))";
inline const char* const unmatched_loop = "sum(m : 3j(a, a, c; m, -m, 0))";
// DLMF 34.6.1 with columns permuted, one column 3j with every m reversed, one row as a CG
// (DLMF 34.1.1), and a phase (-1)^(2 x11 - 2 a11) = 1 to absorb.
inline const char* const six_threej_ninej =
    "sum(x11, x12, x13, x21, x22, x23, x31, x32, x33 :"
    " 3j(a12, a11, a13; x12, x11, x13) * 3j(a21, a22, a23; x21, x22, x23)"
    " * (-1)^(a32 - a31 - x33) / sqrt(2*a33 + 1) * <a31 x31, a32 x32 | a33 -x33>"
    " * 3j(a11, a21, a31; -x11, -x21, -x31) * 3j(a22, a12, a32; x22, x12, x32)"
    " * 3j(a13, a23, a33; x13, x23, x33) * (-1)^(2*x11 - 2*a11))";
// DLMF 34.6.1 with 34.3.16: the third column left open; rows reordered, a column reversed.
inline const char* const five_threej_threej_ninej =
    "sum(x11, x12, x21, x22, x31, x32 :"
    " 3j(a13, a12, a11; x13, x12, x11) * 3j(a21, a22, a23; x21, x22, x23) * 3j(a31, a32, a33; x31, x32, x33)"
    " * 3j(a31, a21, a11; -x31, -x21, -x11) * 3j(a12, a22, a32; x12, x22, x32))";

struct labelled_input {
    const char* label;
    const char* input;
};

inline const std::vector<labelled_input>& all() {
    static const std::vector<labelled_input> inputs = {
        {"CG orthogonality", cg_orthogonality},
        {"3j squared over all m", threej_squared},
        {"four 3j -> 6j", four_threej_sixj},
        {"three 3j -> 3j 6j", three_threej_threej_sixj},
        {"line closed on a vertex", loop_on_a_vertex},
        {"bubble in a network", bubble_in_a_network},
        {"mixed entry, left summed", mixed_entry},
        {"loop no move matches", unmatched_loop},
        {"six 3j -> 9j", six_threej_ninej},
        {"five 3j -> 3j 9j", five_threej_threej_ninej},
    };
    return inputs;
}

}  // namespace couplet::testing::acceptance
