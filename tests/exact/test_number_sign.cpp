// Exact sign of sums of square roots, including differences far below any fixed precision.

#include "exact/number.hpp"

#include <catch2/catch.hpp>

#include <cln/float.h>
#include <cln/lfloat.h>
#include <cln/real.h>

#include <random>

using couplet::exact::compare;
using couplet::exact::number;

namespace {

cln::cl_RA ratio(long p, long q) { return cln::cl_RA(p) / cln::cl_RA(q); }
number root(long n) { return number::sqrt_of(n); }

// The k-th convergent p/q of sqrt(2), from p' = p + 2q, q' = p + q; p^2 - 2q^2 = (-1)^(k+1).
void pell_convergent(int k, cln::cl_I& p, cln::cl_I& q) {
    p = 1;
    q = 1;
    for (int i = 0; i < k; ++i) {
        cln::cl_I next_p = p + 2 * q;
        q = p + q;
        p = next_p;
    }
}

}  // namespace

TEST_CASE("exact: sign of single terms and simple sums", "[exact][number][sign]") {
    CHECK(number().sign() == 0);
    CHECK(number(ratio(-1, 3)).sign() == -1);
    CHECK((-root(6) / 6).sign() == -1);
    CHECK((root(2) - 1).sign() == 1);
    CHECK((root(2) + root(3) - root(10)).sign() == -1);  // 3.1463 < 3.1623
    CHECK((root(2) + root(3) - root(9)).sign() == 1);    // 3.1463 > 3
    CHECK((root(6) - root(2) - root(3) + 1).sign() == 1);
    CHECK(compare(root(2) + root(3), root(10)) == -1);
    CHECK(root(5) > number(2));
    CHECK(number(ratio(9, 4)) > root(5));
    CHECK(root(2) * root(3) <= root(6));
}

TEST_CASE("exact: sign of p/q - sqrt(2) for convergents far beyond float precision", "[exact][number][sign]") {
    // k = 1500 puts |p/q - sqrt(2)| near 1e-1148: no 512-bit enclosure decides it, so the
    // exact reasoning has to.
    for (int k : {1, 2, 10, 11, 60, 61, 1500, 1501}) {
        cln::cl_I p, q;
        pell_convergent(k, p, q);
        const number difference = number(cln::cl_RA(p) / q) - root(2);
        INFO("k = " << k);
        CHECK(difference.sign() == (k % 2 == 1 ? 1 : -1));  // sign(p^2 - 2 q^2)
        CHECK((-difference).sign() == -difference.sign());
    }
}

TEST_CASE("exact: sign of a three-prime sum against decimal bounds 700 digits deep", "[exact][number][sign]") {
    // floor and ceiling of (sqrt2+sqrt3+sqrt5) 10^700, from 2600-digit CLN floats, bracket
    // the sum; the differences (~1e-700) are again beyond the float check.
    const auto format = cln::float_format(2600);
    const cln::cl_F value =
        cln::sqrt(cln::cl_float(2, format)) + cln::sqrt(cln::cl_float(3, format)) + cln::sqrt(cln::cl_float(5, format));
    const cln::cl_I scale = cln::expt_pos(cln::cl_I(10), 700);
    const cln::cl_I below = cln::floor1(value * scale);
    const number sum = root(2) + root(3) + root(5);
    CHECK((sum - number(cln::cl_RA(below) / scale)).sign() == 1);
    CHECK((sum - number(cln::cl_RA(below + 1) / scale)).sign() == -1);
    CHECK((number(cln::cl_RA(below) / scale) - sum).sign() == -1);
}

TEST_CASE("exact: sign is multiplicative and agrees with the double value", "[exact][number][sign]") {
    const unsigned seed = 4242u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937 rng(seed);
    std::uniform_int_distribution<int> coefficient(-20, 20), radicand_pick(0, 7);
    const long radicands[] = {1, 2, 3, 5, 6, 7, 10, 15};
    for (int trial = 0; trial < 300; ++trial) {
        number a, b;
        for (int k = 0; k < 4; ++k) {
            a += number(ratio(coefficient(rng), 7)) * root(radicands[radicand_pick(rng)]);
            b += number(ratio(coefficient(rng), 3)) * root(radicands[radicand_pick(rng)]);
        }
        CHECK((a * b).sign() == a.sign() * b.sign());
        const double approx = a.to_double();
        if (approx > 1e-9) CHECK(a.sign() == 1);
        if (approx < -1e-9) CHECK(a.sign() == -1);
    }
}
