// 3j symbols and Clebsch-Gordan coefficients by Racah's formula (DLMF 34.2.4, 34.2.5):
//   (j1 j2 j3; m1 m2 m3) = (-1)^(j1-j2-m3) Delta(j1 j2 j3)
//       * sqrt((j1+m1)!(j1-m1)!(j2+m2)!(j2-m2)!(j3+m3)!(j3-m3)!)
//       * sum_s (-1)^s / (s!(j1+j2-j3-s)!(j1-m1-s)!(j2+m2-s)!(j3-j2+m1+s)!(j3-j1-m2+s)!)

#include "exact/admissibility.hpp"
#include "exact/argument_limits.hpp"
#include "exact/factored_term.hpp"
#include "exact/racah_series.hpp"
#include "exact/wigner.hpp"

#include <algorithm>
#include <climits>
#include <vector>

namespace couplet::exact {

namespace {

bool threej_admissible(long tj1, long tj2, long tj3, long tm1, long tm2, long tm3) {
    return projection_ok(tj1, tm1) && projection_ok(tj2, tm2) && projection_ok(tj3, tm3) &&
           static_cast<__int128>(tm1) + tm2 + tm3 == 0 && triangle(tj1, tj2, tj3);
}

// The admissible 3j times sqrt(extra_factor) times (-1)^extra_phase.
number threej_scaled(long tj1, long tj2, long tj3, long tm1, long tm2, long tm3, long extra_factor, bool extra_phase) {
    factorial_table& table = shared_factorial_table();
    const detail::racah_series series = detail::threej_series(tj1, tj2, tj3, tm1, tm2);
    if (series.empty()) return number();

    const long largest =
        std::max({(tj1 + tj2 + tj3) / 2 + 1, tj1, tj2, tj3, extra_factor, series.largest_factorial_argument()});
    const std::size_t primes = table.prime_count(static_cast<std::uint64_t>(largest));
    thread_local std::vector<std::int32_t> twice_exponents;
    twice_exponents.assign(factorial_table::padded(primes), 0);
    std::int32_t* e2 = twice_exponents.data();

    detail::accumulate_triangle(table, e2, tj1, tj2, tj3, 1);
    for (auto [tj, tm] : {std::pair{tj1, tm1}, std::pair{tj2, tm2}, std::pair{tj3, tm3}}) {
        table.accumulate_factorial(e2, static_cast<std::uint64_t>((tj + tm) / 2), 1);
        table.accumulate_factorial(e2, static_cast<std::uint64_t>((tj - tm) / 2), 1);
    }
    series.accumulate_exponents(table, e2, 2);
    if (extra_factor > 1) table.accumulate_integer(e2, static_cast<std::uint64_t>(extra_factor), 1);

    thread_local detail::natural sum;
    bool negative = false;
    series.sum(sum, negative);
    const bool phase = (((tj1 - tj2 - tm3) / 2) & 1) != 0;
    return detail::assemble_term(negative != (phase != extra_phase), sum, e2, primes, table.sieve());
}

}  // namespace

number threej(long tj1, long tj2, long tj3, long tm1, long tm2, long tm3) {
    if (!threej_admissible(tj1, tj2, tj3, tm1, tm2, tm3)) return number();
    detail::check_doubled_arguments("threej", {tj1, tj2, tj3});
    return threej_scaled(tj1, tj2, tj3, tm1, tm2, tm3, 1, false);
}

number clebsch_gordan(long tj1, long tm1, long tj2, long tm2, long tJ, long tM) {
    if (tM == LONG_MIN) return number();  // |M| > J for every long J, and -tM would overflow
    if (!threej_admissible(tj1, tj2, tJ, tm1, tm2, -tM)) return number();
    detail::check_doubled_arguments("clebsch_gordan", {tj1, tj2, tJ});
    const bool phase = (((tj1 - tj2 + tM) / 2) & 1) != 0;  // (-1)^(j1-j2+M)
    return threej_scaled(tj1, tj2, tJ, tm1, tm2, -tM, tJ + 1, phase);
}

}  // namespace couplet::exact
