// The propagating enumeration of sums (indices solved from equalities, rules checked and
// factors evaluated as soon as their slots are bound, coupling symbols remembered) against the
// plain interval enumeration, and the cases where the two could part: an index solved with a
// coefficient other than 1, parities, half-integer phase exponents, values that are not
// multiples of 1/2.
#include <catch2/catch.hpp>

#include <random>

#include "eval/evaluate.hpp"
#include "network/network_points.hpp"
#include "network/random_network.hpp"
#include "support.hpp"

using namespace couplet;
using exact::number;

namespace {

evaluation_limits by(sum_enumeration e) {
    evaluation_limits limits;
    limits.enumeration = e;
    return limits;
}

struct both_ways {
    compiled_expression propagating, intervals;
    both_ways(const GiNaC::ex& e, const quantum_numbers& numbers)
        : propagating(e, numbers, by(sum_enumeration::propagating)),
          intervals(e, numbers, by(sum_enumeration::intervals)) {}
};

GiNaC::symbol sym(const lowered_program& p, const std::string& name) { return p.numbers.find(name)->symbol; }

}  // namespace

TEST_CASE("random m-sums: the propagating enumeration equals the interval enumeration", "[eval][propagate]") {
    // Common practice, no source: two enumerations of the same finite sum give the same exact value.
    std::mt19937 rng(7);
    int points = 0, nonzero = 0;
    for (int k = 0; k < 120; ++k) {
        auto net = testing::make_random_network(rng, 2, 6, 3);
        INFO(net.text);
        auto program = testing::lower_text(net.text);
        GiNaC::ex input = program.statements.back().value;
        both_ways e(input, program.numbers);
        testing::network_points sampler(input, program.numbers, 500 + k, 4);
        for (int n = 0; n < 6; ++n) {
            auto at = sampler.next();
            if (!at) break;
            INFO(describe(*at));
            number fast = e.propagating.at(*at);
            CHECK(fast == e.intervals.at(*at));
            // The remembered symbol values must not change a second evaluation.
            CHECK(fast == e.propagating.at(*at));
            ++points;
            nonzero += !fast.is_zero();
        }
    }
    CHECK(points > 500);
    CHECK(nonzero > 100);
}

TEST_CASE("the network corpus sums agree between the two enumerations at random points", "[eval][propagate]") {
    // The nine-projection sum of DLMF 34.6.1 (six 3j) and the four-3j sum of DLMF 34.4.1: the
    // widest plans of the corpus, with most indices solved from m1 + m2 + m3 = 0.
    for (std::string text :
         {"sum(x11, x12, x13, x21, x22, x23, x31, x32, x33 : 3j(a11, a12, a13; x11, x12, x13)"
          " * 3j(a21, a22, a23; x21, x22, x23) * 3j(a31, a32, a33; x31, x32, x33)"
          " * 3j(a11, a21, a31; x11, x21, x31) * 3j(a12, a22, a32; x12, x22, x32)"
          " * 3j(a13, a23, a33; x13, x23, x33))",
          "sum(m1, m2, m3, u1, u2, u3 : (-1)^(l1 + l2 + l3 - u1 - u2 - u3) * 3j(j1, j2, j3; m1, m2, m3)"
          " * 3j(j1, l2, l3; m1, u2, -u3) * 3j(l1, j2, l3; -u1, m2, u3) * 3j(l1, l2, j3; u1, -u2, m3))"}) {
        auto program = testing::lower_text(text);
        GiNaC::ex input = program.statements.back().value;
        both_ways e(input, program.numbers);
        testing::network_points sampler(input, program.numbers, 11, 4);
        int nonzero = 0;
        for (int n = 0; n < 40; ++n) {
            auto at = sampler.next();
            REQUIRE(at);
            INFO(text << " at " << describe(*at));
            number fast = e.propagating.at(*at);
            CHECK(fast == e.intervals.at(*at));
            nonzero += !fast.is_zero();
        }
        CHECK(nonzero > 5);
    }
}

