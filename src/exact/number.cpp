#include "exact/number.hpp"

#include <ostream>
#include <stdexcept>

namespace couplet::exact {

number::number(long value) {
    if (value != 0) terms_.emplace(cln::cl_I(1), cln::cl_RA(value));
}

number::number(const cln::cl_RA& value) {
    if (!cln::zerop(value)) terms_.emplace(cln::cl_I(1), value);
}

number number::from_squarefree_term(const cln::cl_RA& coefficient, const cln::cl_I& squarefree_radicand) {
    if (!cln::plusp(squarefree_radicand))
        throw std::domain_error("couplet::exact::number: a radicand must be positive");
    number result;
    if (!cln::zerop(coefficient)) result.terms_.emplace(squarefree_radicand, coefficient);
    return result;
}

bool number::is_rational() const { return terms_.empty() || (terms_.size() == 1 && terms_.begin()->first == 1); }

cln::cl_RA number::rational_value() const {
    if (!is_rational()) throw std::domain_error("couplet::exact::number: " + to_string() + " is not rational");
    return terms_.empty() ? cln::cl_RA(0) : terms_.begin()->second;
}

number number::operator-() const {
    number result(*this);
    for (auto& term : result.terms_) term.second = -term.second;
    return result;
}

number& number::operator+=(const number& other) {
    for (const auto& [radicand, coefficient] : other.terms_) {
        auto [it, inserted] = terms_.emplace(radicand, coefficient);
        if (!inserted) {
            it->second = it->second + coefficient;
            if (cln::zerop(it->second)) terms_.erase(it);
        }
    }
    return *this;
}

number& number::operator-=(const number& other) { return *this += -other; }

// sqrt(p) sqrt(q) = g sqrt((p/g)(q/g)) with g = gcd(p, q): the product of two square-free
// numbers is square-free once their common part is taken out as a square.
number operator*(const number& a, const number& b) {
    number result;
    for (const auto& [ra, qa] : a.terms_) {
        for (const auto& [rb, qb] : b.terms_) {
            cln::cl_I g = cln::gcd(ra, rb);
            cln::cl_I radicand = cln::exquopos(ra, g) * cln::exquopos(rb, g);
            cln::cl_RA coefficient = qa * qb * g;
            auto [it, inserted] = result.terms_.emplace(radicand, coefficient);
            if (!inserted) {
                it->second = it->second + coefficient;
                if (cln::zerop(it->second)) result.terms_.erase(it);
            }
        }
    }
    return result;
}

number& number::operator*=(const number& other) { return *this = *this * other; }
number& number::operator/=(const number& other) { return *this = *this / other; }

number power(const number& x, long n) {
    if (n < 0) return power(x.inverse(), -(n + 1)) * x.inverse();
    number result(1L), base(x);
    for (unsigned long e = static_cast<unsigned long>(n); e != 0; e >>= 1) {
        if (e & 1) result *= base;
        if (e > 1) base *= base;
    }
    return result;
}

int compare(const number& a, const number& b) { return (a - b).sign(); }

std::ostream& operator<<(std::ostream& os, const number& x) { return os << x.to_string(); }

}  // namespace couplet::exact
