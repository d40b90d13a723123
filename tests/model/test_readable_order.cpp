// The readable order below the printers: a delta's argument order is chosen by readable_key,
// which must sort linear forms exactly as the printed text does, so that what collects alike
// also prints alike (common practice, no source: a canonical order independent of hashing).
#include <catch2/catch.hpp>

#include <random>

#include "model/readable_order.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"

using namespace couplet;
using namespace GiNaC;

TEST_CASE("readable_key writes a linear form as the printer does", "[model]") {
    const char* names[] = {"j", "j1", "j12", "J", "J'", "m", "x", "lambda"};
    std::vector<symbol> syms;
    for (const char* n : names) syms.emplace_back(n);
    std::mt19937 rng(20261203);
    std::uniform_int_distribution<int> coefficient(-3, 3), pick(0, 7), denominator(1, 2);
    for (int trial = 0; trial < 400; ++trial) {
        ex e = numeric(coefficient(rng), denominator(rng));
        int terms = 1 + trial % 3;
        for (int t = 0; t < terms; ++t) e += coefficient(rng) * syms[pick(rng)];
        INFO(to_text(e));
        CHECK(readable_key(e) == to_text(e));
    }
}

TEST_CASE("a delta's arguments come in readable order whichever way they are written", "[model]") {
    symbol j("j"), k("k"), J("J");
    CHECK(to_text(kdelta(k, j)) == to_text(kdelta(j, k)));
    CHECK((kdelta(k, j) - kdelta(j, k)).is_zero());
    CHECK((kdelta(2 * J + 1, k) - kdelta(k, 2 * J + 1)).is_zero());
    CHECK(readable_less(j, J));
    CHECK_FALSE(readable_less(J, j));
}
