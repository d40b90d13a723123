// The simplification pipeline, as one call: normalize, canonicalize symbols and phases, and
// (as the engines grow) reduce m-sums and j-sums.  The result equals the input at every
// admissible assignment; callers verify that by exact evaluation before printing.
#pragma once

#include <ginac/ginac.h>

#include <stdexcept>

#include "couplet/model/quantum.hpp"

namespace couplet {

// A request couplet refuses for a reason the user can fix (a phase exponent that is not an
// integer everywhere, ...).  The CLI reports it like a user error, at the statement, exit 2.
class refusal : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet
