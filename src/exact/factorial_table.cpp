#include "exact/factorial_table.hpp"

#include <algorithm>
#include <stdexcept>
#include <string>

namespace couplet::exact {

void factorial_table::reserve(std::uint64_t n) {
    if (n > max_factorial_argument)
        throw std::domain_error("couplet::exact: factorial argument " + std::to_string(n) +
                                " exceeds the supported maximum " + std::to_string(max_factorial_argument));
    sieve_.ensure(static_cast<std::uint32_t>(std::max<std::uint64_t>(n, 2)));
    if (std::min(n, cache_limit) > filled_ || !any_filled_) fill_cache(std::min(n, cache_limit));
}

std::size_t factorial_table::prime_count_slow(std::uint64_t n) {
    reserve(n);
    return sieve_.count_upto(n);
}

// Legendre: v_p(n!) = sum_k floor(n / p^k).
static std::int32_t legendre(std::uint64_t n, std::uint64_t p) {
    std::uint64_t e = 0;
    for (std::uint64_t q = n / p; q != 0; q /= p) e += q;
    return static_cast<std::int32_t>(e);
}

void factorial_table::fill_cache(std::uint64_t n) {
    // Grow geometrically so that a slowly rising series of requests costs linear time.
    std::uint64_t target = std::min<std::uint64_t>(cache_limit, std::max<std::uint64_t>(n, 2 * filled_));
    if (!any_filled_) {
        offset_.assign(1, 0);
        length_.assign(1, 0);  // 0! = 1
        prime_count_.assign(1, 0);
        flat_.clear();
        filled_ = 0;
        any_filled_ = true;
    }
    sieve_.ensure(static_cast<std::uint32_t>(std::max<std::uint64_t>(target, 2)));
    for (std::uint64_t m = filled_ + 1; m <= target; ++m) {
        const std::size_t previous = offset_[m - 1];
        const std::uint32_t previous_length = length_[m - 1];
        const auto primes_upto_m = static_cast<std::uint32_t>(sieve_.count_upto(m));
        const std::uint32_t length = static_cast<std::uint32_t>(padded(primes_upto_m));
        const std::size_t start = flat_.size();
        flat_.resize(start + length, 0);
        std::copy(flat_.begin() + static_cast<std::ptrdiff_t>(previous),
                  flat_.begin() + static_cast<std::ptrdiff_t>(previous + previous_length),
                  flat_.begin() + static_cast<std::ptrdiff_t>(start));
        offset_.push_back(start);
        length_.push_back(length);
        prime_count_.push_back(primes_upto_m);
        accumulate_integer(flat_.data() + start, m, 1);
    }
    filled_ = std::max(filled_, target);
}

std::vector<std::int32_t> factorial_table::exponents(std::uint64_t n) {
    const std::size_t count = prime_count(n);
    std::vector<std::int32_t> v(padded(count), 0);
    accumulate_factorial(v.data(), n, 1);
    v.resize(count);
    return v;
}

void factorial_table::accumulate_uncached(std::int32_t* acc, std::uint64_t n, std::int32_t times) {
    const auto& primes = sieve_.primes();
    for (std::size_t i = 0; i < primes.size() && primes[i] <= n; ++i) acc[i] += times * legendre(n, primes[i]);
}

void factorial_table::accumulate_integer(std::int32_t* acc, std::uint64_t m, std::int32_t times) {
    if (m == 0 || m > sieve_.limit()) throw std::logic_error("factorial_table::accumulate_integer: out of range");
    auto value = static_cast<std::uint32_t>(m);
    while (value > 1) {
        std::uint32_t p = sieve_.smallest_factor(value);
        std::size_t index = sieve_.index_of(p);
        while (value % p == 0) {
            value /= p;
            acc[index] += times;
        }
    }
}

factorial_table& shared_factorial_table() {
    thread_local factorial_table table;
    return table;
}

}  // namespace couplet::exact
