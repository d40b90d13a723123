#include "cli/fixed_layout.hpp"

#include <sys/personality.h>
#include <unistd.h>

namespace couplet::cli {

void run_with_fixed_address_layout(char** argv) {
    const int current = personality(0xffffffff);  // a query: changes nothing
    if (current == -1 || (current & ADDR_NO_RANDOMIZE)) return;
    if (personality(static_cast<unsigned long>(current) | ADDR_NO_RANDOMIZE) == -1) return;
    execv("/proc/self/exe", argv);
    personality(static_cast<unsigned long>(current));  // no exec: leave the flag as it was found
}

}  // namespace couplet::cli
