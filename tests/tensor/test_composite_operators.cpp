// Tensor and scalar products of operators on the parts of coupled states, derived from their
// definitions (the components' Clebsch-Gordan sum, Edmonds 1957 sec. 5.1) and the coupled
// states' expansion, against the closed forms of Edmonds (1957) ch. 7.  Edmonds primes the
// bra; here the ket is primed: his eqs. 7.1.5 and 7.1.6 are symmetric under that renaming
// (the 9j's symmetry under exchange of its two first columns, DLMF 34.6.2's table of
// symmetries, with the 6j's under exchange of columns, DLMF 34.3.8).
#include <catch2/catch.hpp>

#include "rules/cli_simplify.hpp"
#include "support.hpp"
#include "tensor/element_checks.hpp"

using couplet::testing::check_equal;
using couplet::testing::count_of;
using couplet::testing::require_exact;
using couplet::testing::simplify_and_compare;
using couplet::testing::simplify_error;

TEST_CASE("a tensor product of operators on two parts: Edmonds 7.1.5", "[tensor][composite][cli]") {
    // Edmonds (1957) eq. 7.1.5: <j1 j2 J || [T^(k1)(1) x U^(k2)(2)]^(k) || j1' j2' J'> =
    //   sqrt((2J+1)(2J'+1)(2k+1)) {j1 j1' k1; j2 j2' k2; J J' k} <j1 || T || j1'> <j2 || U || j2'>.
    const std::string element = "<(j1, j2) J || [T^(k1)(1) x U^(k2)(2)]^(k) || (j1', j2') J'>";
    const std::string edmonds =
        "sqrt((2*J+1)*(2*J'+1)*(2*k+1)) * 9j{j1, j1', k1; j2, j2', k2; J, J', k} * "
        "<j1 || T^(k1) || j1'> * <j2 || U^(k2) || j2'>";
    CHECK(check_equal(element, edmonds) == 0);
    // simplify derives the one-term form: one 9j, no sum.
    auto s = simplify_and_compare("", element);
    require_exact(s);
    CHECK(count_of(s.text, "9j{") == 1);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, " + ") == 0);
    // The m-dependent element is its Wigner-Eckart form (Edmonds 5.4.1).
    CHECK(check_equal("<(j1, j2) J M | [T^(k1)(1) x U^(k2)(2)]^(k)_q | (j1', j2') J' M'>",
                      "(-1)^(J-M) * 3j(J, k, J'; -M, q, M') * " + edmonds) == 0);
}

TEST_CASE("a scalar product of operators on two parts: Edmonds 7.1.6", "[tensor][composite][cli]") {
    // Edmonds (1957) eq. 7.1.6, ket primed: <j1 j2 J M | T^(k)(1) . U^(k)(2) | j1' j2' J' M'> =
    //   delta(J, J') delta(M, M') (-1)^(j1'+j2+J) {J j2 j1; k j1' j2'} <j1 || T || j1'> <j2 || U || j2'>.
    const std::string edmonds =
        "delta(J, J') * (-1)^(j1'+j2+J) * 6j{J, j2, j1; k, j1', j2'} * <j1 || T^(k) || j1'> * <j2 || U^(k) || j2'>";
    CHECK(check_equal("<(j1, j2) J M | T^(k)(1) . U^(k)(2) | (j1', j2') J' M'>", "delta(M, M') * " + edmonds) == 0);
    // A scalar's reduced element: Edmonds 5.4.1 with k = 0, (-1)^(J-M) 3j(J 0 J; -M 0 M) =
    // 1/sqrt(2J+1) (DLMF 34.3.1 with a zero entry, from memory as 34.3.1's special case).
    CHECK(check_equal("<(j1, j2) J || T^(k)(1) . U^(k)(2) || (j1', j2') J'>", "sqrt(2*J+1) * " + edmonds) == 0);
    // The shape from the reduced element (few random points satisfy both deltas of the other).
    auto s = simplify_and_compare("", "<(j1, j2) J || T^(k)(1) . U^(k)(2) || (j1', j2') J'>");
    require_exact(s);
    CHECK(count_of(s.text, "6j{") == 1);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "delta(J, J')") == 1);
}

