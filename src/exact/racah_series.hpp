#pragma once
// The alternating factorial series of Racah's formulas,
//
//     sum_{s=first}^{last} (-1)^s  prod_a (s+a)!  /  ( prod_b (s+b)!  prod_c (c-s)! ),
//
// summed exactly by term ratios.  With t_s the term, t_{s+1}/t_s = -N_s/D_s where N_s and
// D_s are products of a few small integers, so
//
//     sum = t_first * P / Q,   Q = prod_l D_l,   P by Horner: P <- D_l Q_{l+1} - N_l P.
//
// t_first / Q is again a quotient of factorials, kept as a prime-exponent vector; only P is
// a big integer, built from word multiplications without touching the heap.

#include "exact/factorial_table.hpp"
#include "exact/natural.hpp"

#include <array>
#include <cstdint>

namespace couplet::exact::detail {

struct racah_series {
    long first = 0;
    long last = -1;                          // empty when last < first
    std::array<long, 1> rising_numerator{};  // (s+a)! in the numerator
    int rising_numerator_count = 0;
    std::array<long, 4> rising_denominator{};  // (s+b)! in the denominator
    int rising_denominator_count = 0;
    std::array<long, 4> falling_denominator{};  // (c-s)! in the denominator
    int falling_denominator_count = 0;

    bool empty() const { return last < first; }
    // Largest factorial argument met in accumulate_exponents().
    long largest_factorial_argument() const;

    // acc += times * exponents of t_first / Q.
    void accumulate_exponents(factorial_table& table, std::int32_t* acc, std::int32_t times) const;

    // P (magnitude, and sign including the (-1)^first of t_first).
    void sum(natural& magnitude, bool& negative) const;
};

// The series of DLMF 34.2.4 (3j) and 34.4.2 (6j).
// Arguments doubled, of an admissible symbol (m3 = -m1-m2 is implied).
racah_series threej_series(long tj1, long tj2, long tj3, long tm1, long tm2);
racah_series sixj_series(long ta, long tb, long tc, long td, long te, long tf);

// acc += times * exponents of Delta(abc)^2 = (a+b-c)!(a-b+c)!(-a+b+c)!/(a+b+c+1)!, doubled
// arguments of an admissible triad.
void accumulate_triangle(factorial_table& table, std::int32_t* acc, long ta, long tb, long tc, std::int32_t times);

}  // namespace couplet::exact::detail
