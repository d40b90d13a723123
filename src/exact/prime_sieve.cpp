#include "exact/prime_sieve.hpp"

#include <algorithm>
#include <stdexcept>

namespace couplet::exact {

prime_sieve::prime_sieve(std::uint32_t initial_limit) { rebuild(std::max<std::uint32_t>(initial_limit, 16)); }

void prime_sieve::ensure(std::uint32_t n) {
    if (n <= limit_) return;
    std::uint64_t grown = std::max<std::uint64_t>(n, 2 * std::uint64_t(limit_));
    rebuild(static_cast<std::uint32_t>(std::min<std::uint64_t>(grown, UINT32_MAX - 1)));
}

// Linear sieve: every composite is struck exactly once, by its smallest prime factor.
void prime_sieve::rebuild(std::uint32_t new_limit) {
    smallest_factor_.assign(std::size_t(new_limit) + 1, 0);
    primes_.clear();
    for (std::uint64_t i = 2; i <= new_limit; ++i) {
        if (smallest_factor_[i] == 0) {
            smallest_factor_[i] = static_cast<std::uint32_t>(i);
            primes_.push_back(static_cast<std::uint32_t>(i));
        }
        for (std::uint32_t p : primes_) {
            std::uint64_t multiple = i * p;
            if (p > smallest_factor_[i] || multiple > new_limit) break;
            smallest_factor_[multiple] = p;
        }
    }
    limit_ = new_limit;
}

std::size_t prime_sieve::count_upto(std::uint64_t n) const {
    if (n > limit_) throw std::logic_error("prime_sieve::count_upto beyond the sieve limit");
    return static_cast<std::size_t>(std::upper_bound(primes_.begin(), primes_.end(), static_cast<std::uint32_t>(n)) -
                                    primes_.begin());
}

std::size_t prime_sieve::index_of(std::uint32_t prime) const {
    auto it = std::lower_bound(primes_.begin(), primes_.end(), prime);
    if (it == primes_.end() || *it != prime) throw std::logic_error("prime_sieve::index_of: not a sieved prime");
    return static_cast<std::size_t>(it - primes_.begin());
}

}  // namespace couplet::exact
