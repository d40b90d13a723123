#include "couplet/simplify.hpp"

#include "couplet/model/normalize.hpp"
#include "couplet/network/completeness.hpp"
#include "couplet/network/reduce.hpp"
#include "couplet/run_limits.hpp"
#include "couplet/rules/engine.hpp"
#include "couplet/symmetry/symmetries.hpp"
#include "simplify/nest_sums.hpp"
#include "simplify/phase_reduction.hpp"

namespace couplet {

namespace {
thread_local std::vector<simplification_step> steps_taken;

void record_network_steps(const std::vector<network::reduction_step>& moves) {
    for (const auto& m : moves) steps_taken.push_back({m.move, m.reference, m.before, m.after});
}
}  // namespace

const std::vector<simplification_step>& last_simplification_steps() { return steps_taken; }

// Each stage keeps the value at every admissible assignment; the order matters only in that
// phases are reduced after the symmetries have produced theirs.
GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers) {
    steps_taken.clear();
    GiNaC::ex x = normalize(e);
    x = symmetry::canonicalize_symbols(x, numbers);
    std::vector<network::reduction_step> completeness;
    x = network::reduce_completeness(x, numbers, &completeness);
    record_network_steps(completeness);
    x = nest_projection_sums(x, numbers);
    check_expansion(x);
    x = merge_phases(x.expand());
    check_deadline();
    std::vector<network::reduction_step> moves;
    x = network::reduce_msums(x, numbers, &moves);
    record_network_steps(moves);
    check_deadline();
    x = reduce_phases(x, numbers);
    check_deadline();
    x = apply_jsum_rules(x, numbers);
    steps_taken.insert(steps_taken.end(), last_jsum_trace().begin(), last_jsum_trace().end());
    return merge_phases(x);
}

}  // namespace couplet
