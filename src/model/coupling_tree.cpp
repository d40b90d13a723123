#include "model/coupling_tree.hpp"

#include <map>
#include <sstream>
#include <string>

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

std::string leaf_key(const ex& label) {
    std::ostringstream os;
    os << label;
    return os.str();
}

}  // namespace

ex coupling_coefficients(const coupling_tree& tree) {
    if (tree.is_leaf()) return 1;
    const coupling_tree &a = tree.parts[0], &b = tree.parts[1];
    return clebsch(a.label, a.projection, b.label, b.projection, tree.label, tree.projection) *
           coupling_coefficients(a) * coupling_coefficients(b);
}

namespace {}  // namespace

void name_inner_projections(coupling_tree& t, bool ket_side,
                            const std::function<ex(const ex& label, bool ket_side)>& projection_for, lst& summed) {
    for (coupling_tree& part : t.parts) {
        if (part.is_leaf()) continue;
        part.projection = projection_for(part.label, ket_side);
        summed.append(part.projection);
        name_inner_projections(part, ket_side, projection_for, summed);
    }
}

ex recoupling_definition(coupling_tree bra, coupling_tree ket,
                         const std::function<ex(const ex& label, bool ket_side)>& projection_for) {
    lst summed;
    std::map<std::string, ex> leaf_projection;
    for (const coupling_tree* leaf : leaves_of(bra)) {
        const ex m = projection_for(leaf->label, false);
        leaf_projection[leaf_key(leaf->label)] = m;
        summed.append(m);
    }
    for (coupling_tree* side : {&bra, &ket})
        for (coupling_tree* leaf : leaves_to_fill(*side)) leaf->projection = leaf_projection.at(leaf_key(leaf->label));
    name_inner_projections(bra, false, projection_for, summed);
    name_inner_projections(ket, true, projection_for, summed);
    const ex total = projection_for(bra.label, false);
    bra.projection = ket.projection = total;
    summed.append(total);
    const ex body = coupling_coefficients(bra) * coupling_coefficients(ket);
    return make_sum(body, summed) / (2 * bra.label + 1);
}

namespace {

template <typename Tree>
void collect_leaves(Tree& tree, std::vector<Tree*>& out) {
    if (tree.is_leaf()) {
        out.push_back(&tree);
        return;
    }
    for (Tree& part : tree.parts) collect_leaves(part, out);
}

}  // namespace

REGISTER_FUNCTION(recoupling, dummy())

bool is_recoupling(const ex& e) {
    return is_a<function>(e) && ex_to<function>(e).get_serial() == recoupling_SERIAL::serial;
}

ex as_held_tree(const coupling_tree& tree) {
    if (tree.is_leaf()) return tree.label;
    return lst{as_held_tree(tree.parts[0]), as_held_tree(tree.parts[1]), tree.label};
}

coupling_tree tree_from_held(const ex& held) {
    coupling_tree out;
    if (!is_a<lst>(held)) {
        out.label = held;
        return out;
    }
    out.parts = {tree_from_held(held.op(0)), tree_from_held(held.op(1))};
    out.label = held.op(2);
    return out;
}

std::vector<const coupling_tree*> leaves_of(const coupling_tree& tree) {
    std::vector<const coupling_tree*> out;
    collect_leaves(tree, out);
    return out;
}

std::vector<coupling_tree*> leaves_to_fill(coupling_tree& tree) {
    std::vector<coupling_tree*> out;
    collect_leaves(tree, out);
    return out;
}

}  // namespace couplet
