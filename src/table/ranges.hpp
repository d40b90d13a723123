// The values a table gives its quantum numbers, as written after --for:
//   j1, j2 = 0..5        every admissible value from 0 to 5 (steps of 1/2 where the kind allows)
//   J = 1/2..9/2 step 1  from 1/2 to 9/2 in steps of 1
//   m = -1               one value
// Values are held doubled (2x, an integer), like the sampling domain's.
#pragma once

#include <cstddef>
#include <string>
#include <vector>

namespace couplet::table_detail {

// The largest |value| a range may hold: the evaluator's bound 2j <= 20000.
constexpr long max_twice_value = 20000;

struct named_range {
    std::string name;
    std::size_t offset = 0;  // where the name stands in the text, for messages
    long from = 0, to = 0, step = 1;
};

// One --for text, one entry per name.  Throws user_error (source/source.hpp) at the offending
// character.
std::vector<named_range> read_ranges(const std::string& text);

}  // namespace couplet::table_detail
