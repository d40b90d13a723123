// The rewrites the j-sum engine performs as code rather than by matching a pattern, each as an
// identity with an instance (model/identity.hpp), so that its trace entries come from an
// object with a reference and a self-test like every rule's.
#pragma once

#include <ginac/ginac.h>

#include "model/identity.hpp"

namespace couplet::rules {

// A symbol that one of its symmetries maps to minus itself, given the parities, is 0.
const identity& odd_symbol_identity();
// delta(a, b)^n = delta(a, b) for n >= 1.
const identity& repeated_delta_identity();
// delta(a, b) f(b) = delta(a, b) f(a).
const identity& delta_elimination_identity();
// sum(x : delta(x, a) f(x)) = f(a) where a is a value x takes.
const identity& delta_collapse_identity();
// sum(x : A + B) = sum(x : A) + sum(x : B).
const identity& sum_split_identity();
// sum(x : A) + sum(x : B) = sum(x : A + B), and the same after renaming one sum's indices.
const identity& sums_merged_identity();
const identity& sums_merged_renamed_identity();
// A 9j as a sum over x of three 6j (DLMF 34.6.2 read from the 9j): the sum rule that
// recognises three 6j as a 9j, both sides exchanged.
const identity& ninej_expansion_identity();
// The summand of that expansion for the 9j `ninej` (any arrangement) and the index x: the
// sum rule's summand with its pattern symbols replaced by the 9j's entries.
GiNaC::ex ninej_summand(const GiNaC::ex& ninej, const GiNaC::symbol& x);

}  // namespace couplet::rules
