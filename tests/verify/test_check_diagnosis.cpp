// `check` on DLMF chapter 34 identities spoiled on purpose: a phase left out or flipped, an
// argument swapped, a (2j+1) dropped.  The verdict and the missing phase or factor follow from
// the DLMF equation; multiplying the diagnosed repair in must make the identity hold.
#include <catch2/catch.hpp>

#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_coupling.h>

#include <cmath>

#include "check_support.hpp"
#include "verify/domain.hpp"
#include "verify/sampler.hpp"

using couplet::testing::check_text;
using couplet::verify::verdict;

namespace {

// "LHS == RHS" with the right side multiplied by `factor`.
std::string repaired(const std::string& identity, const std::string& factor) {
    std::size_t at = identity.find("==");
    return identity.substr(0, at) + "== (" + identity.substr(at + 2) + ") * (" + factor + ")";
}

void require_phase(const std::string& identity, const std::string& phase, int depth = 2, int samples = 200) {
    INFO(identity);
    auto c = check_text(identity, depth, samples);
    CHECK(c.report.result == verdict::fails_by_phase);
    CHECK(c.missing_phase == phase);
    REQUIRE(!c.missing_phase.empty());
    auto fixed = check_text(repaired(identity, c.missing_phase), depth, samples);
    CHECK(fixed.report.result == verdict::holds);
}

void require_factor(const std::string& identity, const std::string& factor, int depth = 2, int samples = 200) {
    INFO(identity);
    auto c = check_text(identity, depth, samples);
    CHECK(c.report.result == verdict::fails_by_factor);
    CHECK(c.missing_factor == factor);
    REQUIRE(!c.missing_factor.empty());
    auto fixed = check_text(repaired(identity, c.missing_factor), depth, samples);
    CHECK(fixed.report.result == verdict::holds);
}

double value(const couplet::exact::number& x) { return x.to_double(); }

}  // namespace

TEST_CASE("a 3j odd permutation without its phase fails by that phase", "[verify][dlmf]") {
    // DLMF 34.3.9: the phase is (-1)^(j1+j2+j3).
    require_phase("3j(j1, j2, j3; m1, m2, m3) == 3j(j2, j1, j3; m2, m1, m3)", "(-1)^(j1+j2+j3)");
}

TEST_CASE("a flipped term in a phase is found as (-1)^(2j)", "[verify][dlmf]") {
    // DLMF 34.3.10 has (-1)^(j1+j2+j3); j1+j2-j3 differs from it by 2 j3.
    require_phase("3j(j1, j2, j3; -m1, -m2, -m3) == (-1)^(j1+j2-j3) * 3j(j1, j2, j3; m1, m2, m3)", "(-1)^(2*j3)");
    // DLMF 34.3.1 has (-1)^(j-m); j+m differs from it by 2m, which has the parity of 2j.
    require_phase("3j(j, j, 0; m, -m, 0) == (-1)^(j+m) / sqrt(2*j+1)", "(-1)^(2*j)");
    // DLMF 34.1.1 has (-1)^(j1-j2+m3); with -m3 the difference 2 m3 has the parity of 2 j3.
    require_phase("<j1 m1, j2 m2 | j3 m3> == (-1)^(j1-j2-m3) * sqrt(2*j3+1) * 3j(j1, j2, j3; m1, m2, -m3)",
                  "(-1)^(2*j3)");
}

TEST_CASE("an overall sign is the phase -1", "[verify][dlmf]") {
    // DLMF 34.3.9 with the sign of the right side reversed.
    require_phase("3j(j1, j2, j3; m1, m2, m3) == -(-1)^(j1+j2+j3) * 3j(j1, j3, j2; m1, m3, m2)", "-1");
}

TEST_CASE("a phase flipped inside a sum is found outside it", "[verify][dlmf]") {
    // DLMF 34.5.15 has (-1)^(x+p+q) under the sum; (-1)^(x+p-q) differs by (-1)^(2q).
    require_phase(
        "sum(x : (-1)^(x+p-q) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == "
        "6j{a, d, p; b, c, q}",
        "(-1)^(2*q)");
}

TEST_CASE("the 9j sum without (-1)^(2j) fails by a phase of the free j's", "[verify][dlmf]") {
    // DLMF 34.6.2; the triad (j11, j33, j) of its first 6j makes 2j have the parity of
    // 2 j11 + 2 j33 (common practice, no source), so the missing (-1)^(2j) is that phase.
    require_phase(
        "9j{j11, j12, j13; j21, j22, j23; j31, j32, j33} == sum(j : (2*j+1) * "
        "6j{j11, j21, j31; j32, j33, j} * 6j{j12, j22, j32; j21, j, j23} * 6j{j13, j23, j33; j, j11, j12})",
        "(-1)^(2*j11+2*j33)");
}

TEST_CASE("a dropped (2j+1) is found as the missing factor", "[verify][dlmf]") {
    // DLMF 34.5.14 has (2 l3 + 1) on the left.
    require_factor(
        "sum(j3 : (2*j3+1) * 6j{j1, j2, j3; l1, l2, l3} * 6j{j1, j2, j3; l1, l2, k}) == "
        "delta(l3, k) * tri(j1, l2, l3) * tri(l1, j2, l3)",
        "1/(2*l3+1)");
    // DLMF 34.3.16 has (2 j3 + 1) on the left; j3 = k wherever a side is nonzero, and j3 comes first.
    require_factor(
        "sum(m1, m2 : 3j(j1, j2, j3; m1, m2, m3) * 3j(j1, j2, k; m1, m2, n)) == "
        "delta(j3, k) * delta(m3, n) * tri(j1, j2, j3)",
        "1/(2*j3+1)");
}

