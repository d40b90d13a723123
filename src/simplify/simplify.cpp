#include "couplet/simplify.hpp"

#include "couplet/model/normalize.hpp"
#include "couplet/model/result_shape.hpp"
#include "couplet/network/completeness.hpp"
#include "couplet/network/reduce.hpp"
#include "couplet/run_limits.hpp"
#include "couplet/rules/engine.hpp"
#include "couplet/symmetry/symmetries.hpp"
#include "simplify/closed_form.hpp"
#include "simplify/frozen_weights.hpp"
#include "simplify/nest_sums.hpp"
#include "simplify/phase_reduction.hpp"

namespace couplet {

using GiNaC::ex;
using GiNaC::is_a;

namespace {
thread_local std::vector<simplification_step> steps_taken;

void record_network_steps(const std::vector<network::reduction_step>& moves, const frozen_weights& weights) {
    for (const auto& m : moves)
        steps_taken.push_back({m.move, m.reference, weights.thaw(m.before), weights.thaw(m.after)});
}
int term_count(const ex& e) { return is_a<GiNaC::add>(e) ? static_cast<int>(e.nops()) : 1; }

// An answer never has more terms, sums or coupling symbols than the input's own form.
bool never_worse(const ex& answer, const ex& input) {
    const result_shape a = shape_of(answer), i = shape_of(input);
    return term_count(answer) <= term_count(input) && a.indices <= i.indices && a.symbols() <= i.symbols();
}

}  // namespace

ex canonical_form(const ex& e, const quantum_numbers& numbers) {
    ex x = merge_phases(symmetry::canonicalize_symbols(normalize(e), numbers));
    try {
        x = reduce_phases(x, numbers);
    } catch (const phase_not_integer&) {
        // Left as written: whether such a phase is acceptable is for the pipeline to say.
    }
    return closed_form(merge_phases(x));
}

const std::vector<simplification_step>& last_simplification_steps() { return steps_taken; }

// Each stage keeps the value at every admissible assignment; the order matters only in that
// phases are reduced after the symmetries have produced theirs.
GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers) {
    steps_taken.clear();
    GiNaC::ex x = normalize(e);
    x = symmetry::canonicalize_symbols(x, numbers);
    std::vector<network::reduction_step> completeness;
    x = network::reduce_completeness(x, numbers, &completeness);
    record_network_steps(completeness, frozen_weights());
    x = nest_projection_sums(x, numbers);
    check_expansion(x);
    frozen_weights weights;
    x = merge_phases(weights.freeze(x, numbers).expand());
    check_deadline();
    std::vector<network::reduction_step> moves;
    x = weights.thaw(network::reduce_msums(x, numbers, &moves));
    record_network_steps(moves, weights);
    check_deadline();
    x = reduce_phases(x, numbers);
    check_deadline();
    x = apply_jsum_rules(x, numbers);
    steps_taken.insert(steps_taken.end(), last_jsum_trace().begin(), last_jsum_trace().end());
    x = merge_phases(x);
    const ex closed = closed_form(x);
    if (!closed.is_equal(x))
        steps_taken.push_back({"closed form: like terms collected, implied triangle conditions dropped",
                               "common practice, no source", x, closed});
    x = closed;
    const ex input = canonical_form(e, numbers);
    if (!never_worse(x, input)) {
        steps_taken.push_back({"the input's own form kept", "no reduction with fewer terms, sums and symbols",
                               x, input});
        return input;
    }
    return x;
}

}  // namespace couplet
