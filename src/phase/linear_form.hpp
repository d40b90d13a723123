// An exponent of (-1): a linear form in named quantum numbers with exact rational coefficients.
#pragma once

#include <cln/rational.h>

#include <iosfwd>
#include <map>
#include <string>
#include <vector>

namespace couplet::phase {

// Values of quantum numbers by name.
using assignment = std::map<std::string, cln::cl_RA>;

class linear_form {
public:
    linear_form() = default;
    // Constants; implicit so that `a + 1`, `a - half` and `equal(x, 0)` read naturally.
    linear_form(const cln::cl_RA& constant);  // NOLINT(google-explicit-constructor)
    linear_form(int constant);                // NOLINT(google-explicit-constructor)

    static linear_form variable(const std::string& name, const cln::cl_RA& coefficient = 1);

    // Zero coefficients are never stored, so equal forms have equal maps.
    const std::map<std::string, cln::cl_RA>& coefficients() const { return coefficients_; }
    const cln::cl_RA& constant() const { return constant_; }
    cln::cl_RA coefficient(const std::string& name) const;
    bool is_constant() const { return coefficients_.empty(); }

    linear_form& operator+=(const linear_form& other);
    linear_form& operator-=(const linear_form& other);
    linear_form& operator*=(const cln::cl_RA& factor);

    // Throws std::out_of_range when a variable of the form has no value.
    cln::cl_RA evaluate(const assignment& values) const;

    // Couplet syntax, e.g. "a+b-c", "2*j", "j-m+1", "1/2*j+1/2".  Variables listed in `order`
    // come first, in that order; any others follow alphabetically.
    std::string to_string(const std::vector<std::string>& order) const;
    std::string to_string() const { return to_string({}); }

    friend bool operator==(const linear_form& x, const linear_form& y);

private:
    void add_term(const std::string& name, const cln::cl_RA& coefficient);

    std::map<std::string, cln::cl_RA> coefficients_;
    cln::cl_RA constant_ = 0;
};

inline linear_form var(const std::string& name) { return linear_form::variable(name); }

bool operator==(const linear_form& x, const linear_form& y);
inline bool operator!=(const linear_form& x, const linear_form& y) { return !(x == y); }

linear_form operator-(const linear_form& x);
linear_form operator+(linear_form x, const linear_form& y);
linear_form operator-(linear_form x, const linear_form& y);
linear_form operator*(const cln::cl_RA& factor, linear_form x);
linear_form operator*(linear_form x, const cln::cl_RA& factor);

// Prints to_string() (alphabetical order); for messages and test output.
std::ostream& operator<<(std::ostream& out, const linear_form& x);

}  // namespace couplet::phase
