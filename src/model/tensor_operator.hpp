// Tensor operators named by the user: the reduced matrix element <a || T^(k) || b> as a factor
// the simplifier carries unchanged, and the matrix element <j m | T^(k)_q | j' m'> held whole
// until the Wigner-Eckart theorem replaces it (Edmonds 1957, eq. 5.4.1, as in DESIGN):
//   <j m | T^(k)_q | j' m'> = (-1)^(j-m) 3j(j, k, j'; -m, q, m') <j || T^(k) || j'>.
// A reduced element is not an angular momentum: nothing about it is known but its arguments,
// so the exact evaluator gives each distinct one a fixed pseudo-random rational value, and a
// derived formula is checked at sampled points like any other.
#pragma once

#include <ginac/ginac.h>

#include <string>

namespace couplet {

// The name of an operator inside an expression.  Not a symbol: no stage takes it for a
// quantum number, samples it or substitutes into it.
class operator_name : public GiNaC::basic {
    GINAC_DECLARE_REGISTERED_CLASS(operator_name, GiNaC::basic)
public:
    explicit operator_name(const std::string& name);
    const std::string& name() const { return name_; }

protected:
    void do_print(const GiNaC::print_context& c, unsigned level) const;

private:
    std::string name_;
};

// reduced_element(T, k, a, b) = <a || T^(k) || b>.
DECLARE_FUNCTION_4P(reduced_element)
// matrix_element(T, k, q, j, m, j', m') = <j m | T^(k)_q | j' m'>.
DECLARE_FUNCTION_7P(matrix_element)

// The operators couplet knows by their definitions, whose reduced elements are closed forms:
// - J^(1), the angular momentum of the part it acts on, whose spherical components
//   J_{+1} = -J+/sqrt(2), J_0 = J_z, J_{-1} = J-/sqrt(2) act by the Condon-Shortley ladder
//   coefficients: <j || J^(1) || j'> = delta(j, j') sqrt(j (j+1) (2j+1))   (Edmonds 1957, eq. 5.4.3);
// - C^(k), Racah's normalized spherical harmonic C^(k)_q = sqrt(4 pi / (2k+1)) Y_kq of the
//   orbit (Condon-Shortley phase), k an integer:
//   <l || C^(k) || l'> = (-1)^l sqrt((2l+1)(2l'+1)) 3j(l, k, l'; 0, 0, 0)   (Edmonds 1957, sec. 5.4, from memory;
//   tests/tensor/test_racah_harmonic.cpp checks it by quadrature over the sphere).
bool is_angular_momentum(const std::string& op);
bool is_racah_harmonic(const std::string& op);

// <a || T^(k) || b>, held; for J^(1) and C^(k) their values above.
GiNaC::ex make_reduced_element(const std::string& op, const GiNaC::ex& rank, const GiNaC::ex& bra,
                               const GiNaC::ex& ket);
GiNaC::ex make_matrix_element(const std::string& op, const GiNaC::ex& rank, const GiNaC::ex& component,
                              const GiNaC::ex& j, const GiNaC::ex& m, const GiNaC::ex& j_ket, const GiNaC::ex& m_ket);
bool is_reduced_element(const GiNaC::ex& e);
bool is_matrix_element(const GiNaC::ex& e);
// The operator's name of either.
const std::string& operator_of(const GiNaC::ex& element);

// A matrix element by the Wigner-Eckart theorem above.
GiNaC::ex wigner_eckart_form(const GiNaC::ex& matrix_element);

// The value the evaluator gives <a || T^(k) || b> at doubled arguments: a nonzero rational
// p/q with |p| <= 97 and q <= 16 fixed by the name and the three numbers (FNV-1a), the same in
// every run and on every machine.
GiNaC::numeric reduced_element_value(const std::string& op, long twice_rank, long twice_bra, long twice_ket);

}  // namespace couplet
