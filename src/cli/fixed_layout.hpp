// One binary, one printed form: GiNaC orders the terms of sums and products by hashes seeded
// from the addresses of type information (DEPENDENCIES.md 1.7), so under address-space
// randomization the same input can come out as a different, equally correct form on each run,
// with other recoupling choices along the way.  The command line therefore runs itself once more
// with randomization off, as `setarch -R` would.
#pragma once

namespace couplet::cli {

// Re-executes the program with ADDR_NO_RANDOMIZE set, unless it is set already or the system
// refuses (a sandbox may forbid it): then it returns and the run goes on, its results as correct
// as ever, only their term order free to vary.  Call first in main, before any input is read.
void run_with_fixed_address_layout(char** argv);

}  // namespace couplet::cli
