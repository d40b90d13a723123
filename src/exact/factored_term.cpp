#include "exact/factored_term.hpp"

#include "exact/coprime_ratio.hpp"

#include <algorithm>
#include <limits>
#include <vector>

namespace couplet::exact::detail {

namespace {

using u128 = unsigned __int128;

constexpr std::uint64_t modulus_limit = std::uint64_t(1) << 62;
constexpr std::uint64_t prime_power_limit = std::uint64_t(1) << 31;

// Per-prime constants, built once per thread for the primes met so far:
//  * p | r  <=>  r * inverse <= limit (mod 2^64) for odd p, and then r * inverse is r / p,
//    which replaces hardware division (it dominated the cost of small symbols);
//  * p, p^2, ..., p^k_max < 2^31, so that powers are looked up instead of multiplied out.
struct prime_data {
    std::uint64_t inverse;
    std::uint64_t limit;
    std::uint32_t power_offset;
    std::int32_t max_exponent;
};

class prime_tables {
public:
    void extend(const prime_sieve& sieve, std::size_t count) {
        const auto& primes = sieve.primes();
        for (std::size_t i = data_.size(); i < count; ++i) {
            const std::uint64_t p = primes[i];
            prime_data d{0, 0, static_cast<std::uint32_t>(powers_.size()), 0};
            if (p % 2 == 1) {
                d.inverse = inverse_mod_word(p);
                d.limit = std::numeric_limits<std::uint64_t>::max() / p;
            }
            for (std::uint64_t power = p; power < prime_power_limit; power *= p) {
                powers_.push_back(power);
                ++d.max_exponent;
            }
            data_.push_back(d);
        }
    }
    const prime_data& operator[](std::size_t i) const { return data_[i]; }
    // p_i^k for 1 <= k <= max_exponent.
    std::uint64_t power(std::size_t i, std::int32_t k) const { return powers_[data_[i].power_offset + k - 1]; }

private:
    std::vector<prime_data> data_;
    std::vector<std::uint64_t> powers_;
};

prime_tables& tables_for(const prime_sieve& sieve, std::size_t count) {
    thread_local prime_tables tables;
    tables.extend(sieve, count);
    return tables;
}

// Collects word factors and multiplies them into a natural only when a word would overflow.
class word_packer {
public:
    explicit word_packer(natural& target) : target_(target) {}
    ~word_packer() { flush(); }
    word_packer(const word_packer&) = delete;
    word_packer& operator=(const word_packer&) = delete;

