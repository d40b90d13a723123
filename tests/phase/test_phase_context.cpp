// Unit cases of the phase group.  Facts of the trade are marked; the rest is algebra that the
// exhaustive checks below (or test_phase_property.cpp) confirm by evaluation.
#include <catch2/catch.hpp>

#include "phase/context.hpp"

#include <cln/integer.h>
#include <cln/rational_io.h>

#include <cstdlib>
#include <string>

using namespace couplet::phase;

namespace {

const cln::cl_RA half = cln::cl_RA(1) / 2;

const linear_form a = var("a"), b = var("b"), c = var("c"), j = var("j"), m = var("m"), l = var("l"), s = var("s");

context triad_abc() {
    context ctx;
    for (const char* name : {"a", "b", "c"}) ctx.declare_angular(name);
    ctx.add_triad(a, b, c);
    return ctx;
}

// 3j(j1 j2 j3; m1 m2 m3): three angular momenta, their projections, the triad and the m-sum.
context three_j() {
    context ctx;
    for (const char* name : {"j1", "j2", "j3"}) ctx.declare_angular(name);
    for (int k = 1; k <= 3; ++k) ctx.declare_projection("m" + std::to_string(k), var("j" + std::to_string(k)));
    ctx.add_triad(var("j1"), var("j2"), var("j3"));
    ctx.add_zero_sum(var("m1"), var("m2"), var("m3"));
    return ctx;
}

// (-1)^x at an assignment where x is an integer.
int sign_at(const linear_form& x, const assignment& at) {
    const cln::cl_RA value = x.evaluate(at);
    REQUIRE(cln::denominator(value) == 1);
    return cln::oddp(cln::numerator(value)) ? -1 : 1;
}

bool is_half_odd(const cln::cl_RA& v) { return cln::denominator(v) == 2; }

}  // namespace

TEST_CASE("phase: (-1)^(4j) is 1 and (-1)^(2j) stays for unknown parity", "[phase]") {
    context ctx;
    ctx.declare_angular("j");
    CHECK(ctx.canonical(4 * j) == linear_form());  // common practice, no source
    CHECK(ctx.equal(4 * j, 0) == verdict::equal);
    CHECK(ctx.canonical(2 * j) == 2 * j);
    CHECK(ctx.canonical(-2 * j) == 2 * j);
    CHECK(ctx.canonical(6 * j + 1) == 2 * j + 1);
    const comparison cmp = ctx.compare(2 * j, 0);
    REQUIRE(cmp.result == verdict::not_equal);
    CHECK(is_half_odd(cmp.witness->at("j")));
}

TEST_CASE("phase: parity declarations fold (-1)^(2j)", "[phase]") {
    context ctx;
    ctx.declare_angular("l", parity::integer);
    ctx.declare_angular("s", parity::half_odd);
    CHECK(ctx.canonical(2 * l) == linear_form());   // common practice, no source
    CHECK(ctx.canonical(2 * s) == linear_form(1));  // common practice, no source
    CHECK(ctx.canonical(2 * s + 2 * l + 1) == linear_form());
    CHECK(ctx.is_integer(l));
    CHECK(ctx.is_integer(s + half));
    CHECK_FALSE(ctx.is_integer(s));
    CHECK(ctx.canonical(s - half) == s - half);  // not -s+1/2: a negative term reads worse
    CHECK(ctx.canonical(s + cln::cl_RA(3) / 2) == s - half);
}

TEST_CASE("phase: a triad makes 2(a+b+c) null", "[phase]") {
    const context ctx = triad_abc();
    CHECK(ctx.canonical(2 * a + 2 * b + 2 * c) == linear_form());  // common practice, no source
    CHECK(ctx.equal(2 * a + 2 * b, 2 * c) == verdict::equal);
    CHECK(ctx.is_integer(a + b + c));
    CHECK_FALSE(ctx.is_integer(a + b));
    CHECK(ctx.canonical(a + b + c) == a + b + c);
}

