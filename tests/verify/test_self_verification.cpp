// simplify never prints a result it has not verified; check reports its verdict on the command
// line with the documented exit codes and JSON fields.
#include <catch2/catch.hpp>

#include "api/statement_runner.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "support.hpp"
#include "verify/simplification_check.hpp"

using namespace couplet;
using couplet::testing::run_cli;

namespace {

verify::simplification_check verify_text(const std::string& input, const std::string& result) {
    lowered_program p = testing::lower_text("let A = " + input + "\nlet B = " + result);
    return verify::verify_simplification(p.statements[0].value, p.statements[1].value, p.numbers, {});
}

}  // namespace

TEST_CASE("a correct simplification verifies, a wrong one is caught with a counterexample", "[verify]") {
    // DLMF 34.3.9: an odd column permutation costs (-1)^(j1+j2+j3).
    auto good = verify_text("3j(b, a, c; mb, ma, mc)", "(-1)^(a+b+c) * 3j(a, b, c; ma, mb, mc)");
    CHECK(good.agrees);
    CHECK(good.points > 100);
    CHECK(good.nonzero > 50);
    auto bad = verify_text("3j(b, a, c; mb, ma, mc)", "3j(a, b, c; ma, mb, mc)");
    CHECK_FALSE(bad.agrees);
    REQUIRE(bad.counter);
    CHECK(bad.counter->lhs == -bad.counter->rhs);
    CHECK(bad.counter->lhs != bad.counter->rhs);
}

TEST_CASE("a result that lost a free quantum number is caught", "[verify]") {
    // DLMF 34.3.1: 3j(j j 0; m -m 0) depends on m through (-1)^(j-m).
    auto bad = verify_text("3j(j, j, 0; m, -m, 0)", "(-1)^(2*j) / sqrt(2*j+1)");
    CHECK_FALSE(bad.agrees);
}

TEST_CASE("simplify JSON reports the verification", "[verify][cli]") {
    auto r = run_cli({"simplify", "--format", "json", "-e", "(-1)^(a+b) * (-1)^(b+c) * 3j(a, b, c; 0, 0, 0)"});
    REQUIRE(r.code == 0);
    auto j = nlohmann::json::parse(r.out);
    CHECK(j.at("verified") == true);
    // The time-matched budget guarantees its minimum whatever the machine's speed.
    CHECK(j.at("points").get<std::size_t>() >= verify::verification_budget{}.min_points);
    r = run_cli(
        {"simplify", "--no-verify", "--format", "json", "-e", "(-1)^(a+b) * (-1)^(b+c) * 3j(a, b, c; 0, 0, 0)"});
    REQUIRE(r.code == 0);
    j = nlohmann::json::parse(r.out);
    CHECK(j.at("verified") == false);
    CHECK(j.at("points") == 0);
}

TEST_CASE("the options --samples and --depth set how many points are checked", "[verify][cli]") {
    auto run = [](std::vector<std::string> extra) {
        std::vector<std::string> args{"simplify", "--format", "json", "-e", "6j{a, b, c; d, e, f}"};
        args.insert(args.begin() + 1, extra.begin(), extra.end());
        auto r = run_cli(args);
        REQUIRE(r.code == 0);
        return nlohmann::json::parse(r.out);
    };
    // Explicit settings check every sampled point.
    auto full = run({"--samples", "200"});
    CHECK(full.at("points") == full.at("points_sampled"));
    CHECK(run({"--samples", "10"}).at("points").get<int>() < full.at("points").get<int>());
    CHECK(run({"--depth", "1", "--samples", "200"}).at("points").get<int>() < full.at("points").get<int>());
    // Default settings spend about the simplification's time, but check at least 12 points.
    auto quick = run({});
    CHECK(quick.at("points").get<int>() >= 12);
    CHECK(quick.at("points").get<int>() <= quick.at("points_sampled").get<int>());
}

