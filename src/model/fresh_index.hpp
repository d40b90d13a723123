// A new summation index for a stage that introduces a sum (the 9j expansion, the network's
// square and interchange moves).  The name is x1, x2, ... : the first one that neither the
// program's quantum numbers nor the term itself use, so it can never capture a name.
#pragma once

#include <ginac/ginac.h>

#include "model/quantum.hpp"

namespace couplet {

// The same name always yields the same GiNaC symbol within a process, so two stages that
// choose an index independently produce terms that compare equal.
GiNaC::symbol fresh_index(const GiNaC::ex& term, const quantum_numbers& numbers);

}  // namespace couplet