TEST_CASE("phase: (-1)^(3a-b+5c) over a triad reads a+b-c, which differs from a+b+c", "[phase]") {
    const context ctx = triad_abc();
    const linear_form x = 3 * a - b + 5 * c;
    CHECK(ctx.canonical(x) == a + b - c);
    CHECK(ctx.equal(x, a + b - c) == verdict::equal);
    // 3a-b+5c - (a+b+c) = 2a-2b+4c == 2a+2b (mod 4j), and 2a+2b == 2c is not null for an
    // unknown c: the two phases differ, e.g. at a = c = 1/2, b = 0.
    const comparison cmp = ctx.compare(x, a + b + c);
    REQUIRE(cmp.result == verdict::not_equal);
    REQUIRE(ctx.admits(*cmp.witness));
    CHECK(sign_at(x, *cmp.witness) != sign_at(a + b + c, *cmp.witness));
    // Exhaustively over small admissible values the rewrite holds and the other does not.
    bool differs_somewhere = false;
    for (int ua = 0; ua <= 4; ++ua)
        for (int ub = 0; ub <= 4; ++ub)
            for (int uc = 0; uc <= 4; ++uc) {
                if ((ua + ub + uc) % 2 != 0 || uc > ua + ub || std::abs(ua - ub) > uc) continue;
                const assignment at{{"a", cln::cl_RA(ua) / 2}, {"b", cln::cl_RA(ub) / 2}, {"c", cln::cl_RA(uc) / 2}};
                CHECK(sign_at(x, at) == sign_at(a + b - c, at));
                differs_somewhere = differs_somewhere || sign_at(x, at) != sign_at(a + b + c, at);
            }
    CHECK(differs_somewhere);
}

TEST_CASE("phase: (-1)^(2m) equals (-1)^(2j) for a projection", "[phase]") {
    context ctx;
    ctx.declare_angular("j");
    ctx.declare_projection("m", j);
    CHECK(ctx.equal(2 * m, 2 * j) == verdict::equal);  // common practice, no source
    CHECK(ctx.canonical(2 * m) == 2 * j);
    CHECK(ctx.is_integer(j - m));
    CHECK(ctx.is_integer(j + m));
    CHECK(ctx.canonical(m - j) == j - m);
    CHECK(ctx.canonical(3 * j - m) == j + m);
    CHECK(ctx.equal(j - m, j + m) == verdict::not_equal);
}

TEST_CASE("phase: an m-sum makes (-1)^(m1+m2+m3) one", "[phase]") {
    const context ctx = three_j();
    const linear_form m1 = var("m1"), m2 = var("m2"), m3 = var("m3");
    CHECK(ctx.canonical(m1 + m2 + m3) == linear_form());  // common practice, no source
    CHECK(ctx.canonical(half * (m1 + m2 + m3)) == linear_form());
    CHECK(ctx.canonical(-m1 - m2) == m3);
    CHECK(ctx.equal(m1 + m2, -m3) == verdict::not_integer);
    CHECK(ctx.equal(var("j3") + m1 + m2, var("j3") - m3) == verdict::equal);
    CHECK(ctx.equal(var("j1") + m1 + m2, var("j1") - m3) == verdict::not_integer);
}

TEST_CASE("phase: (-1)^j with unknown j is not an integer power", "[phase]") {
    context ctx;
    ctx.declare_angular("j");
    const integrality result = ctx.check_integer(j);
    REQUIRE_FALSE(result.integer);
    CHECK(result.witness->at("j") == half);
    CHECK(ctx.equal(j, j) == verdict::not_integer);
    const comparison cmp = ctx.compare(2 * j, j);
    CHECK(cmp.result == verdict::not_integer);
    CHECK(is_half_odd(cmp.witness->at("j")));
    // Not an integer, but still a phase: canonical keeps the same complex value.
    CHECK(ctx.canonical(5 * j) == j);
}

TEST_CASE("phase: constants fold to 0 or 1", "[phase]") {
    context ctx;
    ctx.declare_angular("j");
    CHECK(ctx.canonical(7) == linear_form(1));
    CHECK(ctx.canonical(-3) == linear_form(1));
    CHECK(ctx.canonical(4) == linear_form());
    CHECK(ctx.canonical(-2 * j + 2 * j + 2) == linear_form());
    CHECK(ctx.canonical(cln::cl_RA(5) / 2) == linear_form(half));
    CHECK(ctx.canonical(-half) == linear_form(-half));
    CHECK(ctx.canonical(cln::cl_RA(3) / 2) == linear_form(-half));
    CHECK(ctx.canonical(j + 3) == j + 1);
    CHECK(ctx.equal(1, 3) == verdict::equal);
    CHECK(ctx.equal(1, 2) == verdict::not_equal);
}

TEST_CASE("phase: linear forms in slots", "[phase]") {
    // 3j(j+1/2, l, 1; m, n, -1) with integer l: j+1/2+l+1 integer forces j half-odd.
    context ctx;
    ctx.declare_angular("j");
    ctx.declare_angular("l", parity::integer);
    ctx.declare_projection("m", j + half);
    ctx.declare_projection("n", l);
    ctx.add_triad(j + half, l, 1);
    ctx.add_zero_sum(m, var("n"), -1);
    CHECK(ctx.canonical(2 * j) == linear_form(1));
    CHECK(ctx.is_integer(j + half));
    CHECK_FALSE(ctx.is_integer(j));
    CHECK(ctx.is_integer(m));  // m = 1 - n, with n an integer
    CHECK(ctx.equal(m + var("n"), 1) == verdict::equal);
    CHECK(ctx.canonical(m + var("n")) == linear_form(1));
    CHECK(ctx.canonical(j - m + half) == j + m + half);  // m is an integer here
    const comparison cmp = ctx.compare(m, 0);
    REQUIRE(cmp.result == verdict::not_equal);
    CHECK(ctx.admits(*cmp.witness));
}

