// The simplification pipeline, as one call: normalize, canonicalize symbols and phases, and
// (as the engines grow) reduce m-sums and j-sums.  The result equals the input at every
// admissible assignment; callers verify that by exact evaluation before printing.
#pragma once

#include <ginac/ginac.h>

#include <stdexcept>
#include <string>
#include <vector>

#include "limits/refusal.hpp"
#include "model/quantum.hpp"
#include "rules/rule.hpp"

namespace couplet {

// One applied rule or network move (name, reference, before, after); a network move records
// the term it changed, as it stood and as the move left it.  format_jsum_trace prints them.
using simplification_step = rules::rule_step;

GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers);

// e without any identity applied: every symbol in its canonical arrangement, phases merged and
// reduced, like terms collected, implied triangles dropped.  An answer of simplify_expression
// is never worse than this form of its input: not more sums, then symbols, then terms.
GiNaC::ex canonical_form(const GiNaC::ex& e, const quantum_numbers& numbers);

// The answer with the steps that led to it, in order, for the derivation trace (`simplify
// --steps`): CG to 3j, the network moves, the phase reduction, the j-sum rules, the closed form.
struct simplification {
    GiNaC::ex answer;
    std::vector<simplification_step> steps;
};
simplification simplify_with_steps(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet
