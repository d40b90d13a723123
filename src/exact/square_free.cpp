// sqrt of a rational as q*sqrt(r): needs the square-free part of an integer, found by trial
// division up to the cube root of what is left (then the rest has at most two prime
// factors, so it is square-free unless it is a perfect square).

#include "exact/number.hpp"
#include "exact/prime_sieve.hpp"

#include <stdexcept>

namespace couplet::exact {

namespace {

constexpr std::uint32_t trial_division_limit = 1u << 20;

prime_sieve& trial_primes() {
    thread_local prime_sieve sieve(1u << 12);
    return sieve;
}

// m = square^2 * squarefree, m > 0.
void split_square(cln::cl_I m, cln::cl_I& square, cln::cl_I& squarefree) {
    square = 1;
    squarefree = 1;
    prime_sieve& sieve = trial_primes();
    std::size_t index = 0;
    for (;;) {
        if (index == sieve.primes().size()) {
            if (sieve.limit() >= trial_division_limit)
                throw std::domain_error(
                    "couplet::exact::number::sqrt_of: cannot certify the square-free part of an "
                    "integer with a cofactor above 2^60 free of primes below 2^20");
            sieve.ensure(2 * sieve.limit());
        }
        const std::uint32_t p = sieve.primes()[index++];
        const cln::cl_I pp(static_cast<unsigned long>(p));
        if (pp * pp * pp > m) break;
        int e = 0;
        for (;;) {
            cln::cl_I_div_t qr = cln::truncate2(m, pp);
            if (!cln::zerop(qr.remainder)) break;
            m = qr.quotient;
            ++e;
        }
        if (e == 0) continue;
        if (e >= 2) square = square * cln::expt_pos(pp, static_cast<unsigned long>(e / 2));  // expt_pos needs e/2 >= 1
        if (e & 1) squarefree = squarefree * pp;
    }
    cln::cl_I root;
    if (cln::sqrtp(m, &root))
        square = square * root;
    else
        squarefree = squarefree * m;
}

}  // namespace

number number::sqrt_of(const cln::cl_RA& x) {
    if (cln::minusp(x)) throw std::domain_error("couplet::exact::number::sqrt_of: negative argument");
    if (cln::zerop(x)) return number();
    // sqrt(n/d) = sqrt(n d) / d
    const cln::cl_I n = cln::numerator(x), d = cln::denominator(x);
    cln::cl_I square, squarefree;
    split_square(n * d, square, squarefree);
    return from_squarefree_term(square / d, squarefree);
}

}  // namespace couplet::exact
