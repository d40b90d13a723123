// 9j symbols by DLMF 34.6.2, applied to the transposed symbol (a 9j is invariant under
// transposition, DLMF 34.7(ii)):
//   {a b c; d e f; g h i} = sum_x (-1)^(2x) (2x+1) {a b c; f i x}{d e f; b x h}{g h i; x a d}.
//
// The three 6j symbols share the triads (a i x), (f b x), (d x h) in pairs, so their square
// roots combine to rationals and every term of the x-sum carries the same radical: the one
// from the six triads of the 9j itself.  The sum therefore runs over integers:
//   9j = sqrt(prod Delta^2 of the rows and columns) * prod p^m_p * sum_x s_x P_x prod p^(f_x,p - m_p)
// with P_x the product of the three Racah-series numerators, f_x its prime exponents and
// m_p = min_x f_x,p, so that no term needs a denominator.

#include "exact/admissibility.hpp"
#include "exact/argument_limits.hpp"
#include "exact/factored_term.hpp"
#include "exact/interrupt.hpp"
#include "exact/racah_series.hpp"
#include "exact/wigner.hpp"

#include <algorithm>
#include <array>
#include <cstdlib>
#include <utility>
#include <vector>

namespace couplet::exact {

namespace {

struct ninej_terms {
    long a, b, c, d, e, f, g, h, i;  // doubled

    std::array<detail::racah_series, 3> series(long x) const {
        return {detail::sixj_series(a, b, c, f, i, x), detail::sixj_series(d, e, f, b, x, h),
                detail::sixj_series(g, h, i, x, a, d)};
    }

    // Prime exponents of everything in term x except the common radical and P_x:
    // the three series quotients, each shared Delta^2 once, and 2x+1.
    void exponents(factorial_table& table, std::int32_t* acc, long x,
                   const std::array<detail::racah_series, 3>& s) const {
        for (const auto& one : s) one.accumulate_exponents(table, acc, 1);
        detail::accumulate_triangle(table, acc, a, i, x, 1);
        detail::accumulate_triangle(table, acc, f, b, x, 1);
        detail::accumulate_triangle(table, acc, d, x, h, 1);
        table.accumulate_integer(acc, static_cast<std::uint64_t>(x + 1), 1);
    }
};

// The range of x in the sum, doubled; empty when first > last.
std::pair<long, long> x_range(long ta, long tb, long td, long tf, long th, long ti) {
    return {std::max({std::labs(ta - ti), std::labs(tb - tf), std::labs(td - th)}),
            std::min({ta + ti, tb + tf, td + th})};
}

bool admissible(long ta, long tb, long tc, long td, long te, long tf, long tg, long th, long ti) {
    return triangle(ta, tb, tc) && triangle(td, te, tf) && triangle(tg, th, ti) && triangle(ta, td, tg) &&
           triangle(tb, te, th) && triangle(tc, tf, ti);
}

}  // namespace

long ninej_series_terms(long ta, long tb, long tc, long td, long te, long tf, long tg, long th, long ti) {
    if (!admissible(ta, tb, tc, td, te, tf, tg, th, ti)) return 0;
    const ninej_terms nine{ta, tb, tc, td, te, tf, tg, th, ti};
    const auto [x_min, x_max] = x_range(ta, tb, td, tf, th, ti);
    long terms = 0;
    for (long x = x_min; x <= x_max; x += 2)
        for (const auto& one : nine.series(x)) terms += one.empty() ? 0 : one.last - one.first + 1;
    return terms;
}

number ninej(long ta, long tb, long tc, long td, long te, long tf, long tg, long th, long ti) {
    if (!admissible(ta, tb, tc, td, te, tf, tg, th, ti)) return number();
    detail::check_doubled_arguments("ninej", {ta, tb, tc, td, te, tf, tg, th, ti});
    const ninej_terms nine{ta, tb, tc, td, te, tf, tg, th, ti};

    // x couples with (a, i), (f, b) and (d, h); the three bounds share one parity because
    // the rows and columns are triads.
    const auto [x_min, x_max] = x_range(ta, tb, td, tf, th, ti);
    if (x_min > x_max) return number();

    factorial_table& table = shared_factorial_table();
    long largest = x_max + 1;
    for (auto [p, q, r] : {std::array{ta, tb, tc}, std::array{td, te, tf}, std::array{tg, th, ti},
                           std::array{ta, td, tg}, std::array{tb, te, th}, std::array{tc, tf, ti}})
        largest = std::max(largest, (p + q + r) / 2 + 1);
    for (long x = x_min; x <= x_max; x += 2) {
        poll_interrupt();
        for (const auto& one : nine.series(x)) largest = std::max(largest, one.largest_factorial_argument());
        largest = std::max({largest, (ta + ti + x) / 2 + 1, (tf + tb + x) / 2 + 1, (td + x + th) / 2 + 1});
    }
    const std::size_t primes = table.prime_count(static_cast<std::uint64_t>(largest));

    // Pass 1: the common power m_p = min_x f_x,p (zero terms may lower it; that only leaves
    // a common factor for assemble_term to cancel).
    std::vector<std::int32_t> common(factorial_table::padded(primes), 0), row(factorial_table::padded(primes), 0);
    bool first = true;
    for (long x = x_min; x <= x_max; x += 2) {
        std::fill(row.begin(), row.end(), 0);
        nine.exponents(table, row.data(), x, nine.series(x));
        for (std::size_t k = 0; k < primes; ++k) common[k] = first ? row[k] : std::min(common[k], row[k]);
        first = false;
    }

    // Pass 2: the integer sum.
    cln::cl_I total = 0;
    detail::natural product, factor;
    for (long x = x_min; x <= x_max; x += 2) {
        poll_interrupt();
        const auto s = nine.series(x);
        bool negative = (x & 1) != 0;  // (-1)^(2x)
        product.assign(1);
        for (const auto& one : s) {
            bool n = false;
            one.sum(factor, n);
            negative = negative != n;
            product.multiply(factor);
        }
        if (product.is_zero()) continue;
        std::fill(row.begin(), row.end(), 0);
        nine.exponents(table, row.data(), x, s);
        for (std::size_t k = 0; k < primes; ++k) row[k] -= common[k];
        detail::multiply_prime_powers(product, row.data(), primes, table.sieve());
        const cln::cl_I term = detail::to_cl_I(product);
        total = negative ? total - term : total + term;
    }

    std::vector<std::int32_t> twice_exponents(factorial_table::padded(primes), 0);
    for (auto [p, q, r] : {std::array{ta, tb, tc}, std::array{td, te, tf}, std::array{tg, th, ti},
                           std::array{ta, td, tg}, std::array{tb, te, th}, std::array{tc, tf, ti}})
        detail::accumulate_triangle(table, twice_exponents.data(), p, q, r, 1);
    for (std::size_t k = 0; k < primes; ++k) twice_exponents[k] += 2 * common[k];
    detail::natural magnitude = detail::from_cl_I(cln::abs(total));
    return detail::assemble_term(cln::minusp(total), magnitude, twice_exponents.data(), primes, table.sieve());
}

}  // namespace couplet::exact
