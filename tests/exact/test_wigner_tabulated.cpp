// A few tabulated values, exactly; each also against GSL 2.7 in double precision.

#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <gsl/gsl_sf_coupling.h>

#include <cmath>

using couplet::exact::ninej;
using couplet::exact::number;
using couplet::exact::sixj;
using couplet::exact::threej;

namespace {
cln::cl_RA ratio(long p, long q) { return cln::cl_RA(p) / cln::cl_RA(q); }
}  // namespace

TEST_CASE("exact: 6j{1,1,1|1,1,1} = 1/6", "[exact][wigner][tabulated]") {
    const number x = sixj(2, 2, 2, 2, 2, 2);
    CHECK(x == number(ratio(1, 6)));                                                      // from memory
    CHECK(x.to_double() == Approx(gsl_sf_coupling_6j(2, 2, 2, 2, 2, 2)).epsilon(1e-13));  // GSL 2.7 gsl_sf_coupling_6j
    CHECK(x.to_string() == "1/6");
}

TEST_CASE("exact: 6j{2,2,2|2,2,2} = -3/70", "[exact][wigner][tabulated]") {
    const number x = sixj(4, 4, 4, 4, 4, 4);
    CHECK(x == number(ratio(-3, 70)));                                                    // from memory
    CHECK(x.to_double() == Approx(gsl_sf_coupling_6j(4, 4, 4, 4, 4, 4)).epsilon(1e-13));  // GSL 2.7 gsl_sf_coupling_6j
}

TEST_CASE("exact: 9j{2,2,2|2,2,2|2,2,2} = 41/2450", "[exact][wigner][tabulated]") {
    const number x = ninej(4, 4, 4, 4, 4, 4, 4, 4, 4);
    CHECK(x == number(ratio(41, 2450)));  // from memory
    CHECK(x.to_double() ==
          Approx(gsl_sf_coupling_9j(4, 4, 4, 4, 4, 4, 4, 4, 4)).epsilon(1e-12));  // GSL 2.7 gsl_sf_coupling_9j
}

TEST_CASE("exact: 3j(2,2,2|0,0,0) = -sqrt(2/35)", "[exact][wigner][tabulated]") {
    const number x = threej(4, 4, 4, 0, 0, 0);
    // DLMF 34.3.5 with J = 6: -sqrt(2!2!2!/7!) 3!/(1!1!1!) = -sqrt(2/35)
    CHECK(x == -number::sqrt_of(ratio(2, 35)));
    CHECK(x.to_string() == "-sqrt(70)/35");
    CHECK(x.to_double() == Approx(gsl_sf_coupling_3j(4, 4, 4, 0, 0, 0)).epsilon(1e-13));  // GSL 2.7 gsl_sf_coupling_3j
}

TEST_CASE("exact: 3j(1/2,1/2,1|1/2,-1/2,0) = 1/sqrt(6)", "[exact][wigner][tabulated]") {
    const number x = threej(1, 1, 2, 1, -1, 0);
    CHECK(x == number::sqrt_of(ratio(1, 6)));             // DLMF 34.3.2 with j = 1/2, m = 1/2
    CHECK(x.to_decimal(20) == "0.40824829046386301637");  // from memory: 1/sqrt(6) = 0.4082482904638630163662...
    CHECK(x.to_double() == Approx(gsl_sf_coupling_3j(1, 1, 2, 1, -1, 0)).epsilon(1e-13));  // GSL 2.7 gsl_sf_coupling_3j
}

TEST_CASE("exact: 6j with all j = 43, where GSL overflows, is computed exactly", "[exact][wigner][tabulated]") {
    const number x = sixj(86, 86, 86, 86, 86, 86);
    REQUIRE(x.terms().size() == 1);
    CHECK(x.is_rational());  // every triad is (43 43 43): the square roots pair up
    // 6j orthogonality (from memory) bounds |{a b c; d e f}| by 1/sqrt((2c+1)(2f+1)) for the
    // two entries of any column: here 1/87.
    CHECK(std::fabs(x.to_double()) <= 1.0 / 87.0);
}
