// `check` on identities of DLMF chapter 34 as stated there (with the triangle and projection
// conditions DLMF assumes written out as tri() and deltas): each must hold, at many points where
// its sides are nonzero.
#include <catch2/catch.hpp>

#include "check_support.hpp"

using couplet::testing::check_text;
using couplet::verify::verdict;

namespace {

void require_holds(const std::string& text, int depth = 2, int samples = 200, std::size_t min_nonzero = 40) {
    auto c = check_text(text, depth, samples);
    INFO(text);
    INFO("note: " << c.report.note);
    CHECK(c.report.result == verdict::holds);
    CHECK(c.report.nonzero >= min_nonzero);
    CHECK(!c.report.counter);
}

}  // namespace

TEST_CASE("Clebsch-Gordan coefficient as a 3j symbol holds", "[verify][dlmf]") {
    // DLMF 34.1.1
    require_holds("<j1 m1, j2 m2 | j3 m3> == (-1)^(j1-j2+m3) * sqrt(2*j3+1) * 3j(j1, j2, j3; m1, m2, -m3)");
}

TEST_CASE("3j symmetries hold", "[verify][dlmf]") {
    // DLMF 34.3.8: even column permutations.
    require_holds("3j(j1, j2, j3; m1, m2, m3) == 3j(j2, j3, j1; m2, m3, m1)");
    require_holds("3j(j1, j2, j3; m1, m2, m3) == 3j(j3, j1, j2; m3, m1, m2)");
    // DLMF 34.3.9: odd column permutations cost (-1)^(j1+j2+j3).
    require_holds("3j(j1, j2, j3; m1, m2, m3) == (-1)^(j1+j2+j3) * 3j(j2, j1, j3; m2, m1, m3)");
    require_holds("3j(j1, j2, j3; m1, m2, m3) == (-1)^(j1+j2+j3) * 3j(j1, j3, j2; m1, m3, m2)");
    // DLMF 34.3.10: reversing the projections.
    require_holds("3j(j1, j2, j3; -m1, -m2, -m3) == (-1)^(j1+j2+j3) * 3j(j1, j2, j3; m1, m2, m3)");
}

TEST_CASE("3j special case with a zero holds", "[verify][dlmf]") {
    // DLMF 34.3.1
    require_holds("3j(j, j, 0; m, -m, 0) == (-1)^(j-m) / sqrt(2*j+1)", 2, 200, 20);
}

TEST_CASE("3j orthogonality holds", "[verify][dlmf]") {
    // DLMF 34.3.16, with the triangle of (j1, j2, j3) that DLMF assumes.
    require_holds(
        "sum(m1, m2 : (2*j3+1) * 3j(j1, j2, j3; m1, m2, m3) * 3j(j1, j2, k; m1, m2, n)) == "
        "delta(j3, k) * delta(m3, n) * tri(j1, j2, j3)");
    // DLMF 34.3.17
    require_holds(
        "sum(j3, m3 : (2*j3+1) * 3j(j1, j2, j3; m1, m2, m3) * 3j(j1, j2, j3; n1, n2, m3)) == "
        "delta(m1, n1) * delta(m2, n2)");
}

TEST_CASE("6j symmetries hold", "[verify][dlmf]") {
    // DLMF 34.5.8
    require_holds("6j{j1, j2, j3; l1, l2, l3} == 6j{j2, j1, j3; l2, l1, l3}");
    require_holds("6j{j1, j2, j3; l1, l2, l3} == 6j{j1, l2, l3; l1, j2, j3}");
}

TEST_CASE("6j orthogonality holds", "[verify][dlmf]") {
    // DLMF 34.5.14, with the triangles of l3 that DLMF assumes written as tri().
    require_holds(
        "sum(j3 : (2*j3+1) * (2*l3+1) * 6j{j1, j2, j3; l1, l2, l3} * 6j{j1, j2, j3; l1, l2, k}) == "
        "delta(l3, k) * tri(j1, l2, l3) * tri(l1, j2, l3)");
}

TEST_CASE("Racah sum rule holds", "[verify][dlmf]") {
    // DLMF 34.5.15 (letters renamed; the arrangement from memory)
    require_holds(
        "sum(x : (-1)^(x+p+q) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == "
        "6j{a, d, p; b, c, q}");
}

TEST_CASE("Biedenharn-Elliott identity holds", "[verify][dlmf]") {
    // DLMF 34.5.16 (letters renamed; the arrangement from memory); depth 1 keeps it quick.
    require_holds(
        "sum(x : (-1)^(a+b+c+d+e+f+p+q+r+x) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{c, d, x; e, f, q} * "
        "6j{e, f, x; b, a, r}) == 6j{p, q, r; e, a, d} * 6j{p, q, r; f, b, c}",
        2, 200);
}

TEST_CASE("9j as a sum over three 6j holds", "[verify][dlmf]") {
    // DLMF 34.6.2
    require_holds(
        "9j{j11, j12, j13; j21, j22, j23; j31, j32, j33} == sum(j : (-1)^(2*j) * (2*j+1) * "
        "6j{j11, j21, j31; j32, j33, j} * 6j{j12, j22, j32; j21, j, j23} * 6j{j13, j23, j33; j, j11, j12})",
        2, 200);
}
