// The command line: subcommands, formats, exit codes, help.
#include <catch2/catch.hpp>

#include "support.hpp"

using couplet::testing::run_cli;

TEST_CASE("eval prints the exact value and a decimal", "[cli]") {
    auto r = run_cli({"eval", "-e", "6j{1, 1, 1; 1, 1, 1}"});
    CHECK(r.code == 0);
    CHECK(r.out == "1/6  ~ 0.16666666666666666667\n");
}

TEST_CASE("eval JSON carries exact and decimal", "[cli]") {
    auto r = run_cli({"eval", "--format", "json", "-e", "3j(1/2, 1/2, 1; 1/2, -1/2, 0)"});
    REQUIRE(r.code == 0);
    auto j = nlohmann::json::parse(r.out);
    CHECK(j.at("kind") == "eval");
    CHECK(j.at("exact") == "sqrt(6)/6");
    CHECK(j.at("decimal").get<std::string>().rfind("0.408248290463863", 0) == 0);
    CHECK(j.at("input") == "3j(1/2, 1/2, 1; 1/2, -1/2, 0)");
    CHECK(j.contains("latex"));
}

TEST_CASE("simplify JSON has kind, input, result and latex", "[cli]") {
    auto r = run_cli({"simplify", "--format", "json", "-e", "(-1)^(4*a+1) * 6j{e, d, c; b, a, f}"});
    REQUIRE(r.code == 0);
    auto j = nlohmann::json::parse(r.out);
    CHECK(j.at("kind") == "simplify");
    CHECK(j.at("result") == "-6j{a, b, c; d, e, f}");
    CHECK(j.at("latex") == "-\\begin{Bmatrix} a & b & c \\\\ d & e & f \\end{Bmatrix}");
}

TEST_CASE("one JSON object per statement", "[cli]") {
    auto r = run_cli({"eval", "--format", "json", "-"}, "int l\neval 6j{1,1,1;1,1,1}; 2*3\nlet x = 1\n");
    REQUIRE(r.code == 0);
    std::istringstream lines(r.out);
    std::string line;
    int n = 0;
    while (std::getline(lines, line)) {
        auto j = nlohmann::json::parse(line);
        CHECK(j.at("kind") == "eval");
        ++n;
    }
    CHECK(n == 2);
}

TEST_CASE("check of closed numbers: exit 0 when true, 1 when false", "[cli]") {
    auto r = run_cli({"check", "-e", "6j{1, 1, 1; 1, 1, 1} == 1/6"});
    CHECK(r.code == 0);
    CHECK(r.out.rfind("holds", 0) == 0);
    r = run_cli({"check", "--format", "json", "-e", "6j{2, 2, 2; 2, 2, 2} == 3/70"});
    CHECK(r.code == 1);
    auto j = nlohmann::json::parse(r.out);
    CHECK(j.at("holds") == false);
}

TEST_CASE("latex prints a complete document by default and formulas with --fragment", "[cli]") {
    auto r = run_cli({"latex", "-e", "sum(m : (-1)^(j-m) * 3j(j, j, 0; m, -m, 0))"});
    CHECK(r.code == 0);
    CHECK(r.out.find("\\documentclass{article}") != std::string::npos);
    CHECK(r.out.find("\\usepackage{amsmath}") != std::string::npos);
    CHECK(r.out.find("\\end{document}") != std::string::npos);
    r = run_cli({"latex", "--fragment", "-e", "int a; (-1)^(a)"});
    CHECK(r.out == "(-1)^{a}\n");
}

TEST_CASE("usage errors exit 2 with a message", "[cli]") {
    CHECK(run_cli({}).code == 2);
    CHECK(run_cli({"frobnicate"}).code == 2);
    CHECK(run_cli({"eval"}).code == 2);
    CHECK(run_cli({"eval", "--format", "yaml", "-e", "1"}).code == 2);
    CHECK(run_cli({"eval", "/nonexistent/file.cpl"}).code == 2);
    auto r = run_cli({"eval", "x.cpl", "-e", "1"});
    CHECK(r.code == 2);
    CHECK(r.err.find("not both") != std::string::npos);
}

TEST_CASE("the help text states the commands and the conventions", "[cli]") {
    auto r = run_cli({"--help"});
    CHECK(r.code == 0);
    for (const char* word : {"simplify", "check", "eval", "latex", "Condon-Shortley", "(-1)^(j1-j2+M)", "Exit status"})
        CHECK(r.out.find(word) != std::string::npos);
}

TEST_CASE("the bundled examples run", "[cli][examples]") {
    for (const char* name : {"/examples/p_electron_coupling.cpl", "/examples/orbit_nucleus_coupling.cpl"}) {
        auto r = run_cli({"eval", std::string(COUPLET_SOURCE_DIR) + name});
        INFO(r.err);
        CHECK(r.code == 0);
        CHECK(!r.out.empty());
    }
}

TEST_CASE("each statement of a program pairs its projections by its own columns", "[cli]") {
    // Line 1 makes c - M an integer, which says nothing about line 2, where M is a projection
    // of a and the phase (-1)^(2c+2M) is (-1)^(2c+2a).  Borrowing line 1's pairing reduced the
    // phase to 1 and the self-check caught it (exit 3).
    auto r = run_cli({"simplify", "-"}, "3j(c, c, 0; M, -M, 0)\n(-1)^(2*c+2*M)*3j(a, b, l; M, -M, 0)\n");
    CHECK(r.code == 0);
    CHECK(r.out == "3j(c, c, 0; M, -M, 0)\n(-1)^(2*a+2*c)*3j(a, b, l; M, -M, 0)\n");
}

TEST_CASE("an assigned value that names new quantum numbers is refused cleanly", "[cli]") {
    // Lowering the value adds its names to the table; the assigned name must not be read through
    // a pointer into the table afterwards (a use after free that the parse fuzzer found).
    std::string value = "b0";
    for (int k = 1; k < 40; ++k) value += "+b" + std::to_string(k);
    auto r = run_cli({"eval", "-e", "3j(a, a, 0; 0, 0, 0) at a = " + value});
    CHECK(r.code == 2);
    CHECK(r.err.find("the value of 'a' must be a number like 1, -2 or 3/2") != std::string::npos);
}
