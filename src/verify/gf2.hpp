// Linear algebra over GF(2), for fitting a missing phase: a sign (-1)^E is a bit, and the
// bits of a sum of exponents add.
#pragma once

#include <cstddef>
#include <cstdint>
#include <optional>
#include <vector>

namespace couplet::verify::gf2 {

class bits {
public:
    explicit bits(std::size_t size = 0) : size_(size), words_((size + 63) / 64, 0) {}
    std::size_t size() const { return size_; }
    bool get(std::size_t i) const { return (words_[i / 64] >> (i % 64)) & 1U; }
    void set(std::size_t i, bool value) {
        std::uint64_t mask = std::uint64_t{1} << (i % 64);
        words_[i / 64] = value ? (words_[i / 64] | mask) : (words_[i / 64] & ~mask);
    }
    bits& operator^=(const bits& other) {
        for (std::size_t w = 0; w < words_.size(); ++w) words_[w] ^= other.words_[w];
        return *this;
    }
    friend bool operator<(const bits& a, const bits& b) { return a.words_ < b.words_; }
    friend bool operator==(const bits& a, const bits& b) { return a.words_ == b.words_; }

private:
    std::size_t size_;
    std::vector<std::uint64_t> words_;
};

// Some x with row . x = rhs for every row (free unknowns set to 0), or nothing when the
// equations contradict each other.  Every row has `unknowns` bits.
std::optional<bits> solve(const std::vector<bits>& rows, const std::vector<bool>& rhs, std::size_t unknowns);

// A basis of {x : row . x = 0 for every row}.
std::vector<bits> null_space(const std::vector<bits>& rows, std::size_t unknowns);

}  // namespace couplet::verify::gf2
