// Runs that grew without bound on small inputs (regressions of #18).  Each test gives the run a
// time limit far above what it needs now, so it fails only if the old growth comes back; the
// expected outcomes are common practice, no source.
#include <catch2/catch.hpp>

#include <string>

#include "support.hpp"

using couplet::testing::run_cli;

namespace {

// ((((x+1)*y+1)*y+1)...)*y with `levels` levels.
std::string nested(int levels) {
    std::string e = "x";
    for (int k = 0; k < levels; ++k) e = "(" + e + "+1)*y";
    return e;
}

std::string product_of_threej(int n) {
    std::string e;
    for (int i = 0; i < n; ++i) {
        std::string k = std::to_string(i);
        e += (i ? "*" : "") + std::string("3j(a") + k + ", b" + k + ", c" + k + "; m" + k + ", n" + k + ", -m" + k +
             "-n" + k + ")";
    }
    return e;
}

}  // namespace

TEST_CASE("printing a deeply nested expression takes time in proportion to its size", "[cli]") {
    // The printer sorts by printed keys; without a memo each level printed its subtree again.
    auto r = run_cli({"simplify", "--no-verify", "--time-limit", "30", "-e", nested(12)});
    REQUIRE(r.code == 0);
    CHECK(r.out.find("(x+1)*y + 1") != std::string::npos);
    auto tex = run_cli({"latex", "--fragment", "--time-limit", "30", "-e", nested(12)});
    CHECK(tex.code == 0);
    auto value = run_cli({"eval", "--time-limit", "30", "-e", nested(12) + " at x=1, y=1"});
    CHECK(value.code == 0);
    CHECK(value.out.substr(0, 3) == "13 ");  // 2, 3, ..., 13 at x = y = 1
}

TEST_CASE("the time limit stops the exact evaluation of a 9j with large entries", "[cli]") {
    // All entries 1500: under the term bound (about 6.8e6 series terms) but tens of seconds of
    // big-number work; the limit ends it within a second.
    auto r = run_cli({"eval", "--time-limit", "1", "-e", "9j{1500, 1500, 1500; 1500, 1500, 1500; 1500, 1500, 1500}"});
    CHECK(r.code == 2);
    CHECK(r.err.find("stopped: the time limit of 1 s") != std::string::npos);
}

TEST_CASE("the bound on summands counts the series of a 9j before computing it", "[cli]") {
    // All entries 5000: about 7.5e7 series terms (x takes 5001 values, three 6j series of up to
    // 5001 terms each), refused at once whatever the time limit.
    auto r = run_cli({"eval", "-e", "9j{5000, 5000, 5000; 5000, 5000, 5000; 5000, 5000, 5000}"});
    CHECK(r.code == 2);
    CHECK(r.err.find("need more than 10000000 terms") != std::string::npos);
    // The same bound over a sum of 9j symbols: the terms of every 9j of the sum add up.
    auto summed = run_cli({"eval", "-e", "sum(x : 9j{a, a, x; a, a, x; x, x, x}) at a=3000"});
    CHECK(summed.code == 2);
    CHECK(summed.err.find("need more than 10000000 terms") != std::string::npos);
    // A 9j of entries 500 stays well inside it (about 7.5e5 terms).
    CHECK(run_cli({"eval", "-e", "9j{500, 500, 500; 500, 500, 500; 500, 500, 500}"}).code == 0);
}

TEST_CASE("the term bound (--max-terms) looks inside a root", "[cli]") {
    auto r = run_cli({"simplify", "-e", "sqrt((a+b+c+d+e+f+g+h)^10)"});
    CHECK(r.code == 2);
    CHECK(r.err.find("more than the limit of 100000") != std::string::npos);
}

TEST_CASE("self-verification of a product of many independent 3j is not quadratic", "[cli][timing]") {
    // 300 independent 3j: the sampling domain read each of its rules against every number
    // (about 6.6 s in Release before, about 1 s after); the limit leaves a wide margin.
    auto r = run_cli({"simplify", "--time-limit", "5", "-e", product_of_threej(300)});
    CHECK(r.code == 0);
}

TEST_CASE("a power that lets doubled past the bound is refused, not computed", "[cli]") {
    // W(i) = W(i-1)*W(i-1) forty times is a 6j to the power 2^40; evaluating it exactly filled
    // gigabytes.  Each statement is refused at its line and the next still runs.
    std::string text = "let W0 = 6j{a, b, c; d, e, f}\n";
    for (int i = 1; i <= 40; ++i)
        text += "let W" + std::to_string(i) + " = W" + std::to_string(i - 1) + "*W" + std::to_string(i - 1) + "\n";
    text += "eval W40 at a=1, b=1, c=1, d=1, e=1, f=1\neval W3 at a=1, b=1, c=1, d=1, e=1, f=1\n";
    auto r = run_cli({"eval", "--time-limit", "30", "-e", text});
    CHECK(r.code == 2);
    CHECK(r.err.find("the exponent 1099511627776") != std::string::npos);
    // (1/6)^8: the 6j{1 1 1; 1 1 1} = 1/6 of GSL 2.7 gsl_sf_coupling_6j, to the power 2^3.
    CHECK(r.out.substr(0, r.out.find(' ')) == "1/1679616");
}
