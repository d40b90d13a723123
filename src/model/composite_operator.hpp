// The operator of a matrix element between coupled states, as the states see it: a named
// operator acting on one part, T^(k)(p); the tensor product of two operators coupled to rank k,
// [A x B]^(k); or the scalar product of two of equal rank, A . B.  Each is held as an
// expression for printing, and its components are written through the components of the named
// operators (Edmonds 1957, sec. 5.1):
//   [A x B]^(k)_q = sum_{q1, q2} <kA q1, kB q2 | k q> A_q1 B_q2,
//   A . B         = sum_q (-1)^q A_q B_-q.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <functional>
#include <string>
#include <vector>

namespace couplet {

// acting_on(T, k, part): operator_name T of rank k on the part-th leaf, counted from 1.
DECLARE_FUNCTION_3P(acting_on)
// tensor_product(A, B, k) and scalar_product(A, B) of operator expressions.
DECLARE_FUNCTION_3P(tensor_product)
DECLARE_FUNCTION_2P(scalar_product)

GiNaC::ex make_acting_on(const std::string& op, const GiNaC::ex& rank, std::size_t part);
GiNaC::ex make_tensor_product(const GiNaC::ex& a, const GiNaC::ex& b, const GiNaC::ex& rank);
GiNaC::ex make_scalar_product(const GiNaC::ex& a, const GiNaC::ex& b);
bool is_acting_on(const GiNaC::ex& e);
bool is_tensor_product(const GiNaC::ex& e);
bool is_scalar_product(const GiNaC::ex& e);

GiNaC::ex rank_of(const GiNaC::ex& op);
std::size_t part_of(const GiNaC::ex& acting);
const std::string& name_of(const GiNaC::ex& acting);

// One named operator's component inside an expanded product.
struct named_component {
    std::string op;
    GiNaC::ex rank, component;
    std::size_t part;
};

// The q-th component of an operator expression = coefficient * prod factors, summed over
// `summed` (the components of the inner operators, which new_component names from a rank).
struct component_expansion {
    GiNaC::ex coefficient = 1;
    std::vector<named_component> factors;
    GiNaC::lst summed;
};
component_expansion expand_component(const GiNaC::ex& op, const GiNaC::ex& component,
                                     const std::function<GiNaC::ex(const GiNaC::ex& rank)>& new_component);

}  // namespace couplet
