#pragma once
// Factorials as prime-exponent vectors.  Products and quotients of factorials become sums
// of small integer vectors; the square-free part of such a quotient (needed for the square
// roots in every Wigner symbol) is just the set of primes with an odd exponent.

#include "exact/prime_sieve.hpp"

#include <cstddef>
#include <cstdint>
#include <vector>

namespace couplet::exact {

// Exponents are int32: the largest argument accepted anywhere is max_factorial_argument,
// whose factorial has v_2 < 2^22, so even sums of a few dozen such vectors cannot overflow.
class factorial_table {
public:
    static constexpr std::uint64_t max_factorial_argument = std::uint64_t(1) << 22;
    // Exponent vectors of n! for n <= cache_limit are kept (about 5 MB when all are filled);
    // larger ones are recomputed by Legendre's formula on every use.
    static constexpr std::uint64_t cache_limit = 4096;

    factorial_table() = default;

    // Makes primes up to n available; throws std::domain_error if n > max_factorial_argument.
    void reserve(std::uint64_t n);
    // pi(n), the length of the exponent vector of n!  (reserves n).
    std::size_t prime_count(std::uint64_t n) {
        if (n <= filled_ && any_filled_) return prime_count_[n];
        return prime_count_slow(n);
    }
    std::uint32_t prime(std::size_t index) const { return sieve_.primes()[index]; }
    const prime_sieve& sieve() const { return sieve_; }

    // v_p(n!) for every prime p <= n, indexed like sieve().primes().
    std::vector<std::int32_t> exponents(std::uint64_t n);

    // Accumulators are padded to a multiple of 8 entries, so that adding a cached vector
    // is a remainder-free vector loop (the padding stays 0).
    static std::size_t padded(std::size_t count) { return (count + 7) & ~std::size_t(7); }

    // acc[i] += times * v_{p_i}(n!) for every prime p_i <= n.  acc must have at least
    // padded(prime_count(n)) entries, and n must already be reserved.
    void accumulate_factorial(std::int32_t* acc, std::uint64_t n, std::int32_t times) {
        if (n > filled_) {
            accumulate_uncached(acc, n, times);
            return;
        }
        const std::int32_t* src = flat_.data() + offset_[n];
        const std::uint32_t count = length_[n];
        // The usual multipliers get loops without an integer multiply (which baseline
        // x86-64 SIMD lacks for 32-bit lanes).
        switch (times) {
            case 1:
                add_blocks(acc, src, count, [](block a, block b) { return a + b; });
                break;
            case -1:
                add_blocks(acc, src, count, [](block a, block b) { return a - b; });
                break;
            case 2:
                add_blocks(acc, src, count, [](block a, block b) { return a + b + b; });
                break;
            case -2:
                add_blocks(acc, src, count, [](block a, block b) { return a - b - b; });
                break;
            default:
                add_blocks(acc, src, count, [times](block a, block b) { return a + times * b; });
                break;
        }
    }

    // acc[i] += times * v_{p_i}(m) for an integer 1 <= m <= max_factorial_argument (reserved).
    void accumulate_integer(std::int32_t* acc, std::uint64_t m, std::int32_t times);

private:
    // Four lanes at a time with GCC vector types (SSE2, baseline x86-64): the padding makes every vector a whole
    // number of blocks, and plain loops were left scalar by the auto-vectoriser.
    using block = std::int32_t __attribute__((vector_size(16)));
    template <class Op>
    static void add_blocks(std::int32_t* acc, const std::int32_t* src, std::uint32_t count, Op op) {
        for (std::uint32_t i = 0; i < count; i += 4) {
            block a, b;
            __builtin_memcpy(&a, acc + i, sizeof a);
            __builtin_memcpy(&b, src + i, sizeof b);
            a = op(a, b);
            __builtin_memcpy(acc + i, &a, sizeof a);
        }
    }
    void accumulate_uncached(std::int32_t* acc, std::uint64_t n, std::int32_t times);
    std::size_t prime_count_slow(std::uint64_t n);
    void fill_cache(std::uint64_t n);

    prime_sieve sieve_;
    // Exponent vectors of 0!, 1!, ..., filled_! one after another; vector n starts at
    // offset_[n] and has length_[n] = padded(pi(n)) entries.  Filled incrementally, since
    // v(n!) = v((n-1)!) + v(n).
    std::vector<std::int32_t> flat_;
    std::vector<std::size_t> offset_;
    std::vector<std::uint32_t> length_;
    std::vector<std::uint32_t> prime_count_;  // pi(n) for n <= filled_
    std::uint64_t filled_ = 0;
    bool any_filled_ = false;
};

// The table every Wigner-symbol routine of this thread shares, so that the factorial
// cache is reused across calls.
factorial_table& shared_factorial_table();

}  // namespace couplet::exact
