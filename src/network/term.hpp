// One term of an m-sum seen as a coupling network: its 3j factors (vertices), the summed
// projections that join two of them (lines), the projections left free (open ends), its phase,
// and the factors that do not depend on any summed projection.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <string>
#include <vector>

#include "model/quantum.hpp"

namespace couplet::network {

struct line {
    GiNaC::symbol projection;
    int ends[2] = {-1, -1};  // indices into msum_term::threejs; equal for a loop
    GiNaC::ex angular;       // the j in the column of the first end
};

// sum(summed : (-1)^exponent * rest * product of threejs)
struct msum_term {
    GiNaC::lst summed;
    std::vector<GiNaC::ex> threejs;  // a power 3j^k appears k times
    GiNaC::ex exponent = 0;
    GiNaC::ex rest = 1;                // free of every summed projection
    std::vector<line> lines;           // one per summed projection
    std::vector<GiNaC::ex> open_ends;  // bottom-row entries without a summed projection
};

struct term_analysis {
    std::optional<msum_term> term;
    std::string why_not;  // when the term is not a network
};

// A term is a network when every index is a projection, every bottom-row entry of a 3j is
// free of the indices or exactly +-index, every index fills exactly two bottom-row slots, and
// no factor other than the 3j's and the phase involves an index.
term_analysis analyze_term(const GiNaC::ex& body, const GiNaC::lst& indices, const quantum_numbers& numbers);

// Whether every line is a proper contraction sum_m (-1)^(j-m) (..m..)(..-m..) once some
// vertices are flipped (m -> -m in all three columns) and some vertex rules m1+m2+m3 = 0 are
// added to the phase: the Yutsis networks, on which the recoupling moves always close up.
bool is_proper_network(const msum_term& t);

// The product the analysis describes, without the sum.
GiNaC::ex summand_of(const msum_term& t);

}  // namespace couplet::network
