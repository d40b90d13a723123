// What one step of a derivation changed: the step's term before and after with the factors they
// share taken away (those that hold no index the step removed or introduced), each under a sum
// over only the indices it alone has.  The two parts are equal wherever the shared indices take
// the same values, so a derivation can show `changed before = changed after` and the reader
// follows the change instead of a re-typeset of the whole term.
#pragma once

#include <ginac/ginac.h>

#include <utility>

namespace couplet {

std::pair<GiNaC::ex, GiNaC::ex> changed_parts(const GiNaC::ex& before, const GiNaC::ex& after);

}  // namespace couplet
