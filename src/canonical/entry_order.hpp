// The order in which couplet prefers the entries of a coupling symbol: angular momenta before
// projections, each by name (couplet::readable_name_less); entries with quantum numbers before pure
// numbers; a projection with a leading '+' before its negative.  It depends only on the names
// and their roles, so the same symbol prints the same in every program.
#pragma once

#include <ginac/ginac.h>

#include <map>
#include <string>
#include <utility>
#include <vector>

#include "model/quantum.hpp"

namespace couplet::symmetry {

class entry_order {
public:
    explicit entry_order(const quantum_numbers& numbers);

    // A sortable key for one entry; `projection_row` enables the sign preference.
    using key = std::vector<std::pair<long, GiNaC::numeric>>;
    key of(const GiNaC::ex& entry, bool projection_row) const;

    // Position of a name in the readable order (unknown names last, in name order).
    long rank(const std::string& name) const;

private:
    std::map<std::string, long> rank_;
};

bool key_less(const entry_order::key& a, const entry_order::key& b);

}  // namespace couplet::symmetry
