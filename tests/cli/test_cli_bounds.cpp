// The run-wide resource bounds: --max-terms refuses an expansion before it happens, and
// --time-limit stops a run after the statements it finished, each with exit status 2 and a
// message at the statement.
#include <catch2/catch.hpp>

#include <chrono>
#include <limits>
#include <random>

#include "limits/run_limits.hpp"
#include "support.hpp"

using namespace couplet;
using testing::run_cli;

TEST_CASE("the expansion size is counted without expanding", "[cli][bounds]") {
    // Cross-checked against GiNaC's own expand on random products of sums of fresh symbols,
    // where no two monomials can merge and the count is exact (common practice, no source).
    std::mt19937 rng(11);
    auto pick = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng); };
    for (int trial = 0; trial < 40; ++trial) {
        GiNaC::ex product = 1;
        int factors = pick(1, 4);
        for (int f = 0; f < factors; ++f) {
            GiNaC::ex sum = 0;
            int terms = pick(1, 4);
            for (int t = 0; t < terms; ++t)
                sum += GiNaC::symbol("s" + std::to_string(trial) + "_" + std::to_string(f) + "_" + std::to_string(t));
            product *= sum;
        }
        INFO(product);
        GiNaC::ex expanded = product.expand();
        CHECK(expanded_term_count(product) == (GiNaC::is_a<GiNaC::add>(expanded) ? expanded.nops() : 1));
    }
    GiNaC::symbol a("a"), b("b");
    CHECK(expanded_term_count(GiNaC::pow(a + b, 1000)) == std::numeric_limits<std::size_t>::max());
}

TEST_CASE("max-terms: refuses a large expansion at the statement, exit 2", "[cli][bounds]") {
    const std::string input = "eval 1\n(a+b+c)^2 * (d+e+f+g)^2 * 3j(a, b, c; 0, 0, 0)\n";
    auto r = run_cli({"simplify", "--max-terms", "100", "-"}, input);
    CHECK(r.code == 2);
    CHECK(r.err.find(":2:1: error: expanding this expression would produce 144 terms") != std::string::npos);
    CHECK(r.err.find("--max-terms") != std::string::npos);
    auto json = run_cli({"simplify", "--max-terms", "100", "--format", "json", "-"}, input);
    CHECK(json.code == 2);
    CHECK(json.out.find("\"line\":2") != std::string::npos);
    // 144 terms is within the default bound.
    CHECK(run_cli({"simplify", "--no-verify", "-"}, input).code == 0);
}

TEST_CASE("max-terms: leaves check to decide by evaluation alone", "[cli][bounds]") {
    auto r = run_cli({"check", "--max-terms", "5", "-e", "(a+b)^3 == a^3 + 3*a^2*b + 3*a*b^2 + b^3"});
    CHECK(r.code == 0);
    CHECK(r.out.find("holds") != std::string::npos);
    CHECK(r.out.find("sampled, not proved") != std::string::npos);
}

TEST_CASE("time-limit: stops after the finished statements and says so", "[cli][bounds]") {
    // A sum of 10 001 exact 6j values with entries near 5000 takes far longer than 0.3 s.
    const std::string input =
        "eval 3j(1, 1, 0; 0, 0, 0)\n"
        "eval sum(x : (2*x+1) * 6j{a, b, x; a, b, c}^2) at a = 5000, b = 5000, c = 1\n"
        "eval 1/2\n";
    auto started = std::chrono::steady_clock::now();
    auto r = run_cli({"eval", "--time-limit", "0.3", "-"}, input);
    auto seconds = std::chrono::duration<double>(std::chrono::steady_clock::now() - started).count();
    INFO(r.out << r.err);
    CHECK(r.code == 2);
    CHECK(seconds < 5);
    CHECK(r.out.find("-sqrt(3)/3") != std::string::npos);  // the first statement is printed
    CHECK(r.err.find(":2:1: error: stopped: the time limit of 0.3 s was reached") != std::string::npos);
    CHECK(r.err.find("the 1 statement before it is complete") != std::string::npos);
    CHECK(r.err.find("the 1 after it was not started") != std::string::npos);
}

TEST_CASE("the help states every bound with its value", "[cli][bounds]") {
    auto r = run_cli({"--help"});
    for (const char* text :
         {"--max-terms N (default 100000)", "--time-limit S", "2j <= 20000", "10000000 summands", "200 deep",
          "200 digits", "|n| <= 1000", "at most 10000 digits", "at most 1000 levels deep"})
        CHECK(r.out.find(text) != std::string::npos);
}

// [timing]: the stop must come after the first points and long before the last.  Entries near
// 100 make each point cost milliseconds (two Racah sums of about 100 terms for each of about 200
// x), so 10 000 points take about 30 s on the machine this was measured on, while the symbolic
// attempt and the drawing of the sample take about 0.15 s: the 2 s limit falls between them with
// a wide margin on a faster machine and on a loaded one.  (Many cheap points at small j did not
// have that margin: a quiet machine finished them within the limit, a loaded one was still
// drawing them when it passed.)
TEST_CASE("time-limit: during check prints what the points established", "[cli][bounds][timing]") {
    // DLMF 34.5.14 (6j orthogonality) with every fixed entry raised by 100.
    const std::string identity =
        "sum(x : (2*x+1) * 6j{a+100, b+100, x; c+100, d+100, p} * 6j{c+100, d+100, x; a+100, b+100, q}) == "
        "delta(p, q)*tri(a+100, d+100, p)*tri(b+100, c+100, p)/(2*p+1)";
    auto r = run_cli(
        {"check", "--time-limit", "2", "--depth", "1", "--samples", "10000", "--format", "json", "-e", identity});
    INFO(r.out << r.err);
    CHECK(r.code == 2);
    auto record = nlohmann::json::parse(r.out.substr(0, r.out.find('\n')));
    CHECK(record.at("verdict") == "undecided");
    CHECK(record.at("holds").is_null());
    CHECK(record.at("stopped_by_time_limit") == true);
    CHECK(record.at("points").get<int>() > 0);
    CHECK(r.err.find("what it established by then is printed") != std::string::npos);
}
