// Condon-Shortley conventions of the Clebsch-Gordan coefficients (common practice, no
// source), checked exactly for every admissible j up to 10.

#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"

#include <catch2/catch.hpp>

using couplet::exact::clebsch_gordan;
using couplet::exact::number;
using couplet::exact::triangle;

namespace {

constexpr long max_doubled = 20;  // j <= 10

// The ladder coefficient sqrt((j - m)(j + m + 1)) of J+ on |j m> (doubled j, m), real and >= 0.
number raising(long tj, long tm) { return number::sqrt_of(cln::cl_RA((tj - tm) * (tj + tm + 2)) / 4); }
// The coefficient sqrt((j + m)(j - m + 1)) of J- on |j m>.
number lowering(long tj, long tm) { return number::sqrt_of(cln::cl_RA((tj + tm) * (tj - tm + 2)) / 4); }

}  // namespace

TEST_CASE("exact: <j1 j1, j2 J-j1 | J J> > 0", "[exact][wigner][condon-shortley]") {
    // Common practice, no source: the phase convention fixes this coefficient positive.
    int checked = 0;
    for (long a = 0; a <= max_doubled; ++a)
        for (long b = 0; b <= max_doubled; ++b)
            for (long J = std::labs(a - b); J <= a + b; J += 2) {
                INFO("2j1=" << a << " 2j2=" << b << " 2J=" << J);
                CHECK(clebsch_gordan(a, a, b, J - a, J, J).sign() == 1);
                ++checked;
            }
    CHECK(checked > 2000);
}

TEST_CASE("exact: J- applied to the coupled state |J M> gives |J M-1> with the real ladder coefficients",
          "[exact][wigner][condon-shortley]") {
    // Common practice, no source: J- = j1- + j2-, each acting with sqrt((j+m)(j-m+1)) >= 0, so
    //   sqrt((J+M)(J-M+1)) <m1 m2|J M-1> = sqrt((j1-m1)(j1+m1+1)) <m1+1 m2|J M>
    //                                    + sqrt((j2-m2)(j2+m2+1)) <m1 m2+1|J M>.
    // Both sides are sums of two radicals: the identity is checked exactly.
    long checked = 0;
    for (long a = 0; a <= 14; ++a)
        for (long b = 0; b <= 14; ++b)
            for (long J = std::labs(a - b); J <= a + b; J += 2)
                for (long M = -J + 2; M <= J; M += 2)
                    for (long m1 = -a; m1 <= a; m1 += 2) {
                        const long m2 = M - 2 - m1;
                        if (m2 < -b || m2 > b) continue;
                        const number left = lowering(J, M) * clebsch_gordan(a, m1, b, m2, J, M - 2);
                        const number right = raising(a, m1) * clebsch_gordan(a, m1 + 2, b, m2, J, M) +
                                             raising(b, m2) * clebsch_gordan(a, m1, b, m2 + 2, J, M);
                        INFO("2j1=" << a << " 2j2=" << b << " 2J=" << J << " 2M=" << M << " 2m1=" << m1);
                        CHECK(left == right);
                        ++checked;
                    }
    CHECK(checked > 10000);
}

TEST_CASE("exact: J+ applied to |J M> gives |J M+1>", "[exact][wigner][condon-shortley]") {
    // Common practice, no source: the raising counterpart of the recursion above.
    for (long a = 0; a <= 12; ++a)
        for (long b = 0; b <= 12; ++b)
            for (long J = std::labs(a - b); J <= a + b; J += 2)
                for (long M = -J; M <= J - 2; M += 2)
                    for (long m1 = -a; m1 <= a; m1 += 2) {
                        const long m2 = M + 2 - m1;
                        if (m2 < -b || m2 > b) continue;
                        const number left = raising(J, M) * clebsch_gordan(a, m1, b, m2, J, M + 2);
                        const number right = lowering(a, m1) * clebsch_gordan(a, m1 - 2, b, m2, J, M) +
                                             lowering(b, m2) * clebsch_gordan(a, m1, b, m2 - 2, J, M);
                        CHECK(left == right);
                    }
}

TEST_CASE("exact: Clebsch-Gordan coefficients are orthonormal", "[exact][wigner][condon-shortley]") {
    // 3j orthogonality (DLMF 34.3(iv)) in Clebsch-Gordan form:
    //   sum_{m1,m2} <m1 m2|J M><m1 m2|J' M> = delta_{J J'}.
    for (long a = 0; a <= 8; ++a)
        for (long b = 0; b <= 8; ++b)
            for (long J = std::labs(a - b); J <= a + b; J += 2)
                for (long K = std::labs(a - b); K <= a + b; K += 2)
                    for (long M = -std::min(J, K); M <= std::min(J, K); M += 2) {
                        number total;
                        for (long m1 = -a; m1 <= a; m1 += 2)
                            total += clebsch_gordan(a, m1, b, M - m1, J, M) * clebsch_gordan(a, m1, b, M - m1, K, M);
                        CHECK(total == number(J == K ? 1 : 0));
                    }
}

TEST_CASE("exact: Clebsch-Gordan table for j2 = 1/2", "[exact][wigner][condon-shortley]") {
    // From memory (the standard j2 = 1/2 table in the Condon-Shortley convention):
    //   <j1 m-1/2, 1/2 +1/2 | j1+1/2 m> =  sqrt((j1+m+1/2)/(2j1+1))
    //   <j1 m+1/2, 1/2 -1/2 | j1+1/2 m> =  sqrt((j1-m+1/2)/(2j1+1))
    //   <j1 m-1/2, 1/2 +1/2 | j1-1/2 m> = -sqrt((j1-m+1/2)/(2j1+1))
    //   <j1 m+1/2, 1/2 -1/2 | j1-1/2 m> =  sqrt((j1+m+1/2)/(2j1+1))
    for (long a = 1; a <= max_doubled; ++a)
        for (long M = -a - 1; M <= a + 1; M += 2) {
            const cln::cl_RA plus = cln::cl_RA(a + M + 1) / 2 / (a + 1), minus = cln::cl_RA(a - M + 1) / 2 / (a + 1);
            INFO("2j1=" << a << " 2m=" << M);
            CHECK(clebsch_gordan(a, M - 1, 1, 1, a + 1, M) == number::sqrt_of(plus));
            CHECK(clebsch_gordan(a, M + 1, 1, -1, a + 1, M) == number::sqrt_of(minus));
            if (std::labs(M) <= a - 1) {
                CHECK(clebsch_gordan(a, M - 1, 1, 1, a - 1, M) == -number::sqrt_of(minus));
                CHECK(clebsch_gordan(a, M + 1, 1, -1, a - 1, M) == number::sqrt_of(plus));
            }
        }
}

TEST_CASE("exact: a Clebsch-Gordan coefficient needs M = m1 + m2", "[exact][wigner][condon-shortley]") {
    CHECK(clebsch_gordan(2, 0, 2, 0, 2, 2).is_zero());
    CHECK(clebsch_gordan(1, 1, 1, 1, 2, 2) == number(1));  // stretched state: <1/2 1/2, 1/2 1/2 | 1 1> = 1
    CHECK(triangle(1, 1, 2));
}
