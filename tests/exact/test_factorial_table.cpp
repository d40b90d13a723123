// Prime sieve and factorial exponent vectors, checked against CLN's factorials.

#include "exact/factorial_table.hpp"

#include <catch2/catch.hpp>

#include <cln/integer.h>

#include <stdexcept>

using couplet::exact::factorial_table;
using couplet::exact::prime_sieve;

namespace {

// v_p(x) by repeated exact division.
std::int32_t valuation(cln::cl_I x, unsigned long p) {
    std::int32_t v = 0;
    for (;;) {
        cln::cl_I_div_t qr = cln::truncate2(x, cln::cl_I(p));
        if (!cln::zerop(qr.remainder)) return v;
        x = qr.quotient;
        ++v;
    }
}

// p^e for e >= 0 (cln::expt_pos never returns for e = 0).
cln::cl_I integer_power(unsigned long p, std::int32_t e) {
    return e == 0 ? cln::cl_I(1) : cln::expt_pos(cln::cl_I(p), static_cast<unsigned long>(e));
}

}  // namespace

TEST_CASE("exact: prime sieve counts and factors", "[exact][factorial]") {
    prime_sieve sieve(100);
    CHECK(sieve.count_upto(1) == 0);
    CHECK(sieve.count_upto(2) == 1);
    CHECK(sieve.count_upto(100) == 25);
    sieve.ensure(10000);
    CHECK(sieve.count_upto(10000) == 1229);
    CHECK(sieve.primes()[sieve.index_of(9973)] == 9973);
    CHECK(sieve.smallest_factor(9973) == 9973);
    CHECK(sieve.smallest_factor(91) == 7);
    CHECK(sieve.smallest_factor(1024) == 2);
}

TEST_CASE("exact: factorial exponent vectors match the factorisation of n!", "[exact][factorial]") {
    factorial_table table;
    for (unsigned long n : {0ul, 1ul, 2ul, 10ul, 97ul, 300ul, 4096ul, 5000ul}) {
        const std::vector<std::int32_t> e = table.exponents(n);
        REQUIRE(e.size() == table.prime_count(n));
        const cln::cl_I f = cln::factorial(static_cast<std::uintptr_t>(n));
        cln::cl_I rebuilt = 1;
        for (std::size_t i = 0; i < e.size(); ++i) {
            if (i < 12 || i + 3 > e.size()) CHECK(e[i] == valuation(f, table.prime(i)));
            rebuilt = rebuilt * integer_power(table.prime(i), e[i]);
        }
        INFO("n = " << n);
        CHECK(rebuilt == f);  // every prime accounted for, with its multiplicity
    }
}

TEST_CASE("exact: accumulating factorials gives the exponents of a quotient", "[exact][factorial]") {
    factorial_table table;
    const std::size_t count = table.prime_count(60);
    std::vector<std::int32_t> acc(factorial_table::padded(count), 0);
    // 60! / (20! 20! 20!) is a multinomial coefficient: all exponents >= 0.
    table.accumulate_factorial(acc.data(), 60, 1);
    table.accumulate_factorial(acc.data(), 20, -3);
    table.accumulate_integer(acc.data(), 12, 2);  // times 144
    cln::cl_I rebuilt = 1;
    for (std::size_t i = 0; i < count; ++i) {
        REQUIRE(acc[i] >= 0);
        rebuilt = rebuilt * integer_power(table.prime(i), acc[i]);
    }
    const cln::cl_I f20 = cln::factorial(20);
    CHECK(rebuilt == cln::exquo(cln::factorial(60), f20 * f20 * f20) * 144);
    for (std::size_t i = count; i < acc.size(); ++i) CHECK(acc[i] == 0);  // padding untouched
}

TEST_CASE("exact: factorial arguments beyond the supported range are refused", "[exact][factorial]") {
    factorial_table table;
    CHECK_THROWS_AS(table.reserve(factorial_table::max_factorial_argument + 1), std::domain_error);
}
