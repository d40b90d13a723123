// Printing: the couplet input syntax, doubles, and decimals.

#include "exact/float_enclosure.hpp"
#include "exact/number.hpp"

#include <cln/float.h>
#include <cln/integer_io.h>
#include <cln/lfloat.h>
#include <cln/rational_io.h>
#include <cln/real.h>

#include <cmath>
#include <limits>
#include <optional>
#include <sstream>
#include <stdexcept>

namespace couplet::exact {

namespace {

std::string decimal_string(const cln::cl_I& x) {
    // Most numbers fit a machine word, and CLN's printing through a stream is the slow part of
    // writing a table row.
    if (cln::integer_length(x) < 63) return std::to_string(cln::cl_I_to_long(x));
    std::ostringstream os;
    cln::fprintdecimal(os, x);
    return os.str();
}

// A long-float value of x whose relative error is below 2^-(wanted_bits).
cln::cl_F accurate_float(const number::term_map& terms, unsigned wanted_bits) {
    for (unsigned bits = wanted_bits + 64;; bits *= 2) {
        detail::float_enclosure e = detail::enclose(terms, bits);
        if (terms.size() == 1) return e.value;  // no cancellation: relative error ~ 2^-bits
        const auto format = static_cast<cln::float_format_t>(bits);
        if (cln::abs(e.value) * cln::scale_float(cln::cl_float(1, format), -long(wanted_bits)) > e.bound)
            return e.value;
    }
}

std::string format_digits(bool negative, const std::string& digits, long exponent) {
    std::string out = negative ? "-" : "";
    const long count = static_cast<long>(digits.size());
    if (exponent >= -8 && exponent < count) {
        if (exponent >= 0) {
            out += digits.substr(0, std::size_t(exponent + 1));
            if (exponent + 1 < count) out += "." + digits.substr(std::size_t(exponent + 1));
        } else {
            out += "0." + std::string(std::size_t(-exponent - 1), '0') + digits;
        }
    } else {
        out += digits.substr(0, 1);
        if (count > 1) out += "." + digits.substr(1);
        out += "e" + std::to_string(exponent);
    }
    return out;
}

cln::cl_RA power_of_ten(long e) { return cln::expt(cln::cl_RA(10), e); }

// q * sqrt(r) with word-sized numerator, denominator and radicand, in x87 extended precision:
// three roundings of 2^-64 each, so the double nearest to the result is the double nearest to
// the value unless the result lies within that error of a midpoint between two doubles; then
// nothing, and the certified long float decides.  A table row's decimal is written this way
// some ten times faster.
std::optional<double> word_sized_double(const cln::cl_I& radicand, const cln::cl_RA& coefficient) {
    if (std::numeric_limits<long double>::digits < 64) return std::nullopt;
    const cln::cl_I n = cln::numerator(coefficient), d = cln::denominator(coefficient);
    if (cln::integer_length(n) > 62 || cln::integer_length(d) > 62 || cln::integer_length(radicand) > 62)
        return std::nullopt;
    long double y = static_cast<long double>(cln::cl_I_to_long(n));
    if (radicand != 1) y *= std::sqrt(static_cast<long double>(cln::cl_I_to_long(radicand)));
    y /= static_cast<long double>(cln::cl_I_to_long(d));
    const double x = static_cast<double>(y);
    if (static_cast<long double>(x) == y) return x;
    const double neighbour =
        std::nextafter(x, y > x ? std::numeric_limits<double>::infinity() : -std::numeric_limits<double>::infinity());
    const long double midpoint = (static_cast<long double>(x) + static_cast<long double>(neighbour)) / 2;
    if (std::fabs(y - midpoint) <= std::fabs(y) * std::ldexp(1.0L, -60)) return std::nullopt;
    return x;
}

}  // namespace

std::string number::to_string() const {
    if (terms_.empty()) return "0";
    std::string out;
    bool first = true;
    for (const auto& [radicand, coefficient] : terms_) {
        const cln::cl_I num = cln::numerator(coefficient), den = cln::denominator(coefficient);
        if (cln::minusp(num))
            out += "-";
        else if (!first)
            out += "+";
        const cln::cl_I magnitude = cln::abs(num);
        if (radicand == 1) {
            out += decimal_string(magnitude);
        } else {
            if (magnitude != 1) out += decimal_string(magnitude) + "*";
            out += "sqrt(" + decimal_string(radicand) + ")";
        }
        if (den != 1) out += "/" + decimal_string(den);
        first = false;
    }
    return out;
}

double number::to_double() const {
    if (terms_.empty()) return 0.0;
    if (terms_.size() == 1)
        if (auto x = word_sized_double(terms_.begin()->first, terms_.begin()->second)) return *x;
    return cln::double_approx(accurate_float(terms_, 64));
}

std::string number::to_decimal(int significant_digits) const {
    if (significant_digits < 1) throw std::invalid_argument("couplet::exact::number::to_decimal: digits must be >= 1");
    if (terms_.empty()) return "0";
    const long digits = significant_digits;
    // (cln::expt_pos never returns for exponent 0)
    const cln::cl_I lowest =
        digits == 1 ? cln::cl_I(1) : cln::expt_pos(cln::cl_I(10), static_cast<unsigned long>(digits - 1));
    const cln::cl_I beyond = lowest * 10;
    cln::cl_I scaled;  // round(|x| * 10^(digits-1-exponent)), in [lowest, beyond)
    long exponent;     // floor(log10 |x|)
    bool negative;
    if (terms_.size() == 1) {
        // Exact: with v = |x|, v^2 = q^2 r is rational, and floor/round of v*10^k follow
        // from integer square roots and one comparison.
        const auto& [radicand, coefficient] = *terms_.begin();
        negative = cln::minusp(coefficient);
        const cln::cl_RA square = coefficient * coefficient * radicand;
        long bits2 =
            long(cln::integer_length(cln::numerator(square))) - long(cln::integer_length(cln::denominator(square)));
        exponent = static_cast<long>(std::floor(double(bits2) * 0.5 * 0.30102999566398120));
        while (square >= power_of_ten(2 * (exponent + 1))) ++exponent;
        while (square < power_of_ten(2 * exponent)) --exponent;
        const cln::cl_RA y2 = square * power_of_ten(2 * (digits - 1 - exponent));
        scaled = cln::isqrt(cln::floor1(y2));
        const cln::cl_RA half_up = cln::cl_RA(scaled) + cln::cl_RA(1) / 2;
        if (y2 >= half_up * half_up) scaled = scaled + 1;
        if (scaled == beyond) {
            scaled = lowest;
            ++exponent;
        }
    } else {
        const unsigned wanted_bits = static_cast<unsigned>(digits * 3.33) + 16;
        const cln::cl_F value = accurate_float(terms_, wanted_bits);
        negative = cln::minusp(value);
        const cln::cl_F magnitude = cln::abs(value);
        exponent = static_cast<long>(std::floor(double(cln::float_exponent(magnitude)) * 0.30102999566398120));
        for (int guard = 0; guard < 8; ++guard) {
            scaled = cln::round1(magnitude * power_of_ten(digits - 1 - exponent));
            if (scaled >= beyond)
                ++exponent;
            else if (scaled < lowest)
                --exponent;
            else
                break;
        }
    }
    return format_digits(negative, decimal_string(scaled), exponent);
}

}  // namespace couplet::exact
