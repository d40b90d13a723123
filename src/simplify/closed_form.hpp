// The shape of a printed answer (DESIGN section 7): terms that differ only by a polynomial
// coefficient are collected and their coefficient factored, so (2J+1) weights come back whole
// and cancel against (2J+1) denominators; sums over the same indices are joined into one; a
// triangle condition that a 3j, CG, 6j or 9j of the same product imposes is dropped; factors
// common to every term are taken out.  Every
// rewrite keeps the value at every assignment.
#pragma once

#include <ginac/ginac.h>

namespace couplet {

GiNaC::ex closed_form(const GiNaC::ex& e);

// Every 6j and 9j of `result` that is a symmetric image of one the input wrote, in the input's
// arrangement (times the phase the symmetry costs; none for a 6j): a user who wrote
// {j1 J j2; J' j1' k} reads it back so.  Symbols the reduction made keep the canonical one.
GiNaC::ex in_written_arrangement(const GiNaC::ex& result, const GiNaC::ex& input);

// Only the collection: like terms collected with their coefficients factored, sums over the
// same indices joined.  For showing a step's terms as written, triangles and all.
GiNaC::ex collected_terms(const GiNaC::ex& e);

// tri(a, b, c) dropped from each product (also inside sums) that holds a coupling symbol with
// the triad (a, b, c): that symbol vanishes wherever the condition fails.
GiNaC::ex without_implied_triangles(const GiNaC::ex& e);

}  // namespace couplet
