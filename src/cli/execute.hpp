// Carrying out one lowered statement; the result is a JSON object that the reporters print.
#pragma once

#include <nlohmann/json.hpp>

#include <optional>
#include <string>
#include <vector>

#include "exact/number.hpp"
#include "simplify/simplify.hpp"

#include "parse/lower.hpp"
#include "verify/identity_check.hpp"

namespace couplet::cli {

// What the subcommand makes of statements without a keyword.
enum class bare_meaning { simplify, eval };

// How `check` samples, and whether `simplify` verifies its results.
struct execute_options {
    verify::sampling_options sampling;
    bool verify_simplify = true;
    // At default settings a simplification's check takes about as long as the simplification
    // did (at least 12 points: verify::matching_budget); with explicit sampling options it
    // checks every point.
    bool limit_verification_time = true;
    verify::progress_callback progress;
    verify::simplifier_function simplifier;  // empty: simplify_expression
    bool prefer_clebsch = false;             // print results with CG instead of 3j symbols
    bool as_written = false;                 // a 6j or 9j the input wrote keeps its arrangement
    bool show_steps = false;                 // add the applied moves and rules to simplify's record
};

struct outcome {
    nlohmann::json record;   // {"kind", "input", "result", "latex", ...}
    // The same results as values, for the LaTeX document: simplify's result (the input where
    // the internal check failed), eval's exact value, check's report, simplify's steps.
    GiNaC::ex result;
    std::optional<exact::number> value;
    std::optional<verify::check_report> check;
    std::vector<simplification_step> steps;
    bool check_failed = false;
    // couplet caught itself in an error (a simplification that changes the value): the
    // record shows the input unchanged and `diagnostic` says what went wrong.
    bool internal_failure = false;
    std::string diagnostic = {};
    // The time limit ended the statement; the record shows what was established before it.
    bool stopped = false;
};

// Throws user_error (pointing at the statement) when the request cannot be carried out.
outcome execute(const lowered_statement& s, const lowered_program& program, bare_meaning bare,
                const execute_options& options = {});

}  // namespace couplet::cli
