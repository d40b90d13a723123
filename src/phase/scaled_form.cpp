#include "phase/scaled_form.hpp"

#include "phase/affine_lattice.hpp"
#include "phase/context.hpp"

#include <cln/integer.h>

#include <stdexcept>

namespace couplet::phase::detail {

namespace {

std::size_t index_of(const std::string& name, const std::map<std::string, std::size_t>& index) {
    auto it = index.find(name);
    if (it == index.end()) throw unknown_variable(name);
    return it->second;
}

std::int64_t mod(std::int64_t x, std::int64_t q) {
    const std::int64_t r = x % q;
    return r < 0 ? r + q : r;
}

}  // namespace

scaled_form to_scaled(const linear_form& x, const std::map<std::string, std::size_t>& index) {
    cln::cl_I level = cln::denominator(cln::cl_RA(2) * x.constant());
    for (const auto& term : x.coefficients()) level = cln::lcm(level, cln::denominator(term.second));
    scaled_form out;
    out.level = to_int64(level);
    out.w.assign(index.size() + 1, 0);
    for (const auto& [name, c] : x.coefficients()) out.w[index_of(name, index)] = to_int64(cln::numerator(c * level));
    out.w.back() = to_int64(cln::numerator(cln::cl_RA(2) * x.constant() * level));
    return out;
}

std::int64_t signed_coefficient(std::int64_t wi, std::int64_t level) {
    const std::int64_t r = mod(wi, 4 * level);
    return r > 2 * level ? r - 4 * level : r;
}

std::int64_t signed_constant(std::int64_t wn, std::int64_t level) {
    const std::int64_t r = mod(wn, 4 * level);
    return r > 2 * level ? r - 4 * level : r;
}

linear_form from_scaled(const int_vector& w, std::int64_t level, const std::vector<std::string>& names) {
    linear_form out = cln::cl_RA(signed_constant(w.back(), level)) / cln::cl_RA(2 * level);
    for (std::size_t i = 0; i < names.size(); ++i) {
        const std::int64_t s = signed_coefficient(w[i], level);
        if (s != 0) out += linear_form::variable(names[i], cln::cl_RA(s) / cln::cl_RA(level));
    }
    return out;
}

double doubled_form::value(const int_vector& u) const {
    double sum = constant;
    for (const auto& [i, c] : terms) sum += c * static_cast<double>(u[i]);
    return sum;
}

doubled_form to_doubled(const linear_form& f, const std::map<std::string, std::size_t>& index) {
    // Witness geometry only compares small slot values, so doubles are ample.
    doubled_form out;
    for (const auto& [name, c] : f.coefficients()) out.terms.emplace_back(index_of(name, index), cln::double_approx(c));
    out.constant = 2 * cln::double_approx(f.constant());
    return out;
}

}  // namespace couplet::phase::detail
