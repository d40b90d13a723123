#include "limits/run_limits.hpp"

#include "exact/interrupt.hpp"

namespace couplet {

namespace {
// Thread-local so that tests running statements side by side cannot see each other's bounds.
thread_local run_limits limits_in_force;
}  // namespace

const run_limits& current_run_limits() { return limits_in_force; }

scoped_run_limits::scoped_run_limits(const run_limits& limits)
    : previous_(limits_in_force), previous_check_(exact::set_interrupt_check(&check_deadline)) {
    limits_in_force = limits;
}

scoped_run_limits::~scoped_run_limits() {
    limits_in_force = previous_;
    exact::set_interrupt_check(previous_check_);
}

void check_deadline() {
    const auto& deadline = limits_in_force.deadline;
    if (deadline && std::chrono::steady_clock::now() >= *deadline) throw time_limit_reached();
}

}  // namespace couplet
