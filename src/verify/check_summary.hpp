// A check's outcome as the command line shows it: one line of text, and the JSON fields.
#pragma once

#include <nlohmann/json.hpp>

#include <string>

#include "verify/identity_check.hpp"

namespace couplet::verify {

// "holds: ...", "fails by a phase: holds after multiplying the right side by (-1)^(a+b)", ...
std::string summary(const check_report& r);

// {"holds", "verdict", "missing_phase", "missing_factor", "points", "nonzero_points",
//  "symbolic_proof", "depth", "exhaustive", "counterexample", "note"}
nlohmann::json to_json(const check_report& r);

// {"at": {name: value}, "assignment": "j=1, m=0", "lhs", "rhs"}
nlohmann::json to_json(const counterexample& c);

}  // namespace couplet::verify
