// A check's outcome in one line of text.
#pragma once

#include <string>

#include "verify/identity_check.hpp"

namespace couplet::verify {

// "holds: ...", "fails by a phase: holds after multiplying the right side by (-1)^(a+b)", ...
std::string summary(const check_report& r);

}  // namespace couplet::verify
