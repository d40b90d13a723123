// What the rules need to know about the factors of a term: the triads each symbol enforces,
// its symmetric arrangements, and the phase group those triads and the declared parities span.
#pragma once

#include <ginac/ginac.h>

#include <array>
#include <optional>
#include <vector>

#include "canonical/symmetries.hpp"
#include "model/quantum.hpp"
#include "model/rewrite.hpp"
#include "phase/context.hpp"

namespace couplet::rules {

using triad = std::array<GiNaC::ex, 3>;

// The triads a 3j, CG, 6j, 9j or tri(...) holds to be admissible; nothing for other factors.
std::vector<triad> triads_of(const GiNaC::ex& symbol);
// Triads of every symbol anywhere in e (inside products, powers and sums).
std::vector<triad> all_triads(const GiNaC::ex& e);

// The arrangements of a 6j (24; 144 with Regge's when an entry is a compound linear form), 9j (72)
// or tri (6, no phase), as symbol == (-1)^phase * arrangement.
std::vector<symmetry::transformed> arrangements(const GiNaC::ex& symbol);

// Terms of a sum, factors of a product (model/rewrite.hpp).
using couplet::factors_of;
using couplet::terms_of;

// The phase group of a term: declared parities and the triads of its symbols.  `loose`, when
// given, is declared with unknown parity, so that what its triads alone imply can be asked.
phase::context context_for(const GiNaC::ex& term, const quantum_numbers& numbers,
                           const std::optional<GiNaC::symbol>& loose = std::nullopt);

// Whether (-1)^x == (-1)^y in the context; false also when either side is no linear form.
bool same_phase(const phase::context& ctx, const GiNaC::ex& x, const GiNaC::ex& y);

// The product e with its phase factors replaced by 1: zero exactly where e is zero, also at
// points where a phase exponent is no integer (there the evaluator refuses e itself).
GiNaC::ex without_phases(const GiNaC::ex& e);

}  // namespace couplet::rules