TEST_CASE("an index solved from an equality with coefficient 2", "[eval][propagate]") {
    // Definition of delta (common practice, no source): sum_x delta(2x, k) (2x+1) = k+1 when
    // x = k/2 is a multiple of 1/2, that is when k is an integer, and 0 otherwise.
    auto program = testing::lower_text("sum(x : delta(2*x, k) * (2*x + 1))");
    both_ways e(program.statements.back().value, program.numbers);
    for (int twice_k = 0; twice_k <= 12; ++twice_k) {
        assignment at{{sym(program, "k"), GiNaC::numeric(twice_k, 2)}};
        number expected = twice_k % 2 == 0 ? number(twice_k / 2 + 1L) : number();
        INFO("2k = " << twice_k);
        CHECK(e.propagating.at(at) == expected);
        CHECK(e.intervals.at(at) == expected);
    }
}

TEST_CASE("a solved index keeps its declared parity", "[eval][propagate]") {
    // Definition of delta (common practice, no source): with l declared an integer,
    // sum_l delta(2l, k) (l+1) is k/2+1 for even k and 0 for odd k (l would be half-odd).
    auto program = testing::lower_text("int l\nsum(l : delta(2*l, k) * (l + 1))");
    both_ways e(program.statements.back().value, program.numbers);
    for (int k = 0; k <= 9; ++k) {
        assignment at{{sym(program, "k"), GiNaC::numeric(k)}};
        number expected = k % 2 == 0 ? number(k / 2 + 1L) : number();
        INFO("k = " << k);
        CHECK(e.propagating.at(at) == expected);
        CHECK(e.intervals.at(at) == expected);
    }
}

TEST_CASE("a looped projection steps over the parity that j - m integral fixes", "[eval][propagate]") {
    // DLMF 34.3.1: (j j 0; m -m 0) = (-1)^(j-m) / sqrt(2j+1), so the sum of (-1)^(j-m) times it
    // over the 2j+1 projections is sqrt(2j+1); s is declared half-odd.
    auto program = testing::lower_text("half s\nsum(m : (-1)^(s - m) * 3j(s, s, 0; m, -m, 0))");
    both_ways e(program.statements.back().value, program.numbers);
    for (int twice_s = 1; twice_s <= 15; twice_s += 2) {
        assignment at{{sym(program, "s"), GiNaC::numeric(twice_s, 2)}};
        CHECK(e.propagating.at(at) == number::sqrt_of(cln::cl_RA(twice_s + 1)));
    }
}

TEST_CASE("a hoisted phase is an error only where a term survives", "[eval][propagate]") {
    // (-1)^j does not depend on m and is evaluated once per sum; at j = 1/2 its exponent is not
    // an integer.  Where every term vanishes by a triangle (j j 3) the sum is 0, as the interval
    // enumeration (which never reaches the phase) says; where terms survive it is an error.
    auto vanishing = testing::lower_text("sum(m : (-1)^j * 3j(j, j, 3; m, -m, 0))");
    both_ways v(vanishing.statements.back().value, vanishing.numbers);
    assignment half{{sym(vanishing, "j"), GiNaC::numeric(1, 2)}};
    CHECK(v.propagating.at(half).is_zero());
    CHECK(v.intervals.at(half).is_zero());

    auto surviving = testing::lower_text("sum(m : (-1)^j * 3j(j, j, 1; m, -m, 0))");
    both_ways s(surviving.statements.back().value, surviving.numbers);
    assignment at{{sym(surviving, "j"), GiNaC::numeric(1, 2)}};
    CHECK_THROWS_AS(s.propagating.at(at), evaluation_error);
    CHECK_THROWS_AS(s.intervals.at(at), evaluation_error);
}

TEST_CASE("a value that is not a multiple of 1/2 is evaluated with rationals", "[eval][propagate]") {
    // Plain arithmetic (common practice, no source): x^2 + 1 at x = 1/3 is 10/9.
    auto program = testing::lower_text("x^2 + 1");
    compiled_expression e(program.statements.back().value, program.numbers);
    assignment at{{sym(program, "x"), GiNaC::numeric(1, 3)}};
    CHECK(e.at(at) == number(cln::cl_RA(10) / 9));
}

TEST_CASE("an unbounded index is still reported by the propagating enumeration", "[eval][propagate]") {
    auto program = testing::lower_text("sum(x : (2*x + 1) * 3j(a, b, c; 0, 0, 0))");
    compiled_expression e(program.statements.back().value, program.numbers);
    assignment at{{sym(program, "a"), GiNaC::numeric(1)},
                  {sym(program, "b"), GiNaC::numeric(1)},
                  {sym(program, "c"), GiNaC::numeric(0)}};
    CHECK_THROWS_WITH(e.at(at), Catch::Contains("nothing bounds the summation index 'x'"));
}
