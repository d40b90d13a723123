// Selection rules: every non-admissible argument set gives exact 0; too large ones throw.

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <climits>
#include <stdexcept>

using namespace couplet::exact;

TEST_CASE("exact: admissibility predicates", "[exact][admissibility]") {
    CHECK(triangle(2, 2, 2));
    CHECK(triangle(1, 1, 0));
    CHECK(triangle(1, 2, 3));
    CHECK_FALSE(triangle(1, 1, 1));  // a+b+c = 3/2 not an integer
    CHECK_FALSE(triangle(2, 2, 6));  // c > a+b
    CHECK_FALSE(triangle(6, 2, 2));  // c < |a-b|
    CHECK_FALSE(triangle(-2, 2, 0));
    CHECK_FALSE(triangle(LONG_MAX, LONG_MAX, 1));  // no overflow in a+b
    CHECK(triangle(LONG_MAX - 1, LONG_MAX - 1, LONG_MAX - 1));
    CHECK(projection_ok(3, -3));
    CHECK(projection_ok(0, 0));
    CHECK_FALSE(projection_ok(3, 5));
    CHECK_FALSE(projection_ok(3, 2));  // j-m half-odd
    CHECK_FALSE(projection_ok(-2, 0));
    CHECK_FALSE(projection_ok(LONG_MAX, LONG_MIN));
    CHECK(angular_momentum_ok(0));
    CHECK_FALSE(angular_momentum_ok(-1));
}

TEST_CASE("exact: 3j and Clebsch-Gordan vanish outside the selection rules", "[exact][admissibility]") {
    REQUIRE_FALSE(threej(2, 2, 2, 2, -2, 0).is_zero());
    CHECK(threej(2, 2, 6, 0, 0, 0).is_zero());                // triangle
    CHECK(threej(2, 2, 1, 0, 0, 0).is_zero());                // j1+j2+j3 half-odd
    CHECK(threej(2, 2, 2, 4, -4, 0).is_zero());               // |m| > j
    CHECK(threej(2, 2, 2, 1, -1, 0).is_zero());               // j-m half-odd
    CHECK(threej(2, 2, 2, 2, 0, 0).is_zero());                // m1+m2+m3 != 0
    CHECK(threej(-2, 2, 0, 0, 0, 0).is_zero());               // negative j
    CHECK(threej(2, 2, 2, 0, 0, 0).is_zero());                // admissible, zero by 34.3.5 (J odd)
    CHECK(clebsch_gordan(2, 2, 2, 0, 2, 0).is_zero());        // M != m1+m2
    CHECK(clebsch_gordan(2, 2, 2, -2, 6, 0).is_zero());       // triangle
    CHECK(clebsch_gordan(2, 2, 2, -2, -2, 0).is_zero());      // negative J
    CHECK(clebsch_gordan(2, 1, 2, -1, 2, 0).is_zero());       // j-m half-odd
    CHECK(threej(LONG_MAX, 0, LONG_MAX, 0, 0, 0).is_zero());  // huge but inadmissible: no throw
    CHECK(clebsch_gordan(1, 1, 1, -1, 2, LONG_MIN).is_zero());
}

TEST_CASE("exact: 6j and 9j vanish when any triad fails", "[exact][admissibility]") {
    REQUIRE_FALSE(sixj(2, 2, 2, 2, 2, 2).is_zero());
    CHECK(sixj(2, 2, 6, 2, 2, 2).is_zero());  // (a b c)
    CHECK(sixj(2, 2, 2, 2, 6, 2).is_zero());  // (a e f)
    CHECK(sixj(2, 2, 2, 6, 2, 2).is_zero());  // (d b f)
    CHECK(sixj(2, 2, 2, 2, 2, 1).is_zero());  // parity of (a e f)
    CHECK(sixj(-2, 2, 2, 2, 2, 2).is_zero());
    REQUIRE_FALSE(ninej(2, 2, 2, 2, 2, 2, 2, 2, 0).is_zero());
    CHECK(ninej(2, 2, 6, 2, 2, 2, 2, 2, 0).is_zero());  // row 1
    CHECK(ninej(2, 2, 2, 2, 2, 2, 2, 2, 1).is_zero());  // row 3 and column 3 parity
    CHECK(ninej(2, 2, 2, 2, 2, 2, 6, 2, 4).is_zero());  // column 1
    CHECK(ninej(2, 2, 2, 2, 2, 2, 2, 2, -2).is_zero());
}

TEST_CASE("exact: doubled arguments beyond the supported range throw, within it they work", "[exact][admissibility]") {
    const long beyond = max_doubled_argument + 2;
    CHECK_THROWS_AS(threej(beyond, beyond, 0, 0, 0, 0), std::domain_error);
    CHECK_THROWS_AS(clebsch_gordan(beyond, 0, 0, 0, beyond, 0), std::domain_error);
    CHECK_THROWS_AS(sixj(beyond, beyond, 0, 0, 0, beyond), std::domain_error);
    CHECK_THROWS_AS(ninej(beyond, beyond, 0, beyond, beyond, 0, 0, 0, 0), std::domain_error);
    // (j j 0; m -m 0) at 2j = 20000: DLMF 34.3.1, (-1)^(j-m)/sqrt(2j+1).
    CHECK(threej(20000, 20000, 0, 2, -2, 0) == -number::sqrt_of(cln::cl_RA(1) / 20001));
}
