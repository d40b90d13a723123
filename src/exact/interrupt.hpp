// The long loops of exact evaluation (a Racah series in big integers, the x-sum of a 9j) poll
// here now and then.  exact/ knows nothing of run limits: the layer that sets them installs
// the check (limits/run_limits.cpp installs the deadline), which may throw to stop the work.
#pragma once

namespace couplet::exact {

using interrupt_check = void (*)();

// Installs `check` (nullptr: none) and returns the one it replaces.
interrupt_check set_interrupt_check(interrupt_check check);

void poll_interrupt();

}  // namespace couplet::exact
