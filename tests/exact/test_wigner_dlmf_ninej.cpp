// 9j symbols: the zero-argument reduction DLMF 34.7.1, and the definition by 3j symbols
// DLMF 34.6.1 (independent of the 6j route the implementation takes).

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <array>
#include <cmath>
#include <random>

using couplet::exact::ninej;
using couplet::exact::number;
using couplet::exact::sixj;
using couplet::exact::threej;
using couplet::exact::triangle;

namespace {

int phase(long exponent) { return (exponent % 2 == 0) ? 1 : -1; }  // (-1)^exponent

bool ninej_admissible(const std::array<long, 9>& j) {
    return triangle(j[0], j[1], j[2]) && triangle(j[3], j[4], j[5]) && triangle(j[6], j[7], j[8]) &&
           triangle(j[0], j[3], j[6]) && triangle(j[1], j[4], j[7]) && triangle(j[2], j[5], j[8]);
}

// DLMF 34.6.1: the sum over all projections of the six 3j symbols of the rows and columns.
number ninej_from_threej(const std::array<long, 9>& j) {
    number total;
    auto row = [&](long ja, long jb, long jc, long ma, long mb) { return threej(ja, jb, jc, ma, mb, -ma - mb); };
    for (long m11 = -j[0]; m11 <= j[0]; m11 += 2)
        for (long m12 = -j[1]; m12 <= j[1]; m12 += 2) {
            const number r1 = row(j[0], j[1], j[2], m11, m12);
            if (r1.is_zero()) continue;
            const long m13 = -m11 - m12;
            for (long m21 = -j[3]; m21 <= j[3]; m21 += 2)
                for (long m22 = -j[4]; m22 <= j[4]; m22 += 2) {
                    const number r2 = row(j[3], j[4], j[5], m21, m22);
                    if (r2.is_zero()) continue;
                    const long m23 = -m21 - m22;
                    for (long m31 = -j[6]; m31 <= j[6]; m31 += 2)
                        for (long m32 = -j[7]; m32 <= j[7]; m32 += 2) {
                            const long m33 = -m31 - m32;
                            const number r3 = row(j[6], j[7], j[8], m31, m32);
                            if (r3.is_zero()) continue;
                            const number c1 = threej(j[0], j[3], j[6], m11, m21, m31);
                            const number c2 = threej(j[1], j[4], j[7], m12, m22, m32);
                            const number c3 = threej(j[2], j[5], j[8], m13, m23, m33);
                            if (c1.is_zero() || c2.is_zero() || c3.is_zero()) continue;
                            total += r1 * r2 * r3 * c1 * c2 * c3;
                        }
                }
        }
    return total;
}

}  // namespace

TEST_CASE("exact: DLMF 34.7.1: a 9j with a zero argument is a 6j", "[exact][wigner][dlmf]") {
    int checked = 0;
    for (long a = 0; a <= 6; ++a)
        for (long b = 0; b <= 6; ++b)
            for (long c = 0; c <= 6; ++c)
                for (long d = 0; d <= 6; ++d)
                    for (long e = 0; e <= 6; ++e)
                        for (long g = 0; g <= 6; ++g) {
                            const std::array<long, 9> nine{a, b, c, d, e, c, g, g, 0};
                            if (!ninej_admissible(nine)) {
                                CHECK(ninej(a, b, c, d, e, c, g, g, 0).is_zero());
                                continue;
                            }
                            // (-1)^(j12+j21+j13+j31) / sqrt((2j13+1)(2j31+1)) {j11 j12 j13; j22 j21 j31}
                            const number expected = phase((b + d + c + g) / 2) *
                                                    number::sqrt_of(cln::cl_RA(1) / ((c + 1) * (g + 1))) *
                                                    sixj(a, b, c, e, d, g);
                            INFO("2j = " << a << " " << b << " " << c << " " << d << " " << e << " " << g);
                            CHECK(ninej(a, b, c, d, e, c, g, g, 0) == expected);
                            ++checked;
                        }
    CHECK(checked > 2000);
}

TEST_CASE("exact: DLMF 34.6.1: the 9j as a sum over projections of six 3j symbols", "[exact][wigner][dlmf]") {
    const unsigned seed = 3461u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937 rng(seed);
    std::uniform_int_distribution<long> pick(0, 3);  // j <= 3/2
    int checked = 0, nonzero = 0;
    while (checked < 40) {
        std::array<long, 9> j;
        for (long& v : j) v = pick(rng);
        if (!ninej_admissible(j)) continue;
        const number direct = ninej(j[0], j[1], j[2], j[3], j[4], j[5], j[6], j[7], j[8]);
        INFO("2j = " << j[0] << " " << j[1] << " " << j[2] << " " << j[3] << " " << j[4] << " " << j[5] << " " << j[6]
                     << " " << j[7] << " " << j[8]);
        CHECK(direct == ninej_from_threej(j));
        ++checked;
        nonzero += !direct.is_zero();
    }
    CHECK(nonzero > 20);
}

TEST_CASE("exact: DLMF 34.7.1 at 2j = 20000", "[exact][wigner][dlmf][large]") {
    // {j j j; j j j; j j 0} = (-1)^(4j) / (2j+1) {j j j; j j j} with j = 10000: the 6j is a
    // Racah sum of 10001 terms over integers of about 500000 bits.
    const long t = 20000;
    const number six = sixj(t, t, t, t, t, t);
    CHECK(ninej(t, t, t, t, t, t, t, t, 0) == six * number(cln::cl_RA(1) / (t + 1)));
    CHECK(six.is_rational());
    // 6j orthogonality (from memory) bounds |{a b c; d e f}| by 1/sqrt((2c+1)(2f+1)).
    CHECK(std::fabs(six.to_double()) <= 1.0 / (t + 1));
}
