// 3j closed forms of DLMF 34.3.1-34.3.7, each written out here from the formula and
// evaluated with CLN factorials, compared exactly with the Racah sum.

#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <cln/integer.h>
#include <cln/rational.h>

using couplet::exact::number;
using couplet::exact::threej;

namespace {

cln::cl_I fact(long n) { return cln::factorial(static_cast<unsigned int>(n)); }
int phase(long exponent) { return (exponent % 2 == 0) ? 1 : -1; }  // (-1)^exponent
number signed_root(int sign, const cln::cl_RA& square) { return sign * number::sqrt_of(square); }

}  // namespace

TEST_CASE("exact: DLMF 34.3.1: (j j 0 | m -m 0)", "[exact][wigner][dlmf]") {
    for (long tj = 0; tj <= 60; ++tj)
        for (long tm = -tj; tm <= tj; tm += 2) {
            // (-1)^(j-m) / sqrt(2j+1)
            const number expected = signed_root(phase((tj - tm) / 2), cln::cl_RA(1) / (tj + 1));
            INFO("2j=" << tj << " 2m=" << tm);
            CHECK(threej(tj, tj, 0, tm, -tm, 0) == expected);
        }
}

TEST_CASE("exact: DLMF 34.3.2: (j j 1 | m -m 0)", "[exact][wigner][dlmf]") {
    for (long tj = 1; tj <= 60; ++tj)
        for (long tm = -tj; tm <= tj; tm += 2) {
            // (-1)^(j-m) 2m / sqrt(2j (2j+1) (2j+2))
            const number expected =
                tm * signed_root(phase((tj - tm) / 2), cln::cl_RA(1) / (cln::cl_I(tj) * (tj + 1) * (tj + 2)));
            INFO("2j=" << tj << " 2m=" << tm);
            CHECK(threej(tj, tj, 2, tm, -tm, 0) == expected);
        }
}

TEST_CASE("exact: DLMF 34.3.3: (j j 1 | m -m-1 1)", "[exact][wigner][dlmf]") {
    for (long tj = 1; tj <= 60; ++tj)
        for (long tm = -tj; tm <= tj; tm += 2) {
            // (-1)^(j-m) sqrt(2 (j-m)(j+m+1) / (2j (2j+1) (2j+2))), with 2(j-m)(j+m+1) = (2j-2m)(2j+2m+2)/2
            const cln::cl_RA square =
                cln::cl_RA(cln::cl_I(tj - tm) * (tj + tm + 2)) / 2 / (cln::cl_I(tj) * (tj + 1) * (tj + 2));
            const number expected = signed_root(phase((tj - tm) / 2), square);
            INFO("2j=" << tj << " 2m=" << tm);
            CHECK(threej(tj, tj, 2, tm, -tm - 2, 2) == expected);
        }
}

TEST_CASE("exact: DLMF 34.3.5: (j1 j2 j3 | 0 0 0)", "[exact][wigner][dlmf]") {
    for (long j1 = 0; j1 <= 18; ++j1)
        for (long j2 = 0; j2 <= 18; ++j2)
            for (long j3 = std::labs(j1 - j2); j3 <= j1 + j2; ++j3) {
                const long J = j1 + j2 + j3;
                number expected;  // 0 for odd J
                if (J % 2 == 0) {
                    // (-1)^(J/2) sqrt((J-2j1)!(J-2j2)!(J-2j3)!/(J+1)!) (J/2)! / ((J/2-j1)!(J/2-j2)!(J/2-j3)!)
                    const cln::cl_RA square =
                        cln::cl_RA(fact(J - 2 * j1) * fact(J - 2 * j2) * fact(J - 2 * j3)) / fact(J + 1);
                    const cln::cl_RA factor =
                        cln::cl_RA(fact(J / 2)) / (fact(J / 2 - j1) * fact(J / 2 - j2) * fact(J / 2 - j3));
                    expected = signed_root(phase(J / 2), square) * number(factor);
                }
                INFO("j = " << j1 << " " << j2 << " " << j3);
                CHECK(threej(2 * j1, 2 * j2, 2 * j3, 0, 0, 0) == expected);
            }
}

