#include "print/print.hpp"

namespace couplet {

std::vector<std::string> trace_step_lines(const std::string& rule, const std::string& reference,
                                          const std::string& before, const std::string& after) {
    return {rule + " (" + reference + ")", "  before: " + before, "  after:  " + after};
}

}  // namespace couplet
