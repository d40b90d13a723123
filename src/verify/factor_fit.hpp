// Candidates for LHS/RHS of an identity that fails: c * F with c a constant (found from the
// points) times a sign, and F one of 1, (2j+1), 1/(2j+1), sqrt(2j+1), 1/sqrt(2j+1) for a free
// angular momentum j.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <vector>

#include "exact/number.hpp"
#include "verify/domain.hpp"
#include "verify/phase_fit.hpp"
#include "verify/sampler.hpp"

namespace couplet::verify::detail {

enum class factor_shape { constant, hat_squared, inverse_hat_squared, hat, inverse_hat };

class factor_candidate {
public:
    factor_candidate(factor_shape shape, std::size_t variable, const sampling_domain& domain);

    // The ratio LHS/RHS at a point where both sides are nonzero.
    void observe(const exact::number& ratio, const point& t);
    // A point where both sides vanish: any sign will do there.
    void observe_vanishing() { needs_.push_back(sign_need::any); }
    void kill() { alive_ = false; }

    bool alive() const { return alive_; }
    factor_shape shape() const { return shape_; }
    const GiNaC::ex& factor() const { return factor_; }             // F
    const exact::number& magnitude() const { return *magnitude_; }  // |c|, once observed
    bool observed() const { return magnitude_.has_value(); }
    const std::vector<sign_need>& needs() const { return needs_; }

private:
    factor_shape shape_;
    std::size_t variable_;
    GiNaC::ex factor_;
    bool alive_ = true;
    std::optional<exact::number> magnitude_;
    std::vector<sign_need> needs_;
};

// The constant first, then each free angular momentum's four factors, in variable order.
std::vector<factor_candidate> simple_factors(const sampling_domain& domain);

}  // namespace couplet::verify::detail
