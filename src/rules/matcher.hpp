// Finding a rule in a term: unification of the pattern symbols with the term's entries over
// all symmetric arrangements, and the phase left over, which must not depend on the index.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <vector>

#include "model/quantum.hpp"
#include "rules/rule.hpp"

namespace couplet::rules {

// The sum over the indices xs (in the order of r.indices()) of the product of `factors` (every
// factor of a summand that involves one of them) as rule r gives it, times the leftover phase;
// nothing when r does not fit.  `term` is the whole term, whose triads and parities decide
// phase equalities.
std::optional<GiNaC::ex> match_sum_rule(const sum_rule& r, const std::vector<GiNaC::symbol>& xs,
                                        const std::vector<GiNaC::ex>& factors, const GiNaC::ex& term,
                                        const quantum_numbers& numbers);

// The symbol rewritten by r, when one of its arrangements fits r's pattern.
std::optional<GiNaC::ex> match_local_rule(const local_rule& r, const GiNaC::ex& symbol);

}  // namespace couplet::rules
