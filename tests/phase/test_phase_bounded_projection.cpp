// A projection of a constant angular momentum can pin other values through the m-sums: the
// phase context must count only the values its bounds leave, not every value the congruences
// allow.  Hand-checked schemes; the enumeration over small values stands beside each verdict.
#include <catch2/catch.hpp>

#include "phase/context.hpp"

using namespace couplet::phase;

namespace {

// a integer; m1 of b, m2 of 1, m3 of a, m4 of c; triads (b, 1, a), (b, c, b), (a, b, c); m-sums
// m1 + m2 + m3 = 0, m1 + m4 + 1 = 0, m3 - m1 - 1 + m4 = 0 (with every 3j column's j - m an
// integer).  The m-sums give m4 = -m1 - 1, m3 = 2 m1 + 2, m2 = -3 m1 - 2, and |m2| <= 1 with m1
// an integer leaves only m1 = -1: m4 = 0 although the congruences allow any integer m4.
context pinned_scheme() {
    context ctx;
    ctx.declare_angular("a", parity::integer);
    ctx.declare_angular("b");
    ctx.declare_angular("c");
    ctx.declare_projection("m1", var("b"));
    ctx.declare_projection("m2", 1);
    ctx.declare_projection("m3", var("a"));
    ctx.declare_projection("m4", var("c"));
    ctx.add_triad(var("b"), 1, var("a"));
    ctx.add_zero_sum(var("m1"), var("m2"), var("m3"));
    ctx.add_triad(var("b"), var("c"), var("b"));
    ctx.add_zero_sum(var("m1"), var("m4"), 1);
    ctx.add_triad(var("a"), var("b"), var("c"));
    ctx.add_zero_sum(var("m3"), -var("m1") - 1, var("m4"));
    return ctx;
}

}  // namespace

TEST_CASE("phase: a projection of a constant pins the values the m-sums tie to it", "[phase]") {
    const context ctx = pinned_scheme();
    REQUIRE(ctx.satisfiable());
    // X - Y = 2a - 4b - 4c - m4, even at m4 = 0 (by hand: 2a, 4b, 4c are even for a integer and
    // b, c in Z/2).
    const linear_form x = -var("a") - var("b") - 2 * var("c") - var("m4");
    const linear_form y = -3 * var("a") + 3 * var("b") + 2 * var("c");
    CHECK(ctx.equal(x, y) == verdict::equal);
    CHECK(ctx.compare(x, y).result == verdict::equal);
    CHECK(ctx.canonical(x) == ctx.canonical(y));
    CHECK(ctx.equal(var("m4"), 0) == verdict::equal);
    CHECK(ctx.equal(var("m2"), 1) == verdict::equal);
}

TEST_CASE("phase: bounds that pin nothing leave the verdicts of the congruences", "[phase]") {
    // m of 3/2 with m + n = 0 and n of j: every half-odd m in -3/2..3/2 is allowed, so the
    // parity of m - 1/2 still varies (m = 1/2 and m = 3/2).
    context ctx;
    ctx.declare_projection("m", cln::cl_RA(3) / 2);
    ctx.declare_projection("n", var("j"));
    ctx.add_zero_sum(var("m"), var("n"), 0);
    const comparison c = ctx.compare(var("m") - cln::cl_RA(1) / 2, 0);
    CHECK(c.result == verdict::not_equal);
    REQUIRE(c.witness.has_value());
    CHECK(ctx.admits(*c.witness));
    const cln::cl_RA m = c.witness->at("m");
    CHECK((m <= cln::cl_RA(3) / 2 && m >= cln::cl_RA(-3) / 2));
}

TEST_CASE("phase: a bound that leaves one value fixes the projection", "[phase]") {
    // m of 1 with 2m = n + 2 and n of 0 (so n = 0): m = 1 is the only admissible value; the
    // congruences alone allow every integer m.
    context ctx;
    ctx.declare_projection("m", 1);
    ctx.declare_projection("n", 0);
    ctx.add_zero(2 * var("m") - var("n") - 2);
    CHECK(ctx.equal(var("m"), 1) == verdict::equal);
    CHECK(ctx.canonical(var("m") + var("n")) == linear_form(1));
}

TEST_CASE("phase: a bound too wide to enumerate is left to the congruences", "[phase]") {
    // m - 5000 = 10001 t with |m| <= 5000 leaves only t = 0, m = 5000 (by hand), but 2J + 1 = 10001
    // values exceed the enumerated box: the congruences alone let m have either parity.
    context ctx;
    ctx.declare_projection("m", 5000);
    ctx.declare_angular("t", parity::integer);
    ctx.add_zero(var("m") - 5000 - 10001 * var("t"));
    CHECK(ctx.satisfiable());
    CHECK(ctx.equal(var("m"), 0) == verdict::not_equal);
}
