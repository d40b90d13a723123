// Performing one move on one term: find the move's 3j among the term's, each brought to the
// pattern's exact arrangement by a classical 3j symmetry (which returns its phase), with the
// pattern's summed projections landing on summed projections of the term (m -> -m as a change
// of summation variable where needed).  The phase left over must then be free of the
// projections the move sums; it is made so with the vertex rules m1+m2+m3 = 0 and
// (-1)^(2m) = (-1)^(2j), solved over GF(2).  Otherwise the move does not apply there.
#pragma once

#include <ginac/ginac.h>

#include <functional>
#include <optional>
#include <vector>

#include "network/move.hpp"
#include "network/term.hpp"

namespace couplet::network {

// A later stage's veto on a candidate result (the phase group must be able to prove every
// exponent an integer from the result's own factors); the search then goes on.
using result_check = std::function<bool(const GiNaC::ex&)>;

// Where a move may bind: the pattern symbols' values (e.g. which lines an interchange pairs).
using binding_check = std::function<bool(const GiNaC::exmap&)>;

struct move_options {
    result_check accept;
    binding_check where;
    // Fresh names for the move's introduced symbols, angular ones first, then projections.
    std::vector<GiNaC::symbol> fresh;
};

// The term after the move, as sum(remaining indices : ...), or nothing when the move does not
// apply anywhere in the term (or only where `accept` or `where` refuses).  A move that
// introduces a sum over x gives sum(x : sum(remaining indices and x's projection : ...)).
std::optional<GiNaC::ex> apply_move(const move& m, const msum_term& term, const result_check& accept = {});
std::optional<GiNaC::ex> apply_move(const move& m, const msum_term& term, const move_options& options);

}  // namespace couplet::network
