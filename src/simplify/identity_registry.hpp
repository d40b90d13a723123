// Every identity the simplifier can apply, in one list: the sum rules and local rules of the
// j-sum stage, the network moves, and the rewrites each stage performs as code.  The trace
// names only these; the test suite self-tests each one (verify/identity_self_test.hpp).
//
// Adding an identity: write one function that builds it (a sum rule or local rule in
// rules/sum_rules.cpp, a move in network/moves.cpp, a rewrite beside the code that performs it)
// and add one line to its table below or to the table that lists its kind.
#pragma once

#include <vector>

#include "model/identity.hpp"

namespace couplet {

const std::vector<const identity*>& all_identities();

}  // namespace couplet
