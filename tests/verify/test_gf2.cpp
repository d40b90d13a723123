// Linear algebra over GF(2) against brute force over every vector (small sizes).
#include <catch2/catch.hpp>

#include <random>

#include "verify/gf2.hpp"

using couplet::verify::gf2::bits;

namespace {

bits from_mask(unsigned mask, std::size_t n) {
    bits b(n);
    for (std::size_t i = 0; i < n; ++i) b.set(i, (mask >> i) & 1U);
    return b;
}

bool dot(const bits& a, const bits& b) {
    bool s = false;
    for (std::size_t i = 0; i < a.size(); ++i) s ^= a.get(i) && b.get(i);
    return s;
}

}  // namespace

TEST_CASE("GF(2) solve agrees with brute force", "[verify]") {
    std::mt19937 rng(7);
    const std::size_t n = 6;
    for (int trial = 0; trial < 200; ++trial) {
        std::size_t m = 1 + rng() % 9;
        std::vector<bits> rows;
        std::vector<bool> rhs;
        for (std::size_t r = 0; r < m; ++r) {
            rows.push_back(from_mask(rng() % 64, n));
            rhs.push_back(rng() % 2);
        }
        bool solvable = false;
        for (unsigned x = 0; x < 64 && !solvable; ++x) {
            bool all = true;
            for (std::size_t r = 0; r < m; ++r) all = all && dot(rows[r], from_mask(x, n)) == rhs[r];
            solvable = all;
        }
        auto x = couplet::verify::gf2::solve(rows, rhs, n);
        REQUIRE(x.has_value() == solvable);
        if (x)
            for (std::size_t r = 0; r < m; ++r) CHECK(dot(rows[r], *x) == rhs[r]);
    }
}

TEST_CASE("GF(2) null space has the dimension brute force finds", "[verify]") {
    std::mt19937 rng(11);
    const std::size_t n = 7;
    for (int trial = 0; trial < 100; ++trial) {
        std::vector<bits> rows;
        for (std::size_t r = 0, m = rng() % 8; r < m; ++r) rows.push_back(from_mask(rng() % 128, n));
        std::size_t solutions = 0;
        for (unsigned x = 0; x < 128; ++x) {
            bool all = true;
            for (const bits& row : rows) all = all && !dot(row, from_mask(x, n));
            solutions += all;
        }
        auto basis = couplet::verify::gf2::null_space(rows, n);
        CHECK((std::size_t{1} << basis.size()) == solutions);
        for (const bits& v : basis)
            for (const bits& row : rows) CHECK(!dot(row, v));
    }
}
