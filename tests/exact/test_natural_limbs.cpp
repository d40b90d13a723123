// The word-limb naturals under the Racah sums, checked against cln::cl_I.

#include "exact/natural.hpp"

#include <catch2/catch.hpp>

#include <random>

using couplet::exact::detail::natural;

namespace {

cln::cl_I random_integer(std::mt19937_64& rng, int words) {
    cln::cl_I x = 0;
    for (int i = 0; i < words; ++i) x = cln::logior(cln::ash(x, 64), cln::cl_I(static_cast<unsigned long long>(rng())));
    return x;
}

}  // namespace

TEST_CASE("exact: natural arithmetic agrees with cl_I", "[exact][natural]") {
    const unsigned seed = 31u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937_64 rng(seed);
    using couplet::exact::detail::from_cl_I;
    using couplet::exact::detail::to_cl_I;
    for (int trial = 0; trial < 500; ++trial) {
        const int words_a = trial % 9, words_b = (trial / 9) % 7;
        const cln::cl_I a = random_integer(rng, words_a), b = random_integer(rng, words_b);
        const std::uint64_t w = rng() | 1;
        REQUIRE(to_cl_I(from_cl_I(a)) == a);

        natural x = from_cl_I(a);
        x.multiply_word(w);
        CHECK(to_cl_I(x) == a * cln::cl_I(static_cast<unsigned long long>(w)));

        x = from_cl_I(a);
        x.add(from_cl_I(b));
        CHECK(to_cl_I(x) == a + b);

        const cln::cl_I big = a > b ? a : b, small = a > b ? b : a;
        x = from_cl_I(big);
        x.subtract(from_cl_I(small));
        CHECK(to_cl_I(x) == big - small);
        x = from_cl_I(small);
        x.subtract_from(from_cl_I(big));
        CHECK(to_cl_I(x) == big - small);

        x = from_cl_I(a);
        x.multiply(from_cl_I(b));
        CHECK(to_cl_I(x) == a * b);

        x = from_cl_I(a * cln::cl_I(static_cast<unsigned long long>(w)));
        couplet::exact::detail::divide_exact(x, w, couplet::exact::detail::inverse_mod_word(w));
        CHECK(to_cl_I(x) == a);

        x = from_cl_I(cln::ash(a, trial % 130));
        CHECK(x.remove_twos(1000) == (cln::zerop(a) ? 0 : cln::ord2(a) + trial % 130));
        CHECK(compare(from_cl_I(a), from_cl_I(b)) == (a < b ? -1 : (a == b ? 0 : 1)));
    }
}

TEST_CASE("exact: Hensel residues decide divisibility by every prime of a modulus", "[exact][natural]") {
    const unsigned seed = 57u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937_64 rng(seed);
    const std::uint64_t modulus = 3ull * 3 * 5 * 7 * 11 * 13 * 101 * 1009;
    const std::uint64_t inverse = couplet::exact::detail::inverse_mod_word(modulus);
    CHECK(modulus * inverse == 1);
    for (int trial = 0; trial < 300; ++trial) {
        cln::cl_I x = random_integer(rng, 1 + trial % 6);
        if (trial % 3 == 0) x = x * 9 * 1009;
        const std::uint64_t residue =
            couplet::exact::detail::hensel_residue(couplet::exact::detail::from_cl_I(x), modulus, inverse);
        for (unsigned long p : {3ul, 9ul, 5ul, 7ul, 11ul, 13ul, 101ul, 1009ul}) {
            const bool divides = cln::zerop(cln::mod(x, cln::cl_I(p)));
            CHECK((residue % p == 0) == divides);
        }
    }
}
