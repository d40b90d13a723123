// The network moves, each one identity of DLMF chapter 34 written over its own pattern
// symbols:  sum(summed : (-1)^phase * product of threejs) == result.
// The graph only chooses where a move applies; apply_move (match.hpp) performs it on the 3j
// symbols themselves.  Each move is an identity whose instance is its own two sides, so the
// shared self-test checks it by exact evaluation alone.
#pragma once

#include <ginac/ginac.h>

#include <string>
#include <vector>

#include "model/identity.hpp"
#include "model/quantum.hpp"

namespace couplet::network {

struct move : identity {
    std::vector<GiNaC::ex> threejs;  // top rows: pattern j's; bottom rows: +-pattern m's
    GiNaC::ex phase = 0;             // exponent of (-1)
    GiNaC::lst summed;               // the projections the identity sums over
    GiNaC::ex result;
    // Pattern symbols the result sums over that the left side does not have: angular momenta
    // (an outer sum) and their projections (joining the m-sum that remains).
    GiNaC::lst introduced_angular, introduced_projections;
};

// In the order the reduction loop tries them: the largest closed piece first.
const std::vector<move>& network_moves();

// Recoupling: two 3j sharing a summed line become a sum over x of (2x+1) 6j times two 3j
// coupled the other way round.  Not in network_moves(): it removes no index, and the reduction
// chooses where it applies (a line of a shortest cycle, shortening that cycle).
const move& interchange_move();

// The left side of the identity as an expression.
GiNaC::ex left_side(const move& m);
// The right side, with the sums over the introduced symbols.
GiNaC::ex right_side(const move& m);

}  // namespace couplet::network
