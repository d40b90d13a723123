#include "phase/linear_form.hpp"

#include <cln/rational_io.h>

#include <ostream>
#include <set>
#include <sstream>
#include <stdexcept>

namespace couplet::phase {

namespace {

std::string rational_text(const cln::cl_RA& r) {
    std::ostringstream out;
    out << r;  // CLN prints exact rationals as "p/q"
    return out.str();
}

// Appends "+c*name" with the sign folded in; `first` suppresses a leading '+'.
void append_term(std::string& text, const cln::cl_RA& c, const std::string& name) {
    const bool negative = cln::minusp(c);
    const cln::cl_RA magnitude = negative ? cln::cl_RA(-c) : c;
    if (negative)
        text += '-';
    else if (!text.empty())
        text += '+';
    if (name.empty()) {
        text += rational_text(magnitude);
    } else {
        if (magnitude != 1) text += rational_text(magnitude) + "*";
        text += name;
    }
}

}  // namespace

linear_form::linear_form(const cln::cl_RA& constant) : constant_(constant) {}
linear_form::linear_form(int constant) : constant_(constant) {}

linear_form linear_form::variable(const std::string& name, const cln::cl_RA& coefficient) {
    if (name.empty()) throw std::invalid_argument("phase: a variable needs a name");
    linear_form f;
    f.add_term(name, coefficient);
    return f;
}

cln::cl_RA linear_form::coefficient(const std::string& name) const {
    auto it = coefficients_.find(name);
    return it == coefficients_.end() ? cln::cl_RA(0) : it->second;
}

void linear_form::add_term(const std::string& name, const cln::cl_RA& coefficient) {
    if (cln::zerop(coefficient)) return;
    auto [it, inserted] = coefficients_.emplace(name, coefficient);
    if (inserted) return;
    it->second = it->second + coefficient;
    if (cln::zerop(it->second)) coefficients_.erase(it);
}

linear_form& linear_form::operator+=(const linear_form& other) {
    for (const auto& [name, c] : other.coefficients_) add_term(name, c);
    constant_ = constant_ + other.constant_;
    return *this;
}

linear_form& linear_form::operator-=(const linear_form& other) {
    for (const auto& [name, c] : other.coefficients_) add_term(name, -c);
    constant_ = constant_ - other.constant_;
    return *this;
}

linear_form& linear_form::operator*=(const cln::cl_RA& factor) {
    if (cln::zerop(factor)) {
        coefficients_.clear();
    } else {
        for (auto& term : coefficients_) term.second = term.second * factor;
    }
    constant_ = constant_ * factor;
    return *this;
}

cln::cl_RA linear_form::evaluate(const assignment& values) const {
    cln::cl_RA sum = constant_;
    for (const auto& [name, c] : coefficients_) {
        auto it = values.find(name);
        if (it == values.end()) throw std::out_of_range("phase: no value for variable '" + name + "'");
        sum = sum + c * it->second;
    }
    return sum;
}

std::string linear_form::to_string(const std::vector<std::string>& order) const {
    std::string text;
    std::set<std::string> written;
    for (const std::string& name : order) {
        auto it = coefficients_.find(name);
        if (it == coefficients_.end() || !written.insert(name).second) continue;
        append_term(text, it->second, name);
    }
    for (const auto& [name, c] : coefficients_)
        if (!written.count(name)) append_term(text, c, name);
    if (!cln::zerop(constant_)) append_term(text, constant_, "");
    return text.empty() ? "0" : text;
}

bool operator==(const linear_form& x, const linear_form& y) {
    return x.constant() == y.constant() && x.coefficients() == y.coefficients();
}

linear_form operator-(const linear_form& x) { return cln::cl_RA(-1) * x; }
linear_form operator+(linear_form x, const linear_form& y) { return x += y; }
linear_form operator-(linear_form x, const linear_form& y) { return x -= y; }
linear_form operator*(const cln::cl_RA& factor, linear_form x) { return x *= factor; }
linear_form operator*(linear_form x, const cln::cl_RA& factor) { return x *= factor; }

std::ostream& operator<<(std::ostream& out, const linear_form& x) { return out << x.to_string(); }

}  // namespace couplet::phase
