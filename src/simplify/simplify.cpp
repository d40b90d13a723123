#include "couplet/simplify.hpp"

#include "couplet/model/normalize.hpp"
#include "couplet/network/reduce.hpp"
#include "couplet/run_limits.hpp"
#include "couplet/rules/engine.hpp"
#include "couplet/symmetry/symmetries.hpp"
#include "simplify/phase_reduction.hpp"

namespace couplet {

// Each stage keeps the value at every admissible assignment; the order matters only in that
// phases are reduced after the symmetries have produced theirs.
GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers& numbers) {
    GiNaC::ex x = normalize(e);
    x = symmetry::canonicalize_symbols(x, numbers);
    check_expansion(x);
    x = merge_phases(x.expand());
    check_deadline();
    x = network::reduce_msums(x, numbers);
    check_deadline();
    x = reduce_phases(x, numbers);
    check_deadline();
    x = apply_jsum_rules(x, numbers);
    return merge_phases(x);
}

}  // namespace couplet
