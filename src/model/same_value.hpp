// Whether two expressions are the same value as polynomials in the quantum numbers (entries of
// symbols, exponents, projections): the one comparison the stages share.
#pragma once

#include <ginac/ginac.h>

namespace couplet {

inline bool same_value(const GiNaC::ex& a, const GiNaC::ex& b) {
    if (a.is_equal(b)) return true;
    // Two different names, or a name and a number, never agree; only sums need expanding.
    const bool atom_a = GiNaC::is_a<GiNaC::symbol>(a) || GiNaC::is_a<GiNaC::numeric>(a);
    const bool atom_b = GiNaC::is_a<GiNaC::symbol>(b) || GiNaC::is_a<GiNaC::numeric>(b);
    if (atom_a && atom_b) return false;
    return (a - b).expand().is_zero();
}

}  // namespace couplet
