// Matrix elements of an operator that acts on one part of a coupled state, derived from the
// coupled states' Clebsch-Gordan coefficients and the Wigner-Eckart theorem, against the
// closed forms of Edmonds (1957) ch. 7.  Edmonds primes the bra; here the ket is primed, so
// each expected form below is his with bra and ket exchanged (his eq. 5.4.1 and the 6j's
// symmetry under exchange of columns, DLMF 34.3.8, make that a renaming).
#include <catch2/catch.hpp>

#include "rules/cli_simplify.hpp"
#include "support.hpp"
#include "tensor/element_checks.hpp"

using couplet::testing::check_equal;
using couplet::testing::count_of;
using couplet::testing::require_exact;
using couplet::testing::simplify_and_compare;

namespace {

couplet::testing::cli_result run(std::vector<std::string> args) { return couplet::testing::run_cli(std::move(args)); }

}  // namespace

TEST_CASE("an operator on the first part of two coupled ones: Edmonds 7.1.7", "[tensor][coupled][cli]") {
    // Edmonds (1957) eq. 7.1.7: <j1 j2 J || T(1) || j1' j2 J'> =
    //   (-1)^(j1+j2+J'+k) sqrt((2J+1)(2J'+1)) {j1 J j2; J' j1' k} <j1 || T || j1'>.
    const std::string edmonds =
        "(-1)^(j1+j2+J'+k) * sqrt((2*J+1)*(2*J'+1)) * 6j{j1, J, j2; J', j1', k} * <j1 || T^(k) || j1'>";
    CHECK(check_equal("<(j1, j2) J || T^(k)(1) || (j1', j2) J'>", edmonds) == 0);
    // The spectator's j may be named apart on the ket: the identity on that part gives delta.
    CHECK(check_equal("<(j1, j2) J || T^(k)(1) || (j1', j2') J'>", "delta(j2, j2') * " + edmonds) == 0);
    // The same form without its phase is found wrong, and the missing phase named.
    const std::string wrong = "sqrt((2*J+1)*(2*J'+1)) * 6j{j1, J, j2; J', j1', k} * <j1 || T^(k) || j1'>";
    auto r = run({"check", "-e", "<(j1, j2) J || T^(k)(1) || (j1', j2) J'> == " + wrong});
    INFO(r.out);
    CHECK(r.code == 1);
    CHECK_THAT(r.out, Catch::Contains("fails by a phase") && Catch::Contains("(-1)^("));
}

TEST_CASE("an operator on the second part: Edmonds 7.1.8", "[tensor][coupled][cli]") {
    // Edmonds (1957) eq. 7.1.8, ket primed: <j1 j2 J || U(2) || j1 j2' J'> =
    //   (-1)^(j1+j2'+J+k) sqrt((2J+1)(2J'+1)) {j2 J j1; J' j2' k} <j2 || U || j2'>.
    CHECK(check_equal(
              "<(j1, j2) J || U^(k)(2) || (j1, j2') J'>",
              "(-1)^(j1+j2'+J+k) * sqrt((2*J+1)*(2*J'+1)) * 6j{j2, J, j1; J', j2', k} * <j2 || U^(k) || j2'>") == 0);
}

TEST_CASE("the m-dependent element is the Wigner-Eckart form of the coupled reduced one", "[tensor][coupled][cli]") {
    // Edmonds 5.4.1 applied to the coupled states, with 7.1.7 for the reduced element.
    CHECK(check_equal("<(j1, j2) J M | T^(k)_q(1) | (j1', j2) J' M'>",
                      "(-1)^(J-M) * 3j(J, k, J'; -M, q, M') * (-1)^(j1+j2+J'+k) * sqrt((2*J+1)*(2*J'+1)) * "
                      "6j{j1, J, j2; J', j1', k} * <j1 || T^(k) || j1'>") == 0);
    // What simplify prints is one term: the 3j, one 6j and the reduced element, no sum.  (Few
    // random points give a nonzero 3j here; the check above is the proof, this the shape.)
    auto s = simplify_and_compare("", "<(j1, j2) J M | T^(k)_q(1) | (j1', j2) J' M'>");
    CHECK(s.report.mismatches == 0);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "3j(") == 1);
    CHECK(count_of(s.text, "6j{") == 1);
    CHECK(count_of(s.text, "<j1 || T^(k) || j1'>") == 1);
    CHECK(count_of(s.text, " + ") == 0);
}

TEST_CASE("a coupled pair that the operator leaves alone is a spectator", "[tensor][coupled][cli]") {
    // ((a b) e, c) J with T on c: Edmonds 7.1.8 with j1 = e, times the orthonormality of the
    // coupled pair's Clebsch-Gordan coefficients, tri(a, b, e) (DLMF 34.3.18 in CG form).
    CHECK(check_equal("<((a, b) e, c) J || T^(k)(3) || ((a, b) e, c') J'>",
                      "tri(a, b, e) * (-1)^(e+c'+J+k) * sqrt((2*J+1)*(2*J'+1)) * 6j{c, J, e; J', c', k} * "
                      "<c || T^(k) || c'>") == 0);
    // An operator on a middle leaf of four: whatever form simplify gives, it equals the
    // definition exactly and keeps no sum over projections.
    auto s = simplify_and_compare("", "<(a, (b, c) e) J || T^(k)(2) || (a, (b', c) e') J'>");
    require_exact(s);
    CHECK(count_of(s.text, "sum(") == 0);
}

TEST_CASE("coupled elements print as written, and the derivation starts from the definition",
          "[tensor][coupled][cli]") {
    auto text = run({"simplify", "--steps", "-e", "<(l, s) j || L^(1)(1) || (l, s) j'>"});
    INFO(text.out);
    CHECK_THAT(text.out, Catch::Contains("<(l, s) j || L^(1)(1) || (l, s) j'>") &&
                             Catch::Contains("coupled states by their Clebsch-Gordan coefficients") &&
                             Catch::Contains("Wigner-Eckart theorem"));
    auto doc = run({"latex", "--fragment", "-e", "<(j1, j2) J M | T^(k)_q(1) | (j1', j2) J' M'>"});
    INFO(doc.out);
    CHECK_THAT(doc.out, Catch::Contains("\\langle (j_{1}, j_{2})\\, J\\, M \\mid T^{(k)}_{q}(1) \\mid"));
}

TEST_CASE("a coupled element that cannot be read says where and why", "[tensor][coupled][cli]") {
    using couplet::testing::simplify_error;
    CHECK_THAT(simplify_error("<(j1, j2) J M | T^(k)_q | (j1', j2) J' M'>"),
               Catch::Contains("1:25") && Catch::Contains("part the operator acts on"));
    CHECK_THAT(simplify_error("<(j1, j2) J M | T^(k)_q(3) | (j1', j2) J' M'>"),
               Catch::Contains("1:24") && Catch::Contains("from 1 to 2"));
    CHECK_THAT(simplify_error("<(j1, j2) J M | T^(k)_q(1) | (j1', (j2, j3) j23) J' M'>"),
               Catch::Contains("1:30") && Catch::Contains("coupled in the same order"));
    CHECK_THAT(simplify_error("<(j1, j1) J || T^(k)(1) || (j1', j2) J'>"), Catch::Contains("coupled twice"));
}
