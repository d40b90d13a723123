// The classical symmetry groups as explicit arrangements of the entries.
#include <algorithm>
#include <array>

#include "canonical/symmetries.hpp"
#include "model/symbols.hpp"

namespace couplet::symmetry {

using namespace GiNaC;

namespace {

// The six permutations of three columns with their parity (1 = odd).
const std::array<std::pair<std::array<int, 3>, int>, 6>& permutations3() {
    static const std::array<std::pair<std::array<int, 3>, int>, 6> p{
        {{{0, 1, 2}, 0}, {{1, 2, 0}, 0}, {{2, 0, 1}, 0}, {{1, 0, 2}, 1}, {{0, 2, 1}, 1}, {{2, 1, 0}, 1}}};
    return p;
}

}  // namespace

std::vector<transformed> threej_orbit(const ex& s) {
    // Odd column permutations and m -> -m each cost (-1)^(j1+j2+j3)   (DLMF 34.3.8-34.3.10).
    const ex jsum = s.op(0) + s.op(1) + s.op(2);
    std::vector<transformed> out;
    for (int flip = 0; flip < 2; ++flip) {
        for (const auto& [perm, odd] : permutations3()) {
            exvector a(6);
            for (int k = 0; k < 3; ++k) {
                a[k] = s.op(perm[k]);
                a[3 + k] = flip ? ex(-s.op(3 + perm[k])) : s.op(3 + perm[k]);
            }
            out.push_back({wigner3j(a[0], a[1], a[2], a[3], a[4], a[5]), ((odd + flip) % 2) ? jsum : ex(0)});
        }
    }
    return out;
}

std::vector<transformed> sixj_orbit(const ex& s) {
    // Any column permutation, and exchanging upper and lower entries in two columns: the 24
    // tetrahedral symmetries, all without phase   (DLMF 34.5.8).
    static const std::array<std::array<bool, 3>, 4> swaps{
        {{false, false, false}, {true, true, false}, {true, false, true}, {false, true, true}}};
    std::vector<transformed> out;
    for (const auto& sw : swaps) {
        for (const auto& [perm, odd] : permutations3()) {
            (void)odd;
            exvector a(6);
            for (int k = 0; k < 3; ++k) {
                int c = perm[k];
                a[k] = sw[k] ? s.op(3 + c) : s.op(c);
                a[3 + k] = sw[k] ? s.op(c) : s.op(3 + c);
            }
            out.push_back({wigner6j(a[0], a[1], a[2], a[3], a[4], a[5]), 0});
        }
    }
    return out;
}

std::vector<transformed> ninej_orbit(const ex& s) {
    // Row and column permutations and transposition; an odd permutation of the rows, or of
    // the columns, costs (-1)^(sum of the nine entries)   (DLMF 34.7(ii)).
    ex total = 0;
    for (std::size_t k = 0; k < 9; ++k) total += s.op(k);
    std::vector<transformed> out;
    for (int transpose = 0; transpose < 2; ++transpose)
        for (const auto& [rows, rows_odd] : permutations3())
            for (const auto& [cols, cols_odd] : permutations3()) {
                exvector a(9);
                for (int r = 0; r < 3; ++r)
                    for (int c = 0; c < 3; ++c) {
                        int rr = rows[r], cc = cols[c];
                        a[3 * r + c] = transpose ? s.op(3 * cc + rr) : s.op(3 * rr + cc);
                    }
                out.push_back({wigner9j(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8]),
                               (rows_odd + cols_odd) % 2 ? total : ex(0)});
            }
    return out;
}

}  // namespace couplet::symmetry
