#include "model/coupled_element.hpp"

#include <vector>

#include "model/composite_operator.hpp"
#include "model/symbols.hpp"
#include "model/tensor_operator.hpp"

namespace couplet {

using namespace GiNaC;

REGISTER_FUNCTION(coupled_element, dummy())
REGISTER_FUNCTION(coupled_reduced_element, dummy())

bool is_coupled_element(const ex& e) {
    return is_a<function>(e) && ex_to<function>(e).get_serial() == coupled_element_SERIAL::serial;
}

bool is_coupled_reduced_element(const ex& e) {
    return is_a<function>(e) && ex_to<function>(e).get_serial() == coupled_reduced_element_SERIAL::serial;
}

ex expansion_of(const ex& coupled) { return coupled.op(coupled.nops() - 1); }

bool same_shape(const coupling_tree& a, const coupling_tree& b) {
    if (a.is_leaf() || b.is_leaf()) return a.is_leaf() && b.is_leaf();
    return same_shape(a.parts[0], b.parts[0]) && same_shape(a.parts[1], b.parts[1]);
}

namespace {

void relabel(coupling_tree& t, const exmap& to_bra) {
    t.label = t.label.subs(to_bra);
    for (coupling_tree& part : t.parts) relabel(part, to_bra);
}

struct expanded {
    ex body;
    lst summed;
    ex ket_total;  // the ket's J as the expansion has it
};

// The identity on a part that no operator acts on is delta(j, j') delta(m, m'): the ket takes
// the bra's j and m there, and delta(j, j') stays, so that each projection runs over one
// angular momentum's range.
expanded expand(const ex& op, const ex& component, coupling_tree bra, const ex& m_bra, coupling_tree ket,
                const ex& m_ket, const projection_source& projection_for, const angular_source& angular_for) {
    expanded out;
    const component_expansion c =
        expand_component(op, component, [&](const ex& rank) { return projection_for(rank, false); });
    out.summed = c.summed;
    auto acted = [&](std::size_t part) {
        std::vector<const named_component*> on;
        for (const named_component& f : c.factors)
            if (f.part == part) on.push_back(&f);
        return on;
    };
    const std::vector<coupling_tree*> bra_leaves = leaves_to_fill(bra), ket_leaves = leaves_to_fill(ket);
    exmap to_bra;
    ex deltas = 1;
    for (std::size_t i = 0; i < bra_leaves.size(); ++i) {
        if (!acted(i + 1).empty() || bra_leaves[i]->label.is_equal(ket_leaves[i]->label)) continue;
        deltas *= kdelta(bra_leaves[i]->label, ket_leaves[i]->label);
        to_bra[ket_leaves[i]->label] = bra_leaves[i]->label;
    }
    relabel(ket, to_bra);
    ex elements = c.coefficient;
    for (std::size_t i = 0; i < bra_leaves.size(); ++i) {
        coupling_tree &b = *bra_leaves[i], &k = *ket_leaves[i];
        b.projection = projection_for(b.label, false);
        out.summed.append(b.projection);
        const std::vector<const named_component*> on = acted(i + 1);
        if (on.empty()) {
            k.projection = b.projection;
            continue;
        }
        k.projection = projection_for(k.label, true);
        out.summed.append(k.projection);
        // Leftmost operator next to the bra; between two, the closure sum over j'' m''.
        ex j = b.label, m = b.projection;
        for (std::size_t f = 0; f < on.size(); ++f) {
            ex j_next = k.label, m_next = k.projection;
            if (f + 1 < on.size()) {
                j_next = angular_for(b.label);
                m_next = projection_for(j_next, true);
                out.summed.append(j_next).append(m_next);
            }
            elements *= make_matrix_element(on[f]->op, on[f]->rank, on[f]->component, j, m, j_next, m_next);
            j = j_next;
            m = m_next;
        }
    }
    name_inner_projections(bra, false, projection_for, out.summed);
    name_inner_projections(ket, true, projection_for, out.summed);
    bra.projection = m_bra;
    ket.projection = m_ket;
    out.body = coupling_coefficients(bra) * coupling_coefficients(ket) * elements * deltas;
    out.ket_total = ket.label;
    return out;
}

}  // namespace

ex make_coupled_element(const ex& op, const ex& component, const coupling_tree& bra, const ex& m_bra,
                        const coupling_tree& ket, const ex& m_ket, const projection_source& projection_for,
                        const angular_source& angular_for) {
    const expanded e = expand(op, component, bra, m_bra, ket, m_ket, projection_for, angular_for);
    return coupled_element(op, component, as_held_tree(bra), m_bra, as_held_tree(ket), m_ket,
                           make_sum(e.body, e.summed))
        .hold();
}

ex make_coupled_reduced_element(const ex& op, const coupling_tree& bra, const coupling_tree& ket,
                                const projection_source& projection_for, const angular_source& angular_for) {
    const ex m_bra = projection_for(bra.label, false), m_ket = projection_for(ket.label, true), rank = rank_of(op);
    // A scalar's one component is 0, not a projection of a symbol.
    const ex component = rank.is_zero() ? ex(0) : projection_for(rank, false);
    expanded e = expand(op, component, bra, m_bra, ket, m_ket, projection_for, angular_for);
    e.summed.append(m_bra);
    if (!rank.is_zero()) e.summed.append(component);
    e.summed.append(m_ket);
    const ex body =
        make_phase(bra.label - m_bra) * wigner3j(bra.label, rank, e.ket_total, -m_bra, component, m_ket) * e.body;
    return coupled_reduced_element(op, as_held_tree(bra), as_held_tree(ket), make_sum(body, e.summed)).hold();
}

}  // namespace couplet
