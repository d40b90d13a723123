#include "simplify/projection_owners.hpp"

#include <algorithm>
#include <vector>

#include "model/structure.hpp"
#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

// m free (not bound by an enclosing sum over it) in the exponent of some phase of e.
bool in_some_phase(const ex& e, const symbol& m) {
    if (is_a<phase_factor>(e)) return ex_to<phase_factor>(e).exponent().has(m);
    if (is_a<index_sum>(e) && ex_to<index_sum>(e).indices().has(m)) return false;
    return std::any_of(e.begin(), e.end(), [&](const ex& child) { return in_some_phase(child, m); });
}

bool has_column(const std::vector<projection_column>& columns, const symbol& m) {
    return std::any_of(columns.begin(), columns.end(), [&](const projection_column& c) { return c.name.is_equal(m); });
}

ex with_owners_in_term(const ex& term, const quantum_numbers& numbers) {
    const std::vector<projection_column> columns = free_projection_columns(term);
    ex out = term;
    for (const quantum_number& q : numbers.all()) {
        if (q.role != qn_role::projection || !q.owner) continue;
        if (!in_some_phase(term, q.symbol) || has_column(columns, q.symbol)) continue;
        out *= projection_of(*q.owner, q.symbol);
    }
    return out;
}

}  // namespace

ex with_projection_owners(const ex& answer, const quantum_numbers& numbers) {
    if (!is_a<add>(answer)) return with_owners_in_term(answer, numbers);
    ex out = 0;
    for (const ex& term : answer) out += with_owners_in_term(term, numbers);
    return out;
}

}  // namespace couplet
