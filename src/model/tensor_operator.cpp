#include "model/tensor_operator.hpp"

#include <cstdint>

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

GINAC_IMPLEMENT_REGISTERED_CLASS_OPT(operator_name, basic, print_func<print_context>(&operator_name::do_print))

operator_name::operator_name() {}
operator_name::operator_name(const std::string& name) : name_(name) {}

int operator_name::compare_same_type(const basic& other) const {
    const std::string& o = static_cast<const operator_name&>(other).name_;
    return name_ < o ? -1 : name_ > o ? 1 : 0;
}

void operator_name::do_print(const print_context& c, unsigned) const { c.s << name_; }

REGISTER_FUNCTION(reduced_element, dummy())
REGISTER_FUNCTION(matrix_element, dummy())

bool is_angular_momentum(const std::string& op) { return op == "J"; }
bool is_racah_harmonic(const std::string& op) { return op == "C"; }

ex make_reduced_element(const std::string& op, const ex& rank, const ex& bra, const ex& ket) {
    if (is_angular_momentum(op)) return kdelta(bra, ket) * sqrt(bra * (bra + 1) * (2 * bra + 1));
    if (is_racah_harmonic(op))
        return make_phase(bra) * sqrt((2 * bra + 1) * (2 * ket + 1)) * wigner3j(bra, rank, ket, 0, 0, 0);
    return reduced_element(operator_name(op), rank, bra, ket).hold();
}

ex make_matrix_element(const std::string& op, const ex& rank, const ex& component, const ex& j, const ex& m,
                       const ex& j_ket, const ex& m_ket) {
    return matrix_element(operator_name(op), rank, component, j, m, j_ket, m_ket).hold();
}

bool is_reduced_element(const ex& e) {
    return is_a<function>(e) && ex_to<function>(e).get_serial() == reduced_element_SERIAL::serial;
}

bool is_matrix_element(const ex& e) {
    return is_a<function>(e) && ex_to<function>(e).get_serial() == matrix_element_SERIAL::serial;
}

const std::string& operator_of(const ex& element) { return ex_to<operator_name>(element.op(0)).name(); }

ex wigner_eckart_form(const ex& e) {
    const ex &k = e.op(1), &q = e.op(2), &j = e.op(3), &m = e.op(4), &jp = e.op(5), &mp = e.op(6);
    return make_phase(j - m) * wigner3j(j, k, jp, -m, q, mp) * make_reduced_element(operator_of(e), k, j, jp);
}

numeric reduced_element_value(const std::string& op, long twice_rank, long twice_bra, long twice_ket) {
    std::uint64_t h = 1469598103934665603ULL;
    auto mix = [&](unsigned char byte) { h = (h ^ byte) * 1099511628211ULL; };
    for (char c : op) mix(static_cast<unsigned char>(c));
    for (long v : {twice_rank, twice_bra, twice_ket})
        for (int shift = 0; shift < 64; shift += 8)
            mix(static_cast<unsigned char>((static_cast<std::uint64_t>(v) >> shift) & 0xff));
    const long p = static_cast<long>(h % 97) + 1, q = static_cast<long>((h / 97) % 16) + 1;
    return numeric((h >> 40) & 1 ? -p : p, q);
}

}  // namespace couplet
