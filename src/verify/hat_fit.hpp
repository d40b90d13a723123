// A missing factor c * prod_j (2j+1)^(e_j / 2) * (-1)^E over all free angular momenta at once:
// products and ratios of hats (sqrt((2J+1)(2J'+1)), (2 j12+1) written where
// sqrt((2 j12+1)(2 j23+1)) belongs), with a phase.  The exponents are fitted exactly: with
// Q = (LHS/RHS)^2 rational and h_j = 2j+1, the p-adic valuations satisfy
//     v_p(Q) = v_p(c^2) + sum_j e_j v_p(h_j)
// at every point, for every prime p dividing some h_j; the differences between points remove
// the constant, leaving a linear system in the e_j solved over the rationals.  A fit is then
// confirmed at every point (the primes that divide no h_j go into c), and its signs give the
// phase by the GF(2) fit.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <vector>

#include "exact/number.hpp"
#include "verify/domain.hpp"
#include "verify/phase_fit.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify {

struct hat_factor {
    exact::number constant;                            // c > 0
    std::vector<int> exponents;                        // e_j, per variable of the domain (0 for those that are not j)
    std::vector<sign_need> needs;                      // the sign (-1)^E must give at each point
    GiNaC::ex factor(const sampling_domain& d) const;  // c * prod (2j+1)^(e_j/2), no phase
};

// `ratios[i]` is LHS/RHS at points[i], or nothing where both sides vanish (where one alone
// vanishes no factor can help, and the caller does not ask).  Nothing when no such factor
// with |e_j| <= 4 fits every point.
std::optional<hat_factor> fit_hat_factor(const sampling_domain& d, const std::vector<point>& points,
                                         const std::vector<std::optional<exact::number>>& ratios);

}  // namespace couplet::verify
