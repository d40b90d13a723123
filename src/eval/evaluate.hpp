// Exact evaluation of a whole expression at an assignment of its free quantum numbers.
#pragma once

#include <ginac/ginac.h>

#include <map>
#include <memory>
#include <stdexcept>
#include <string>
#include <vector>

#include "exact/number.hpp"
#include "model/quantum.hpp"

namespace couplet {

using assignment = std::map<GiNaC::symbol, GiNaC::numeric, GiNaC::ex_is_less>;

// Evaluation cannot proceed: a phase exponent that is not an integer at the point, a sum index
// that nothing bounds, a free quantum number without a value, a j too large.  The message
// names the culprit.
class evaluation_error : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// A divisor is 0 at the point: the expression is undefined there, which a verification counts
// as a point where the identity says nothing rather than as a failure.
class division_by_zero : public evaluation_error {
public:
    explicit division_by_zero(const std::string& divisor_text, const std::string& where = "here")
        : evaluation_error("division by zero: the divisor of " + divisor_text + " is 0 " + where),
          divisor(divisor_text) {}
    std::string divisor;  // the expression that divides, as written
};

// The point needs more summands than evaluation_limits::max_sum_terms allows.
class work_limit_exceeded : public evaluation_error {
public:
    using evaluation_error::evaluation_error;
};

// How a sum's indices are enumerated.  Both give the same exact value.  `propagating` binds
// the indices in an order fixed at compile time, solves an index from an equality (m3 = -m1 - m2
// of a 3j) instead of looping over it, checks each selection rule and evaluates each factor
// as soon as its slots are bound, and remembers coupling-symbol values between calls; it works
// on doubled values in machine integers and falls back to `intervals` when a value is not a
// multiple of 1/2.  `intervals` loops over every index in turn, the narrowest range first,
// with rational arithmetic: the plain reference.
enum class sum_enumeration { propagating, intervals };

struct evaluation_limits {
    long max_twice_j = 20000;         // 2j of any coupling-symbol entry
    long max_sum_terms = 10'000'000;  // summand evaluations in one call
    sum_enumeration enumeration = sum_enumeration::propagating;
    // Keep coupling-symbol values between calls (the propagating enumeration): they recur
    // across a sum's terms and a verification's points, but a table of one symbol meets each
    // value once, and there the memo is all cost.
    bool remember_symbols = true;
};

namespace eval_detail {
struct program;
}

// An expression prepared once and evaluated at many assignments.  Throws evaluation_error
// from the constructor for what can never be evaluated (x^(1/3), a non-linear slot).
class compiled_expression {
public:
    compiled_expression(const GiNaC::ex& e, const quantum_numbers& numbers, evaluation_limits limits = {});
    ~compiled_expression();
    compiled_expression(compiled_expression&&) noexcept;
    compiled_expression& operator=(compiled_expression&&) noexcept;

    // Every free quantum number of the expression must be assigned.
    exact::number at(const assignment& values) const;
    // The free quantum numbers, in the order at_twice takes their values.
    std::vector<std::string> free_names() const;
    // The value with the free numbers at twice[k] / 2, in the order of free_names(): the path of
    // a loop over many points, without looking names up.
    exact::number at_twice(const std::vector<long>& twice) const;

private:
    std::unique_ptr<eval_detail::program> program_;
    evaluation_limits limits_;
};

// One-shot convenience: compile and evaluate.
class evaluator {
public:
    explicit evaluator(const quantum_numbers& numbers, evaluation_limits limits = {})
        : numbers_(numbers), limits_(limits) {}
    exact::number operator()(const GiNaC::ex& e, const assignment& at) const {
        return compiled_expression(e, numbers_, limits_).at(at);
    }

private:
    const quantum_numbers& numbers_;
    evaluation_limits limits_;
};

std::string describe(const assignment& at);

}  // namespace couplet

namespace couplet {
// The exact number as a GiNaC expression (sum of rational multiples of square roots).
GiNaC::ex to_ex(const exact::number& value);
}  // namespace couplet
