// 6j symbols by DLMF 34.4.2:
//   {a b c; d e f} = Delta(abc) Delta(aef) Delta(dbf) Delta(dec)
//       * sum_s (-1)^s (s+1)! / ((s-a-b-c)!(s-a-e-f)!(s-d-b-f)!(s-d-e-c)!
//                                (a+b+d+e-s)!(b+c+e+f-s)!(c+a+f+d-s)!)

#include "exact/admissibility.hpp"
#include "exact/argument_limits.hpp"
#include "exact/factored_term.hpp"
#include "exact/racah_series.hpp"
#include "exact/wigner.hpp"

#include <algorithm>
#include <vector>

namespace couplet::exact {

number sixj(long ta, long tb, long tc, long td, long te, long tf) {
    if (!triangle(ta, tb, tc) || !triangle(ta, te, tf) || !triangle(td, tb, tf) || !triangle(td, te, tc))
        return number();
    detail::check_doubled_arguments("sixj", {ta, tb, tc, td, te, tf});
    factorial_table& table = shared_factorial_table();
    const detail::racah_series series = detail::sixj_series(ta, tb, tc, td, te, tf);
    if (series.empty()) return number();

    const long largest = std::max({series.largest_factorial_argument(), (ta + tb + tc) / 2 + 1, (ta + te + tf) / 2 + 1,
                                   (td + tb + tf) / 2 + 1, (td + te + tc) / 2 + 1});
    const std::size_t primes = table.prime_count(static_cast<std::uint64_t>(largest));
    thread_local std::vector<std::int32_t> twice_exponents;
    twice_exponents.assign(factorial_table::padded(primes), 0);
    std::int32_t* e2 = twice_exponents.data();
    detail::accumulate_triangle(table, e2, ta, tb, tc, 1);
    detail::accumulate_triangle(table, e2, ta, te, tf, 1);
    detail::accumulate_triangle(table, e2, td, tb, tf, 1);
    detail::accumulate_triangle(table, e2, td, te, tc, 1);
    series.accumulate_exponents(table, e2, 2);

    thread_local detail::natural sum;
    bool negative = false;
    series.sum(sum, negative);
    return detail::assemble_term(negative, sum, e2, primes, table.sieve());
}

}  // namespace couplet::exact
