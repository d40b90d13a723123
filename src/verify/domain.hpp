// Where the free quantum numbers of an identity may be sampled.  Values are held doubled
// (t = 2x, an integer), so every rule is an integer linear condition.
//
// Two kinds of rule:
//  - hard rules define the admissible points: declared parities, the congruences of every
//    coupling symbol whose slots are free (a triad's sum and j - m are integers), and for a
//    projection m of j the range |m| <= j.  A phase exponent of the expression is an integer
//    on them, so exact evaluation never stops on a half-integer exponent of a well-posed input.
//  - selection rules are the inequalities and m-sums of those symbols.  A point that breaks one
//    makes that symbol vanish; such points prove little, so samplers prefer points that keep
//    every selection rule, and check only a few of the others.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <string>
#include <utility>
#include <vector>

#include "model/quantum.hpp"

namespace couplet::verify {

// sum_k coefficient_k * t[variable_k] + constant.
struct doubled_form {
    std::vector<std::pair<std::size_t, long>> terms;
    long constant = 0;

    long value(const std::vector<long>& t) const;
    long coefficient_of(std::size_t variable) const;
    // The variable assigned last when variables are assigned in index order.
    std::size_t last_variable() const;
};

enum class rule_kind { nonnegative, zero, divisible };

struct rule {
    rule_kind kind = rule_kind::nonnegative;
    doubled_form form;
    long modulus = 1;  // divisible: form % modulus == 0
    bool holds(const std::vector<long>& t) const;
};

struct free_number {
    GiNaC::symbol symbol;
    qn_role role = qn_role::unknown;
    qn_parity parity = qn_parity::any;
    // A projection whose range is bounded by the j of a column it fills outside every sum
    // over its name: |m| <= j + slack/2.
    bool owned = false;
    long slack = 0;
};

struct sampling_domain {
    // Free quantum numbers in the order of the program's table: angular momenta and plain
    // variables first, projections after them (so that a projection's owner is known first).
    std::vector<free_number> numbers;
    std::vector<rule> hard;
    std::vector<rule> selection;

    std::size_t index_of(const std::string& name) const;  // numbers.size() when absent
    bool preferred(const std::vector<long>& t) const;     // every selection rule holds
    bool admissible(const std::vector<long>& t) const;    // every hard rule holds
};

// The free quantum numbers of all the expressions together (names bound by a sum are not
// free inside it) and the rules their coupling symbols impose.
sampling_domain build_domain(const std::vector<GiNaC::ex>& expressions, const quantum_numbers& numbers);

}  // namespace couplet::verify