TEST_CASE("phase: two odd column permutations of a 3j cost nothing", "[phase]") {
    const context ctx = three_j();
    const linear_form sum = var("j1") + var("j2") + var("j3");
    // DLMF 34.3.9: an odd permutation multiplies by (-1)^(j1+j2+j3), which must be a sign ...
    CHECK(ctx.is_integer(sum));
    // ... and two of them make an even one, which has no phase (DLMF 34.3.8).
    CHECK(ctx.canonical(sum + sum) == linear_form());
}

TEST_CASE("phase: the phases of 3j(j j 0 | m -m 0) and 3j(j j 0 | -m m 0) agree", "[phase]") {
    context ctx;
    ctx.declare_angular("j");
    ctx.declare_projection("m", j);
    ctx.add_triad(j, j, 0);
    ctx.add_zero_sum(m, -m, 0);
    // DLMF 34.3.1 gives (-1)^(j-m) for the first and (-1)^(j+m) for the second; by the sign
    // reversal of DLMF 34.3(ii) they differ by (-1)^(j+j+0), so the phases must match up.
    CHECK(ctx.equal(j - m + 2 * j, j + m) == verdict::equal);
    CHECK(ctx.is_integer(j - m));
}

TEST_CASE("phase: the sum of a 9j's arguments is an integer", "[phase]") {
    context ctx;
    const char* names[9] = {"a", "b", "c", "d", "e", "f", "g", "h", "i"};
    for (const char* name : names) ctx.declare_angular(name);
    linear_form sum;
    for (int r = 0; r < 3; ++r) {
        ctx.add_triad(var(names[3 * r]), var(names[3 * r + 1]), var(names[3 * r + 2]));
        ctx.add_triad(var(names[r]), var(names[r + 3]), var(names[r + 6]));
    }
    for (const char* name : names) sum += var(name);
    // DLMF 34.7(ii): odd permutations of rows or columns give (-1)^R, R the sum of all nine.
    CHECK(ctx.is_integer(sum));
    CHECK(ctx.canonical(2 * sum) == linear_form());
    // Its parity is not fixed: all nine 0 gives R = 0, all nine 1 gives R = 9.
    CHECK(ctx.equal(sum, 0) == verdict::not_equal);
    // Nine terms are beyond the exact search; the descent must still give one form per class.
    const linear_form printed = ctx.canonical(sum);
    CHECK(ctx.equal(printed, sum) == verdict::equal);
    CHECK(ctx.canonical(sum + 2 * (var("a") + var("d") + var("g"))) == printed);
    CHECK(ctx.canonical(3 * sum) == printed);
    CHECK(printed.coefficients().size() <= 9);
}

TEST_CASE("phase: contradictory constraints make every exponent equal", "[phase]") {
    context ctx;
    ctx.declare_angular("l", parity::integer);
    ctx.add_triad(l, l, half);
    CHECK_FALSE(ctx.satisfiable());
    CHECK(ctx.is_integer(l * half));
    CHECK(ctx.equal(l, l + 1) == verdict::equal);
    CHECK(ctx.canonical(l + 1) == linear_form());
}

TEST_CASE("phase: declarations and unknown names", "[phase]") {
    context ctx;
    ctx.add_triad(b, a, 1);  // b and a are met here first, in this order
    CHECK(ctx.variables() == std::vector<std::string>{"b", "a"});
    CHECK(ctx.to_string(a + b) == "b+a");
    CHECK(ctx.parity_of("a") == parity::unknown);
    ctx.declare_angular("a", parity::integer);  // refining unknown is allowed
    CHECK(ctx.parity_of("a") == parity::integer);
    CHECK(ctx.canonical(2 * b) == linear_form());  // b = a + 1 - integer: also an integer
    CHECK_THROWS_AS(ctx.declare_angular("a", parity::half_odd), std::invalid_argument);
    ctx.declare_projection("m", a);
    CHECK(ctx.is_projection("m"));
    CHECK_THROWS_AS(ctx.declare_projection("m", b), std::invalid_argument);
    CHECK_THROWS_AS(ctx.declare_angular("m"), std::invalid_argument);
    CHECK_THROWS_AS(ctx.canonical(var("zz")), unknown_variable);
    CHECK_THROWS_AS(ctx.equal(var("zz"), 0), unknown_variable);
}

