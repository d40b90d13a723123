#pragma once
// Guards the exact routines against arguments whose sums would not finish.

#include <initializer_list>

namespace couplet::exact::detail {

// Throws std::domain_error naming `symbol` if any doubled argument exceeds
// max_doubled_argument (wigner.hpp).
void check_doubled_arguments(const char* symbol, std::initializer_list<long> doubled);

}  // namespace couplet::exact::detail
