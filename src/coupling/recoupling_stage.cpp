#include "coupling/recoupling_stage.hpp"

#include "coupling/recoupling_form.hpp"
#include "coupling/rewrites.hpp"
#include "model/coupling_tree.hpp"
#include "model/rewrite.hpp"

namespace couplet::coupling {

using namespace GiNaC;

ex reduce_recouplings(const ex& e, const quantum_numbers& numbers, std::vector<derivation_step>* steps) {
    // Each new index is new to the input and to the forms before it.
    lst context{e};
    return rewritten(e, [&](const ex& part) -> std::optional<ex> {
        if (!is_recoupling(part)) return std::nullopt;
        const ex after =
            closed_recoupling(tree_from_held(part.op(0)), tree_from_held(part.op(1)), numbers, context).value;
        context.append(after);
        if (steps) steps->push_back(step_by(recoupling_by_trees_identity(), part, after));
        return after;
    });
}

}  // namespace couplet::coupling
