// Lowering: roles inferred from slots, declarations, definitions and sums.
#include <catch2/catch.hpp>

#include "model/symbols.hpp"
#include "print/print.hpp"
#include "support.hpp"

using namespace couplet;

TEST_CASE("roles are inferred from the slots a name fills", "[model]") {
    auto p = testing::lower_text("3j(a, b, c; ma, mb, -ma-mb) * <a ma, l 0 | a ma> * x");
    CHECK(p.numbers.find("a")->role == qn_role::angular);
    CHECK(p.numbers.find("l")->role == qn_role::angular);
    CHECK(p.numbers.find("ma")->role == qn_role::projection);
    CHECK(p.numbers.find("mb")->role == qn_role::projection);
    CHECK(p.numbers.find("x")->role == qn_role::unknown);
    // A projection remembers the angular momentum of the slot it first filled.
    REQUIRE(p.numbers.find("ma")->owner);
    CHECK(to_text(*p.numbers.find("ma")->owner) == "a");
}

TEST_CASE("declarations give parities", "[model]") {
    auto p = testing::lower_text("int l, k; half s\n6j{l, k, s; s, l, k}");
    CHECK(p.numbers.find("l")->parity == qn_parity::integer);
    CHECK(p.numbers.find("k")->parity == qn_parity::integer);
    CHECK(p.numbers.find("s")->parity == qn_parity::half_odd);
}

TEST_CASE("let names expand to their definitions", "[model]") {
    auto e = testing::lower_last("let W = 3j(a, b, c; m, -m, 0)\nlet V = 2*W\nV + W");
    CHECK(to_text(e) == "3*3j(a, b, c; m, -m, 0)");
}

TEST_CASE("selection rules with numbers give 0, not an error", "[model]") {
    CHECK(testing::lower_last("3j(1, 1, 3; 0, 0, 0)").is_zero());
    CHECK(testing::lower_last("3j(a, b, c; 1, 1, 0)").is_zero());
    CHECK(testing::lower_last("6j{1, 1, 3; a, b, c}").is_zero());
    CHECK(testing::lower_last("<1 2, 1 0 | 2 2>").is_zero());
    CHECK(testing::lower_last("delta(a+1, a)").is_zero());
    CHECK(testing::lower_last("delta(a, a)") == 1);
    CHECK(testing::lower_last("tri(1, 1, 1/2)").is_zero());
}

TEST_CASE("sum indices are bound: substitution leaves them alone", "[model]") {
    auto p = testing::lower_text("sum(m : 3j(j, j, 0; m, -m, 0)) * m");
    GiNaC::ex e = p.statements.back().value;
    GiNaC::symbol m = p.numbers.find("m")->symbol;
    CHECK(to_text(e.subs(m == 5)) == "5*sum(m : 3j(j, j, 0; m, -m, 0))");
}

TEST_CASE("phases merge on simplify", "[model][cli]") {
    auto r = testing::run_cli({"simplify", "-e", "(-1)^(a+b) * (-1)^(b+c) * 3j(a, b, c; 0, 0, 0) * (-1)^(1)"});
    CHECK(r.code == 0);
    // With all projections 0 the triad is integral, so (-1)^(2b) drops out.
    CHECK(r.out == "-(-1)^(a+c)*3j(a, b, c; 0, 0, 0)\n");
}
