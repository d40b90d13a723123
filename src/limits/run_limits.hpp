// The resource bounds of one run that no single stage owns: the number of terms an expansion
// may produce (--max-terms) and a wall-clock deadline (--time-limit).  They are set once for
// the run (scoped_run_limits) and read by the long loops of every stage, so no signature has
// to carry them.  The per-evaluation bounds (2j, summands) stay in evaluation_limits.
#pragma once

#include <ginac/ginac.h>

#include <chrono>
#include <cstddef>
#include <optional>
#include <stdexcept>
#include <string>

#include "limits/refusal.hpp"

namespace couplet {

struct run_limits {
    std::size_t max_terms = 100000;
    std::optional<std::chrono::steady_clock::time_point> deadline;  // none: no time limit
};

// An expansion would exceed --max-terms.  A refusal: the user can raise the bound or factor
// the input; `check` then decides by evaluation alone.
class term_limit_reached : public refusal {
public:
    using refusal::refusal;
};

// The deadline has passed.  Not a refusal: no stage may catch it and carry on, it unwinds to
// the statement, which the CLI reports as stopped.
class time_limit_reached : public std::runtime_error {
public:
    time_limit_reached() : std::runtime_error("the time limit was reached") {}
};

// The limits in force (defaults outside any scope).
const run_limits& current_run_limits();

class scoped_run_limits {
public:
    explicit scoped_run_limits(const run_limits& limits);
    ~scoped_run_limits();
    scoped_run_limits(const scoped_run_limits&) = delete;
    scoped_run_limits& operator=(const scoped_run_limits&) = delete;

private:
    run_limits previous_;
    void (*previous_check_)();  // the exact evaluator's interrupt check before these limits
};

// Throws time_limit_reached once the deadline has passed.  Cheap enough for inner loops
// that call it every few thousand iterations.
void check_deadline();

// The number of terms e.expand() would produce, counted without expanding (saturating at
// SIZE_MAX); sums over indices count as one term, as expand leaves them whole.
std::size_t expanded_term_count(const GiNaC::ex& e);

// Throws term_limit_reached when expanding e would exceed max_terms.
void check_expansion(const GiNaC::ex& e);

}  // namespace couplet
