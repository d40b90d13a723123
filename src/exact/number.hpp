#pragma once
// An exact real number  sum_r q_r * sqrt(r):  r square-free positive integers, q_r rational.
// Every value of a 3j, 6j, 9j or Clebsch-Gordan coefficient is a single such term; sums,
// products and quotients of them stay in this form, so equality is decided exactly.

#include <cln/integer.h>
#include <cln/rational.h>

#include <iosfwd>
#include <map>
#include <string>

namespace couplet::exact {

struct radicand_less {
    bool operator()(const cln::cl_I& a, const cln::cl_I& b) const { return a < b; }
};

class number {
public:
    // radicand -> coefficient; radicands square-free and > 0, coefficients never zero.
    // Canonical: two numbers are equal exactly when their maps are equal, because square
    // roots of distinct square-free integers are linearly independent over the rationals.
    using term_map = std::map<cln::cl_I, cln::cl_RA, radicand_less>;

    number() = default;
    number(long value);               // NOLINT: implicit, an integer is a number
    number(const cln::cl_RA& value);  // NOLINT: implicit, a rational is a number

    // sqrt(x) for a rational x >= 0, written as q*sqrt(r) with r square-free.
    // Throws std::domain_error for x < 0, and for a (huge) x whose square-free part cannot
    // be certified by trial division (a cofactor >= 2^60 with no prime factor < 2^20).
    static number sqrt_of(const cln::cl_RA& x);

    // coefficient * sqrt(radicand).  Precondition (not checked beyond radicand > 0, since
    // checking needs factoring): radicand is square-free.  Throws std::domain_error if <= 0.
    static number from_squarefree_term(const cln::cl_RA& coefficient, const cln::cl_I& squarefree_radicand);

    const term_map& terms() const { return terms_; }
    bool is_zero() const { return terms_.empty(); }
    bool is_rational() const;
    // The value when is_rational(); throws std::domain_error otherwise.
    cln::cl_RA rational_value() const;

    // Exact sign (-1, 0, +1).  Several radicals: a certified interval evaluation with CLN
    // long floats, falling back to exact reasoning in the field Q(sqrt(p), ...).
    int sign() const;

    // Exact inverse; throws std::domain_error for zero.  A sum of several radicals is
    // rationalised one square-free factor at a time, so every nonzero number has an inverse.
    number inverse() const;

    number operator-() const;
    number& operator+=(const number& other);
    number& operator-=(const number& other);
    number& operator*=(const number& other);
    number& operator/=(const number& other);

    friend number operator+(number a, const number& b) { return a += b; }
    friend number operator-(number a, const number& b) { return a -= b; }
    friend number operator*(const number& a, const number& b);
    friend number operator/(const number& a, const number& b) { return a * b.inverse(); }
    friend bool operator==(const number& a, const number& b) { return a.terms_ == b.terms_; }
    friend bool operator!=(const number& a, const number& b) { return !(a == b); }

    // The value as a double (rounded from a certified 128-bit or wider CLN long float, so
    // within an ulp).  Never overflows on huge numerators or denominators; only a value
    // outside the double range itself gives +-inf or 0.
    double to_double() const;

    // Couplet input syntax, radicands ascending: 0, 1/6, -sqrt(6)/6, 3*sqrt(35)/70,
    // 1/2+sqrt(3)/2.  Re-parses to the same value.
    std::string to_string() const;

    // Decimal with `significant_digits` significant digits (>= 1), correctly rounded for
    // a single term: "-0.40824829046386301637" for -sqrt(6)/6 with 20 digits.  Fixed
    // notation for decimal exponents in [-8, digits), otherwise "d.ddde-30" style.
    // Throws std::invalid_argument if significant_digits < 1.
    std::string to_decimal(int significant_digits) const;

private:
    term_map terms_;
};

// x^n for any integer n (n < 0 through inverse(); 0^0 = 1).
number power(const number& x, long n);

// sign(a - b).
int compare(const number& a, const number& b);
inline bool operator<(const number& a, const number& b) { return compare(a, b) < 0; }
inline bool operator>(const number& a, const number& b) { return compare(a, b) > 0; }
inline bool operator<=(const number& a, const number& b) { return compare(a, b) <= 0; }
inline bool operator>=(const number& a, const number& b) { return compare(a, b) >= 0; }

std::ostream& operator<<(std::ostream& os, const number& x);

}  // namespace couplet::exact