TEST_CASE("two operators on one part: Edmonds 7.1.1 inside 7.1.7", "[tensor][composite][cli]") {
    // Edmonds (1957) eq. 7.1.1: <j || [T^(k1) x U^(k2)]^(k) || j'> =
    //   (-1)^(j+k+j') sqrt(2k+1) sum_j'' {k1 k2 k; j' j j''} <j || T || j''> <j'' || U || j'>,
    // and 7.1.7 for the coupled state, ket primed:
    //   <j1 j2 J || X(1) || j1' j2 J'> = (-1)^(j1+j2+J'+k) sqrt((2J+1)(2J'+1)) {j1 J j2; J' j1' k} <j1 || X || j1'>.
    const std::string edmonds =
        "(-1)^(j1+j2+J'+k) * sqrt((2*J+1)*(2*J'+1)) * 6j{j1, J, j2; J', j1', k} * "
        "(-1)^(j1+k+j1') * sqrt(2*k+1) * sum(x : 6j{k1, k2, k; j1', j1, x} * "
        "<j1 || T^(k1) || x> * <x || U^(k2) || j1'>)";
    CHECK(check_equal("<(j1, j2) J || [T^(k1)(1) x U^(k2)(1)]^(k) || (j1', j2) J'>", edmonds) == 0);
    // The intermediate j'' stays a sum: the reduced elements at each j'' are unknown.
    auto s = simplify_and_compare("", "<(j1, j2) J || [T^(k1)(1) x U^(k2)(1)]^(k) || (j1', j2) J'>");
    require_exact(s);
    CHECK(count_of(s.text, "sum(j1''") == 1);
    CHECK(count_of(s.text, "6j{") == 2);
}

TEST_CASE("composite operators print in the trade's notation", "[tensor][composite][cli]") {
    auto text = couplet::testing::run_cli(
        {"simplify", "--steps", "-e", "<(l, s) j || [A^(1)(1) x B^(1)(2)]^(2) || (l', s') j'>"});
    INFO(text.out);
    CHECK_THAT(text.out, Catch::Contains("<(l, s) j || [A^(1)(1) x B^(1)(2)]^(2) || (l', s') j'>"));
    auto doc =
        couplet::testing::run_cli({"latex", "--fragment", "-e", "<(l, s) j m | A^(1)(1) . B^(1)(2) | (l', s') j' m'>"});
    INFO(doc.out);
    CHECK_THAT(doc.out, Catch::Contains("A^{(1)}(1) \\cdot B^{(1)}(2)"));
    auto product = couplet::testing::run_cli(
        {"latex", "--fragment", "-e", "<(l, s) j m | [A^(1)(1) x B^(1)(2)]^(2)_q | (l', s') j' m'>"});
    INFO(product.out);
    CHECK_THAT(product.out, Catch::Contains("\\bigl[ A^{(1)}(1) \\times B^{(1)}(2) \\bigr]^{(2)}_{q}"));
}

TEST_CASE("a composite operator that cannot be read says where and why", "[tensor][composite][cli]") {
    CHECK_THAT(simplify_error("<(a, b) J M | [T^(1)(1) x U^(1)(2)]^(1) | (a, b) J M'>"),
               Catch::Contains("1:15") && Catch::Contains("names the operator's component"));
    CHECK_THAT(simplify_error("<(a, b) J || [T^(1)_q(1) x U^(1)(2)]^(1) || (a, b) J>"),
               Catch::Contains("1:21") && Catch::Contains("the component goes on the whole operator"));
    CHECK_THAT(simplify_error("<(a, b) J || T^(1)(1) . U^(2)(2) || (a, b) J>"),
               Catch::Contains("1:25") && Catch::Contains("of one rank"));
    CHECK_THAT(simplify_error("<(a, b) J || T^(1/2)(1) . U^(1/2)(2) || (a, b) J>"), Catch::Contains("integer rank"));
    CHECK_THAT(simplify_error("<(a, b) J M | T^(1)(1) . U^(1)_0(2) | (a, b) J M>"),
               Catch::Contains("1:32") && Catch::Contains("written without one"));
    CHECK_THAT(simplify_error("<(a, b) J || T^(1)_q(1) || (a, b) J>"),
               Catch::Contains("1:20") && Catch::Contains("has no component"));
    CHECK_THAT(simplify_error("<(a, b) J || T^(1)(1) . U^(1)(2) . V^(1)(1) || (a, b) J>"),
               Catch::Contains("1:36") && Catch::Contains("joins two operators"));
    CHECK_THAT(simplify_error("<(a, b) J || [T^(1)(1) y U^(1)(2)]^(1) || (a, b) J>"),
               Catch::Contains("1:24") && Catch::Contains("expected 'x'"));
}
