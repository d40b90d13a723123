// 6j closed forms of DLMF 34.5.1-34.5.7 (a lower argument 0, 1/2 or 1), each written out here
// from the formula and compared exactly with the Racah sum, at every admissible j up to 12
// and at a few very large j.

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <cln/integer.h>
#include <cln/rational.h>

#include <functional>

using couplet::exact::number;
using couplet::exact::sixj;
using couplet::exact::triangle;

namespace {

int phase(long exponent) { return (exponent % 2 == 0) ? 1 : -1; }  // (-1)^exponent
number signed_root(int sign, const cln::cl_RA& square) { return sign * number::sqrt_of(square); }
cln::cl_I I(long v) { return cln::cl_I(v); }

bool admissible(long a, long b, long c, long d, long e, long f) {
    return triangle(a, b, c) && triangle(a, e, f) && triangle(d, b, f) && triangle(d, e, c);
}

// Runs `check(a, b, c)` (doubled j1, j2, j3) over every triad up to 2j = limit whose 6j
// {j1 j2 j3; lower(a, b, c)} is admissible; returns how many ran.
int for_each_admissible(long limit, long l1, long dl2, long dl3, const std::function<void(long, long, long)>& check) {
    int count = 0;
    for (long a = 0; a <= limit; ++a)
        for (long b = 0; b <= limit; ++b)
            for (long c = std::labs(a - b); c <= std::min(a + b, limit); c += 2) {
                if (!admissible(a, b, c, l1, c + dl3, b + dl2)) continue;
                INFO("2j = " << a << " " << b << " " << c);
                check(a, b, c);
                ++count;
            }
    return count;
}

}  // namespace

TEST_CASE("exact: DLMF 34.5.1: {j1 j2 j3 | 0 j3 j2}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 0, 0, 0, [](long a, long b, long c) {
        // (-1)^J / sqrt((2j2+1)(2j3+1)),  J = j1+j2+j3
        const number expected = signed_root(phase((a + b + c) / 2), cln::cl_RA(1) / (I(b + 1) * (c + 1)));
        CHECK(sixj(a, b, c, 0, c, b) == expected);
    });
    CHECK(n > 1000);
}

TEST_CASE("exact: DLMF 34.5.2: {j1 j2 j3 | 1/2 j3-1/2 j2+1/2}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 1, 1, -1, [](long a, long b, long c) {
        // (-1)^J sqrt((j1+j3-j2)(j1+j2-j3+1) / ((2j2+1)(2j2+2) 2j3 (2j3+1)))
        const cln::cl_RA square = cln::cl_RA(I(a + c - b) * (a + b - c + 2)) / 4 / (I(b + 1) * (b + 2) * c * (c + 1));
        CHECK(sixj(a, b, c, 1, c - 1, b + 1) == signed_root(phase((a + b + c) / 2), square));
    });
    CHECK(n > 500);
}

TEST_CASE("exact: DLMF 34.5.3: {j1 j2 j3 | 1/2 j3-1/2 j2-1/2}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 1, -1, -1, [](long a, long b, long c) {
        // (-1)^J sqrt((j2+j3-j1)(j1+j2+j3+1) / (2j2 (2j2+1) 2j3 (2j3+1)))
        const cln::cl_RA square = cln::cl_RA(I(b + c - a) * (a + b + c + 2)) / 4 / (I(b) * (b + 1) * c * (c + 1));
        CHECK(sixj(a, b, c, 1, c - 1, b - 1) == signed_root(phase((a + b + c) / 2), square));
    });
    CHECK(n > 500);
}

TEST_CASE("exact: DLMF 34.5.4: {j1 j2 j3 | 1 j3-1 j2-1}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 2, -2, -2, [](long a, long b, long c) {
        // (-1)^J sqrt(J(J+1)(J-2j1)(J-2j1-1) / ((2j2-1) 2j2 (2j2+1) (2j3-1) 2j3 (2j3+1)))
        const long J = (a + b + c) / 2;
        const cln::cl_RA square =
            cln::cl_RA(I(J) * (J + 1) * (J - a) * (J - a - 1)) / (I(b - 1) * b * (b + 1) * (c - 1) * c * (c + 1));
        CHECK(sixj(a, b, c, 2, c - 2, b - 2) == signed_root(phase(J), square));
    });
    CHECK(n > 300);
}