    void push(std::uint64_t factor) {
        std::uint64_t next;
        if (__builtin_mul_overflow(packed_, factor, &next)) {
            target_.multiply_word(packed_);
            packed_ = factor;
        } else {
            packed_ = next;
        }
    }
    // p_i^e, e >= 0, in chunks of at most max_exponent factors.
    void push_power(const prime_tables& tables, std::size_t i, std::int64_t e) {
        const std::int32_t chunk = tables[i].max_exponent;
        for (; e >= chunk; e -= chunk) push(tables.power(i, chunk));
        if (e > 0) push(tables.power(i, static_cast<std::int32_t>(e)));
    }
    void flush() {
        if (packed_ != 1) target_.multiply_word(packed_);
        packed_ = 1;
    }

private:
    natural& target_;
    std::uint64_t packed_ = 1;
};

struct wanted_prime {
    std::uint32_t index;
    std::int32_t exponent;  // how many more factors of the prime the denominator holds
};

// Divides `integer` by as much of prod p^exponent over the wanted (odd) primes as divides
// it, lowering their exponents accordingly.  Each round packs the tested prime powers p^k
// (k up to the exponent still wanted) into few odd moduli; one Hensel pass per modulus
// tells, for every prime in it, how many of its tested powers divide the integer.  No
// hardware division.  Afterwards no prime with exponent > 0 divides the integer.
void cancel_odd_primes(natural& integer, wanted_prime* wanted, std::size_t wanted_count, const prime_tables& tables) {
    thread_local std::vector<std::uint32_t> pending, next_round;  // positions in `wanted`
    thread_local std::vector<std::uint64_t> divisors;
    pending.resize(wanted_count);
    for (std::size_t k = 0; k < wanted_count; ++k) pending[k] = static_cast<std::uint32_t>(k);

    constexpr std::size_t batch_capacity = 64;  // odd prime powers >= 3 in a 62-bit modulus: <= 39
    while (!pending.empty() && !integer.is_zero()) {
        divisors.clear();
        next_round.clear();
        std::size_t begin = 0;
        while (begin < pending.size()) {
            std::int32_t trial_exponent[batch_capacity];
            std::uint64_t modulus = 1;
            std::size_t end = begin;
            while (end < pending.size() && end - begin < batch_capacity) {
                const wanted_prime& w = wanted[pending[end]];
                const std::int32_t k = std::min(w.exponent, tables[w.index].max_exponent);
                const u128 grown = u128(modulus) * tables.power(w.index, k);
                if (grown > modulus_limit) break;
                modulus = static_cast<std::uint64_t>(grown);
                trial_exponent[end - begin] = k;
                ++end;
            }
            const std::uint64_t residue = hensel_residue(integer, modulus, inverse_mod_word(modulus));
            for (std::size_t k = begin; k < end; ++k) {
                wanted_prime& w = wanted[pending[k]];
                const prime_data& d = tables[w.index];
                const std::int32_t tested = trial_exponent[k - begin];
                std::uint64_t r = residue;
                std::int32_t v = 0;
                while (v < tested && r * d.inverse <= d.limit) {
                    r *= d.inverse;
                    ++v;
                }
                if (v == 0) continue;
                divisors.push_back(tables.power(w.index, v));
                w.exponent -= v;
                if (v == tested && w.exponent > 0) next_round.push_back(pending[k]);
            }
            begin = end;
        }
        std::size_t d = 0;
        while (d < divisors.size()) {
            std::uint64_t packed = divisors[d++];
            while (d < divisors.size() && u128(packed) * divisors[d] <= modulus_limit) packed *= divisors[d++];
            divide_exact(integer, packed, inverse_mod_word(packed));
        }
        pending.swap(next_round);
    }
}

}  // namespace

void multiply_prime_powers(natural& integer, const std::int32_t* exponents, std::size_t count,
                           const prime_sieve& sieve) {
    const prime_tables& tables = tables_for(sieve, count);
    word_packer packer(integer);
    for (std::size_t i = 0; i < count; ++i) packer.push_power(tables, i, exponents[i]);
}

number assemble_term(bool negative, natural& integer, std::int32_t* twice_exponents, std::size_t count,
                     const prime_sieve& sieve) {
    if (integer.is_zero()) return number();
    thread_local natural radicand, denominator;
    thread_local std::vector<wanted_prime> wanted;
    thread_local std::vector<std::uint32_t> odd, up;
    if (wanted.size() < count) {
        wanted.resize(count);
        odd.resize(count);
        up.resize(count);
    }
    const std::uint32_t* primes = sieve.primes().data();
    const prime_tables& tables = tables_for(sieve, count);

    // One pass: p^(e/2) = p^floor(e/2) * sqrt(p)^(e mod 2).  Odd e put p in the radicand,
    // positive halves multiply the integer (after the cancellation, which they cannot
    // affect), negative ones wait to be cancelled against the integer.  The lists are
    // appended to without branches: the exponents' signs and parities are random.
    std::int32_t twos_wanted = 0, twos_up = 0;  // powers of 2 become shifts
    std::size_t odd_count = 0, up_count = 0, wanted_count = 0;
    if (count > 0) {
        const std::int32_t e = twice_exponents[0], half = e >> 1;
        odd[odd_count] = 0;
        odd_count += e & 1;
        twos_up = half > 0 ? half : 0;
        twos_wanted = half < 0 ? -half : 0;
    }
    for (std::size_t i = 1; i < count; ++i) {
        const std::int32_t e = twice_exponents[i], half = e >> 1;  // floor
        const auto index = static_cast<std::uint32_t>(i);
        odd[odd_count] = index;
        odd_count += static_cast<std::size_t>(e & 1);
        up[up_count] = index;
        up_count += half > 0;
        wanted[wanted_count] = {index, -half};
        wanted_count += half < 0;
    }
    radicand.assign(1);
    {
        word_packer radical(radicand);
        for (std::size_t k = 0; k < odd_count; ++k) radical.push(primes[odd[k]]);
    }
    twos_wanted -= static_cast<std::int32_t>(integer.remove_twos(std::uint64_t(twos_wanted)));
    cancel_odd_primes(integer, wanted.data(), wanted_count, tables);

    denominator.assign(1);
    {
        // Coprime by construction: every prime left in the denominator no longer divides
        // the integer, and the primes multiplied in now are not in the denominator.
        word_packer multiply(integer), divide(denominator);
        for (std::size_t k = 0; k < up_count; ++k) multiply.push_power(tables, up[k], twice_exponents[up[k]] >> 1);
        for (std::size_t k = 0; k < wanted_count; ++k)
            if (wanted[k].exponent > 0) divide.push_power(tables, wanted[k].index, wanted[k].exponent);
    }
    cln::cl_I numerator = to_cl_I(integer);
    if (twos_up > 0) numerator = cln::ash(numerator, twos_up);
    if (negative) numerator = -numerator;
    cln::cl_I denominator_integer = to_cl_I(denominator);
    if (twos_wanted > 0) denominator_integer = cln::ash(denominator_integer, twos_wanted);
    return number::from_squarefree_term(coprime_ratio(numerator, denominator_integer), to_cl_I(radicand));
}

}  // namespace couplet::exact::detail
