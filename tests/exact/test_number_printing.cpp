// Printing of couplet::exact::number: input syntax, decimals, doubles.

#include "exact/number.hpp"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>
#include <sstream>
#include <stdexcept>

using couplet::exact::number;

namespace {

cln::cl_RA ratio(long p, long q) { return cln::cl_RA(p) / cln::cl_RA(q); }
number root(long n) { return number::sqrt_of(n); }

}  // namespace

TEST_CASE("exact: to_string writes the couplet input syntax", "[exact][number][print]") {
    CHECK(number().to_string() == "0");
    CHECK(number(ratio(1, 6)).to_string() == "1/6");
    CHECK(number(-12).to_string() == "-12");
    CHECK((-root(6) / 6).to_string() == "-sqrt(6)/6");
    CHECK((3 * root(35) / 70).to_string() == "3*sqrt(35)/70");
    CHECK(number(ratio(-3, 70)).to_string() == "-3/70");
    CHECK((number(ratio(1, 2)) + root(3) / 2).to_string() == "1/2+sqrt(3)/2");
    CHECK((root(3) / 2 + number(ratio(1, 2))).to_string() == "1/2+sqrt(3)/2");  // ascending radicand
    CHECK((root(2) - 4 * root(3) / 5 - 1).to_string() == "-1+sqrt(2)-4*sqrt(3)/5");
    CHECK(root(2).to_string() == "sqrt(2)");
    std::ostringstream os;
    os << -root(10) / 3;
    CHECK(os.str() == "-sqrt(10)/3");
}

TEST_CASE("exact: to_decimal rounds correctly to significant digits", "[exact][number][print]") {
    CHECK((-root(6) / 6).to_decimal(20) ==
          "-0.40824829046386301637");  // from memory: 1/sqrt(6) = 0.4082482904638630163662...
    CHECK(number().to_decimal(5) == "0");
    CHECK(number(ratio(1, 6)).to_decimal(5) == "0.16667");
    CHECK(number(ratio(1, 8)).to_decimal(2) == "0.13");  // an exact tie rounds up
    CHECK(number(ratio(-3, 70)).to_decimal(6) == "-0.0428571");
    CHECK(number(123).to_decimal(3) == "123");
    CHECK(number(ratio(12345, 10)).to_decimal(3) == "1.23e3");
    CHECK(number(ratio(9999, 1000)).to_decimal(2) == "10");  // rounding carries into a new digit
    CHECK(number(ratio(1, 1000000000)).to_decimal(3) == "1.00e-9");
    CHECK(root(2).to_decimal(1) == "1");
    // from memory: sqrt(2) = 1.41421356237309504880168872420969807856967187537694...
    CHECK(root(2).to_decimal(50) == "1.4142135623730950488016887242096980785696718753769");
    // from memory: sqrt(3) = 1.73205080756887729352744634150587236694280525381038..., so
    // 1/2 + sqrt(3)/2 = 1.36602540378443864676372317075293618347140262690519...
    CHECK((number(ratio(1, 2)) + root(3) / 2).to_decimal(30) == "1.36602540378443864676372317075");
    CHECK_THROWS_AS(root(2).to_decimal(0), std::invalid_argument);
}

TEST_CASE("exact: to_double never overflows on huge numerators and denominators", "[exact][number][print]") {
    const cln::cl_I huge = cln::expt_pos(cln::cl_I(10), 5000);
    const number nearly_one_third = number(cln::cl_RA(huge) / (3 * huge + 1));
    CHECK(nearly_one_third.to_double() == Approx(1.0 / 3.0).epsilon(1e-15));
    const number scaled_root = number::from_squarefree_term(cln::cl_RA(huge + 1) / huge, 2);
    CHECK(scaled_root.to_double() == Approx(std::sqrt(2.0)).epsilon(1e-15));
    CHECK(number(cln::cl_RA(huge)).to_double() == std::numeric_limits<double>::infinity());
    CHECK(number(cln::cl_RA(1) / huge).to_double() == 0.0);
    CHECK((-root(6) / 6).to_double() == Approx(-0.408248290463863).epsilon(1e-15));
}

TEST_CASE("exact: to_double of a sum that nearly cancels is accurate", "[exact][number][print]") {
    // 665857/470832 is a continued-fraction convergent of sqrt(2): the difference is
    // about 1.6e-12, far below the size of the terms.
    const number difference = number(ratio(665857, 470832)) - root(2);
    const double expected = 1.0 / (470832.0 * 470832.0 * 2.0 * std::sqrt(2.0));  // ~ 1/(2 sqrt2 q^2)
    CHECK(difference.to_double() == Approx(expected).epsilon(1e-6));
    CHECK(difference.to_decimal(5) == "1.5949e-12");
}

TEST_CASE("exact: to_double of one word-sized term is the double nearest to its 40-digit decimal",
          "[exact][number][print]") {
    // The extended-precision path against the exact decimal expansion (to_decimal works in
    // integers), read back by strtod, which rounds to nearest (C standard, 7.22.1.3).
    std::size_t differ = 0, checked = 0;
    for (long r : {1L, 2L, 3L, 5L, 6L, 7L, 30L, 105L, 1155L, 4294967291L, 2305843009213693951L})
        for (long p = -400; p <= 400; p += 7)
            for (long q : {1L, 3L, 7L, 10L, 99L, 1024L, 999999937L}) {
                if (p == 0) continue;
                const number x = number::from_squarefree_term(ratio(p, q), r);
                ++checked;
                if (x.to_double() != std::strtod(x.to_decimal(40).c_str(), nullptr)) ++differ;
            }
    CHECK(checked > 5000);
    CHECK(differ == 0);
}
