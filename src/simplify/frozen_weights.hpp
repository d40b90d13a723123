// Polynomial weights such as (2J+1), J(J+1) or sqrt((2a+1)(2b+1)) held as opaque atoms while
// the m-sum stage expands and reduces: expanding (2J+1)*S gives 2J*S + S, and each piece's
// network would be reduced on its own (twice the work, the derivation shown twice) and the
// answer left as two terms.  A weight is frozen only where none of its names is bound by an
// enclosing sum and none is a projection, so no move of that stage can see inside it.
#pragma once

#include <ginac/ginac.h>

#include "couplet/model/quantum.hpp"

namespace couplet {

class frozen_weights {
public:
    // e with each such weight replaced by an opaque placeholder.
    GiNaC::ex freeze(const GiNaC::ex& e, const quantum_numbers& numbers);
    // The weights back in place of their placeholders.
    GiNaC::ex thaw(const GiNaC::ex& e) const;

private:
    GiNaC::ex placeholder_for(const GiNaC::ex& weight);
    GiNaC::exmap to_weight_;
};

}  // namespace couplet
