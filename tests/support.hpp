// Helpers shared by the test files: running the command line in-process and lowering text.
#pragma once

#include <nlohmann/json.hpp>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "cli/run.hpp"
#include "parse/lower.hpp"

namespace couplet::testing {

struct cli_result {
    int code;
    std::string out, err;
};

inline cli_result run_cli(std::vector<std::string> args, const std::string& input = "") {
    args.insert(args.begin(), "couplet");
    std::istringstream in(input);
    std::ostringstream out, err;
    int code = cli::run(args, in, out, err);
    return {code, out.str(), err.str()};
}

inline lowered_program lower_text(const std::string& text) { return read_program(source_file("<test>", text)); }

// The expression of the last statement of `text`.
inline GiNaC::ex lower_last(const std::string& text) { return lower_text(text).statements.back().value; }

}  // namespace couplet::testing
