// What a coupling symbol says about its entries: the triads it couples, the (j, m) pairs it
// holds and the linear forms that must vanish.  The evaluator's selection rules and the phase
// group's lattice are both built from this one description.
#pragma once

#include <ginac/ginac.h>

#include <array>
#include <utility>
#include <vector>

namespace couplet {

struct coupling_structure {
    std::vector<std::array<GiNaC::ex, 3>> triads;              // a+b+c integral, triangle
    std::vector<std::pair<GiNaC::ex, GiNaC::ex>> projections;  // (j, m): j-m integral, |m| <= j
    std::vector<GiNaC::ex> zeros;                              // m1+m2+m3, x-y of delta(x, y)
};

// Adds the structure of a 3j, CG, 6j, 9j, tri or delta; other expressions add nothing.
void add_structure(const GiNaC::ex& symbol, coupling_structure& out);

// A column (j, m) of a 3j or CG whose m is one name with coefficient +-1 plus a constant
// (m, -m, m+1; not 2m, whose column says j - 2m is an integer): it pairs that name with j.
struct projection_column {
    GiNaC::symbol name;
    GiNaC::ex j, m;
    GiNaC::numeric shift;  // the constant beside +-name
};

// Such columns of e whose entries are free where they stand (no name bound by an enclosing sum
// over it), in walk order: how one expression, not the program, pairs its projections.
std::vector<projection_column> free_projection_columns(const GiNaC::ex& e);

}  // namespace couplet
