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

std::optional<ex> engine::merge_sums(const std::vector<ex>& terms) {
    struct group {
        lst indices;
        ex structure;  // of the first member's summand, to align the others' index names
        std::vector<size_t> members;
        ex body = 0;
        bool renamed = false;
    };
    std::vector<group> groups;
    for (size_t k = 0; k < terms.size(); ++k) {
        std::vector<ex> factors = factors_of(terms[k]);
        auto sums = std::count_if(factors.begin(), factors.end(), [](const ex& f) { return is_a<index_sum>(f); });
        if (sums != 1) continue;
        auto at = std::find_if(factors.begin(), factors.end(), [](const ex& f) { return is_a<index_sum>(f); });
        const auto& s = ex_to<index_sum>(*at);
        ex outside = 1;
        for (auto f = factors.begin(); f != factors.end(); ++f)
            if (f != at) outside *= *f;
        bool captures =
            std::any_of(s.indices().begin(), s.indices().end(), [&](const ex& i) { return outside.has(i); });
        if (captures) continue;
        bool joined = false;
        for (group& g : groups) {
            if (g.indices.nops() != s.indices().nops()) continue;
            auto body = renamed_into(terms[k], s, g.indices, g.structure);
            if (!body) continue;
            g.members.push_back(k);
            g.body += outside * *body;
            g.renamed = g.renamed || !s.indices().is_equal(g.indices);
            joined = true;
            break;
        }
        if (!joined) groups.push_back({s.indices(), summand_structure(s.body()), {k}, outside * s.body(), false});
    }
    for (const group& g : groups) {
        if (g.members.size() < 2) continue;
        ex merged = make_sum(g.body, g.indices);
        size_t before_merge = trace.size();
        auto rewritten = step_on_term(merged);
        if (!rewritten) continue;
        ex rest = 0, before = 0;
        for (size_t k = 0; k < terms.size(); ++k)
            (std::count(g.members.begin(), g.members.end(), k) ? before : rest) += terms[k];
        const identity& used = g.renamed ? sums_merged_renamed_identity() : sums_merged_identity();
        trace.insert(trace.begin() + static_cast<long>(before_merge), step_by(used, before, merged));
        return rest + *rewritten;
    }
    return std::nullopt;
}

ex engine::summand_structure(const ex& body) {
    const ex structure = without_polynomial_factors(body);
    const std::vector<ex> factors = factors_of(structure);
    if (std::none_of(factors.begin(), factors.end(), [](const ex& f) { return is_a<add>(f); })) return structure;
    return without_polynomial_factors(terms_of(structure.expand()).front());
}

std::optional<ex> engine::renamed_into(const ex& term, const index_sum& s, const lst& target, const ex& structure) {
    if (s.indices().is_equal(target)) return s.body();
    std::vector<ex> own(s.indices().begin(), s.indices().end());
    for (const ex& t : target)
        if (term.has(t) && std::none_of(own.begin(), own.end(), [&](const ex& i) { return i.is_equal(t); }))
            return std::nullopt;
    std::vector<size_t> order(own.size());
    for (size_t i = 0; i < order.size(); ++i) order[i] = i;
    do {
        exmap rename;
        for (size_t i = 0; i < order.size(); ++i) rename[own[order[i]]] = target.op(i);
        ex body = s.body().subs(rename);
        if (summand_structure(body).is_equal(structure)) return body;
    } while (std::next_permutation(order.begin(), order.end()));
    return std::nullopt;
}

}  // namespace couplet::rules
