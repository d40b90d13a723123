// The identities that remove sums over angular momenta, one object each.  A sum rule reads
//   sum(X : (2X+1)^weight * (-1)^phase * factor_1 * ... * factor_k) == result
// in its own pattern symbols; the matcher (matcher.hpp) finds it in a term up to the symbols'
// symmetries, the phase group and a renamed index.  Every rule proves itself with self_test.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <string>
#include <vector>

#include "model/quantum.hpp"

namespace couplet::rules {

struct sum_rule {
    std::string name;
    std::string reference;  // DLMF equation, or "common practice, no source"
    GiNaC::symbol index;    // X, bound by the sum
    std::optional<GiNaC::symbol> second_index;  // Y, for a double sum
    int weight = 1;         // power of (2X+1) (and of (2Y+1))
    GiNaC::ex phase = 0;    // exponent of (-1) in the pattern
    std::vector<GiNaC::ex> factors;  // 6j / 9j / tri in pattern symbols
    GiNaC::ex result;       // free of X
    // The pattern symbols (X included) as quantum numbers, for the self-test.
    quantum_numbers numbers;

    GiNaC::ex left_side() const;
    std::vector<GiNaC::symbol> indices() const;
};

// 6j orthogonality, Racah sum rule, Biedenharn-Elliott, three 6j -> 9j, sum of (2x+1) over a
// triangle, 9j orthogonality, the 9j sum rule (the double sums last).  Built once
// (function-local static: GiNaC functions must be registered first).
const std::vector<sum_rule>& sum_rules();

// A rule on one symbol, wherever it stands: the pattern (a 6j or 9j in pattern symbols with
// some entries fixed numbers) equals the result.  Matched up to the symbol's symmetries.
struct local_rule {
    std::string name;
    std::string reference;
    GiNaC::ex pattern;
    GiNaC::ex result;
    quantum_numbers numbers;
};

// 6j with a zero argument, 9j with a zero argument.
const std::vector<local_rule>& local_rules();

// One applied rewrite, for the derivation trace.
struct rule_step {
    std::string rule;
    std::string reference;
    GiNaC::ex before, after;
    // Shown as recorded: a trace reduces the phases of every other step for reading, which
    // would hide what the phase reduction itself did.
    bool shown_as_recorded = false;
};

// Exact comparison of both sides of a sum rule at random points with every j <= twice_max/2:
// `admissible` points where the free triads of the left side hold, plus `arbitrary` points
// anywhere (where both sides must vanish together).  Returns the number of points compared;
// throws std::logic_error with the point when the sides differ.
struct self_test_report {
    int compared = 0;
    int nonzero = 0;
};
self_test_report self_test(const sum_rule& r, unsigned seed, int admissible = 200, int arbitrary = 100,
                           int twice_max = 8);
self_test_report self_test(const local_rule& r, unsigned seed, int admissible = 200, int arbitrary = 100,
                           int twice_max = 8);

}  // namespace couplet::rules
