#include "rules/engine.hpp"
#include "rules/engine_class.hpp"

#include <cln/rational.h>

#include <algorithm>
#include <map>
#include <set>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "limits/run_limits.hpp"
#include "model/fresh_index.hpp"
#include "model/normalize.hpp"
#include "model/readable_order.hpp"
#include "model/result_shape.hpp"
#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "rules/matcher.hpp"
#include "rules/rewrites.hpp"
#include "rules/roots.hpp"
#include "rules/structure.hpp"

namespace couplet::rules {

using namespace GiNaC;

ex product_of(const std::vector<ex>& factors) {
    ex out = 1;
    for (const ex& f : factors) out *= f;
    return out;
}

ex without_polynomial_factors(const ex& term) {
    ex out = 1;
    for (const ex& f : factors_of(term))
        if (!is_polynomial(f)) out *= f;  // roots stay with the structure: factor() cannot see through them
    return out;
}

ex regroup(const ex& body) {
    if (!is_a<add>(body)) return body;
    std::vector<std::pair<ex, ex>> groups;  // structure, coefficient
    for (const ex& term : body) {
        ex coefficient = 1, structure = 1;
        for (const ex& f : factors_of(term)) (is_polynomial(f) ? coefficient : structure) *= f;
        auto it =
            std::find_if(groups.begin(), groups.end(), [&](const auto& g) { return g.first.is_equal(structure); });
        if (it == groups.end())
            groups.emplace_back(structure, coefficient);
        else
            it->second += coefficient;
    }
    ex out = 0;
    for (const auto& [structure, coefficient] : groups) out += factor(coefficient.expand()) * structure;
    return out;
}

ex engine::run(const ex& e) {
    // Roots split before every step: a rule's result or a substitution can leave
    // sqrt((2p+1)(2p+1)) or sqrt(2y+1)^2 behind.
    ex x = split_roots(e, numbers_);
    for (int step = 0; step < step_limit; ++step) {
        check_deadline();
        std::optional<ex> next = step_on_sum(x);
        if (!next) break;
        x = split_roots(*next, numbers_);
    }
    return x;
}

std::optional<ex> engine::step_on_sum(const ex& e) {
    std::vector<ex> terms;
    if (is_a<add>(e))
        for (const ex& t : e) terms.push_back(t);
    else
        terms.push_back(e);
    if (auto merged = merge_sums(terms)) return merged;
    for (size_t k = 0; k < terms.size(); ++k) {
        if (auto t = step_on_term(terms[k])) {
            terms[k] = *t;
            ex out = 0;
            for (const ex& u : terms) out += u;
            return out;
        }
    }
    return std::nullopt;
}

std::optional<ex> engine::step_on_term(const ex& term) {
    if (auto t = vanishing_by_parity(term)) return t;
    if (auto t = local_rewrite(term)) return t;
    if (auto t = eliminate_delta(term)) return t;
    std::vector<ex> factors = factors_of(term);
    for (size_t k = 0; k < factors.size(); ++k) {
        if (!is_a<index_sum>(factors[k])) continue;
        if (auto t = sum_rewrite(term, factors, k)) return t;
    }
    return std::nullopt;
}

jsum_result reduce_jsums(const ex& e, const quantum_numbers& numbers) {
    engine en(numbers);
    ex x = en.run(e);
    if (!en.trace.empty()) {
        // The rules leave their results in whatever arrangement the pattern had; bring them
        // into the printed form the other stages use.
        // No expand: it would multiply out the (2a+1)(2b+1) the rules produce.
        x = symmetry::canonicalize_symbols(x, numbers);
        x = merge_phases(x);
        x = reduce_phases(x, numbers);
        x = merge_phases(x);
    }
    return {join_roots(x), std::move(en.trace)};
}

}  // namespace couplet::rules
