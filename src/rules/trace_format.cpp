// The j-sum trace as plain text, for the command line's derivation output.
#include "print/print.hpp"
#include "rules/engine.hpp"

namespace couplet {

std::vector<std::string> format_jsum_trace(const std::vector<rules::rule_step>& trace) {
    std::vector<std::string> lines;
    lines.reserve(3 * trace.size());
    for (const rules::rule_step& step : trace) {
        lines.push_back(step.rule + " (" + step.reference + ")");
        // Through the project's printer: fixed term order, and each line re-parses as input.
        lines.push_back("  before: " + to_text(step.before));
        lines.push_back("  after:  " + to_text(step.after));
    }
    return lines;
}

}  // namespace couplet
