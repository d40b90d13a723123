// Diagnoses beyond one phase or one hat: a product or ratio of hats fitted with its phase, a
// phase missing inside a sum, and a 6j written in an arrangement its symmetries do not reach.
// The expected repair follows from the source named beside each identity; each repair, put
// back in, must make the identity hold.
#include <catch2/catch.hpp>

#include <cmath>
#include <random>
#include <set>
#include <string>

#include "check_support.hpp"

using couplet::testing::check_text;
using couplet::verify::verdict;

namespace {

// Edmonds (1957) 6.1.5 / DLMF 34.4: the recoupling coefficient of three angular momenta as
// its four Clebsch-Gordan coefficients summed over the projections; its closed form is
// (-1)^(j1+j2+j3+J) sqrt((2 j12+1)(2 j23+1)) {j1 j2 j12; j3 J j23}.
const std::string recoupling_sum =
    "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M> * "
    "<j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)";
const std::string sixj = "6j{j1, j2, j12; j3, J, j23}";

std::string repaired(const std::string& identity, const std::string& factor) {
    std::size_t at = identity.find("==");
    return identity.substr(0, at) + "== (" + identity.substr(at + 2) + ") * (" + factor + ")";
}

void symbols_in(const GiNaC::ex& e, std::set<GiNaC::ex, GiNaC::ex_is_less>& out) {
    if (GiNaC::is_a<GiNaC::symbol>(e)) out.insert(e);
    for (std::size_t k = 0; k < e.nops(); ++k) symbols_in(e.op(k), out);
}

// The identity fails by a factor equal to `expected` (as a function of its names): compared in
// floating point at integer values of the names, where every phase is real.
void require_missing(const std::string& identity, const std::string& expected) {
    INFO(identity << "  expected factor " << expected);
    auto program = couplet::testing::lower_text(identity + "\n" + expected);
    const auto& statement = program.statements.front();
    couplet::verify::check_options o;
    o.sampling.reach_time = std::chrono::seconds(60);
    auto report = couplet::verify::check_identity(statement.value, statement.rhs, program.numbers, o);
    REQUIRE(report.result == verdict::fails_by_factor);
    REQUIRE(report.missing_factor);
    const GiNaC::ex want = program.statements.back().value;
    INFO("diagnosed " << couplet::to_text(*report.missing_factor));
    std::set<GiNaC::ex, GiNaC::ex_is_less> names;
    symbols_in(want, names);
    symbols_in(*report.missing_factor, names);
    std::mt19937 rng(7);
    for (int trial = 0; trial < 5; ++trial) {
        GiNaC::exmap values;
        for (const GiNaC::ex& s : names) values[s] = std::uniform_int_distribution<int>(0, 6)(rng);
        double got = GiNaC::ex_to<GiNaC::numeric>(GiNaC::evalf(report.missing_factor->subs(values))).to_double();
        double ref = GiNaC::ex_to<GiNaC::numeric>(GiNaC::evalf(want.subs(values))).to_double();
        CHECK(std::abs(got - ref) < 1e-12 * std::max(1.0, std::abs(ref)));
    }
    auto fixed = check_text(repaired(identity, couplet::to_text(*report.missing_factor)));
    CHECK(fixed.report.result == verdict::holds);
}

}  // namespace

TEST_CASE("a product of two hats is found as one missing factor", "[verify][diagnosis][slow]") {
    // Edmonds 6.1.5 with both hats left out: the factor is sqrt((2 j12+1)(2 j23+1)).
    require_missing(recoupling_sum + " == (-1)^(j1+j2+j3+J) * " + sixj, "sqrt((2*j12+1)*(2*j23+1))");
}

TEST_CASE("(2 j12+1) written where sqrt((2 j12+1)(2 j23+1)) belongs is found as their ratio",
          "[verify][diagnosis][slow]") {
    // Edmonds 6.1.5: the repair is sqrt((2 j12+1)(2 j23+1)) / (2 j12+1).
    require_missing(recoupling_sum + " == (-1)^(j1+j2+j3+J) * (2*j12+1) * " + sixj, "sqrt((2*j23+1)/(2*j12+1))");
}

TEST_CASE("a phase and wrong hats together are found together", "[verify][diagnosis][slow]") {
    // Edmonds 6.1.5 with the phase and both hats left out.
    require_missing(recoupling_sum + " == " + sixj, "(-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1))");
    // DLMF 34.1.1 read backwards, with 1/sqrt(2 j3+1) and the phase left out.
    require_missing("3j(j1, j2, j3; m1, m2, -m3) == <j1 m1, j2 m2 | j3 m3>", "(-1)^(j1-j2+m3) / sqrt(2*j3+1)");
}

TEST_CASE("a phase missing inside a sum is found there, with the summation index", "[verify][diagnosis]") {
    // DLMF 34.5.15 (letters renamed; the arrangement from memory) without its (-1)^(x+p+q).
    auto c = check_text("sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == 6j{a, c, q; b, d, p}");
    REQUIRE(c.report.result == verdict::fails_by_phase);
    CHECK(c.missing_phase == "(-1)^(p+q+x)");
    REQUIRE(c.report.phase_site);
    CHECK(couplet::verify::describe(*c.report.phase_site) == "the summand of the sum over x on the left side");
    auto r = couplet::testing::run_cli(
        {"check", "--format", "json", "-e",
         "sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == 6j{a, c, q; b, d, p}"});
    CHECK(r.code == 1);
    CHECK(r.out.find("\"missing_phase_site\":\"the summand of the sum over x on the left side\"") != std::string::npos);
}

TEST_CASE("a 6j in an arrangement its symmetries do not reach is named with one that holds", "[verify][diagnosis]") {
    // DLMF 34.5.8: {a b c; d e f} = {a e f; d b c} (upper and lower swapped in two columns);
    // swapping them in one column only, as written here, is not a symmetry.
    auto c = check_text("6j{a, b, c; d, e, f} == 6j{a, e, c; d, b, f}");
    REQUIRE(c.report.result == verdict::fails);
    REQUIRE(c.report.rearranged);
    CHECK(couplet::to_text(c.report.rearranged->written) == "6j{a, e, c; d, b, f}");
    CHECK_FALSE(c.report.rearranged->on_left);
    // The arrangement offered must make the identity hold.
    auto fixed = check_text("6j{a, b, c; d, e, f} == " + couplet::to_text(c.report.rearranged->needed));
    CHECK(fixed.report.result == verdict::holds);
    // DLMF 34.5.15 with the 6j on the right written in a wrong order.
    auto sum = check_text(
        "sum(x : (-1)^(x+p+q) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == 6j{a, c, q; b, p, d}");
    CHECK(sum.report.result == verdict::fails);
    CHECK(sum.report.rearranged);
    auto json =
        couplet::testing::run_cli({"check", "--format", "json", "-e", "6j{a, b, c; d, e, f} == 6j{a, e, c; d, b, f}"});
    CHECK(json.out.find("\"arrangement\":{\"needed\":") != std::string::npos);
}