TEST_CASE("exact: DLMF 34.5.5: {j1 j2 j3 | 1 j3-1 j2}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 2, 0, -2, [](long a, long b, long c) {
        // (-1)^J sqrt(2(J+1)(J-2j1)(J-2j2)(J-2j3+1) / (2j2 (2j2+1)(2j2+2)(2j3-1) 2j3 (2j3+1)))
        const long J = (a + b + c) / 2;
        const cln::cl_RA square = cln::cl_RA(2 * I(J + 1) * (J - a) * (J - b) * (J - c + 1)) /
                                  (I(b) * (b + 1) * (b + 2) * (c - 1) * c * (c + 1));
        CHECK(sixj(a, b, c, 2, c - 2, b) == signed_root(phase(J), square));
    });
    CHECK(n > 300);
}

TEST_CASE("exact: DLMF 34.5.6: {j1 j2 j3 | 1 j3-1 j2+1}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 2, 2, -2, [](long a, long b, long c) {
        // (-1)^J sqrt((J-2j2-1)(J-2j2)(J-2j3+1)(J-2j3+2) / ((2j2+1)(2j2+2)(2j2+3)(2j3-1) 2j3 (2j3+1)))
        const long J = (a + b + c) / 2;
        const cln::cl_RA square = cln::cl_RA(I(J - b - 1) * (J - b) * (J - c + 1) * (J - c + 2)) /
                                  (I(b + 1) * (b + 2) * (b + 3) * (c - 1) * c * (c + 1));
        CHECK(sixj(a, b, c, 2, c - 2, b + 2) == signed_root(phase(J), square));
    });
    CHECK(n > 300);
}

TEST_CASE("exact: DLMF 34.5.7: {j1 j2 j3 | 1 j3 j2}", "[exact][wigner][dlmf]") {
    const int n = for_each_admissible(24, 2, 0, 0, [](long a, long b, long c) {
        // (-1)^(J+1) 2 (j2(j2+1) + j3(j3+1) - j1(j1+1)) / sqrt(2j2 (2j2+1)(2j2+2) 2j3 (2j3+1)(2j3+2)),
        // with j(j+1) = 2j (2j+2) / 4
        const long J = (a + b + c) / 2;
        const cln::cl_RA casimirs = cln::cl_RA(I(b) * (b + 2) + I(c) * (c + 2) - I(a) * (a + 2)) / 4;
        const number expected =
            2 * casimirs *
            signed_root(phase(J + 1), cln::cl_RA(1) / (I(b) * (b + 1) * (b + 2) * c * (c + 1) * (c + 2)));
        CHECK(sixj(a, b, c, 2, c, b) == expected);
    });
    CHECK(n > 500);
}

TEST_CASE("exact: DLMF 34.5.1, 34.5.4 and 34.5.7 at large j", "[exact][wigner][dlmf][large]") {
    // Doubled arguments up to 20000 (34.5.1 sums one term; 34.5.4 and 34.5.7 a few).
    {
        const long a = 20000, b = 13001, c = 19999;
        CHECK(sixj(a, b, c, 0, c, b) == signed_root(phase((a + b + c) / 2), cln::cl_RA(1) / (I(b + 1) * (c + 1))));
    }
    {
        const long a = 9000, b = 10000, c = 7002, J = (a + b + c) / 2;
        const cln::cl_RA square =
            cln::cl_RA(I(J) * (J + 1) * (J - a) * (J - a - 1)) / (I(b - 1) * b * (b + 1) * (c - 1) * c * (c + 1));
        CHECK(sixj(a, b, c, 2, c - 2, b - 2) == signed_root(phase(J), square));
    }
    {
        const long a = 12345, b = 9999, c = 5000, J = (a + b + c) / 2;
        const cln::cl_RA casimirs = cln::cl_RA(I(b) * (b + 2) + I(c) * (c + 2) - I(a) * (a + 2)) / 4;
        CHECK(sixj(a, b, c, 2, c, b) ==
              2 * casimirs *
                  signed_root(phase(J + 1), cln::cl_RA(1) / (I(b) * (b + 1) * (b + 2) * c * (c + 1) * (c + 2))));
    }
}
