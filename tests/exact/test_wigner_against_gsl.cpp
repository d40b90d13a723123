// Exact 3j, 6j and 9j symbols against GSL 2.7's double routines (gsl_sf_coupling_3j_e,
// gsl_sf_coupling_6j_e, gsl_sf_coupling_9j_e) on random admissible symbols with j <= 20.

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_coupling.h>

#include <array>
#include <cmath>
#include <random>
#include <sstream>

using couplet::exact::triangle;

namespace {

constexpr int max_doubled_j = 40;  // j <= 20

class random_symbols {
public:
    explicit random_symbols(unsigned seed) : rng_(seed) {}

    int j() { return std::uniform_int_distribution<int>(0, max_doubled_j)(rng_); }
    // A doubled c with (a, b, c) a triad, or -1 if none is <= max_doubled_j.
    int third_of(int a, int b) {
        const int low = std::abs(a - b), high = std::min(a + b, max_doubled_j);
        if (low > high) return -1;
        return low + 2 * std::uniform_int_distribution<int>(0, (high - low) / 2)(rng_);
    }
    int projection(int tj) { return -tj + 2 * std::uniform_int_distribution<int>(0, tj)(rng_); }

    std::array<int, 6> threej() {
        for (;;) {
            const int a = j(), b = j(), c = third_of(a, b);
            if (c < 0) continue;
            const int ma = projection(a), mb = projection(b), mc = -ma - mb;
            if (std::abs(mc) <= c) return {a, b, c, ma, mb, mc};
        }
    }
    std::array<int, 6> sixj() {  // triads (abc) (aef) (dbf) (dec)
        for (;;) {
            const int a = j(), b = j(), c = third_of(a, b), d = j();
            if (c < 0) continue;
            const int e = third_of(d, c);
            if (e < 0) continue;
            const int low = std::max(std::abs(a - e), std::abs(d - b));
            const int high = std::min({a + e, d + b, max_doubled_j});
            if (low > high || (low + a + e) % 2 != 0) continue;
            const int f = low + 2 * std::uniform_int_distribution<int>(0, (high - low) / 2)(rng_);
            return {a, b, c, d, e, f};
        }
    }
    std::array<int, 9> ninej() {  // rows (abc) (def) (ghi), columns (adg) (beh) (cfi)
        for (;;) {
            const int a = j(), b = j(), c = third_of(a, b), d = j(), e = j();
            const int g = third_of(a, d), h = third_of(b, e), f = third_of(d, e);
            if (c < 0 || g < 0 || h < 0 || f < 0) continue;
            const int low = std::max(std::abs(g - h), std::abs(c - f));
            const int high = std::min({g + h, c + f, max_doubled_j});
            if (low > high || (low + g + h) % 2 != 0) continue;
            const int i = low + 2 * std::uniform_int_distribution<int>(0, (high - low) / 2)(rng_);
            return {a, b, c, d, e, f, g, h, i};
        }
    }

private:
    std::mt19937 rng_;
};

struct tally {
    int compared = 0;
    int skipped = 0;  // GSL reported an error or an uncertain value
};

// Agreement to 1e-10 relative, or 1e-14 absolute near 0, unless GSL reports an error or an
// uncertain value.  GSL's error estimates are pessimistic (often 1e-10 relative for values
// that are far better), so only estimates beyond 1e-8 relative count as uncertain.
template <std::size_t N>
void compare_with_gsl(const couplet::exact::number& exact, int status, const gsl_sf_result& gsl,
                      const std::array<int, N>& doubled, tally& t) {
    const double value = exact.to_double();
    if (status != GSL_SUCCESS || !(gsl.err <= 1e-8 * std::fabs(gsl.val) + 1e-14)) {
        ++t.skipped;
        return;
    }
    ++t.compared;
    const double difference = std::fabs(value - gsl.val);
    if (difference > 1e-10 * std::fabs(value) && difference > 1e-14) {
        std::ostringstream args;
        for (int x : doubled) args << x << ' ';
        FAIL("doubled arguments " << args.str() << ": exact " << exact.to_decimal(17) << " = " << exact << ", GSL "
                                  << gsl.val << " +- " << gsl.err);
    }
}

}  // namespace

TEST_CASE("exact: exact symbols agree with GSL 2.7 on random admissible arguments", "[exact][wigner][gsl]") {
    gsl_set_error_handler_off();
    const unsigned seed = 20240611u + Catch::rngSeed();
    INFO("seed " << seed);
    random_symbols pick(seed);
    tally threej_tally, sixj_tally, ninej_tally;

    for (int n = 0; n < 4000; ++n) {
        const auto s = pick.threej();
        gsl_sf_result r;
        const int status = gsl_sf_coupling_3j_e(s[0], s[1], s[2], s[3], s[4], s[5], &r);  // GSL 2.7 gsl_sf_coupling_3j
        compare_with_gsl(couplet::exact::threej(s[0], s[1], s[2], s[3], s[4], s[5]), status, r, s, threej_tally);
    }
    for (int n = 0; n < 4000; ++n) {
        const auto s = pick.sixj();
        gsl_sf_result r;
        const int status = gsl_sf_coupling_6j_e(s[0], s[1], s[2], s[3], s[4], s[5], &r);  // GSL 2.7 gsl_sf_coupling_6j
        compare_with_gsl(couplet::exact::sixj(s[0], s[1], s[2], s[3], s[4], s[5]), status, r, s, sixj_tally);
    }
    for (int n = 0; n < 2500; ++n) {
        const auto s = pick.ninej();
        gsl_sf_result r;
        const int status = gsl_sf_coupling_9j_e(s[0], s[1], s[2], s[3], s[4], s[5], s[6], s[7], s[8],
                                                &r);  // GSL 2.7 gsl_sf_coupling_9j
        compare_with_gsl(couplet::exact::ninej(s[0], s[1], s[2], s[3], s[4], s[5], s[6], s[7], s[8]), status, r, s,
                         ninej_tally);
    }
    INFO("compared 3j " << threej_tally.compared << ", 6j " << sixj_tally.compared << ", 9j " << ninej_tally.compared
                        << "; skipped " << threej_tally.skipped << ", " << sixj_tally.skipped << ", "
                        << ninej_tally.skipped);
    // GSL may decline a few values; far more would mean the comparison tested little.
    CHECK(threej_tally.compared + sixj_tally.compared + ninej_tally.compared >= 10000);
    CHECK(threej_tally.skipped < 40);
    CHECK(sixj_tally.skipped < 40);
    CHECK(ninej_tally.skipped < 25);
}

TEST_CASE("exact: arguments GSL declares zero are exact zeros", "[exact][wigner][gsl]") {
    gsl_set_error_handler_off();
    const unsigned seed = 99u + Catch::rngSeed();
    INFO("seed " << seed);
    std::mt19937 rng(seed);
    std::uniform_int_distribution<int> pick(0, 12), projection(-12, 12);
    int zeros = 0;
    for (int n = 0; n < 3000; ++n) {
        const int a = pick(rng), b = pick(rng), c = pick(rng), ma = projection(rng), mb = projection(rng),
                  mc = projection(rng);
        const double gsl = gsl_sf_coupling_3j(a, b, c, ma, mb, mc);  // GSL 2.7 gsl_sf_coupling_3j
        const couplet::exact::number exact = couplet::exact::threej(a, b, c, ma, mb, mc);
        if (gsl == 0.0 && exact.is_zero()) ++zeros;
        CHECK(std::fabs(exact.to_double() - gsl) <= 1e-12);
    }
    CHECK(zeros > 2000);  // most random arguments break a selection rule
}
