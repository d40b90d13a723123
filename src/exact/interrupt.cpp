#include "exact/interrupt.hpp"

namespace couplet::exact {

namespace {
// Per thread, like the run limits whose check it usually is.
thread_local interrupt_check installed = nullptr;
}  // namespace

interrupt_check set_interrupt_check(interrupt_check check) {
    interrupt_check previous = installed;
    installed = check;
    return previous;
}

void poll_interrupt() {
    if (installed) installed();
}

}  // namespace couplet::exact
