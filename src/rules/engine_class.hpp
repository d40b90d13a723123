// The j-sum engine (engine.hpp) as a class, for the files that hold its parts: the loop and
// its termination (engine.cpp), merging sums that expansion spread apart (engine_merge.cpp),
// deltas and symbols that vanish (engine_deltas.cpp), and the sum rules with the 9j expansion
// (engine_sum_rules.cpp).
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <vector>

#include "model/identity.hpp"
#include "model/quantum.hpp"
#include "model/symbols.hpp"
#include "rules/rule.hpp"

namespace couplet::rules {

using GiNaC::ex;
using GiNaC::lst;
using GiNaC::symbol;

// A bound guard only: the termination argument in engine.hpp is what stops the loop.
constexpr int step_limit = 500;

ex product_of(const std::vector<ex>& factors);
ex without_polynomial_factors(const ex& term);
// An expanded summand such as S + 2x S back to (2x+1) S: like coupling structures collected,
// their polynomial coefficients factored, so that the weights (2x+1)^n are visible again.
ex regroup(const ex& body);

class engine {
public:
    explicit engine(const quantum_numbers& numbers) : numbers_(numbers) {}
    ex run(const ex& e);
    std::vector<rule_step> trace;

private:
    std::optional<ex> step_on_sum(const ex& e);

    // Expansion may have spread one summand over several sums (sum(x : S) + sum(x : 2x S)),

    // possibly under different index names (sum(x : S) + sum(y : 2y S)); together, with the

    // indices renamed to agree, they may be a rule's left side again.
    std::optional<ex> merge_sums(const std::vector<ex>& terms);

    // The coupling structure of a summand (its first term without the polynomial factors).

    // The polynomial factors are dropped before anything is expanded: expanding the whole

    // summand would multiply out its (2x+1) weights, 2^n copies of everything else, and descend

    // into every inner sum (minutes on the nested sums a 30-vertex network leaves).
    static ex summand_structure(const ex& body);

    // The summand of s with its indices renamed to `target`, in an order that captures no name

    // of `term` and gives the summand `structure` (only like structures can collect into a

    // rule's summand); under the same names as they are.
    static std::optional<ex> renamed_into(const ex& term, const index_sum& s, const lst& target, const ex& structure);
    void record(const identity& used, const ex& before, const ex& after) {
        trace.push_back(step_by(used, before, after));
    }
    std::optional<ex> step_on_term(const ex& term);

    // A symbol equal to minus itself by one of its symmetries, given the parities the term implies.
    std::optional<ex> vanishing_by_parity(const ex& term);
    std::optional<ex> local_rewrite(const ex& term);

    // delta(p, q) * f(p, q) -> delta(p, q) * f(p, p): the later name in the readable order goes;

    // delta(p, 0) * f(p) -> delta(p, 0) * f(0), and so for any value that does not hold p.

    // A delta taken twice is taken once: delta^n = delta for n >= 1.
    std::optional<ex> eliminate_delta(const ex& term);

    // Whether the sum over x covers every value the x-triads allow: when x is declared integer

    // or half-odd, the triads alone must already force that parity.
    bool index_range_is_full(const ex& term, const symbol& x);
    std::optional<ex> sum_rewrite(const ex& term, const std::vector<ex>& factors, size_t at);

    // A 9j that involves the summation index y, expanded by DLMF 34.6.2 (in whichever of its 72

    // arrangements) only when a sum rule on y then fires: the expansion alone would undo the

    // recognition rule.  The pair lowers the number of 9j at an unchanged number of indices.

    // Different arrangements can let different rules fire (a 9j with repeated entries may admit

    // orthogonality over y in one and the Racah sum rule in another), and the locally larger

    // step can lead into a dead end; so every distinct outcome is reduced to the end on the side

    // and the one that ends lowest in the termination order is taken.  Each look-ahead runs on a

    // term already lower in that order than this one, so the look-aheads are well founded.
    std::optional<ex> expand_ninej_for(const ex& term, const std::vector<ex>& outside, const index_sum& s,
                                       const ex& body, const symbol& y);

    // Only the single-index sum rules on y, for the expansion probe.
    std::optional<ex> rule_on_index(const ex& term, const symbol& y);

    // sum(x : delta(x, T) f(x)) = f(T): x runs over the half-integers (of its declared parity)

    // that its factors allow, so T must be such a value at every assignment.
    std::optional<ex> collapse_delta(const ex& term, const symbol& x, const std::vector<ex>& with_x);
    const quantum_numbers& numbers_;
};

}  // namespace couplet::rules