TEST_CASE("a dropped square root and a constant are missing factors", "[verify][dlmf]") {
    // DLMF 34.3.1 has 1/sqrt(2j+1).
    require_factor("3j(j, j, 0; m, -m, 0) == (-1)^(j-m)", "1/sqrt(2*j+1)");
    // DLMF 34.5.14 with a spurious 2 on the right.
    require_factor(
        "sum(j3 : (2*j3+1) * (2*l3+1) * 6j{j1, j2, j3; l1, l2, l3} * 6j{j1, j2, j3; l1, l2, k}) == "
        "2 * delta(l3, k) * tri(j1, l2, l3) * tri(l1, j2, l3)",
        "1/2");
}

TEST_CASE("a missing factor together with a missing phase", "[verify][dlmf]") {
    // DLMF 34.3.1 with both the phase flipped and the square root dropped.
    auto c = check_text("3j(j, j, 0; m, -m, 0) == (-1)^(j+m)");
    CHECK(c.report.result == verdict::fails_by_factor);
    CHECK(c.missing_phase == "(-1)^(2*j)");
    auto fixed = check_text(repaired("3j(j, j, 0; m, -m, 0) == (-1)^(j+m)", c.missing_factor));
    CHECK(fixed.report.result == verdict::holds);
}

TEST_CASE("a swapped 6j argument fails with a counterexample", "[verify][dlmf]") {
    // DLMF 34.5.8 swaps the upper and lower entries of two columns at once; of one column alone
    // it is no symmetry.
    auto c = check_text("6j{j1, j2, j3; l1, l2, l3} == 6j{l1, j2, j3; j1, l2, l3}");
    REQUIRE(c.report.result == verdict::fails);
    REQUIRE(c.report.counter);
    const auto& at = c.report.counter->at;
    REQUIRE(at.size() == 6);
    auto twice = [&](const char* name) {
        for (const auto& [n, v] : at)
            if (n == name) return static_cast<int>((2 * v).to_long());
        FAIL("missing " << name);
        return 0;
    };
    gsl_set_error_handler_off();
    gsl_sf_result left, right;
    // GSL 2.7 gsl_sf_coupling_6j at the counterexample, for both sides.
    gsl_sf_coupling_6j_e(twice("j1"), twice("j2"), twice("j3"), twice("l1"), twice("l2"), twice("l3"), &left);
    gsl_sf_coupling_6j_e(twice("l1"), twice("j2"), twice("j3"), twice("j1"), twice("l2"), twice("l3"), &right);
    CHECK(value(c.report.counter->lhs) == Approx(left.val).margin(1e-12));
    CHECK(value(c.report.counter->rhs) == Approx(right.val).margin(1e-12));
    CHECK(std::fabs(left.val - right.val) > 1e-6);
}

TEST_CASE("a 3j with swapped projections fails at the smallest point that shows it", "[verify][dlmf]") {
    // DLMF 34.3.8 permutes whole columns; here m1 and m2 trade places without their j's.
    const std::string identity = "3j(j1, j2, j3; m1, m2, m3) == 3j(j2, j3, j1; m1, m3, m2)";
    auto c = check_text(identity);
    REQUIRE(c.report.result == verdict::fails);
    REQUIRE(c.report.counter);
    auto program = couplet::testing::lower_text(identity);
    const auto& st = program.statements.back();
    auto d = couplet::verify::build_domain({st.value, st.rhs}, program.numbers);
    auto samples = couplet::verify::sample_points(d, {});
    couplet::verify::point counter;
    for (const auto& [n, v] : c.report.counter->at) counter.push_back((2 * v).to_long());
    gsl_set_error_handler_off();
    auto threej = [&](const couplet::verify::point& t, int a, int b, int e, int ma, int mb, int me) {
        gsl_sf_result r;  // GSL 2.7 gsl_sf_coupling_3j
        gsl_sf_coupling_3j_e(t[a], t[b], t[e], t[ma], t[mb], t[me], &r);
        return r.val;
    };
    std::size_t j1 = d.index_of("j1"), j2 = d.index_of("j2"), j3 = d.index_of("j3"), m1 = d.index_of("m1"),
                m2 = d.index_of("m2"), m3 = d.index_of("m3");
    CHECK(value(c.report.counter->lhs) == Approx(threej(counter, j1, j2, j3, m1, m2, m3)).margin(1e-12));
    CHECK(value(c.report.counter->rhs) == Approx(threej(counter, j2, j3, j1, m1, m3, m2)).margin(1e-12));
    // Every sampled point before the counterexample agrees (GSL values, to double precision).
    for (const auto& t : samples.points) {
        if (!couplet::verify::smaller_point(t, counter)) break;
        CHECK(threej(t, j1, j2, j3, m1, m2, m3) == Approx(threej(t, j2, j3, j1, m1, m3, m2)).margin(1e-12));
    }
}
