// Racah's C^(k)_q = sqrt(4 pi / (2k+1)) Y_kq, built in through its reduced element, against the
// integral that defines its matrix elements between orbital states,
//   <l m | C^(k)_q | l' m'> = integral over the sphere of conj(Y_lm) C^(k)_q Y_l'm' dOmega,
// computed by quadrature: Gauss-Legendre in cos(theta) (GSL 2.7 gsl_integration_glfixed) and
// uniform in phi, with the spherical harmonics of GSL 2.7 gsl_sf_legendre_sphPlm, which
// carry the Condon-Shortley phase (-1)^m for m >= 0, and Y_l,-m = (-1)^m conj(Y_lm) (common
// practice, no source).  The Gaunt integral of three harmonics is the same integral.
#include <catch2/catch.hpp>

#include <gsl/gsl_integration.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_sf_legendre.h>

#include <complex>
#include <cstdlib>
#include <string>

#include "couplet/couplet.hpp"
#include "tensor/element_checks.hpp"

namespace {

using complex = std::complex<double>;

complex spherical_harmonic(int l, int m, double x, double phi) {
    const double theta_part = gsl_sf_legendre_sphPlm(l, std::abs(m), x);
    const complex e = std::polar(1.0, m * phi);
    return m >= 0 ? theta_part * e : ((std::abs(m) % 2) ? -1.0 : 1.0) * theta_part * e;
}

// integral of conj(Y_lm) sqrt(4 pi/(2k+1)) Y_kq Y_l'm' over the sphere.
double harmonic_integral(int l, int m, int k, int q, int lp, int mp) {
    static gsl_integration_glfixed_table* nodes = gsl_integration_glfixed_table_alloc(24);
    constexpr int phi_points = 32;  // exact for e^(i n phi) with |n| < 32
    complex total = 0;
    for (size_t i = 0; i < nodes->n; ++i) {
        double x = 0, w = 0;
        gsl_integration_glfixed_point(-1, 1, i, &x, &w, nodes);
        for (int p = 0; p < phi_points; ++p) {
            const double phi = 2 * M_PI * p / phi_points;
            total += w * (2 * M_PI / phi_points) * std::conj(spherical_harmonic(l, m, x, phi)) *
                     spherical_harmonic(k, q, x, phi) * spherical_harmonic(lp, mp, x, phi);
        }
    }
    CHECK(std::abs(total.imag()) < 1e-12);
    return std::sqrt(4 * M_PI / (2 * k + 1)) * total.real();
}

}  // namespace

TEST_CASE("C^(k)_q between orbital states is the integral of three spherical harmonics",
          "[tensor][racah-harmonic][gsl]") {
    int compared = 0, nonzero = 0;
    for (int l = 0; l <= 3; ++l)
        for (int k = 0; k <= 3; ++k)
            for (int lp = 0; lp <= 3; ++lp)
                for (int m = -l; m <= l; ++m)
                    for (int mp = -lp; mp <= lp; ++mp) {
                        const int q = m - mp;
                        if (std::abs(q) > k) continue;
                        const std::string element = "<" + std::to_string(l) + " " + std::to_string(m) + " | C^(" +
                                                    std::to_string(k) + ")_(" + std::to_string(q) + ") | " +
                                                    std::to_string(lp) + " " + std::to_string(mp) + ">";
                        const couplet::result r = couplet::eval(element);
                        REQUIRE(r.value);
                        const double expected = harmonic_integral(l, m, k, q, lp, mp);
                        INFO(element << " = " << r.value->exact << ", quadrature " << expected);
                        CHECK(std::stod(r.value->decimal) == Approx(expected).margin(1e-12));
                        ++compared;
                        nonzero += std::abs(expected) > 1e-9;
                    }
    CHECK(compared > 300);
    CHECK(nonzero > 100);
}

TEST_CASE("the electrostatic angular factor of two electrons", "[tensor][racah-harmonic][cli]") {
    // Edmonds (1957) eq. 7.1.6 with C^(k) for T and U (the Slater form of the angular factor):
    //   <(l1 l2) L M | C^(k)(1) . C^(k)(2) | (l1' l2') L' M'> = delta(L, L') delta(M, M')
    //     (-1)^(l1'+l2+L) {L l2 l1; k l1' l2'} <l1 || C^(k) || l1'> <l2 || C^(k) || l2'>,
    // and <l || C^(k) || l'> = (-1)^l sqrt((2l+1)(2l'+1)) 3j(l, k, l'; 0, 0, 0) (from memory; the
    // case above checks it by quadrature).
    auto reduced = [](const std::string& l, const std::string& lp) {
        return "(-1)^" + l + " * sqrt((2*" + l + "+1)*(2*" + lp + "+1)) * 3j(" + l + ", k, " + lp + "; 0, 0, 0)";
    };
    CHECK(
        couplet::testing::check_equal("<(l1, l2) L M | C^(k)(1) . C^(k)(2) | (l1', l2') L' M'>",
                                      "delta(L, L') * delta(M, M') * (-1)^(l1'+l2+L) * 6j{L, l2, l1; k, l1', l2'} * " +
                                          reduced("l1", "l1'") + " * " + reduced("l2", "l2'")) == 0);
    // The one number every spectroscopist knows (from memory): F2's coefficient in the p^2 3P
    // term is -5/25 = -1/5 of F^2, i.e. <(1 1) 1 M | C^(2)(1) . C^(2)(2) | (1 1) 1 M> = -1/5.
    const couplet::result r =
        couplet::eval("<(l1, l2) L M | C^(2)(1) . C^(2)(2) | (l1, l2) L M> at l1=1, l2=1, L=1, M=0");
    REQUIRE(r.value);
    CHECK(r.value->exact == "-1/5");
}

TEST_CASE("C is a harmonic of integer rank", "[tensor][racah-harmonic][cli]") {
    CHECK_THAT(couplet::testing::simplify_error("<l || C^(1/2) || l>"),
               Catch::Contains("1:10") && Catch::Contains("integer rank"));
}
