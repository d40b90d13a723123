#include "exact/natural.hpp"

#include <algorithm>
#include <stdexcept>

namespace couplet::exact::detail {

using u128 = unsigned __int128;

void natural::multiply_word(std::uint64_t factor) {
    if (limbs_.empty()) return;
    if (factor == 0) {
        limbs_.clear();
        return;
    }
    std::uint64_t carry = 0;
    for (std::uint64_t& limb : limbs_) {
        u128 t = u128(limb) * factor + carry;
        limb = static_cast<std::uint64_t>(t);
        carry = static_cast<std::uint64_t>(t >> 64);
    }
    if (carry != 0) limbs_.push_back(carry);
}

void natural::add(const natural& other) {
    if (other.limbs_.size() > limbs_.size()) limbs_.resize(other.limbs_.size(), 0);
    unsigned char carry = 0;
    std::size_t i = 0;
    for (; i < other.limbs_.size(); ++i) {
        u128 t = u128(limbs_[i]) + other.limbs_[i] + carry;
        limbs_[i] = static_cast<std::uint64_t>(t);
        carry = static_cast<unsigned char>(t >> 64);
    }
    for (; carry != 0 && i < limbs_.size(); ++i) {
        limbs_[i] += 1;
        carry = limbs_[i] == 0;
    }
    if (carry != 0) limbs_.push_back(1);
}

void natural::subtract(const natural& other) {
    unsigned char borrow = 0;
    std::size_t i = 0;
    for (; i < other.limbs_.size(); ++i) {
        std::uint64_t a = limbs_[i], b = other.limbs_[i];
        std::uint64_t d = a - b - borrow;
        borrow = (a < b) || (a == b && borrow);
        limbs_[i] = d;
    }
    for (; borrow != 0 && i < limbs_.size(); ++i) {
        borrow = limbs_[i] == 0;
        limbs_[i] -= 1;
    }
    trim();
}

void natural::subtract_from(const natural& other) {
    limbs_.resize(other.limbs_.size(), 0);
    unsigned char borrow = 0;
    for (std::size_t i = 0; i < other.limbs_.size(); ++i) {
        std::uint64_t a = other.limbs_[i], b = limbs_[i];
        std::uint64_t d = a - b - borrow;
        borrow = (a < b) || (a == b && borrow);
        limbs_[i] = d;
    }
    trim();
}

std::uint64_t natural::trailing_zero_bits() const {
    std::uint64_t bits = 0;
    for (std::uint64_t limb : limbs_) {
        if (limb != 0) return bits + static_cast<std::uint64_t>(__builtin_ctzll(limb));
        bits += 64;
    }
    return bits;
}

void natural::shift_right(std::uint64_t bits) {
    std::size_t words = static_cast<std::size_t>(bits / 64);
    unsigned rest = static_cast<unsigned>(bits % 64);
    if (words >= limbs_.size()) {
        limbs_.clear();
        return;
    }
    limbs_.erase(limbs_.begin(), limbs_.begin() + static_cast<std::ptrdiff_t>(words));
    if (rest != 0) {
        for (std::size_t i = 0; i + 1 < limbs_.size(); ++i)
            limbs_[i] = (limbs_[i] >> rest) | (limbs_[i + 1] << (64 - rest));
        limbs_.back() >>= rest;
    }
    trim();
}

std::uint64_t natural::remove_twos(std::uint64_t max_shift) {
    if (limbs_.empty()) return 0;
    std::uint64_t shift = std::min(trailing_zero_bits(), max_shift);
    if (shift != 0) shift_right(shift);
    return shift;
}

void natural::multiply(const natural& other) {
    if (limbs_.empty() || other.limbs_.empty()) {
        limbs_.clear();
        return;
    }
    std::vector<std::uint64_t> product(limbs_.size() + other.limbs_.size(), 0);
    for (std::size_t i = 0; i < limbs_.size(); ++i) {
        std::uint64_t carry = 0;
        const std::uint64_t a = limbs_[i];
        for (std::size_t j = 0; j < other.limbs_.size(); ++j) {
            u128 t = u128(a) * other.limbs_[j] + product[i + j] + carry;
            product[i + j] = static_cast<std::uint64_t>(t);
            carry = static_cast<std::uint64_t>(t >> 64);
        }
        product[i + other.limbs_.size()] = carry;
    }
    limbs_.swap(product);
    trim();
}

int compare(const natural& a, const natural& b) {
    if (a.limbs_.size() != b.limbs_.size()) return a.limbs_.size() < b.limbs_.size() ? -1 : 1;
    for (std::size_t i = a.limbs_.size(); i-- > 0;) {
        if (a.limbs_[i] != b.limbs_[i]) return a.limbs_[i] < b.limbs_[i] ? -1 : 1;
    }
    return 0;
}

std::uint64_t inverse_mod_word(std::uint64_t odd) {
    // Newton: each step doubles the number of correct low bits; odd*odd == 1 mod 8 to start.
    std::uint64_t x = odd;
    for (int i = 0; i < 5; ++i) x *= 2 - odd * x;
    return x;
}

std::uint64_t hensel_residue(const natural& x, std::uint64_t odd_d, std::uint64_t inverse_d) {
    std::uint64_t carry = 0;
    for (std::uint64_t limb : x.limbs()) {
        std::uint64_t l = limb - carry;
        std::uint64_t borrow = limb < carry;
        std::uint64_t q = l * inverse_d;  // q*d == l (mod 2^64)
        carry = static_cast<std::uint64_t>((u128(q) * odd_d) >> 64) + borrow;
    }
    return carry;
}

void divide_exact(natural& x, std::uint64_t odd_d, std::uint64_t inverse_d) {
    std::uint64_t carry = 0;
    for (std::uint64_t& limb : x.limbs()) {
        std::uint64_t l = limb - carry;
        std::uint64_t borrow = limb < carry;
        std::uint64_t q = l * inverse_d;
        limb = q;
        carry = static_cast<std::uint64_t>((u128(q) * odd_d) >> 64) + borrow;
    }
    if (carry != 0) throw std::logic_error("divide_exact: divisor does not divide");
    while (!x.limbs().empty() && x.limbs().back() == 0) x.limbs().pop_back();
}

static cln::cl_I limbs_to_cl_I(const std::uint64_t* limbs, std::size_t count) {
    if (count == 0) return 0;
    if (count == 1) return cln::cl_I(static_cast<unsigned long long>(limbs[0]));
    std::size_t half = count / 2;
    cln::cl_I high = limbs_to_cl_I(limbs + half, count - half);
    cln::cl_I low = limbs_to_cl_I(limbs, half);
    return cln::logior(cln::ash(high, static_cast<long>(64 * half)), low);
}

cln::cl_I to_cl_I(const natural& x) { return limbs_to_cl_I(x.data(), x.size()); }

natural from_cl_I(const cln::cl_I& nonnegative) {
    if (cln::minusp(nonnegative)) throw std::logic_error("from_cl_I: negative");
    natural result;
    std::size_t count = (cln::integer_length(nonnegative) + 63) / 64;
    result.limbs().resize(count);
    for (std::size_t i = 0; i < count; ++i)
        result.limbs()[i] = cln::cl_I_to_UQ(cln::ldb(nonnegative, cln::cl_byte(64, 64 * i)));
    return result;
}

void multiply_factors(natural& x, const std::uint64_t* factors, int count) {
    std::uint64_t packed = 1;
    for (int i = 0; i < count; ++i) {
        std::uint64_t next;
        if (__builtin_mul_overflow(packed, factors[i], &next)) {
            x.multiply_word(packed);
            packed = factors[i];
        } else {
            packed = next;
        }
    }
    if (packed != 1) x.multiply_word(packed);
}

}  // namespace couplet::exact::detail
