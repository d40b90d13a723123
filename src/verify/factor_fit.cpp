#include "verify/factor_fit.hpp"

#include <cln/rational.h>

namespace couplet::verify::detail {

factor_candidate::factor_candidate(factor_shape shape, std::size_t variable, const sampling_domain& domain)
    : shape_(shape), variable_(variable) {
    GiNaC::ex hat2 = shape == factor_shape::constant ? GiNaC::ex(1) : 2 * domain.numbers[variable].symbol + 1;
    switch (shape) {
        case factor_shape::constant:
            factor_ = 1;
            break;
        case factor_shape::hat_squared:
            factor_ = hat2;
            break;
        case factor_shape::inverse_hat_squared:
            factor_ = 1 / hat2;
            break;
        case factor_shape::hat:
            factor_ = GiNaC::sqrt(hat2);
            break;
        case factor_shape::inverse_hat:
            factor_ = 1 / GiNaC::sqrt(hat2);
            break;
    }
}

void factor_candidate::observe(const exact::number& ratio, const point& t) {
    if (!alive_) return;
    exact::number q = ratio;  // ratio / F
    if (shape_ != factor_shape::constant) {
        long hat2 = t[variable_] + 1;
        switch (shape_) {
            case factor_shape::hat_squared:
                q *= exact::number(cln::cl_RA(1) / hat2);
                break;
            case factor_shape::inverse_hat_squared:
                q *= exact::number(hat2);
                break;
            case factor_shape::hat:
                q *= exact::number::sqrt_of(hat2) * exact::number(cln::cl_RA(1) / hat2);
                break;
            default:
                q *= exact::number::sqrt_of(hat2);
                break;
        }
    }
    bool negative = q.sign() < 0;
    exact::number size = negative ? -q : q;
    if (!magnitude_) {
        magnitude_ = size;
    } else if (size != *magnitude_) {
        alive_ = false;
        return;
    }
    needs_.push_back(negative ? sign_need::flip : sign_need::keep);
}

std::vector<factor_candidate> simple_factors(const sampling_domain& domain) {
    std::vector<factor_candidate> out;
    out.emplace_back(factor_shape::constant, 0, domain);
    for (std::size_t k = 0; k < domain.numbers.size(); ++k) {
        if (domain.numbers[k].role != qn_role::angular) continue;
        for (factor_shape s : {factor_shape::hat_squared, factor_shape::inverse_hat_squared, factor_shape::hat,
                               factor_shape::inverse_hat})
            out.emplace_back(s, k, domain);
    }
    return out;
}

}  // namespace couplet::verify::detail
