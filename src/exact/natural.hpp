#pragma once
// A non-negative big integer as little-endian 64-bit limbs, with only the few in-place
// operations the Racah-series summation needs (multiply by a machine word, add, subtract,
// exact division by an odd word).  Unlike cln::cl_I it allocates nothing once its buffer
// has grown, which keeps the inner loop of every Wigner symbol free of the heap.

#include <cln/integer.h>

#include <cstddef>
#include <cstdint>
#include <vector>

namespace couplet::exact::detail {

class natural {
public:
    natural() = default;
    explicit natural(std::uint64_t value) { assign(value); }

    void assign(std::uint64_t value) {
        limbs_.clear();
        if (value != 0) limbs_.push_back(value);
    }
    bool is_zero() const { return limbs_.empty(); }
    void swap(natural& other) noexcept { limbs_.swap(other.limbs_); }
    std::size_t size() const { return limbs_.size(); }
    const std::uint64_t* data() const { return limbs_.data(); }
    std::vector<std::uint64_t>& limbs() { return limbs_; }
    const std::vector<std::uint64_t>& limbs() const { return limbs_; }

    void multiply_word(std::uint64_t factor);
    void add(const natural& other);
    // this -= other; requires this >= other.
    void subtract(const natural& other);
    // this = other - this; requires other >= this.
    void subtract_from(const natural& other);
    // Removes up to max_shift trailing zero bits; returns how many were removed.
    std::uint64_t remove_twos(std::uint64_t max_shift);
    std::uint64_t trailing_zero_bits() const;
    void shift_right(std::uint64_t bits);
    void multiply(const natural& other);  // schoolbook; for the 9j accumulation only

    friend int compare(const natural& a, const natural& b);

private:
    void trim() {
        while (!limbs_.empty() && limbs_.back() == 0) limbs_.pop_back();
    }
    std::vector<std::uint64_t> limbs_;
};

// Multiplicative inverse of an odd word modulo 2^64.
std::uint64_t inverse_mod_word(std::uint64_t odd);

// Hensel (right-to-left) remainder: a value c with x == -c * 2^(64 n) (mod d), so an odd
// prime p dividing d divides x exactly when it divides c.  One pass of multiplications, no
// hardware division; d must be odd.
std::uint64_t hensel_residue(const natural& x, std::uint64_t odd_d, std::uint64_t inverse_d);

// x /= d for an odd d that divides x exactly.
void divide_exact(natural& x, std::uint64_t odd_d, std::uint64_t inverse_d);

cln::cl_I to_cl_I(const natural& x);
natural from_cl_I(const cln::cl_I& nonnegative);

// Multiplies x by the product of `count` positive factors, packing them into as few
// word multiplications as overflow allows.
void multiply_factors(natural& x, const std::uint64_t* factors, int count);

}  // namespace couplet::exact::detail
