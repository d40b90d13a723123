#include "tensor/wigner_eckart_stage.hpp"

#include "model/coupled_element.hpp"
#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "model/tensor_operator.hpp"

namespace couplet::tensor {

using namespace GiNaC;

const identity& wigner_eckart_identity() {
    static const identity id =
        make_identity("Wigner-Eckart theorem", "Edmonds (1957) eq. 5.4.1", [](pattern_table& p, ex& left, ex& right) {
            auto [j, jp] = p.angulars({"j", "jp"});
            const symbol m = p.projection("m", j), mp = p.projection("mp", jp);
            left = kdelta(j, jp).hold() * kdelta(m, mp).hold() * projection_of(j, m).hold();
            right = make_phase(j - m) * wigner3j(j, 0, jp, -m, 0, mp) * kdelta(j, jp).hold() * sqrt(2 * j + 1);
        });
    return id;
}

// The definition, not a rule: recorded as a step so that a derivation starts where a textbook's does.
ex expand_coupled_states(const ex& e, std::vector<derivation_step>* steps) {
    return rewritten(e, [&](const ex& part) -> std::optional<ex> {
        if (!is_coupled_element(part) && !is_coupled_reduced_element(part)) return std::nullopt;
        const ex after = expansion_of(part);
        if (steps)
            steps->push_back({"coupled states by their Clebsch-Gordan coefficients",
                              "definition, Condon-Shortley, left part first", part, after});
        return after;
    });
}

ex apply_wigner_eckart(const ex& input, std::vector<derivation_step>* steps) {
    const ex e = expand_coupled_states(input, steps);
    return rewritten(e, [&](const ex& part) -> std::optional<ex> {
        if (!is_matrix_element(part)) return std::nullopt;
        const ex after = wigner_eckart_form(part);
        if (steps) steps->push_back(step_by(wigner_eckart_identity(), part, after));
        return after;
    });
}

}  // namespace couplet::tensor