TEST_CASE("phase: a witness lies inside the triangles when it can", "[phase]") {
    const context ctx = three_j();
    const linear_form j1 = var("j1"), j2 = var("j2"), j3 = var("j3"), m3 = var("m3");
    const comparison cmp = ctx.compare(j1 - j2 - m3, j1 - j2 + m3);
    REQUIRE(cmp.result == verdict::not_equal);
    const assignment& w = *cmp.witness;
    REQUIRE(ctx.admits(w));
    CHECK(sign_at(j1 - j2 - m3, w) != sign_at(j1 - j2 + m3, w));
    for (int k = 1; k <= 3; ++k) {
        const cln::cl_RA jk = w.at("j" + std::to_string(k)), mk = w.at("m" + std::to_string(k));
        CHECK(jk >= 0);
        CHECK(cln::abs(mk) <= jk);
    }
    CHECK(cln::abs(w.at("j1") - w.at("j2")) <= w.at("j3"));
    CHECK(w.at("j3") <= w.at("j1") + w.at("j2"));
}

TEST_CASE("phase: the CG phase j1-j2+M prints with one sign", "[phase]") {
    // <j1 m1, j2 m2 | j3 M> carries (-1)^(j1-j2+M) with M = -m3 in the 3j (common practice,
    // no source); its class has a form with a single negative term.
    const context ctx = three_j();
    const linear_form x = var("j1") - var("j2") - var("m3");
    const linear_form y = ctx.canonical(x);
    CHECK(ctx.equal(x, y) == verdict::equal);
    CHECK(y.coefficients().size() == 3);
    int negatives = 0;
    for (const auto& term : y.coefficients()) negatives += cln::minusp(term.second) ? 1 : 0;
    CHECK(negatives == 1);
    CHECK(ctx.canonical(y) == y);
}

TEST_CASE("phase: a class that needs half coefficients keeps them", "[phase]") {
    // A slot j/2 makes j even, so (-1)^(j/2) is a sign that no integer-coefficient exponent gives.
    context ctx;
    ctx.declare_angular("j");
    ctx.add_integer(half * j);
    CHECK(ctx.is_integer(half * j));
    CHECK(ctx.canonical(j) == linear_form());
    CHECK(ctx.canonical(half * j) == half * j);
    CHECK(ctx.canonical(cln::cl_RA(5) / 2 * j) == half * j);
    CHECK(ctx.canonical(-half * j) == half * j);  // j/2 + (-j/2) = 0 and 2(j/2) = j is null
    CHECK(ctx.equal(half * j, 0) == verdict::not_equal);
    const comparison cmp = ctx.compare(half * j, 0);
    REQUIRE(cmp.witness);
    CHECK(cmp.witness->at("j") == 2);
}

TEST_CASE("phase: a context without variables folds constants", "[phase]") {
    const context ctx;
    CHECK(ctx.satisfiable());
    CHECK(ctx.canonical(5) == linear_form(1));
    CHECK(ctx.canonical(half) == linear_form(half));
    CHECK(ctx.equal(2, 0) == verdict::equal);
    CHECK(ctx.compare(half, 0).result == verdict::not_integer);
}

TEST_CASE("phase: products of phases merge by adding exponents", "[phase]") {
    const context ctx = three_j();
    const linear_form j1 = var("j1"), j2 = var("j2"), j3 = var("j3"), m1 = var("m1");
    // (-1)^(j1+j2+j3) (-1)^(j1-m1) (-1)^(j1+m1) = (-1)^(j1+j2+j3) (-1)^(2 j1): three terms
    // with one sign beat four terms without.
    const linear_form product = (j1 + j2 + j3) + (j1 - m1) + (j1 + m1);
    CHECK(ctx.canonical(product) == -j1 + j2 + j3);
    CHECK(ctx.equal(product, j1 + j2 + j3 + 2 * m1) == verdict::equal);
    CHECK(ctx.canonical((j1 + j2 + j3) + (j1 + j2 + j3)) == linear_form());
}

TEST_CASE("phase: a value pinned by inequalities is not seen until stated", "[phase]") {
    // The triangle of (1/2, 1/2, b+1) allows only b = 0, so (-1)^b = 1 at every admissible
    // point; the congruences alone (b an integer) do not know that.  This is the documented
    // limit of ignoring inequalities, and add_zero is the way out.
    context ctx;
    ctx.declare_angular("b");
    ctx.add_triad(half, half, b + 1);
    CHECK(ctx.is_integer(b));
    const comparison cmp = ctx.compare(b, 0);
    CHECK(cmp.result == verdict::not_equal);
    REQUIRE(cmp.witness);
    CHECK(cmp.witness->at("b") != 0);  // necessarily outside the triangle
    ctx.add_zero(b);
    CHECK(ctx.equal(b, 0) == verdict::equal);
    CHECK(ctx.canonical(b) == linear_form());
}
