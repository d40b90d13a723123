#include "model/coupled_element.hpp"

#include <vector>

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

// The identity on a part that the operator does not act on is delta(j, j') delta(m, m'): the
// ket takes the bra's j and m there, and delta(j, j') stays, so that each projection runs over
// one angular momentum's range.
expanded expand(const acted_on& t, const ex& component, coupling_tree bra, const ex& m_bra, coupling_tree ket,
                const ex& m_ket, const projection_source& projection_for) {
    expanded out;
    const std::vector<coupling_tree*> bra_leaves = leaves_to_fill(bra), ket_leaves = leaves_to_fill(ket);
    exmap to_bra;
    ex deltas = 1;
    for (std::size_t i = 0; i < bra_leaves.size(); ++i) {
        if (i + 1 == t.part || bra_leaves[i]->label.is_equal(ket_leaves[i]->label)) continue;
        deltas *= kdelta(bra_leaves[i]->label, ket_leaves[i]->label);
        to_bra[ket_leaves[i]->label] = bra_leaves[i]->label;
    }
    relabel(ket, to_bra);
    ex acted = 1;
    for (std::size_t i = 0; i < bra_leaves.size(); ++i) {
        coupling_tree &b = *bra_leaves[i], &k = *ket_leaves[i];
        b.projection = projection_for(b.label, false);
        out.summed.append(b.projection);
        if (i + 1 != t.part) {
            k.projection = b.projection;
            continue;
        }
        k.projection = projection_for(k.label, true);
        out.summed.append(k.projection);
        acted = make_matrix_element(t.op, t.rank, component, b.label, b.projection, k.label, k.projection);
    }
    name_inner_projections(bra, false, projection_for, out.summed);
    name_inner_projections(ket, true, projection_for, out.summed);
    bra.projection = m_bra;
    ket.projection = m_ket;
    out.body = coupling_coefficients(bra) * coupling_coefficients(ket) * acted * deltas;
    out.ket_total = ket.label;
    return out;
}

}  // namespace

ex make_coupled_element(const acted_on& t, const ex& component, const coupling_tree& bra, const ex& m_bra,
                        const coupling_tree& ket, const ex& m_ket, const projection_source& projection_for) {
    const expanded e = expand(t, component, bra, m_bra, ket, m_ket, projection_for);
    return coupled_element(operator_name(t.op), t.rank, component, numeric(static_cast<long>(t.part)),
                           as_held_tree(bra), m_bra, as_held_tree(ket), m_ket, make_sum(e.body, e.summed))
        .hold();
}

ex make_coupled_reduced_element(const acted_on& t, const coupling_tree& bra, const coupling_tree& ket,
                                const projection_source& projection_for) {
    const ex m_bra = projection_for(bra.label, false), m_ket = projection_for(ket.label, true),
             component = projection_for(t.rank, false);
    expanded e = expand(t, component, bra, m_bra, ket, m_ket, projection_for);
    e.summed.append(m_bra).append(component).append(m_ket);
    const ex body =
        make_phase(bra.label - m_bra) * wigner3j(bra.label, t.rank, e.ket_total, -m_bra, component, m_ket) * e.body;
    return coupled_reduced_element(operator_name(t.op), t.rank, numeric(static_cast<long>(t.part)), as_held_tree(bra),
                                   as_held_tree(ket), make_sum(body, e.summed))
        .hold();
}

}  // namespace couplet
