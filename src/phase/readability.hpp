// The order in which equal exponents are preferred when printed.  Lexicographic:
//   1. fewest variable terms;
//   2. fewest coefficients that are not integers;
//   3. fewest negative coefficients;
//   4. fewest coefficients other than +-1 (so 2j, but a+b-c before a+b+c+2c);
//   5. no constant before a constant (a sign folded into the exponent);
//   6. variable by variable in declaration order: a term on an earlier variable first, with
//      coefficient 1 before 2 before -1 before the rest;
//   7. the constant: 0, then positive ones smallest first, then negative ones.
// Coefficients are read in (-2, 2] and the constant in (-1, 1], since 4v and 2 are null.
#pragma once

#include <array>
#include <cstdint>
#include <vector>

namespace couplet::phase::detail {

using readability_key = std::vector<std::int64_t>;

// w is a form of the given level (see scaled_form.hpp); smaller keys read better.  The key is
// injective on forms with entries mod 4*level, so it is a total order.
readability_key readability(const std::vector<std::int64_t>& w, std::int64_t level);

// Criteria 1-4 alone, without allocating: a cheap filter before the full key.
std::array<std::int64_t, 4> readability_counts(const std::vector<std::int64_t>& w, std::int64_t level);

}  // namespace couplet::phase::detail
