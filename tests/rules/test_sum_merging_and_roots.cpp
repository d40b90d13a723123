// Two preparations that let the rules see their left side: sums over differently named indices
// merged into one, and square roots split into roots of their factors so that (2x+1) weights
// appear.  Each output is compared exactly with its input at sampled points.
#include <catch2/catch.hpp>

#include "cli_simplify.hpp"
#include "print/print.hpp"
#include "rules/roots.hpp"

using namespace couplet;
using couplet::testing::count_of;
using couplet::testing::require_exact;
using couplet::testing::simplify_and_compare;

TEST_CASE("sums over x and over y that together are 6j orthogonality are merged", "[rules][cli]") {
    // DLMF 34.5.14 with its weight (2x+1) spread as 1 over the x-sum and 2y over the y-sum.
    auto s = simplify_and_compare("",
                                  "sum(x : 6j{a, b, x; c, d, p} * 6j{a, b, x; c, d, q})"
                                  " + sum(y : 2*y * 6j{b, a, y; d, c, p} * 6j{a, b, y; c, d, q})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
    std::string applied = testing::rules_applied(
        "sum(x : 6j{a, b, x; c, d, p} * 6j{a, b, x; c, d, q})"
        " + sum(y : 2*y * 6j{b, a, y; d, c, p} * 6j{a, b, y; c, d, q})");
    INFO(applied);
    CHECK(applied.find("sums merged after renaming their indices\n6j orthogonality\n") != std::string::npos);
}

TEST_CASE("double sums whose indices correspond in the other order are merged", "[rules][cli]") {
    // DLMF 34.7.2: (2x+1)(2y+1) written as (2x+1) in the (x, y)-sum plus 2v(2u+1) in a (u, v)-sum
    // where v plays x and u plays y.
    auto s = simplify_and_compare("",
                                  "sum(x, y : (2*x+1) * 9j{a, b, x; c, d, y; p, q, e}"
                                  " * 9j{a, b, x; c, d, y; pp, qq, e})"
                                  " + sum(u, v : 2*u*(2*v+1) * 9j{a, b, v; c, d, u; p, q, e}"
                                  " * 9j{a, b, v; c, d, u; pp, qq, e})",
                                  true, 50);
    INFO(s.text << "\n" << s.report.first_mismatch);
    CHECK(s.report.mismatches == 0);
    CHECK(s.report.compared >= 50);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "delta(") == 2);
}

TEST_CASE("sums over different structures are not merged into one", "[rules][cli]") {
    // The z-sum has no partner: it stays a sum, and the value is kept.
    auto s = simplify_and_compare("",
                                  "sum(x : 6j{a, b, x; c, d, p} * 6j{a, b, x; c, d, q})"
                                  " + sum(y : 2*y * 6j{a, b, y; c, d, p} * 6j{a, b, y; c, d, q})"
                                  " + sum(z : (2*z+1) * 6j{a, b, z; c, d, e} * 6j{a, b, z; c, d, f}"
                                  " * 6j{a, b, z; c, g, h})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") >= 1);
    CHECK(count_of(s.text, "delta(") == 1);
}

TEST_CASE("a root of a perfect square becomes its root", "[rules][cli]") {
    // sqrt(4p^2+4p+1) = 2p+1 since p >= 0 (common practice, no source).
    auto s = simplify_and_compare("", "sqrt(4*p + 4*p^2 + 1) * 6j{a, b, p; c, d, e}");
    require_exact(s);
    CHECK(s.text == "(2*p+1)*6j{a, b, p; c, d, e}");
}

TEST_CASE("recoupling composed with its inverse, hats written as roots, gives a delta", "[rules][cli]") {
    // Each recoupling coefficient ((a b) p, c) J -> (a, (b c) y) J carries sqrt((2p+1)(2y+1))
    // (common practice, no source); the two roots share (2y+1), which becomes the weight of
    // DLMF 34.5.14 only once the roots are split and merged.
    auto s = simplify_and_compare("",
                                  "sum(y : (-1)^(a+b+c+J) * sqrt((2*p+1)*(2*y+1)) * 6j{a, b, p; c, J, y}"
                                  " * (-1)^(a+b+c+J) * sqrt((2*y+1)*(2*q+1)) * 6j{q, c, J; y, a, b})",
                                  false);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "sqrt") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
}

TEST_CASE("roots split only over factors of known sign, and rejoin for printing", "[rules]") {
    auto program = testing::lower_text("6j{a, b, c; d, e, f}\nm");
    const quantum_numbers& numbers = program.numbers;
    GiNaC::ex a = numbers.find("a")->symbol, b = numbers.find("b")->symbol, m = numbers.find("m")->symbol;
    // (2a+1)(2b+1) >= 0 factor by factor: split, then joined again into one root.
    GiNaC::ex both = GiNaC::sqrt(((2 * a + 1) * (2 * b + 1)).expand());
    GiNaC::ex split = rules::split_roots(both, numbers);
    CHECK((split - GiNaC::sqrt(2 * a + 1) * GiNaC::sqrt(2 * b + 1)).is_zero());
    CHECK(to_text(rules::join_roots(split)) == "sqrt((2*a+1)*(2*b+1))");
    // a - b and m have no known sign: sqrt((a-b)(m-1)) is no product of two real roots everywhere.
    GiNaC::ex unknown = GiNaC::sqrt(((a - b) * (m - 1)).expand());
    CHECK(rules::split_roots(unknown, numbers).is_equal(unknown));
    // (2a+1)^3 under a root: (2a+1) sqrt(2a+1), nothing lost.
    GiNaC::ex cube = GiNaC::pow(2 * a + 1, 3).expand();
    CHECK((rules::split_roots(GiNaC::sqrt(cube), numbers) - GiNaC::pow(2 * a + 1, GiNaC::numeric(3, 2))).is_zero());
}