TEST_CASE("a wrong simplification prints the input unchanged and fails with code 3", "[verify][cli]") {
    couplet::program p = couplet::parse("simplify 3j(b, a, c; mb, ma, mc)");
    // A simplifier with a bug: it reorders the columns but forgets the phase (DLMF 34.3.9).
    auto broken = [](const GiNaC::ex& e, const quantum_numbers&) {
        return wigner3j(e.op(1), e.op(0), e.op(2), e.op(4), e.op(3), e.op(5));
    };
    couplet::result out = execute_statement(p.internals(), 0, {}, couplet::bare_meaning::simplify, broken);
    CHECK(out.internal_failure);
    CHECK(to_text(out.answer) == "3j(b, a, c; mb, ma, mc)");
    CHECK(nlohmann::json::parse(couplet::to_json(out)).at("verified") == false);
    CHECK(out.diagnostic.find("internal check failed") != std::string::npos);
    CHECK(out.diagnostic.find("3j(a, b, c; ma, mb, mc)") != std::string::npos);
    CHECK(cli::internal_failure == 3);
}

TEST_CASE("a simplifier that calls a false identity 0 is an internal failure of check", "[verify][cli]") {
    couplet::program p = couplet::parse("check 6j{a, b, c; d, e, f} == 0");
    auto zero = [](const GiNaC::ex&, const quantum_numbers&) { return GiNaC::ex(0); };
    couplet::result out = execute_statement(p.internals(), 0, {}, couplet::bare_meaning::simplify, zero);
    CHECK(out.internal_failure);
    CHECK(out.diagnostic.find("internal check failed") != std::string::npos);
}

TEST_CASE("check JSON carries the verdict, the missing phase, points and the counterexample", "[verify][cli]") {
    // DLMF 34.3.9 without its phase.
    auto r = run_cli({"check", "--format", "json", "-e", "3j(j1, j2, j3; m1, m2, m3) == 3j(j2, j1, j3; m2, m1, m3)"});
    CHECK(r.code == 1);
    auto j = nlohmann::json::parse(r.out);
    CHECK(j.at("holds") == false);
    CHECK(j.at("verdict") == "fails by a phase");
    CHECK(j.at("missing_phase") == "(-1)^(j1+j2+j3)");
    CHECK(j.at("points").get<int>() > 100);
    CHECK(j.at("counterexample").is_object());
    // DLMF 34.3.9 as stated.
    r = run_cli({"check", "--format", "json", "-e",
                 "3j(j1, j2, j3; m1, m2, m3) == (-1)^(j1+j2+j3) * 3j(j2, j1, j3; m2, m1, m3)"});
    CHECK(r.code == 0);
    j = nlohmann::json::parse(r.out);
    CHECK(j.at("holds") == true);
    CHECK(j.at("verdict") == "holds");
    CHECK(j.at("missing_phase").is_null());
    CHECK(j.at("counterexample").is_null());
}

TEST_CASE("every failing verdict exits with 1, and the text names the repair", "[verify][cli]") {
    // DLMF 34.3.9 without its phase; DLMF 34.3.1 without 1/sqrt(2j+1); a swapped 6j argument.
    auto phase = run_cli({"check", "-e", "3j(j1, j2, j3; m1, m2, m3) == 3j(j2, j1, j3; m2, m1, m3)"});
    CHECK(phase.code == 1);
    CHECK(phase.out.rfind("fails by a phase: holds after multiplying the right side by (-1)^(j1+j2+j3)", 0) == 0);
    auto factor = run_cli({"check", "-e", "3j(j, j, 0; m, -m, 0) == (-1)^(j-m)"});
    CHECK(factor.code == 1);
    CHECK(factor.out.rfind("fails by a factor: holds after multiplying the right side by 1/sqrt(2*j+1)", 0) == 0);
    auto plain = run_cli({"check", "-e", "6j{a, b, c; d, e, f} == 6j{d, b, c; a, e, f}"});
    CHECK(plain.code == 1);
    CHECK(plain.out.rfind("fails: at ", 0) == 0);
    CHECK(plain.out.find("the left side is") != std::string::npos);
    // Progress goes only to a terminal, never into captured output.
    CHECK(phase.err.empty());
}

TEST_CASE("check reports an exponent that is not an integer as bad input", "[verify][cli]") {
    auto r = run_cli({"check", "-e", "(-1)^x == 1"});
    CHECK(r.code == 2);
    CHECK(r.err.find("not an integer") != std::string::npos);
}
