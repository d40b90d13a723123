// Exponents as integer vectors: the representation every lattice computation works in.
//
// In doubled coordinates u = 2v (so u is an integer vector), X = sum c_i v_i + c0 satisfies
// 2D X(u) = w . (u, 1) with w_i = D c_i and w_n = 2 D c0.  The phase (-1)^X = exp(i pi X) is then
// fixed by w . (u, 1) mod 4D, so w lives in (Z/4D)^(n+1); D is the "level" of the form.
#pragma once

#include "phase/linear_form.hpp"

#include <cstddef>
#include <cstdint>
#include <map>
#include <string>
#include <utility>
#include <vector>

namespace couplet::phase::detail {

using int_vector = std::vector<std::int64_t>;

struct scaled_form {
    std::int64_t level = 1;
    int_vector w;  // n + 1 entries, the last for the constant
};

// The smallest level at which x has integer entries.  Throws unknown_variable for a name not in
// `index`, std::overflow_error when an entry needs more than 62 bits.
scaled_form to_scaled(const linear_form& x, const std::map<std::string, std::size_t>& index);

// Coefficients taken in (-2, 2] (4v is always null) and the constant in (-1, 1] (2 is null):
// an integer constant folds to 0 or 1, a half-integer one to 1/2 or -1/2.
linear_form from_scaled(const int_vector& w, std::int64_t level, const std::vector<std::string>& names);

// The coefficient w_i / level in (-2, 2], as a numerator over `level`.
std::int64_t signed_coefficient(std::int64_t wi, std::int64_t level);
// The constant w_n / (2 level) in (-1, 1], as a numerator over 2 level.
std::int64_t signed_constant(std::int64_t wn, std::int64_t level);

// 2 f(u) for a slot or owner form f, for the geometric checks of witnesses.
struct doubled_form {
    std::vector<std::pair<std::size_t, double>> terms;  // (variable, coefficient), sparse
    double constant = 0;
    double value(const int_vector& u) const;
};
doubled_form to_doubled(const linear_form& f, const std::map<std::string, std::size_t>& index);

}  // namespace couplet::phase::detail
