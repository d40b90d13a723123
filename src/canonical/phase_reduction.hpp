// Rewriting every phase (-1)^X to the phase group's readable representative of its class,
// given what the surrounding factors imply about the quantum numbers.
#pragma once

#include <ginac/ginac.h>

#include <stdexcept>

#include "limits/refusal.hpp"
#include "model/quantum.hpp"
#include "phase/context.hpp"
#include "phase/linear_form.hpp"

namespace couplet {

// An exponent that is not an integer at some admissible assignment; the message names the
// exponent and the assignment.  simplify and check refuse such input.
class phase_not_integer : public refusal {
public:
    using refusal::refusal;
};

GiNaC::ex reduce_phases(const GiNaC::ex& e, const quantum_numbers& numbers);

// What reduce_phases proves, without the rewriting: throws phase_not_integer where it would.
void prove_phases_integral(const GiNaC::ex& e, const quantum_numbers& numbers);

// For display (the --steps trace): the phases merged and reduced where the phase algebra can
// prove the exponents integral, `e` itself where it cannot.  Never changes the value.
GiNaC::ex phases_reduced_for_reading(const GiNaC::ex& e, const quantum_numbers& numbers);

// A linear GiNaC expression as the phase group's linear form; std::invalid_argument otherwise.
phase::linear_form linear_form_of(const GiNaC::ex& e);

// Declares q in the phase group by its role and declared parity: an angular momentum with its
// parity, a projection as a half-integer of either sign (integral or half-odd as declared).
void declare_in(phase::context& ctx, const quantum_number& q);

}  // namespace couplet
