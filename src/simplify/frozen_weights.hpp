// Polynomial weights such as (2J+1), J(J+1) or sqrt((2a+1)(2b+1)) held as opaque atoms while
// the m-sum stage expands and reduces: expanding (2J+1)*S gives 2J*S + S, and each piece's
// network would be reduced on its own (twice the work, the derivation shown twice) and the
// answer left as two terms.  A weight is frozen only where none of its names is bound by an
// enclosing sum and none is a projection, so no move of that stage can see inside it.
#pragma once

#include <ginac/ginac.h>

#include "model/quantum.hpp"

namespace couplet {

// e with each such weight replaced by an opaque placeholder that holds it.
GiNaC::ex freeze_weights(const GiNaC::ex& e, const quantum_numbers& numbers);
// Every placeholder replaced by the weight it holds (e unchanged where there is none).
GiNaC::ex thaw_weights(const GiNaC::ex& e);

}  // namespace couplet
