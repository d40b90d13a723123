// Coupled states as coupling trees, and the recoupling coefficient between two of them by its
// definition: the overlap of the states that Clebsch-Gordan coefficients build from the same
// uncoupled ones.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <functional>
#include <string>
#include <vector>

namespace couplet {

// A leaf (one angular momentum, `label` its name) or two trees coupled to `label`; each tree
// carries the projection of its label.
struct coupling_tree {
    GiNaC::ex label;
    GiNaC::ex projection;
    std::vector<coupling_tree> parts;  // empty for a leaf, else the left and the right tree
    std::size_t offset = 0;            // where the tree starts in the source, for messages

    bool is_leaf() const { return parts.empty(); }
};

// The number of leaves above which a recoupling coefficient is refused: its definition sums
// over 2n - 1 projections of 2(n - 1) Clebsch-Gordan coefficients, and the m-sum stage reduces
// such networks in well under a second up to n = 12.
constexpr std::size_t max_coupled_leaves = 12;

// The product of the Clebsch-Gordan coefficients <a alpha, b beta | c gamma> (left tree first,
// Condon-Shortley) that builds |tree; label projection> from its leaves' states.
GiNaC::ex coupling_coefficients(const coupling_tree& tree);

// The recoupling coefficient <bra; J | ket; J>, where each side is the tree that couples its
// two trees to J: the sum over every projection, M included, of both products, divided by
// 2J + 1 (the overlap does not depend on M).  The projections come from `projection_for`,
// called once per leaf (both sides share it), once per coupling below the top on each side
// (ket_side tells which), and once for J.
GiNaC::ex recoupling_definition(coupling_tree bra, coupling_tree ket,
                                const std::function<GiNaC::ex(const GiNaC::ex& label, bool ket_side)>& projection_for);

// Each coupling below the top of t gets a new projection from projection_for, appended to
// summed in preorder; the leaves and the top are left to the caller.
void name_inner_projections(coupling_tree& t, bool ket_side,
                            const std::function<GiNaC::ex(const GiNaC::ex& label, bool ket_side)>& projection_for,
                            GiNaC::lst& summed);

// The leaves of a tree, left to right.
std::vector<const coupling_tree*> leaves_of(const coupling_tree& tree);
// The same, writable, for a caller that sets their projections.
std::vector<coupling_tree*> leaves_to_fill(coupling_tree& tree);

// A recoupling coefficient kept whole, recoupling(bra, ket): each side is the tree that
// couples its two trees to J, held as a GiNaC list {left, right, label} per coupling and the
// label itself per leaf (projections are not part of it).  The simplifier's first stage
// reduces it; every other use takes its definition.
DECLARE_FUNCTION_2P(recoupling)

bool is_recoupling(const GiNaC::ex& e);
GiNaC::ex as_held_tree(const coupling_tree& tree);
coupling_tree tree_from_held(const GiNaC::ex& held);

}  // namespace couplet
