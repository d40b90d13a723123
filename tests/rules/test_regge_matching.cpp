// Regge's symmetry of the 6j (DLMF 34.5.9) in matching: a 6j written as the Regge image of a
// rule's factor, whose entries are half-sums, is still recognised.
#include <catch2/catch.hpp>

#include "cli_simplify.hpp"

using couplet::testing::count_of;
using couplet::testing::simplify_and_compare;

TEST_CASE("6j orthogonality with one factor given as its Regge image", "[rules][cli]") {
    // {a b x; c d p} = {a, s-b, s-x; c, s-d, s-p}, s = (b+x+d+p)/2 (DLMF 34.5.9), then DLMF 34.5.14.
    auto s = simplify_and_compare("",
                                  "sum(x : (2*x+1) * 6j{a, (x+d+p-b)/2, (b+d+p-x)/2; c, (b+x+p-d)/2, (b+x+d-p)/2}"
                                  " * 6j{a, b, x; c, d, q})");
    // Orthogonality is nonzero only where p = q: fewer nonzero points than other rules.
    INFO(s.text << "\n" << s.report.first_mismatch);
    CHECK(s.report.mismatches == 0);
    CHECK(s.report.compared >= 100);
    CHECK(s.report.nonzero >= 5);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
}

TEST_CASE("a 6j whose Regge image has a zero argument", "[rules][cli]") {
    // {a b c; d 0 f} read through DLMF 34.5.9 with s = (b+c+f)/2 and columns permuted, then
    // DLMF 34.5.1.
    auto s = simplify_and_compare("", "6j{a, (b+c+f)/2, (b+c-f)/2; d, (b-c+f)/2, (c+f-b)/2}");
    couplet::testing::require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 2);
}
