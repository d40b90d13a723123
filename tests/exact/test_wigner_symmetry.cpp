// Symmetries as facts of the trade on random admissible symbols: 3j column permutations and
// m -> -m (DLMF 34.3.8-34.3.10), the 24 tetrahedral symmetries of the 6j (DLMF 34.5.8), the
// 9j under transposition and permutations of rows and columns (DLMF 34.7(ii)).

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <algorithm>
#include <array>
#include <random>

using couplet::exact::ninej;
using couplet::exact::number;
using couplet::exact::sixj;
using couplet::exact::threej;
using couplet::exact::triangle;

namespace {

int phase(long exponent) { return (exponent % 2 == 0) ? 1 : -1; }  // (-1)^exponent

class picker {
public:
    explicit picker(unsigned seed) : rng_(seed) {}
    long j(long max) { return std::uniform_int_distribution<long>(0, max)(rng_); }
    long third_of(long a, long b) {  // doubled c with (a b c) a triad
        return std::labs(a - b) + 2 * std::uniform_int_distribution<long>(0, std::min(a, b))(rng_);
    }
    long projection(long tj) { return -tj + 2 * std::uniform_int_distribution<long>(0, tj)(rng_); }

private:
    std::mt19937 rng_;
};

bool sixj_admissible(const std::array<long, 6>& s) {
    return triangle(s[0], s[1], s[2]) && triangle(s[0], s[4], s[5]) && triangle(s[3], s[1], s[5]) &&
           triangle(s[3], s[4], s[2]);
}

number ninej_of(const std::array<std::array<long, 3>, 3>& m) {
    return ninej(m[0][0], m[0][1], m[0][2], m[1][0], m[1][1], m[1][2], m[2][0], m[2][1], m[2][2]);
}

}  // namespace

TEST_CASE("exact: 3j: even permutations are free, odd ones and m -> -m cost (-1)^(j1+j2+j3)",
          "[exact][wigner][symmetry]") {
    const unsigned seed = 338u + Catch::rngSeed();
    INFO("seed " << seed);
    picker pick(seed);
    int nonzero = 0;
    for (int trial = 0; trial < 600; ++trial) {
        const long a = pick.j(30), b = pick.j(30), c = pick.third_of(a, b);
        const long ma = pick.projection(a), mb = pick.projection(b), mc = -ma - mb;
        if (std::labs(mc) > c) continue;
        const number x = threej(a, b, c, ma, mb, mc);
        const int odd = phase((a + b + c) / 2);
        INFO("2j = " << a << " " << b << " " << c << ", 2m = " << ma << " " << mb << " " << mc);
        CHECK(threej(b, c, a, mb, mc, ma) == x);           // DLMF 34.3.8
        CHECK(threej(c, a, b, mc, ma, mb) == x);           // DLMF 34.3.8
        CHECK(threej(b, a, c, mb, ma, mc) == odd * x);     // DLMF 34.3.9
        CHECK(threej(a, c, b, ma, mc, mb) == odd * x);     // DLMF 34.3.9
        CHECK(threej(c, b, a, mc, mb, ma) == odd * x);     // DLMF 34.3.9
        CHECK(threej(a, b, c, -ma, -mb, -mc) == odd * x);  // DLMF 34.3.10
        nonzero += !x.is_zero();
    }
    CHECK(nonzero > 300);
}

