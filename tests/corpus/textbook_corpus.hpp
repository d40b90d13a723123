// Textbook results written as a user writes them (Clebsch-Gordan or 3j form, columns in other
// orders, extra phases), each beside the closed form its source prints.  The closed forms were
// written from the sources named, never from couplet's output; where a triangle condition is
// implicit in the source's statement it is written out as tri(...), and a factor the source
// leaves in a conventional position may stand anywhere in the product.  One list for the
// corpus test (test_textbook_corpus.cpp) and the benchmark (bench/bench_textbook.cpp).
#pragma once

#include <vector>

namespace couplet::testing::textbook {

struct entry {
    const char* label;
    const char* source;
    const char* declarations;  // int / half lines the source assumes, or ""
    const char* input;
    const char* closed_form;
};

inline const std::vector<entry>& corpus() {
    static const std::vector<entry> all = {
        {"recoupling of three angular momenta, four CG", "Edmonds (1957) eq. 6.1.5", "",
         "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M>"
         " * <j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)",
         "(-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23}"},
        {"recoupling of three angular momenta, first pair coupled the other way round",
         "Edmonds (1957) eq. 6.1.5 with DLMF 34.3.8 (order of a CG's columns)", "",
         "sum(m1, m2, m3, m12, m23 : <j2 m2, j1 m1 | j12 m12> * <j12 m12, j3 m3 | J M>"
         " * <j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)",
         "(-1)^(j1+j2-j12) * (-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23}"},
        {"recoupling of three angular momenta, the other direction", "Edmonds (1957) eq. 6.1.5 (real, symmetric)", "",
         "sum(m1, m2, m3, m12, m23 : <j1 m1, j23 m23 | J M> * <j2 m2, j3 m3 | j23 m23>"
         " * <j12 m12, j3 m3 | J M> * <j1 m1, j2 m2 | j12 m12>)",
         "(-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23}"},
        {"6j as four 3j summed over all projections", "DLMF 34.4.1", "",
         "sum(m1, m2, m3, u1, u2, u3 : (-1)^(l1+l2+l3+u1+u2+u3) * 3j(j1, j2, j3; m1, m2, m3)"
         " * 3j(j1, l2, l3; m1, u2, -u3) * 3j(l1, j2, l3; -u1, m2, u3) * 3j(l1, l2, j3; u1, -u2, m3))",
         "6j{j1, j2, j3; l1, l2, l3}"},
        {"three 3j summed to a 3j times a 6j", "DLMF 34.5.23", "",
         "sum(u1, u2, u3 : (-1)^(l1+l2+l3+u1+u2+u3) * 3j(j1, l2, l3; m1, u2, -u3)"
         " * 3j(l1, j2, l3; -u1, m2, u3) * 3j(l1, l2, j3; u1, -u2, m3))",
         "3j(j1, j2, j3; m1, m2, m3) * 6j{j1, j2, j3; l1, l2, l3}"},
        {"3j orthogonality", "DLMF 34.3.16", "",
         "sum(m1, m2 : (2*j3+1) * 3j(j1, j2, j3; m1, m2, m3) * 3j(j1, j2, k3; m1, m2, n3))",
         "delta(j3, k3) * delta(m3, n3) * tri(j1, j2, j3)"},
        {"CG orthogonality", "DLMF 34.3.16 with DLMF 34.1.1", "",
         "sum(ma, mb : <a ma, b mb | c mc> * <a ma, b mb | d md>)", "delta(c, d) * delta(mc, md) * tri(a, b, c)"},
        {"CG normalization", "DLMF 34.3.16 with DLMF 34.1.1", "", "sum(ma, mb : <a ma, b mb | c mc>^2)",
         "tri(a, b, c)"},
        {"3j completeness", "DLMF 34.3.17", "", "sum(J, M : (2*J+1) * 3j(a, b, J; ma, mb, M) * 3j(a, b, J; na, nb, M))",
         "delta(ma, na) * delta(mb, nb)"},
        {"CG completeness", "DLMF 34.3.17 with DLMF 34.1.1", "", "sum(J, M : <a ma, b mb | J M> * <a na, b nb | J M>)",
         "delta(ma, na) * delta(mb, nb)"},
        {"a 3j squared over all projections", "DLMF 34.3.16 summed over m3", "",
         "sum(m1, m2, m3 : 3j(a, b, c; m1, m2, m3)^2)", "tri(a, b, c)"},
        {"a line closed on one 3j", "DLMF 34.3.1 with DLMF 34.3.16", "", "sum(m : (-1)^(j-m) * 3j(j, j, c; m, -m, g))",
         "sqrt(2*j+1) * delta(c, 0) * delta(g, 0)"},
        {"Gaunt-type sum of squared 3j", "DLMF 34.3.16 (common practice, no source, for the Gaunt weights)",
         "int l1, l2, l3",
         "sum(m1, m2 : (2*l1+1)*(2*l2+1)*(2*l3+1) * 3j(l1, l2, l3; 0, 0, 0)^2 * 3j(l1, l2, l3; m1, m2, m3)^2)",
         "(2*l1+1) * (2*l2+1) * 3j(l1, l2, l3; 0, 0, 0)^2"},
        {"6j orthogonality", "DLMF 34.5.14", "",
         "sum(x : (2*x+1) * (2*p+1) * 6j{a, b, x; c, d, p} * 6j{c, d, x; a, b, q})",
         "delta(p, q) * tri(a, d, p) * tri(b, c, p)"},
        {"Racah sum rule", "DLMF 34.5.15", "",
         "sum(x : (-1)^(p+q+x) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q})", "6j{a, c, q; b, d, p}"},
        {"Biedenharn-Elliott identity", "DLMF 34.5.16-34.5.17", "",
         "sum(x : (-1)^(a+b+c+d+e+f+p+q+r+x) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{c, d, x; e, f, q}"
         " * 6j{e, f, x; b, a, r})",
         "6j{p, q, r; e, a, d} * 6j{p, q, r; f, b, c}"},
        {"9j as three 6j", "DLMF 34.6.2", "",
         "sum(x : (-1)^(2*x) * (2*x+1) * 6j{a, b, c; f, i, x} * 6j{d, e, f; b, x, h} * 6j{g, h, i; x, a, d})",
         "9j{a, b, c; d, e, f; g, h, i}"},
        {"9j as six 3j summed over all projections", "DLMF 34.6.1", "",
         "sum(m11, m12, m13, m21, m22, m23, m31, m32, m33 : 3j(j11, j12, j13; m11, m12, m13)"
         " * 3j(j21, j22, j23; m21, m22, m23) * 3j(j31, j32, j33; m31, m32, m33)"
         " * 3j(j11, j21, j31; m11, m21, m31) * 3j(j12, j22, j32; m12, m22, m32)"
         " * 3j(j13, j23, j33; m13, m23, m33))",
         "9j{j11, j12, j13; j21, j22, j23; j31, j32, j33}"},
        {"6j with a zero argument", "DLMF 34.5.1", "", "6j{a, b, c; 0, c, b}",
         "(-1)^(a+b+c) * tri(a, b, c) / sqrt((2*b+1)*(2*c+1))"},
        {"9j with a zero argument", "DLMF 34.7.1", "", "9j{a, b, c; d, e, f; g, h, 0}",
         "delta(c, f) * delta(g, h) * (-1)^(b+c+d+g) * 6j{a, b, c; e, d, g} / sqrt((2*c+1)*(2*g+1))"},
        {"9j orthogonality", "DLMF 34.7.2", "",
         "sum(x, y : (2*x+1)*(2*y+1) * (2*p+1)*(2*q+1) * 9j{a, b, x; c, d, y; p, q, e}"
         " * 9j{a, b, x; c, d, y; r, s, e})",
         "delta(p, r) * delta(q, s) * tri(a, c, p) * tri(b, d, q) * tri(p, q, e)"},
        {"sum of (2x+1) over a triangle", "common practice, no source", "", "sum(x : (2*x+1) * tri(a, b, x))",
         "(2*a+1) * (2*b+1)"},
        {"sum of (2x+1) times one 6j", "Varshalovich et al. (1988) sec. 9.8 (from memory)", "",
         "sum(x : (2*x+1) * 6j{a, b, x; a, b, c})", "(-1)^(2*a+2*b) * tri(a, b, c)"},
        {"signed sum of (2x+1) times one 6j", "Varshalovich et al. (1988) sec. 9.8 (from memory)", "",
         "sum(x : (-1)^(a+b+x) * (2*x+1) * 6j{a, b, x; b, a, c})", "sqrt((2*a+1)*(2*b+1)) * delta(c, 0)"},
        {"a sum no identity reduces keeps its weight", "common practice, no source", "",
         "sum(y : (2*y+1) * 6j{a, b, y; c, d, e})", "sum(y : (2*y+1) * 6j{a, b, y; c, d, e})"},
        {"LS-jj transformation of two particles, six CG", "Edmonds (1957) eq. 6.4.2 (number from memory)", "",
         "sum(ml1, ms1, ml2, ms2, mj1, mj2, ML, MS : <l1 ml1, s1 ms1 | j1 mj1> * <l2 ml2, s2 ms2 | j2 mj2>"
         " * <j1 mj1, j2 mj2 | J M> * <l1 ml1, l2 ml2 | L ML> * <s1 ms1, s2 ms2 | S MS> * <L ML, S MS | J M>)",
         "sqrt((2*j1+1)*(2*j2+1)*(2*L+1)*(2*S+1)) * 9j{l1, s1, j1; l2, s2, j2; L, S, J}"},
        {"operator on the first part of a coupled state, Wigner-Eckart form",
         "Edmonds (1957) eq. 7.1.7 (number from memory)", "",
         "sum(m1, m2, n1 : <j1 m1, j2 m2 | J M> * <k1 n1, j2 m2 | K N> * (-1)^(j1-m1) * 3j(j1, k, k1; -m1, q, n1))",
         "(-1)^(J-M) * 3j(J, k, K; -M, q, N) * (-1)^(j1+j2+K+k) * sqrt((2*J+1)*(2*K+1)) * 6j{j1, J, j2; K, k1, k}"},
        {"operator on the second part of a coupled state, Wigner-Eckart form",
         "Edmonds (1957) eq. 7.1.8 (number from memory)", "",
         "sum(m1, m2, n2 : <j1 m1, j2 m2 | J M> * <j1 m1, k2 n2 | K N> * (-1)^(j2-m2) * 3j(j2, k, k2; -m2, q, n2))",
         "(-1)^(J-M) * 3j(J, k, K; -M, q, N) * (-1)^(j1+k2+J+k) * sqrt((2*J+1)*(2*K+1)) * 6j{j2, J, j1; K, k2, k}"},
        {"scalar product of operators on the two parts", "Edmonds (1957) eq. 7.1.6 (number from memory)", "int k",
         "sum(m1, m2, n1, n2, q : <j1 m1, j2 m2 | J M> * <k1 n1, k2 n2 | K N> * (-1)^q"
         " * (-1)^(j1-m1) * 3j(j1, k, k1; -m1, q, n1) * (-1)^(j2-m2) * 3j(j2, k, k2; -m2, -q, n2))",
         "delta(J, K) * delta(M, N) * (-1)^(k1+j2+J) * 6j{J, j2, j1; k, k1, k2}"},
    };
    return all;
}

}  // namespace couplet::testing::textbook
