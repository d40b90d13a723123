#include "simplify/simplify.hpp"

#include <tuple>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "coupling/recoupling_stage.hpp"
#include "limits/run_limits.hpp"
#include "model/normalize.hpp"
#include "model/result_shape.hpp"
#include "model/symbols.hpp"
#include "network/completeness.hpp"
#include "network/reduce.hpp"
#include "rules/engine.hpp"
#include "simplify/closed_form.hpp"
#include "simplify/frozen_weights.hpp"
#include "simplify/nest_sums.hpp"
#include "simplify/projection_owners.hpp"
#include "simplify/stage_identities.hpp"
#include "tensor/wigner_eckart_stage.hpp"

namespace couplet {

using GiNaC::ex;
using GiNaC::is_a;

namespace {

void record_network_steps(const std::vector<network::reduction_step>& moves, std::vector<simplification_step>& steps) {
    for (const auto& m : moves) steps.push_back({m.rule, m.reference, thaw_weights(m.before), thaw_weights(m.after)});
}

// An answer is never worse than the input's own form: not more sums; with as many sums, not
// more coupling symbols; with as many of both, not more terms.  (A reduction may trade m-sums for
// 6j symbols, as the interchange move does; it may not come back longer than it went in.)
bool never_worse(const ex& answer, const ex& input) {
    const result_shape a = shape_of(answer), i = shape_of(input);
    return std::make_tuple(a.indices, a.symbols(), term_count(answer)) <=
           std::make_tuple(i.indices, i.symbols(), term_count(input));
}

// The canonical form (canonical_form) of an input whose symbols are already arranged.
ex canonical_form_of_arranged(const ex& arranged, const quantum_numbers& numbers) {
    ex x = merge_phases(arranged);
    try {
        x = reduce_phases(x, numbers);
    } catch (const phase_not_integer&) {
        // Left as written: whether such a phase is acceptable is for the pipeline to say.
    }
    return closed_form(merge_phases(x));
}

}  // namespace

ex canonical_form(const ex& e, const quantum_numbers& numbers) {
    return canonical_form_of_arranged(symmetry::canonicalize_symbols(normalize(e), numbers), numbers);
}

GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers) {
    return simplify_with_steps(e, numbers).answer;
}

// Each stage keeps the value at every admissible assignment; the order matters only in that
// phases are reduced after the symmetries have produced theirs.
simplification simplify_with_steps(const GiNaC::ex& e, const quantum_numbers& numbers) {
    std::vector<simplification_step> steps_taken;
    GiNaC::ex x =
        normalize(coupling::reduce_recouplings(tensor::apply_wigner_eckart(e, &steps_taken), numbers, &steps_taken));
    const bool recoupled = !steps_taken.empty();
    const ex recoupling_formula = x;
    const bool has_clebsch =
        x.has(clebsch(GiNaC::wild(0), GiNaC::wild(1), GiNaC::wild(2), GiNaC::wild(3), GiNaC::wild(4), GiNaC::wild(5)));
    const ex written = x;
    x = symmetry::canonicalize_symbols(x, numbers);
    const ex arranged = x;
    if (has_clebsch) steps_taken.push_back(step_by(clebsch_as_threej_identity(), written, merge_phases(x)));
    std::vector<network::reduction_step> completeness;
    x = network::reduce_completeness(x, numbers, &completeness);
    record_network_steps(completeness, steps_taken);
    x = nest_projection_sums(x, numbers);
    check_expansion(x);
    x = merge_phases(freeze_weights(x, numbers).expand());
    check_deadline();
    std::vector<network::reduction_step> moves;
    x = thaw_weights(network::reduce_msums(x, numbers, &moves));
    record_network_steps(moves, steps_taken);
    check_deadline();
    const ex unreduced = merge_phases(x);
    x = merge_phases(reduce_phases(x, numbers));
    if (!x.is_equal(unreduced)) steps_taken.push_back(step_by(phase_reduction_identity(), unreduced, x, true));
    check_deadline();
    rules::jsum_result jsums = rules::reduce_jsums(x, numbers);
    x = jsums.value;
    steps_taken.insert(steps_taken.end(), jsums.trace.begin(), jsums.trace.end());
    x = merge_phases(x);
    // The owners of projections in phases are part of the closed form: without them the answer
    // cannot be read back (projection_owners.hpp).  Owners as this input pairs them, so that
    // proj(j, m) is 1 wherever the input is defined.
    const ex collected = closed_form(x);
    if (!collected.is_equal(x)) steps_taken.push_back(step_by(closed_form_identity(), x, collected, true));
    const ex closed = with_projection_owners(collected, numbers.for_statement(e));
    if (!closed.is_equal(collected))
        steps_taken.push_back(step_by(projection_range_identity(), collected, closed, true));
    x = closed;
    // Counted on the input as canonicalized at the start (its phases do not change the counts);
    // the full canonical form, phases reduced, only when it is the answer.
    if (!never_worse(x, closed_form(merge_phases(arranged)))) {
        const ex input = canonical_form_of_arranged(arranged, numbers);
        steps_taken.push_back(step_by(input_form_identity(), x, input));
        x = input;
    }
    // A 6j or 9j that a recoupling formula made reads as the textbook lays it out (rows the
    // bra's couplings, as in Edmonds 6.4.2), not in the canonical arrangement.
    if (recoupled) {
        const ex laid_out = merge_phases(in_written_arrangement(x, recoupling_formula));
        if (!laid_out.is_equal(x)) x = merge_phases(reduce_phases(laid_out, numbers));
    }
    return {x, std::move(steps_taken)};
}

}  // namespace couplet
