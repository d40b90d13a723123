// The readable order of quantum numbers, below the printers: canonical forms (the argument
// order of a delta, the entry order of a symbol) must not depend on GiNaC's hash order, and the
// printers sort by the same order, so what collects alike also prints alike.
#pragma once

#include <ginac/ginac.h>

#include <string>

namespace couplet {

// The readable order of names: j < j1 < j2 < j12 < J < J' < l < lambda (letters case-blind,
// lower case first, subscripts by value, primes last).
bool readable_name_less(const std::string& a, const std::string& b);

// A linear form as the printers write it (terms by readable name, the constant last:
// "2*j+k-1/2"); other expressions in a fixed order of their own.  A sorting key only.
std::string readable_key(const GiNaC::ex& e);

// x before y: names by readable_name_less, otherwise by readable_key.
bool readable_less(const GiNaC::ex& x, const GiNaC::ex& y);

}  // namespace couplet
