// What a verdict may claim: points that reach every value 0..20 of each free j and far beyond
// it, "holds" only with enough nonzero evidence (else undecided, exit status 4), and points
// where a divisor is 0 counted as undefined, never as 0.
#include <catch2/catch.hpp>

#include <chrono>
#include <random>
#include <string>
#include <vector>

#include "check_support.hpp"
#include "support.hpp"

using couplet::testing::check_text;

namespace {
// Enough time for every covering point, so that load on the machine cannot change an outcome.
constexpr std::chrono::milliseconds unhurried{120'000};
}  // namespace
using couplet::testing::run_cli;
using couplet::verify::verdict;

namespace {

std::string spoiled_at(const std::string& identity, const std::string& j, const std::string& value) {
    std::size_t at = identity.find("==");
    return identity.substr(0, at) + "== (" + identity.substr(at + 2) + ") * (1 + delta(" + j + ", " + value + "))";
}

bool caught(verdict v) { return v != verdict::holds && v != verdict::undecided; }

}  // namespace

TEST_CASE("a 6j identity wrong only at a = 7 is caught at default settings", "[verify][reach]") {
    // DLMF 34.5.8 (column permutation) times 1 + delta(a, 7): false exactly at a = 7.
    auto c = check_text(spoiled_at("6j{a, b, c; d, e, f} == 6j{b, a, c; e, d, f}", "a", "7"), 2, 200, unhurried);
    REQUIRE(caught(c.report.result));
    REQUIRE(c.report.counter);
    CHECK(c.report.counter->at.front().first == "a");
    CHECK(c.report.counter->at.front().second == 7);
}

TEST_CASE("a one-j identity wrong only at j = 8 is caught, whatever --samples says", "[verify][reach]") {
    // DLMF 34.3.1 times 1 + delta(j, 8).  One free j (and its m) once gave 7 points, j = 0..6.
    for (int samples : {0, 200, 5000}) {
        INFO("samples " << samples);
        auto c = check_text(spoiled_at("3j(j, j, 0; m, -m, 0) == (-1)^(j-m) / sqrt(2*j+1)", "j", "8"), 2, samples,
                            unhurried);
        CHECK(caught(c.report.result));
    }
}

TEST_CASE("the recoupling coefficient of three j with a factor wrong only at J = 7 is caught",
          "[verify][reach][slow]") {
    // Edmonds (1957) 6.1.5 / DLMF 34.4: the sum of four Clebsch-Gordan coefficients is
    // (-1)^(j1+j2+j3+J) sqrt((2 j12+1)(2 j23+1)) {j1 j2 j12; j3 J j23}.
    const std::string sum =
        "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M> * "
        "<j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)";
    const std::string closed = "(-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23}";
    auto right = check_text(sum + " == " + closed, 2, 200, unhurried);
    CHECK(right.report.result == verdict::holds);
    auto wrong = check_text(spoiled_at(sum + " == " + closed, "J", "7"), 2, 200, unhurried);
    REQUIRE(caught(wrong.report.result));
    REQUIRE(wrong.report.counter);
    bool at_seven = false;
    for (const auto& [name, value] : wrong.report.counter->at) at_seven = at_seven || (name == "J" && value == 7);
    CHECK(at_seven);
}

TEST_CASE("true identities times 1 + delta(j, v), v <= 20, are always caught", "[verify][reach][slow]") {
    // Each free j of these takes every value 0, 1/2, ..., 20 at a point where both sides are
    // nonzero, so each spoiled identity is false somewhere.
    struct source {
        const char* identity;
        std::vector<const char*> names;
    };
    const std::vector<source> identities = {
        // DLMF 34.5.8
        {"6j{a, b, c; d, e, f} == 6j{b, a, c; e, d, f}", {"a", "b", "c", "d", "e", "f"}},
        {"6j{a, b, c; d, e, f} == 6j{a, e, f; d, b, c}", {"a", "b", "c", "d", "e", "f"}},
        // DLMF 34.3.9
        {"3j(a, b, c; ma, mb, mc) == (-1)^(a+b+c) * 3j(b, a, c; mb, ma, mc)", {"a", "b", "c"}},
        // DLMF 34.5.15 (letters renamed; the arrangement from memory)
        {"sum(x : (-1)^(x+p+q) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == 6j{a, c, q; b, d, p}",
         {"a", "b", "c", "d", "p", "q"}},
    };
    std::mt19937 rng(20261204);
    const int trials = 24;
    int failures_caught = 0;
    for (int trial = 0; trial < trials; ++trial) {
        const source& s = identities[std::uniform_int_distribution<std::size_t>(0, identities.size() - 1)(rng)];
        std::string j = s.names[std::uniform_int_distribution<std::size_t>(0, s.names.size() - 1)(rng)];
        int twice = std::uniform_int_distribution<int>(0, 40)(rng);
        std::string v = twice % 2 == 0 ? std::to_string(twice / 2) : std::to_string(twice) + "/2";
        std::string text = spoiled_at(s.identity, j, v);
        INFO(text);
        auto c = check_text(text, 2, 200, unhurried);
        CHECK(caught(c.report.result));
        if (caught(c.report.result)) ++failures_caught;
    }
    CHECK(failures_caught == trials);
}

TEST_CASE("a check reports how far its points reached", "[verify][reach]") {
    // DLMF 34.5.8
    auto c = check_text("6j{a, b, c; d, e, f} == 6j{b, a, c; e, d, f}", 2, 200, unhurried);
    REQUIRE(c.report.result == verdict::holds);
    CHECK(c.report.reach.largest_twice_j >= 2 * 50);  // the far points (common practice, no source)
    CHECK(c.report.reach.cover_max_j == 20);
    CHECK(c.report.reach.wanted == 6 * 41);  // six free j, each 0, 1/2, ..., 20
    CHECK(c.report.reach.covered == c.report.reach.wanted);

    auto r = run_cli({"check", "--format", "json", "-e", "6j{a, b, c; d, e, f} == 6j{b, a, c; e, d, f}"});
    CHECK(r.code == 0);
    CHECK(r.out.find("\"reach\":{\"largest_j\":") != std::string::npos);
    CHECK(r.out.find("\"values_wanted\":246") != std::string::npos);
    auto text = run_cli({"check", "-e", "6j{a, b, c; d, e, f} == 6j{b, a, c; e, d, f}"});
    CHECK(text.out.find("0..20 at a nonzero point") != std::string::npos);
    CHECK(text.out.find("j up to ") != std::string::npos);
}

TEST_CASE("without a proof, too few nonzero points leave a check undecided, with exit status 4", "[verify][reach]") {
    // Both sides are nonzero at a = 1 only: 6j{1 1 1; 1 1 1} = 1/6 (from memory).
    const std::string few = "delta(a, 1) * 6j{a, a, a; a, a, a} == delta(a, 1) / 6";
    auto c = check_text(few);
    CHECK(c.report.result == verdict::undecided);
    CHECK(c.report.nonzero < couplet::verify::minimum_evidence);
    auto r = run_cli({"check", "--format", "json", "-e", few});
    CHECK(r.code == 4);
    CHECK(r.out.find("\"verdict\":\"undecided\"") != std::string::npos);
    CHECK(r.out.find("\"holds\":null") != std::string::npos);
    auto text = run_cli({"check", "-e", few});
    CHECK(text.code == 4);
    CHECK(text.out.rfind("undecided: ", 0) == 0);
    // A failing check elsewhere in the file outranks undecided.
    auto both = run_cli({"check", "-e", few + "; 6j{a, b, c; d, e, f} == 6j{a, e, c; d, b, f}"});
    CHECK(both.code == 1);
}

TEST_CASE("finitely many admissible points, all checked, are a proof", "[verify][reach]") {
    // 6j{1 1 1; 1 1 1} = 1/6 (from memory); m of j = 1 takes three values.
    auto none = check_text("6j{1, 1, 1; 1, 1, 1} == 1/6");
    CHECK(none.report.result == verdict::holds);
    CHECK(none.report.finite);
    // DLMF 34.3.10 at j = 1: each of the three points is checked.
    auto three = check_text("3j(1, 1, 1; m, -m, 0) == -3j(1, 1, 1; -m, m, 0)");
    CHECK(three.report.result == verdict::holds);
    CHECK(three.report.finite);
    CHECK(three.report.points == 3);
}

TEST_CASE("with no exhaustive or random points, false DLMF identities still do not hold", "[verify][reach][slow]") {
    // Each is a DLMF chapter 34 identity spoiled by a swapped argument, a phase or a dropped factor;
    // depth 0 and no random samples leave only the far and coverage points.
    const char* spoiled[] = {
        "6j{a, b, c; d, e, f} == 6j{a, e, c; d, b, f}",                             // 34.5.8, wrong pair
        "3j(a, b, c; ma, mb, mc) == 3j(a, c, b; ma, mc, mb)",                       // 34.3.9 without its phase
        "3j(j, j, 0; m, -m, 0) == (-1)^(j-m)",                                      // 34.3.1 without 1/sqrt(2j+1)
        "9j{a, b, c; d, e, f; g, h, i} == 9j{a, b, c; g, h, i; d, e, f}",           // 34.6.2's symmetry, no phase
        "<j1 m1, j2 m2 | j3 m3> == (-1)^(j1-j2+m3) * 3j(j1, j2, j3; m1, m2, -m3)",  // 34.1.1 without sqrt(2j3+1)
        "<j1 m1, j2 m2 | j3 m3> == (-1)^(j1-j2-m3) * sqrt(2*j3+1) * 3j(j1, j2, j3; m1, m2, -m3)",  // 34.1.1, -m3
        "3j(j1, j2, j3; -m1, -m2, -m3) == (-1)^(j1+j2-j3) * 3j(j1, j2, j3; m1, m2, m3)",           // 34.3.10, -j3
        "3j(j, j, 0; m, -m, 0) == (-1)^(j+m) / sqrt(2*j+1)",                                       // 34.3.1, +m
        "3j(j1, j2, j3; m1, m2, m3) == -(-1)^(j1+j2+j3) * 3j(j1, j3, j2; m1, m3, m2)",             // 34.3.9, sign
        "3j(j1, j2, j3; m1, m2, m3) == 3j(j2, j3, j1; m1, m3, m2)",  // 34.3.8 with the m's misplaced
        // 34.5.15 (arrangement from memory) with x+p-q for x+p+q
        "sum(x : (-1)^(x+p-q) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q}) == 6j{a, d, p; b, c, q}",
        // 34.5.14 without (2 l3+1)
        "sum(j3 : (2*j3+1) * 6j{j1, j2, j3; l1, l2, l3} * 6j{j1, j2, j3; l1, l2, k}) == "
        "delta(l3, k) * tri(j1, l2, l3) * tri(l1, j2, l3)",
        // 34.3.16 without (2 j3+1)
        "sum(m1, m2 : 3j(j1, j2, j3; m1, m2, m3) * 3j(j1, j2, k; m1, m2, n)) == "
        "delta(j3, k) * delta(m3, n) * tri(j1, j2, j3)",
        // 34.6.2 without (-1)^(2j)
        "9j{j11, j12, j13; j21, j22, j23; j31, j32, j33} == sum(j : (2*j+1) * 6j{j11, j21, j31; j32, j33, j} * "
        "6j{j12, j22, j32; j21, j, j23} * 6j{j13, j23, j33; j, j11, j12})",
    };
    for (const char* text : spoiled) {
        INFO(text);
        auto c = check_text(text, 0, 0, unhurried);
        CHECK(caught(c.report.result));
    }
}

TEST_CASE("a phase the first points do not determine is found from the further ones", "[verify][reach]") {
    // DLMF 34.3.9: an odd column permutation costs (-1)^(a+b+c).
    auto c = check_text("3j(a, b, c; ma, mb, mc) == 3j(b, a, c; mb, ma, mc)", 0, 3, unhurried);
    CHECK(c.report.result == verdict::fails_by_phase);
    CHECK(c.missing_phase == "(-1)^(a+b+c)");
}

TEST_CASE("a divisor that is 0 somewhere makes those points undefined, not 0", "[verify][reach]") {
    // DLMF 34.5.8 divided by 2a - 2: undefined at a = 1, true elsewhere.
    auto c = check_text("6j{a, b, c; d, e, f} / (2*a - 2) == 6j{b, a, c; e, d, f} / (2*a - 2)");
    CHECK(c.report.result == verdict::holds);
    CHECK(c.report.undefined > 0);
    // The same division beside a vanishing 6j (a = 1, b = 0, c = 2 breaks a triangle) is still
    // undefined: a 0 factor does not excuse it.
    auto r = run_cli({"eval", "-e", "6j{a, b, c; 1, 1, 1} / (a - 1) at a=1, b=0, c=2"});
    CHECK(r.code == 2);
    CHECK(r.err.find("division by zero") != std::string::npos);
    auto s = run_cli({"eval", "-e", "1 / (a - 1) * 6j{a, b, c; 1, 1, 1} at a=1, b=0, c=2"});
    CHECK(s.code == 2);
}

TEST_CASE("a divisor that is 0 at every admissible point is an error in every command", "[verify][reach]") {
    // 3j(a a 1; 0 0 0) vanishes for every a: a + a + 1 is odd (DLMF 34.3.5).
    for (const char* command : {"check", "simplify", "latex"}) {
        INFO(command);
        std::string text = std::string(command) == "check" ? "1/3j(a, a, 1; 0, 0, 0) == 5" : "1/3j(1, 1, 1; 0, 0, 0)";
        auto r = run_cli({command, "-e", text});
        CHECK(r.code == 2);
        CHECK(r.err.find("division by zero") != std::string::npos);
        CHECK(r.err.find("<expression>:1:1:") != std::string::npos);
    }
    auto sum = run_cli({"simplify", "-e", "1/3j(1, 1, 1; 0, 0, 0) + 6j{1, 1, 1; 1, 1, 1}"});
    CHECK(sum.code == 2);
    auto e = run_cli({"eval", "-e", "1/3j(a, a, 1; 0, 0, 0) at a=1"});
    CHECK(e.code == 2);
}
