// The part of a term that makes the whole term 0 when it is 0: for a table's rows that a
// selection rule leaves out.
#pragma once

#include <ginac/ginac.h>

#include <vector>

namespace couplet::table_detail {

// For each term of e, the product of its coupling-symbol factors, with a factor that is a sum
// of one term replaced by the sum of its own such part (a sum whose every summand vanishes
// vanishes): 6j{a, b, c; d, e, f} * (2c + 1) gives the 6j; 3j(...) + 1 gives two terms, the
// second with nothing that can vanish.
std::vector<GiNaC::ex> vanishing_parts(const GiNaC::ex& e);

}  // namespace couplet::table_detail
