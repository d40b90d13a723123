// Symmetries of the coupling symbols, each a small named transformation with its reference,
// and the canonical representative of each symbol's class.  Convention throughout:
//   symbol == (-1)^(phase) * result
// so a transformation returns the new symbol together with the phase it costs.
#pragma once

#include <ginac/ginac.h>

#include <string>
#include <vector>

#include "model/quantum.hpp"

namespace couplet::symmetry {

struct transformed {
    GiNaC::ex symbol;
    GiNaC::ex phase = 0;  // exponent of (-1)
};

struct named_symmetry {
    std::string name;
    std::string reference;
    // Applies to a symbol of the matching kind.
    transformed (*apply)(const GiNaC::ex& symbol);
};

// Generators, each tested by exact evaluation: they generate the 12 classical 3j symmetries
// (72 with Regge's), the 24 tetrahedral 6j symmetries (144 with Regge's) and the 72 of the 9j.
const std::vector<named_symmetry>& threej_symmetries();
const std::vector<named_symmetry>& sixj_symmetries();
const std::vector<named_symmetry>& ninej_symmetries();

// All classical arrangements of a symbol (12 for 3j, 24 for 6j, 72 for 9j), with phases.
std::vector<transformed> threej_orbit(const GiNaC::ex& threej);
std::vector<transformed> sixj_orbit(const GiNaC::ex& sixj);
std::vector<transformed> ninej_orbit(const GiNaC::ex& ninej);

// The representative couplet prints: the arrangement whose entries, read row by row, come
// first in the readable order (angular momenta before projections, each by name as in
// j1 < j2 < J; quantum numbers before pure numbers; m before -m), and among equal ones
// the one with the shortest phase.
transformed canonical(const GiNaC::ex& symbol, const quantum_numbers& numbers);

// <j1 m1, j2 m2 | J M> -> (-1)^(j1-j2+M) sqrt(2J+1) 3j(j1, j2, J; m1, m2, -M)   (DLMF 34.1.1)
GiNaC::ex clebsch_as_threej(const GiNaC::ex& cg);

// 3j(a, b, c; ma, mb, mc) -> (-1)^(a-b-mc) <a ma, b mb | c -mc> / sqrt(2c+1)   (DLMF 34.1.1 read
// backwards), for output in Clebsch-Gordan form.
GiNaC::ex threej_as_clebsch(const GiNaC::ex& threej);
// Rewrites every 3j of e in Clebsch-Gordan form.
GiNaC::ex prefer_clebsch(const GiNaC::ex& e);

// Replaces every CG by its 3j form and every 3j/6j/9j by phase * canonical representative.
GiNaC::ex canonicalize_symbols(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet::symmetry
