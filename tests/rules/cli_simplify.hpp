// The acceptance harness: `couplet simplify` on a text, its output re-read, and input and output
// compared exactly at sampled points (jsum_check.hpp).
#pragma once

#include <catch2/catch.hpp>

#include <string>
#include <vector>

#include "jsum_check.hpp"
#include "rules/engine.hpp"
#include "simplify/simplify.hpp"
#include "support.hpp"

namespace couplet::testing {

inline int count_of(const std::string& text, const std::string& word) {
    int n = 0;
    for (size_t at = text.find(word); at != std::string::npos; at = text.find(word, at + 1)) ++n;
    return n;
}

inline std::string trimmed(std::string s) {
    while (!s.empty() && (s.back() == '\n' || s.back() == ' ')) s.pop_back();
    return s;
}

struct simplified {
    std::string text;
    sample_report report;
};

// Runs the command line on `declarations` + `input` and compares input and output exactly.
// `verify` off for inputs whose single phase factors are no integers where a triangle fails: the
// command line's own check refuses to evaluate those; this test compares exactly instead.
inline simplified simplify_and_compare(const std::string& declarations, const std::string& input, bool verify = true,
                                       int points = 120) {
    std::vector<std::string> args{"simplify", "-e", declarations + input};
    if (!verify) args.push_back("--no-verify");
    auto r = run_cli(args);
    INFO("stderr: " << r.err);
    REQUIRE(r.code == 0);
    std::string out = trimmed(r.out);
    auto both = lower_text(declarations + input + "\n" + out);
    const auto& statements = both.statements;
    REQUIRE(statements.size() >= 2);
    auto report =
        compare_at_points(statements[statements.size() - 2].value, statements.back().value, both.numbers, 11, points);
    return {out, report};
}

inline void require_exact(const simplified& s) {
    INFO("output: " << s.text << "\nfirst mismatch: " << s.report.first_mismatch);
    CHECK(s.report.mismatches == 0);
    CHECK(s.report.compared >= 100);
    CHECK(s.report.nonzero >= 10);
}

// The identities simplify applied to the last statement of `text`, in order, one per line.
inline std::string rules_applied(const std::string& text) {
    auto program = lower_text(text);
    std::string out;
    for (const auto& step : simplify_with_steps(program.statements.back().value, program.numbers).steps)
        out += step.rule + "\n";
    return out;
}

}  // namespace couplet::testing
