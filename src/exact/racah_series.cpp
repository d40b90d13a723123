#include "exact/racah_series.hpp"

#include "exact/interrupt.hpp"

#include <algorithm>

namespace couplet::exact::detail {

long racah_series::largest_factorial_argument() const {
    long largest = 0;
    for (int i = 0; i < rising_numerator_count; ++i) largest = std::max(largest, first + rising_numerator[i]);
    for (int i = 0; i < rising_denominator_count; ++i) largest = std::max(largest, last + rising_denominator[i]);
    for (int i = 0; i < falling_denominator_count; ++i) largest = std::max(largest, falling_denominator[i] - first);
    return largest;
}

// t_first / Q with Q = prod_l D_l: the rising denominators telescope to (last+b)!, so only
// the factorials at the two ends of the range remain.
void racah_series::accumulate_exponents(factorial_table& table, std::int32_t* acc, std::int32_t times) const {
    for (int i = 0; i < rising_numerator_count; ++i)
        table.accumulate_factorial(acc, static_cast<std::uint64_t>(first + rising_numerator[i]), times);
    for (int i = 0; i < rising_denominator_count; ++i)
        table.accumulate_factorial(acc, static_cast<std::uint64_t>(last + rising_denominator[i]), -times);
    for (int i = 0; i < falling_denominator_count; ++i)
        table.accumulate_factorial(acc, static_cast<std::uint64_t>(falling_denominator[i] - first), -times);
}

namespace {

using u128 = unsigned __int128;

struct step_factors {
    std::uint64_t numerator[5], denominator[4];
    int numerator_count = 0, denominator_count = 0;
};

step_factors factors_at(const racah_series& series, long s) {
    step_factors f;
    for (int i = 0; i < series.rising_numerator_count; ++i)
        f.numerator[f.numerator_count++] = static_cast<std::uint64_t>(s + series.rising_numerator[i] + 1);
    for (int i = 0; i < series.falling_denominator_count; ++i)
        f.numerator[f.numerator_count++] = static_cast<std::uint64_t>(series.falling_denominator[i] - s);
    for (int i = 0; i < series.rising_denominator_count; ++i)
        f.denominator[f.denominator_count++] = static_cast<std::uint64_t>(s + series.rising_denominator[i] + 1);
    return f;
}

int bit_length(u128 x) {
    const auto high = static_cast<std::uint64_t>(x >> 64), low = static_cast<std::uint64_t>(x);
    if (high != 0) return 128 - __builtin_clzll(high);
    return low != 0 ? 64 - __builtin_clzll(low) : 0;
}

// start * prod(factors) if it fits in 128 bits.  Every factor is below 2^23 (factorial
// arguments are bounded by factorial_table::max_factorial_argument), so pairs of factors
// fit in a word and the at most five factors of a step in 128 bits.
bool product_fits(const std::uint64_t* factors, int count, u128 start, u128& product) {
    std::uint64_t low = 1, high = 1;
    int i = 0;
    for (; i < count && i < 2; ++i) low *= factors[i];
    for (; i < count && i < 4; ++i) high *= factors[i];
    u128 f = u128(low) * high;
    for (; i < count; ++i) f *= factors[i];
    if (bit_length(f) + bit_length(start) > 128) return false;
    product = start * f;
    return true;
}

void assign_wide(natural& x, u128 value) {
    x.assign(static_cast<std::uint64_t>(value));
    if (value >> 64) {
        if (x.is_zero()) x.limbs().push_back(0);
        x.limbs().push_back(static_cast<std::uint64_t>(value >> 64));
    }
}

}  // namespace

// Horner from the last term down: P <- D_l Q - N_l P, Q <- D_l Q, starting from P = Q = 1.
// Small symbols finish in 128-bit words; the rest continue in naturals from where the
// words would have overflowed.
void racah_series::sum(natural& magnitude, bool& negative) const {
    u128 p = 1, q = 1;
    bool p_negative = false;
    long l = last - first - 1;
    for (; l >= 0; --l) {
        const step_factors f = factors_at(*this, first + l);
        u128 t, dq;
        if (!product_fits(f.numerator, f.numerator_count, p, t) ||
            !product_fits(f.denominator, f.denominator_count, q, dq))
            break;
        // Both outcomes computed, one selected: the sign of P follows the data and
        // mispredicted branches cost more than the arithmetic.
        u128 sum;
        const bool overflow = __builtin_add_overflow(dq, t, &sum);
        if (p_negative && overflow) break;
        const bool borrow = dq < t;
        const u128 difference = borrow ? t - dq : dq - t;
        p = p_negative ? sum : difference;
        p_negative = !p_negative && borrow;
        q = dq;
    }
    assign_wide(magnitude, p);
    if (l >= 0) {
        thread_local natural big_q, t;
        assign_wide(big_q, q);
        for (; l >= 0; --l) {
            if ((l & 31) == 0) poll_interrupt();  // big-integer steps: a series of 10^4 takes seconds
            const step_factors f = factors_at(*this, first + l);
            t = magnitude;
            multiply_factors(t, f.numerator, f.numerator_count);
            multiply_factors(big_q, f.denominator, f.denominator_count);
            if (p_negative) {
                magnitude.swap(t);
                magnitude.add(big_q);
                p_negative = false;
            } else if (compare(big_q, t) >= 0) {
                magnitude = big_q;
                magnitude.subtract(t);
            } else {
                magnitude.swap(t);
                magnitude.subtract(big_q);
                p_negative = true;
            }
        }
    }
    negative = p_negative != ((first & 1) != 0);
}

racah_series threej_series(long tj1, long tj2, long tj3, long tm1, long tm2) {
    racah_series series;
    const long a = (tj1 + tj2 - tj3) / 2;  // j1+j2-j3
    const long b = (tj1 - tm1) / 2;        // j1-m1
    const long c = (tj2 + tm2) / 2;        // j2+m2
    const long d = (tj3 - tj2 + tm1) / 2;  // j3-j2+m1
    const long e = (tj3 - tj1 - tm2) / 2;  // j3-j1-m2
    series.rising_denominator = {0, d, e, 0};
    series.rising_denominator_count = 3;
    series.falling_denominator = {a, b, c, 0};
    series.falling_denominator_count = 3;
    series.first = std::max({0L, -d, -e});
    series.last = std::min({a, b, c});
    return series;
}

racah_series sixj_series(long ta, long tb, long tc, long td, long te, long tf) {
    racah_series series;
    const long alpha[4] = {(ta + tb + tc) / 2, (ta + te + tf) / 2, (td + tb + tf) / 2, (td + te + tc) / 2};
    const long beta[3] = {(ta + tb + td + te) / 2, (tb + tc + te + tf) / 2, (tc + ta + tf + td) / 2};
    series.rising_numerator = {1};
    series.rising_numerator_count = 1;
    series.rising_denominator = {-alpha[0], -alpha[1], -alpha[2], -alpha[3]};
    series.rising_denominator_count = 4;
    series.falling_denominator = {beta[0], beta[1], beta[2], 0};
    series.falling_denominator_count = 3;
    series.first = *std::max_element(alpha, alpha + 4);
    series.last = *std::min_element(beta, beta + 3);
    return series;
}

void accumulate_triangle(factorial_table& table, std::int32_t* acc, long ta, long tb, long tc, std::int32_t times) {
    table.accumulate_factorial(acc, static_cast<std::uint64_t>((ta + tb - tc) / 2), times);
    table.accumulate_factorial(acc, static_cast<std::uint64_t>((ta - tb + tc) / 2), times);
    table.accumulate_factorial(acc, static_cast<std::uint64_t>((-ta + tb + tc) / 2), times);
    table.accumulate_factorial(acc, static_cast<std::uint64_t>((ta + tb + tc) / 2 + 1), -times);
}

}  // namespace couplet::exact::detail
