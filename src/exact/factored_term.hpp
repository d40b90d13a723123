#pragma once
// Turns  sign * integer * prod_i p_i^(e_i / 2)  (integer a big natural, e_i the doubled
// prime exponents of a product of square roots of factorial quotients) into a reduced
// couplet::exact::number q*sqrt(r).  Common factors of the integer and the denominator are
// removed by exact word division before any CLN object is built, so the final rational is
// normalised on small numbers.

#include "exact/natural.hpp"
#include "exact/number.hpp"
#include "exact/prime_sieve.hpp"

#include <cstddef>
#include <cstdint>

namespace couplet::exact::detail {

// `integer` is consumed (used as scratch); twice_exponents[0..count) are the doubled
// exponents of the primes of the sieve, in order.
number assemble_term(bool negative, natural& integer, std::int32_t* twice_exponents, std::size_t count,
                     const prime_sieve& sieve);

// integer * prod_i p_i^exponents[i] for non-negative exponents.
void multiply_prime_powers(natural& integer, const std::int32_t* exponents, std::size_t count,
                           const prime_sieve& sieve);

}  // namespace couplet::exact::detail
