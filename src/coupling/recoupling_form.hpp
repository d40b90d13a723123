// A recoupling coefficient <T1; J | T2; J> in closed form: the cheapest path of elementary
// recouplings (recoupling_path.hpp) carried out on the ordered trees, each step's 6j or 9j with
// its phase and (2j+1) factors, each exchange of a coupling's two parts with its phase, sums
// over the couplings that the path introduces and removes again, a delta where T1 and T2 give
// one coupling two names, and the triangle of every coupling that no symbol of the answer
// carries (the definition vanishes outside it).
#pragma once

#include <ginac/ginac.h>

#include "coupling/recoupling_path.hpp"
#include "model/coupling_tree.hpp"
#include "model/quantum.hpp"

namespace couplet::coupling {

struct recoupling_form {
    GiNaC::ex value;
    recoupling_cost cost;
    bool cheapest = true;  // the path search ran to the end (recoupling_path.hpp)
};

recoupling_form closed_recoupling(const coupling_tree& bra, const coupling_tree& ket, const quantum_numbers& numbers,
                                  const GiNaC::ex& context, const search_options& options = {});

// The shape of a side (its couplings as leaf sets), the leaves numbered by `leaf_order`, the
// left-to-right leaves of the bra.
tree_shape shape_of(const coupling_tree& side, const std::vector<GiNaC::ex>& leaf_order);

}  // namespace couplet::coupling
