// Carrying out one lowered statement; the result is a JSON object that the reporters print.
#pragma once

#include <nlohmann/json.hpp>

#include "couplet/model/lower.hpp"

namespace couplet::cli {

// What the subcommand makes of statements without a keyword.
enum class bare_meaning { simplify, eval };

struct outcome {
    nlohmann::json record;   // {"kind", "input", "result", "latex", ...}
    bool check_failed = false;
};

// Throws user_error (pointing at the statement) when the request cannot be carried out.
outcome execute(const lowered_statement& s, const lowered_program& program, bare_meaning bare);

}  // namespace couplet::cli
