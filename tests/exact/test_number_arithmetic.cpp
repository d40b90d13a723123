// Arithmetic of couplet::exact::number: canonical form, field operations, square roots.

#include "exact/coprime_ratio.hpp"
#include "exact/number.hpp"

#include <catch2/catch.hpp>

#include <random>
#include <stdexcept>

using couplet::exact::number;
using couplet::exact::power;

namespace {

cln::cl_RA ratio(long p, long q) { return cln::cl_RA(p) / cln::cl_RA(q); }
number root(long n) { return number::sqrt_of(n); }

}  // namespace

TEST_CASE("exact: sqrt_of takes the square part out of the radical", "[exact][number]") {
    CHECK(number::sqrt_of(0).is_zero());
    CHECK(number::sqrt_of(16) == number(4));
    CHECK(number::sqrt_of(12) == number::from_squarefree_term(2, 3));
    CHECK(number::sqrt_of(ratio(2, 35)) == number::from_squarefree_term(ratio(1, 35), 70));
    CHECK(number::sqrt_of(ratio(9, 4)) == number(ratio(3, 2)));
    // 2^40 * 3^3 * 1000003: the cofactor above the trial-division cube root is a prime.
    const cln::cl_I big = cln::expt_pos(cln::cl_I(2), 40) * 27 * 1000003;
    CHECK(number::sqrt_of(big) == number::from_squarefree_term(cln::expt_pos(cln::cl_I(2), 20) * 3, 3 * 1000003));
    // A product of two large primes stays inside the radical.
    const cln::cl_I two_primes = cln::cl_I(1000003) * 1000033;
    CHECK(number::sqrt_of(two_primes * two_primes * 5) == number::from_squarefree_term(two_primes, 5));
    CHECK_THROWS_AS(number::sqrt_of(-1), std::domain_error);
}

TEST_CASE("exact: products of radicals are reduced to square-free radicands", "[exact][number]") {
    CHECK(root(2) * root(2) == number(2));
    CHECK(root(6) * root(10) == number::from_squarefree_term(2, 15));  // sqrt(60) = 2 sqrt(15)
    CHECK(root(2) * root(3) == root(6));
    CHECK((root(3) / root(6)) == number::from_squarefree_term(ratio(1, 2), 2));
    const number x = number(ratio(1, 2)) + root(3) / 2;
    CHECK(x * x == number(1) + root(3) / 2);
}

TEST_CASE("exact: sums keep one coefficient per radicand and drop zeros", "[exact][number]") {
    number x = root(2) + root(3) - root(2);
    CHECK(x == root(3));
    CHECK(x.terms().size() == 1);
    CHECK((root(5) - root(5)).is_zero());
    CHECK((root(5) - root(5)).terms().empty());
    CHECK(number(3) - 3 == number());
    CHECK(-(root(7) - 1) == number(1) - root(7));
}

TEST_CASE("exact: rational numbers are recognised", "[exact][number]") {
    CHECK(number().is_rational());
    CHECK(number(ratio(-3, 70)).is_rational());
    CHECK(number(ratio(-3, 70)).rational_value() == ratio(-3, 70));
    CHECK_FALSE(root(2).is_rational());
    CHECK_THROWS_AS(root(2).rational_value(), std::domain_error);
    CHECK((root(8) * root(2)).is_rational());
}

TEST_CASE("exact: inverse of sums of several radicals", "[exact][number]") {
    const number single = number::from_squarefree_term(ratio(-3, 7), 35);
    CHECK(single * single.inverse() == number(1));
    const number two_terms = number(1) + root(3);
    CHECK(two_terms.inverse() == (root(3) - 1) / 2);
    // Four radicands over two primes, then over three primes.
    const number four = root(2) + root(3) + root(6) + 5;
    CHECK(four * four.inverse() == number(1));
    const number three_primes = root(2) - 2 * root(15) + root(30) / 3 + ratio(1, 5);
    CHECK(three_primes * three_primes.inverse() == number(1));
    CHECK((number(7) / three_primes) * three_primes == number(7));
    CHECK_THROWS_AS(number().inverse(), std::domain_error);
}

TEST_CASE("exact: integer powers", "[exact][number]") {
    const number x = number(1) + root(2);
    CHECK(power(x, 0) == number(1));
    CHECK(power(x, 2) == number(3) + 2 * root(2));
    CHECK(power(x, -1) == root(2) - 1);
    CHECK(power(x, -3) * power(x, 3) == number(1));
    CHECK(power(root(5), 5) == 25 * root(5));
}

TEST_CASE("exact: random expressions obey the field laws exactly", "[exact][number]") {
    const unsigned seed = 811u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937 rng(seed);
    std::uniform_int_distribution<int> small(-9, 9), radicand_pick(0, 5);
    const long radicands[] = {1, 2, 3, 5, 6, 10};
    auto random_number = [&] {
        number x;
        for (int k = 0; k < 3; ++k)
            x += number(ratio(small(rng), 1 + std::abs(small(rng)))) * root(radicands[radicand_pick(rng)]);
        return x;
    };
    for (int trial = 0; trial < 200; ++trial) {
        const number a = random_number(), b = random_number(), c = random_number();
        CHECK(a * (b + c) == a * b + a * c);
        CHECK((a * b) * c == a * (b * c));
        CHECK(a + b - b == a);
        if (!b.is_zero()) {
            CHECK((a / b) * b == a);
        }
    }
}

TEST_CASE("exact: coprime_ratio agrees with CLN's reducing division", "[exact][number]") {
    const unsigned seed = 977u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937_64 rng(seed);
    for (int trial = 0; trial < 2000; ++trial) {
        const int bits = 1 + trial % 190;
        cln::cl_I a =
            cln::ash(cln::cl_I(static_cast<unsigned long long>(rng())), bits) + static_cast<unsigned long long>(rng());
        cln::cl_I b = cln::ash(cln::cl_I(static_cast<unsigned long long>(rng())), bits / 2) + 1;
        const cln::cl_I g = cln::gcd(a, b);
        a = cln::exquo(a, g);
        b = cln::exquo(b, g);
        if (trial % 2) a = -a;
        CHECK(couplet::exact::detail::coprime_ratio(a, b) == a / b);
    }
    CHECK(couplet::exact::detail::coprime_ratio(-7, 1) == cln::cl_RA(-7));
}
