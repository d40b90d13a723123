#pragma once
// Exact Wigner 3j, 6j, 9j symbols and Clebsch-Gordan coefficients (Condon-Shortley phases).
// All arguments are doubled (2j, 2m), as in GSL: threej(2, 2, 2, 0, 0, 0) is (1 1 1; 0 0 0).
// Arguments that break a selection rule (admissibility.hpp), including a negative j or an
// m-sum != 0, give exact 0.  Doubled arguments above max_doubled_argument throw
// std::domain_error (the exact sums would take hours and gigabytes there).

#include "exact/number.hpp"

namespace couplet::exact {

constexpr long max_doubled_argument = 1L << 20;

// (j1 j2 j3; m1 m2 m3), Racah's formula DLMF 34.2.4.
number threej(long tj1, long tj2, long tj3, long tm1, long tm2, long tm3);

// <j1 m1, j2 m2 | J M> = (-1)^(j1-j2+M) sqrt(2J+1) (j1 j2 J; m1 m2 -M)   (DLMF 34.1.1).
number clebsch_gordan(long tj1, long tm1, long tj2, long tm2, long tJ, long tM);

// {a b c; d e f}, DLMF 34.4.2.
number sixj(long ta, long tb, long tc, long td, long te, long tf);

// {a b c; d e f; g h i}, row by row; DLMF 34.6.2 (summed over x of three 6j symbols).
number ninej(long ta, long tb, long tc, long td, long te, long tf, long tg, long th, long ti);

// How many terms the Racah series of ninej() add up over its x-sum, known before any is
// computed: a 9j's cost grows as the cube of its j's, so a caller bounds it by this count.
long ninej_series_terms(long ta, long tb, long tc, long td, long te, long tf, long tg, long th, long ti);

}  // namespace couplet::exact
