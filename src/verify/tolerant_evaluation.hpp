// Exact evaluation that lets a vanishing factor win: a product is 0 where one of its factors is
// exactly 0, even if another factor is undefined there.  sqrt(2J-1) * 3j(J-1, ...) at J = 0,
// or (-1)^(J-1/2) * delta(l, j+1/2) where the delta fails, are 0 and not errors; the plain
// evaluator stops at whichever factor it meets first.  A division by 0 is not excused: the
// expression is undefined there (eval's division_by_zero).
#pragma once

#include <ginac/ginac.h>

#include <map>
#include <memory>
#include <string>

#include "eval/evaluate.hpp"
#include "exact/number.hpp"
#include "model/quantum.hpp"

namespace couplet::verify {

class tolerant_expression {
public:
    // Throws evaluation_error, as compiled_expression does, for what can never be evaluated.
    tolerant_expression(const GiNaC::ex& e, const quantum_numbers& numbers, evaluation_limits limits = {});

    // The value at `at`.  Where it is undefined (a non-integer phase exponent, the square root of
    // a negative number, a division by 0) in a way no vanishing factor excuses, rethrows the
    // evaluator's error: division_by_zero where a divisor is 0 (whatever else vanishes),
    // evaluation_error otherwise.
    exact::number at(const assignment& values) const;

private:
    exact::number forgiving(const GiNaC::ex& e, const assignment& values) const;
    const compiled_expression& compiled(const GiNaC::ex& e) const;

    GiNaC::ex e_;
    const quantum_numbers& numbers_;
    evaluation_limits limits_;
    compiled_expression whole_;
    // Parts compiled on demand, only after the whole failed somewhere.
    mutable std::map<GiNaC::ex, std::unique_ptr<compiled_expression>, GiNaC::ex_is_less> parts_;
};

// The error of an expression whose divisor `divisor` was 0 at each of the `points` admissible
// points a verification evaluated: undefined, not an identity that holds.
division_by_zero undefined_everywhere(const std::string& divisor, std::size_t points);

}  // namespace couplet::verify
