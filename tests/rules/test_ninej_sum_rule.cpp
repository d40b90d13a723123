// DLMF 34.7.3 through `couplet simplify`: the double sum of two 9j symbols in disguise comes
// out as the one 9j of the right side, exactly equal to the input at sampled points.
#include <catch2/catch.hpp>

#include "cli_simplify.hpp"

using couplet::testing::count_of;
using couplet::testing::simplify_and_compare;

namespace {

void require_single_ninej(const couplet::testing::simplified& s) {
    INFO("output: " << s.text << "\nfirst mismatch: " << s.report.first_mismatch);
    CHECK(s.report.mismatches == 0);
    CHECK(s.report.compared >= 50);
    CHECK(s.report.nonzero >= 10);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "9j") == 1);
}

}  // namespace

TEST_CASE("9j sum rule: first 9j transposed, second with two rows and two columns swapped", "[rules][cli]") {
    // DLMF 34.7.3 with j1 j2 j12 j3 j4 j34 j13 j24 j j14 j23 = a b c e g d u v j h f: indices
    // renamed to u, v; the phase (-1)^(2 j2 + j24 + j23 - j34) split over two factors and padded
    // with (-1)^(4u); the first 9j transposed (no phase), the second with rows 1, 2 and columns
    // 1, 2 exchanged (two odd permutations: no phase; common practice, no source).
    auto s = simplify_and_compare("",
                                  "sum(u, v : (-1)^(2*b+v+4*u) * (2*u+1) * 9j{a, e, u; b, g, v; c, d, j}"
                                  " * (-1)^(f-d) * (2*v+1) * 9j{b, g, v; e, a, u; f, h, j})",
                                  false, 60);
    require_single_ninej(s);
}

TEST_CASE("9j sum rule: an odd column exchange paid by its phase, padded with (-1)^(2(a+b+c))", "[rules][cli]") {
    // DLMF 34.7.3; columns 1 and 2 of the first 9j exchanged, which costs (-1)^(sum of all
    // nine) (common practice, no source), written out; the second 9j transposed.
    auto s = simplify_and_compare("",
                                  "sum(u, v : (-1)^(a+b+c+d+e+g+j+u+v) * (-1)^(2*b+v+f-d+2*(a+b+c)) * (2*u+1)"
                                  " * 9j{b, a, c; g, e, d; v, u, j} * (2*v+1) * 9j{a, g, h; e, b, f; u, v, j})",
                                  false, 60);
    require_single_ninej(s);
}

TEST_CASE("the 9j sum rule without (-1)^(2 j2) and half-odd j2 gives minus the 9j", "[rules][cli]") {
    // DLMF 34.7.3: the missing (-1)^(2b) is left over by the match and is -1 for half-odd b.
    auto s = simplify_and_compare("half b\n",
                                  "sum(u, v : (-1)^(v+f-d) * (2*u+1) * (2*v+1) * 9j{a, b, c; e, g, d; u, v, j}"
                                  " * 9j{a, e, u; g, b, v; h, f, j})",
                                  false, 60);
    require_single_ninej(s);
    CHECK(s.text.rfind("-", 0) == 0);
}