TEST_CASE("exact: DLMF 34.3.6: (j1 j2 j1+j2 | m1 m2 -m1-m2)", "[exact][wigner][dlmf]") {
    for (long a = 0; a <= 14; ++a)  // a = 2j1, b = 2j2
        for (long b = 0; b <= 14; ++b)
            for (long tm1 = -a; tm1 <= a; tm1 += 2)
                for (long tm2 = -b; tm2 <= b; tm2 += 2) {
                    // (-1)^(j1-j2+m1+m2) sqrt((2j1)!(2j2)!(j1+j2+m1+m2)!(j1+j2-m1-m2)! /
                    //     ((2j1+2j2+1)!(j1+m1)!(j1-m1)!(j2+m2)!(j2-m2)!))
                    const long up = (a + b + tm1 + tm2) / 2, down = (a + b - tm1 - tm2) / 2;
                    const cln::cl_RA square = cln::cl_RA(fact(a) * fact(b) * fact(up) * fact(down)) /
                                              (fact(a + b + 1) * fact((a + tm1) / 2) * fact((a - tm1) / 2) *
                                               fact((b + tm2) / 2) * fact((b - tm2) / 2));
                    const number expected = signed_root(phase((a - b + tm1 + tm2) / 2), square);
                    INFO("2j1=" << a << " 2j2=" << b << " 2m1=" << tm1 << " 2m2=" << tm2);
                    CHECK(threej(a, b, a + b, tm1, tm2, -tm1 - tm2) == expected);
                }
}

TEST_CASE("exact: DLMF 34.3.7: (j1 j2 j3 | j1 -j1-m3 m3)", "[exact][wigner][dlmf]") {
    int checked = 0;
    for (long a = 0; a <= 12; ++a)
        for (long b = 0; b <= 12; ++b)
            for (long c = std::labs(a - b); c <= a + b; c += 2)
                for (long tm3 = -c; tm3 <= c; tm3 += 2) {
                    const long tm2 = -a - tm3;
                    if (tm2 < -b || tm2 > b) continue;  // (34.3.7) assumes an admissible symbol
                    // (-1)^(j1-j2-m3) sqrt((2j1)!(-j1+j2+j3)!(j1+j2+m3)!(j3-m3)! /
                    //     ((j1+j2+j3+1)!(j1-j2+j3)!(j1+j2-j3)!(-j1+j2-m3)!(j3+m3)!))
                    const cln::cl_RA square =
                        cln::cl_RA(fact(a) * fact((-a + b + c) / 2) * fact((a + b + tm3) / 2) * fact((c - tm3) / 2)) /
                        (fact((a + b + c) / 2 + 1) * fact((a - b + c) / 2) * fact((a + b - c) / 2) *
                         fact((-a + b - tm3) / 2) * fact((c + tm3) / 2));
                    const number expected = signed_root(phase((a - b - tm3) / 2), square);
                    INFO("2j=" << a << " " << b << " " << c << " 2m3=" << tm3);
                    CHECK(threej(a, b, c, a, tm2, tm3) == expected);
                    ++checked;
                }
    CHECK(checked > 1000);
}

TEST_CASE("exact: DLMF 34.3.5 at 2j up to 20000, compared as exact squares", "[exact][wigner][dlmf][large]") {
    // (7000 8000 10000; 0 0 0): a Racah sum of 5001 terms with ~200000-bit integers.
    const long j1 = 7000, j2 = 8000, j3 = 10000, J = j1 + j2 + j3;
    const number value = threej(2 * j1, 2 * j2, 2 * j3, 0, 0, 0);
    const cln::cl_RA square = cln::cl_RA(fact(J - 2 * j1) * fact(J - 2 * j2) * fact(J - 2 * j3)) / fact(J + 1);
    const cln::cl_RA factor = cln::cl_RA(fact(J / 2)) / (fact(J / 2 - j1) * fact(J / 2 - j2) * fact(J / 2 - j3));
    REQUIRE(value.terms().size() == 1);
    const auto& [radicand, coefficient] = *value.terms().begin();
    CHECK(coefficient * coefficient * radicand == square * factor * factor);
    CHECK(value.sign() == phase(J / 2));
    // An odd J gives 0 without any sum.
    CHECK(threej(2 * j1, 2 * j2, 2 * j3 + 2, 0, 0, 0).is_zero());
}