TEST_CASE("exact: 6j: all 24 tetrahedral symmetries are free", "[exact][wigner][symmetry]") {
    const unsigned seed = 358u + Catch::rngSeed();
    INFO("seed " << seed);
    picker pick(seed);
    int checked = 0;
    while (checked < 150) {
        std::array<long, 6> s{pick.j(30), pick.j(30), 0, pick.j(30), pick.j(30), pick.j(30)};
        s[2] = pick.third_of(s[0], s[1]);
        if (!sixj_admissible(s)) continue;
        const number x = sixj(s[0], s[1], s[2], s[3], s[4], s[5]);
        std::array<int, 3> columns{0, 1, 2};
        do {
            // DLMF 34.5.8: any column order, and upper/lower swapped in an even number of columns.
            for (int flips : {0, 3, 5, 6}) {
                std::array<long, 6> t;
                for (int k = 0; k < 3; ++k) {
                    const bool flip = (flips >> k) & 1;
                    t[k] = flip ? s[columns[k] + 3] : s[columns[k]];
                    t[k + 3] = flip ? s[columns[k]] : s[columns[k] + 3];
                }
                CHECK(sixj(t[0], t[1], t[2], t[3], t[4], t[5]) == x);
            }
        } while (std::next_permutation(columns.begin(), columns.end()));
        ++checked;
    }
}

TEST_CASE("exact: 9j: transposition is free, odd row or column permutations cost (-1)^(sum of nine)",
          "[exact][wigner][symmetry]") {
    const unsigned seed = 372u + Catch::rngSeed();
    INFO("seed " << seed);
    picker pick(seed);
    int checked = 0, nonzero = 0;
    while (checked < 60) {
        std::array<std::array<long, 3>, 3> m{};
        m[0][0] = pick.j(12), m[0][1] = pick.j(12), m[1][0] = pick.j(12), m[1][1] = pick.j(12);
        m[0][2] = pick.third_of(m[0][0], m[0][1]);
        m[1][2] = pick.third_of(m[1][0], m[1][1]);
        m[2][0] = pick.third_of(m[0][0], m[1][0]);
        m[2][1] = pick.third_of(m[0][1], m[1][1]);
        m[2][2] = pick.third_of(m[2][0], m[2][1]);
        if (!triangle(m[0][2], m[1][2], m[2][2])) continue;
        const number x = ninej_of(m);
        long sum = 0;
        for (const auto& row : m)
            for (long v : row) sum += v;
        const int odd = phase(sum / 2);
        INFO("rows " << m[0][0] << " " << m[0][1] << " " << m[0][2] << " / " << m[1][0] << " " << m[1][1] << " "
                     << m[1][2] << " / " << m[2][0] << " " << m[2][1] << " " << m[2][2]);

        std::array<std::array<long, 3>, 3> t;
        for (int r = 0; r < 3; ++r)
            for (int c = 0; c < 3; ++c) t[r][c] = m[c][r];
        CHECK(ninej_of(t) == x);  // transposition

        std::array<int, 3> order{0, 1, 2};
        do {
            const bool even = (order[0] == 0 && order[1] == 1) || (order[0] == 1 && order[1] == 2) ||
                              (order[0] == 2 && order[1] == 0);
            std::array<std::array<long, 3>, 3> rows, columns;
            for (int r = 0; r < 3; ++r)
                for (int c = 0; c < 3; ++c) {
                    rows[r][c] = m[order[r]][c];
                    columns[r][c] = m[r][order[c]];
                }
            CHECK(ninej_of(rows) == (even ? 1 : odd) * x);
            CHECK(ninej_of(columns) == (even ? 1 : odd) * x);
        } while (std::next_permutation(order.begin(), order.end()));
        ++checked;
        nonzero += !x.is_zero();
    }
    CHECK(nonzero > 30);
}

TEST_CASE("exact: 9j: two equal rows and an odd sum of nine force 0", "[exact][wigner][symmetry]") {
    // DLMF 34.7(ii): exchanging the equal rows changes nothing but costs (-1)^(sum of nine).
    CHECK(ninej(2, 2, 2, 2, 2, 2, 2, 2, 2).is_zero());        // all j = 1
    CHECK(ninej(2, 4, 2, 2, 4, 2, 4, 4, 2).is_zero());        // rows 1 and 2 equal, sum 13
    CHECK_FALSE(ninej(2, 2, 2, 2, 2, 2, 2, 2, 0).is_zero());  // rows equal, sum 8
}
