#pragma once
// Primes and smallest prime factors up to a limit that grows on demand.  Prime-exponent
// vectors throughout couplet::exact are indexed by the position of a prime in primes().

#include <cstddef>
#include <cstdint>
#include <vector>

namespace couplet::exact {

class prime_sieve {
public:
    explicit prime_sieve(std::uint32_t initial_limit = 1u << 12);

    // Makes every integer in [0, n] covered; grows by at least doubling.
    void ensure(std::uint32_t n);
    std::uint32_t limit() const { return limit_; }

    const std::vector<std::uint32_t>& primes() const { return primes_; }
    // pi(n): how many primes are <= n.  Requires n <= limit().
    std::size_t count_upto(std::uint64_t n) const;
    // Position of `prime` in primes().  Requires a prime <= limit().
    std::size_t index_of(std::uint32_t prime) const;
    // Smallest prime factor of n, for 2 <= n <= limit().
    std::uint32_t smallest_factor(std::uint32_t n) const { return smallest_factor_[n]; }

private:
    void rebuild(std::uint32_t new_limit);

    std::uint32_t limit_ = 0;
    std::vector<std::uint32_t> smallest_factor_;
    std::vector<std::uint32_t> primes_;
};

}  // namespace couplet::exact
