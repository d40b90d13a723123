// Input that no exception may carry out of the program: numbers too large for the square-free
// test or for the phase algebra's 64-bit lattice are refused at the statement (exit 2), and
// bytes that are not UTF-8 cannot stop the JSON output.  Each input once aborted the program.
#include <catch2/catch.hpp>

#include <nlohmann/json.hpp>
#include <string>

#include "support.hpp"

using couplet::testing::run_cli;

TEST_CASE("numbers too large to take apart are refused at the statement", "[cli]") {
    const std::string big(199, '9');
    auto root = run_cli({"eval", "-e", "eval sqrt(" + big + ")"});
    CHECK(root.code == 2);
    CHECK(root.err.find("1:1: error: cannot evaluate: sqrt in") != std::string::npos);
    CHECK(root.err.find("too large") != std::string::npos);
    auto phase = run_cli({"simplify", "-e", "(-1)^(" + big + "*j)"});
    CHECK(phase.code == 2);
    CHECK(phase.err.find("1:1: error: refused: numbers too large here") != std::string::npos);
}

TEST_CASE("JSON output stays valid with bytes that are not UTF-8 in the input", "[cli]") {
    const std::string text = "eval 1 # \xff\xfe comment\neval 6j{1, 1, 1; 1, 1, 1}\n";
    auto r = run_cli({"eval", "--format", "json", "-"}, text);
    CHECK(r.code == 0);
    std::size_t lines = 0;
    for (std::size_t at = 0, end; (end = r.out.find('\n', at)) != std::string::npos; at = end + 1, ++lines)
        CHECK_NOTHROW(nlohmann::json::parse(r.out.substr(at, end - at)));
    CHECK(lines == 2);
    // {1 1 1; 1 1 1} = 1/6 (from memory).
    CHECK(r.out.find("\"exact\":\"1/6\"") != std::string::npos);
}
