// The built-in angular momentum J^(1) of a part: its spherical components act by the
// Condon-Shortley ladder coefficients (common practice, no source):
//   J_0 |j m> = m |j m>,  J+ |j m> = sqrt((j-m)(j+m+1)) |j m+1>,  J- |j m> = sqrt((j+m)(j-m+1)) |j m-1>,
//   J_{+1} = -J+/sqrt(2), J_{-1} = J-/sqrt(2)   (Edmonds 1957, eq. 5.1.2 for a vector).
// couplet knows only <j || J^(1) || j'> (Edmonds 5.4.3) and derives every element from it by the
// Wigner-Eckart theorem, so these checks compare that against the definition.
#include <catch2/catch.hpp>

#include "support.hpp"
#include "tensor/element_checks.hpp"

using couplet::testing::check_statement;

TEST_CASE("J^(1) acts by the ladder coefficients", "[tensor][angular-momentum][cli]") {
    CHECK(check_statement("<j m | J^(1)_0 | j m'> == m * delta(m, m')") == 0);
    CHECK(check_statement("<j m' | J^(1)_1 | j m> == -sqrt((j-m)*(j+m+1)/2) * delta(m', m+1)") == 0);
    CHECK(check_statement("<j m' | J^(1)_(-1) | j m> == sqrt((j+m)*(j-m+1)/2) * delta(m', m-1)") == 0);
    // J changes no j: delta(j, j') from its reduced element.
    CHECK(check_statement("<j m | J^(1)_0 | j' m> == delta(j, j') * m") == 0);
    // A wrong sign on J_{+1} is caught (the Condon-Shortley ladder coefficients are >= 0).
    CHECK(check_statement("<j m' | J^(1)_1 | j m> == sqrt((j-m)*(j+m+1)/2) * delta(m', m+1)") == 1);
}

TEST_CASE("the orbital and spin parts of a coupled state l s j", "[tensor][angular-momentum][cli]") {
    // Edmonds (1957) eq. 7.1.7 with eq. 5.4.3 (ket primed):
    //   <(l s) j || l || (l s) j'> = (-1)^(l+s+j'+1) sqrt((2j+1)(2j'+1)) {l j s; j' l 1} sqrt(l(l+1)(2l+1)),
    // and eq. 7.1.8 for s: (-1)^(l+s+j+1) sqrt((2j+1)(2j'+1)) {s j l; j' s 1} sqrt(s(s+1)(2s+1)).
    CHECK(check_statement("<(l, s) j || J^(1)(1) || (l, s) j'> == (-1)^(l+s+j'+1) * sqrt((2*j+1)*(2*j'+1)) * "
                          "6j{l, j, s; j', l, 1} * sqrt(l*(l+1)*(2*l+1))") == 0);
    CHECK(check_statement("<(l, s) j || J^(1)(2) || (l, s) j'> == (-1)^(l+s+j+1) * sqrt((2*j+1)*(2*j'+1)) * "
                          "6j{s, j, l; j', s, 1} * sqrt(s*(s+1)*(2*s+1))") == 0);
    // The total angular momentum: l + s = j, so <(l s) j || J(1) + J(2) || (l s) j'> = <j || J || j'>.
    CHECK(check_statement("<(l, s) j || J^(1)(1) || (l, s) j'> + <(l, s) j || J^(1)(2) || (l, s) j'> == "
                          "tri(l, s, j) * delta(j, j') * sqrt(j*(j+1)*(2*j+1))") == 0);
}

TEST_CASE("the spin-orbit element l.s from the scalar product", "[tensor][angular-momentum][cli]") {
    // Common practice, no source: 2 l.s = j^2 - l^2 - s^2 on the coupled state, which exists
    // where (l, s, j) is a triangle.
    CHECK(check_statement("<(l, s) j m | J^(1)(1) . J^(1)(2) | (l, s) j' m'> == "
                          "tri(l, s, j) * delta(j, j') * delta(m, m') * (j*(j+1) - l*(l+1) - s*(s+1))/2") == 0);
}

TEST_CASE("J is a vector", "[tensor][angular-momentum][cli]") {
    auto r = couplet::testing::run_cli({"simplify", "-e", "<j || J^(2) || j>"});
    CHECK(r.code == 2);
    CHECK_THAT(r.err, Catch::Contains("1:10") && Catch::Contains("rank 1"));
}

TEST_CASE("the projection theorem and the Lande factor", "[tensor][angular-momentum][cli]") {
    // The projection theorem (common practice, no source): within one j, a vector operator
    // acts as <V . j> j / (j(j+1)).  So on |((l s) j, i) F M>, l . i = <l . j> <j . i> / (j(j+1)),
    // with 2 <l . j> = j(j+1) + l(l+1) - s(s+1) and 2 <j . i> = F(F+1) - j(j+1) - i(i+1).
    CHECK(check_statement(
              "<((l, s) j, i) F M | J^(1)(1) . J^(1)(3) | ((l, s) j, i) F M> == tri(l, s, j) * tri(j, i, F) * "
              "(j*(j+1) + l*(l+1) - s*(s+1)) * (F*(F+1) - j*(j+1) - i*(i+1)) / (4*j*(j+1))") == 0);
    // The Lande factor with the spin's g = 2 (from memory):
    //   <(l s) j m | l_z + 2 s_z | (l s) j m> = m (1 + (j(j+1) + s(s+1) - l(l+1)) / (2 j (j+1))).
    CHECK(check_statement("<(l, s) j m | J^(1)_0(1) | (l, s) j m> + 2 * <(l, s) j m | J^(1)_0(2) | (l, s) j m> == "
                          "tri(l, s, j) * m * (1 + (j*(j+1) + s*(s+1) - l*(l+1)) / (2*j*(j+1)))") == 0);
}
