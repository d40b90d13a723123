// Timings of the exact Wigner symbols, against GSL's double routines where GSL can answer.
// Prints figures only; nothing here is an assertion.

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_coupling.h>

#include <algorithm>
#include <array>
#include <chrono>
#include <cstdio>
#include <random>
#include <vector>

namespace {

using clock_type = std::chrono::steady_clock;
using sixj_args = std::array<int, 6>;

// Calls f repeatedly for at least `seconds` (and `minimum_calls` times); returns the
// fastest single call in microseconds, the figure least disturbed by other load on the
// machine.
template <class F>
double microseconds_per_call(F&& f, double seconds, long minimum_calls = 1) {
    long calls = 0;
    double best = 1e300;
    const auto start = clock_type::now();
    do {
        const auto before = clock_type::now();
        f();
        best = std::min(best, std::chrono::duration<double, std::micro>(clock_type::now() - before).count());
        ++calls;
    } while (std::chrono::duration<double>(clock_type::now() - start).count() < seconds || calls < minimum_calls);
    return best;
}

std::vector<sixj_args> random_admissible_sixj(std::size_t count, int max_doubled_j, unsigned seed) {
    using couplet::exact::triangle;
    std::mt19937 rng(seed);
    std::uniform_int_distribution<int> pick(0, max_doubled_j);
    std::vector<sixj_args> symbols;
    while (symbols.size() < count) {
        sixj_args s;
        for (int& v : s) v = pick(rng);
        if (triangle(s[0], s[1], s[2]) && triangle(s[0], s[4], s[5]) && triangle(s[3], s[1], s[5]) &&
            triangle(s[3], s[4], s[2]))
            symbols.push_back(s);
    }
    return symbols;
}

void random_sixj_against_gsl() {
    const unsigned seed = 20240601;
    const auto symbols = random_admissible_sixj(10000, 80, seed);
    double checksum_exact = 0, checksum_gsl = 0;
    for (const auto& s : symbols)  // warm the factorial cache once
        checksum_exact += couplet::exact::sixj(s[0], s[1], s[2], s[3], s[4], s[5]).to_double();

    // Rounds alternate between the two; the fastest round of each counts.
    const int rounds = 7;
    double exact_us = 1e300, gsl_us = 1e300;
    for (int r = 0; r < rounds; ++r) {
        auto start = clock_type::now();
        for (const auto& s : symbols) {
            couplet::exact::number v = couplet::exact::sixj(s[0], s[1], s[2], s[3], s[4], s[5]);
            checksum_exact += v.is_zero() ? 0.0 : 1.0;
        }
        exact_us = std::min(exact_us, std::chrono::duration<double, std::micro>(clock_type::now() - start).count() /
                                          double(symbols.size()));
        start = clock_type::now();
        for (const auto& s : symbols) {
            gsl_sf_result result;
            gsl_sf_coupling_6j_e(s[0], s[1], s[2], s[3], s[4], s[5], &result);
            checksum_gsl += result.val;
        }
        gsl_us = std::min(gsl_us, std::chrono::duration<double, std::micro>(clock_type::now() - start).count() /
                                      double(symbols.size()));
    }

    double to_double_us = 0;
    {
        std::vector<couplet::exact::number> values;
        for (const auto& s : symbols) values.push_back(couplet::exact::sixj(s[0], s[1], s[2], s[3], s[4], s[5]));
        const auto start = clock_type::now();
        for (const auto& v : values) checksum_exact += v.to_double();
        to_double_us =
            std::chrono::duration<double, std::micro>(clock_type::now() - start).count() / double(values.size());
    }

    std::printf("6j, %zu random admissible symbols with j <= 40 (seed %u, best of %d rounds, warm cache):\n",
                symbols.size(), seed, rounds);
    std::printf("  exact couplet::exact::sixj      %8.3f us/call\n", exact_us);
    std::printf("  GSL gsl_sf_coupling_6j_e        %8.3f us/call\n", gsl_us);
    std::printf("  ratio exact / GSL               %8.2f\n", exact_us / gsl_us);
    std::printf("  (number::to_double afterwards   %8.3f us/call)\n", to_double_us);
    std::printf("  checksums %.6g %.6g\n", checksum_exact, checksum_gsl);
}

void large_symbols() {
    couplet::exact::number value;
    double us = microseconds_per_call([&] { value = couplet::exact::sixj(400, 400, 400, 400, 400, 400); }, 1.0, 3);
    std::printf("6j{200,200,200;200,200,200}      %10.1f us/call (best)  = %s\n", us, value.to_decimal(20).c_str());

    us = microseconds_per_call([&] { value = couplet::exact::ninej(200, 200, 200, 200, 200, 200, 200, 200, 200); }, 2.0,
                               3);
    std::printf("9j with all j = 100               %10.1f us/call (best)  = %s\n", us, value.to_decimal(20).c_str());

    us = microseconds_per_call([&] { value = couplet::exact::threej(20000, 20000, 20000, 0, 0, 0); }, 1.0, 1);
    std::printf("3j(10000 10000 10000; 0 0 0)      %10.1f us/call (best)  = %s\n", us, value.to_decimal(20).c_str());
}

void where_gsl_overflows() {
    gsl_sf_result result;
    const int status = gsl_sf_coupling_6j_e(86, 86, 86, 86, 86, 86, &result);
    const couplet::exact::number exact = couplet::exact::sixj(86, 86, 86, 86, 86, 86);
    std::printf("6j with all j = 43: GSL status %d (%s), val %g, err %g\n", status, gsl_strerror(status), result.val,
                result.err);
    std::printf("                    exact %s\n", exact.to_decimal(30).c_str());
    std::printf("                    = %s\n", exact.to_string().c_str());
}

}  // namespace

int main() {
    gsl_set_error_handler_off();
    random_sixj_against_gsl();
    large_symbols();
    where_gsl_overflows();
    return 0;
}
