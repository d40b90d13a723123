// The j-sum stage of simplify: applies the rules (rule.hpp) until none fires, and records every
// step.
//
// Termination: every rewrite strictly lowers, in lexicographic order, (number of summation
// indices, number of 9j, number of 6j, the multiset of symbol occurrences ranked by the readable
// order).  Sum rules and delta collapse remove an index; a 9j is expanded (DLMF 34.6.2) only
// together with a sum rule on another index that then fires, which keeps the indices and
// removes the 9j (when several arrangements of the 9j let a rule fire, each outcome is reduced to
// the end on the side, on a term already lower in the order, and the lowest end is taken); the
// zero-argument rules remove a 6j or a 9j; a vanishing term drops out; delta
// elimination replaces a symbol by one earlier in the readable order.  Splitting or merging
// sums (also sums whose indices are renamed to agree) is done only together with a rule that
// fires.  Roots are split into roots of their factors before each step (idempotent, so no
// step of its own; rules/roots.hpp) and rejoined at the end.  A step limit guards against a
// bug in that argument.
#pragma once

#include <ginac/ginac.h>

#include <string>
#include <vector>

#include "model/quantum.hpp"
#include "rules/rule.hpp"

namespace couplet::rules {

struct jsum_result {
    GiNaC::ex value;
    std::vector<rule_step> trace;
};

// Equal to e at every assignment of its free quantum numbers.
jsum_result reduce_jsums(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet::rules

namespace couplet {
// Three lines per step: "rule name (reference)", then "  before: ..." and "  after:  ..." in
// the text notation (to_text).
std::vector<std::string> format_jsum_trace(const std::vector<rules::rule_step>& trace);
}  // namespace couplet
