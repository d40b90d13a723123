// Running `check` on the last statement of a program text, for the verify tests.
#pragma once

#include <chrono>
#include <string>

#include "print/print.hpp"
#include "support.hpp"
#include "verify/identity_check.hpp"
#include "verify/phase_fit.hpp"

namespace couplet::testing {

struct checked {
    verify::check_report report;
    std::string missing_phase;   // "" when none
    std::string missing_factor;  // "" when none
};

// `reach_time`: how long the search for far and covering points may take (the default's 0.5 s
// bounds each check's cost; tests that assert what reach finds give it enough that the
// machine's load cannot change the outcome).
inline checked check_text(const std::string& text, int depth = 2, int samples = 200,
                          std::chrono::milliseconds reach_time = std::chrono::milliseconds(500)) {
    lowered_program p = lower_text(text);
    const lowered_statement& s = p.statements.back();
    verify::check_options o;
    o.sampling.depth = depth;
    o.sampling.samples = samples;
    o.sampling.reach_time = reach_time;
    checked c{verify::check_identity(s.value, s.rhs, p.numbers, o), "", ""};
    if (c.report.missing_phase) c.missing_phase = verify::phase_text(*c.report.missing_phase);
    if (c.report.missing_factor) c.missing_factor = to_text(*c.report.missing_factor);
    return c;
}

}  // namespace couplet::testing
