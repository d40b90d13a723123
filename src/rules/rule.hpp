// The identities that remove sums over angular momenta, one object each.  A sum rule reads
//   sum(X : (2X+1)^weight * (-1)^phase * factor_1 * ... * factor_k) == result
// in its own pattern symbols; the matcher (matcher.hpp) finds it in a term up to the symbols'
// symmetries, the phase group and a renamed index.  Each is an identity whose instance is its
// own pattern, so the shared self-test proves every rule.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <string>
#include <vector>

#include "model/identity.hpp"
#include "model/quantum.hpp"

namespace couplet::rules {

struct sum_rule : identity {
    GiNaC::symbol index;                        // X, bound by the sum
    std::optional<GiNaC::symbol> second_index;  // Y, for a double sum
    int weight = 1;                             // power of (2X+1) (and of (2Y+1))
    GiNaC::ex phase = 0;                        // exponent of (-1) in the pattern
    std::vector<GiNaC::ex> factors;             // 6j / 9j / tri in pattern symbols
    GiNaC::ex result;                           // free of X

    GiNaC::ex left_side() const;
    std::vector<GiNaC::symbol> indices() const;
    // The summand of left_side() for given indices: the pattern with X (and Y) renamed.
    GiNaC::ex summand() const;
};

// 6j orthogonality, Racah sum rule, Biedenharn-Elliott, three 6j -> 9j, sum of (2x+1) over a
// triangle, 9j orthogonality, the 9j sum rule (the double sums last).  Built once
// (function-local static: GiNaC functions must be registered first).
const std::vector<sum_rule>& sum_rules();

// A rule on one symbol, wherever it stands: the pattern (a 6j or 9j in pattern symbols with
// some entries fixed numbers) equals the result.  Matched up to the symbol's symmetries.
struct local_rule : identity {
    GiNaC::ex pattern;
    GiNaC::ex result;
};

// 6j with a zero argument, 9j with a zero argument.
const std::vector<local_rule>& local_rules();

// One applied rewrite, for the derivation trace.
using rule_step = derivation_step;

}  // namespace couplet::rules
