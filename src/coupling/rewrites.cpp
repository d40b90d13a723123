#include "coupling/rewrites.hpp"

#include "model/coupling_tree.hpp"
#include "model/symbols.hpp"

namespace couplet::coupling {

using namespace GiNaC;

namespace {

coupling_tree leaf(const ex& j) { return {j, 0, {}}; }
coupling_tree coupled(coupling_tree a, coupling_tree b, const ex& label) {
    coupling_tree t;
    t.label = label;
    t.parts = {std::move(a), std::move(b)};
    return t;
}

// The definition with the pattern's projections: one per leaf and per coupling of each side.
ex defined(pattern_table& p, const coupling_tree& bra, const coupling_tree& ket) {
    int made = 0;
    return recoupling_definition(bra, ket, [&](const ex& label, bool) -> ex {
        return p.projection("m" + std::to_string(++made), ex_to<symbol>(label));
    });
}

ex hat(const ex& j) { return 2 * j + 1; }

}  // namespace

const identity& three_angular_momenta_identity() {
    static const identity id = make_identity(
        "recoupling of three angular momenta", "Edmonds (1957) eq. 6.1.5", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, c, e, f, g] = p.angulars({"a", "b", "c", "e", "f", "g"});
            left = defined(p, coupled(coupled(leaf(a), leaf(b), e), leaf(c), f),
                           coupled(leaf(a), coupled(leaf(b), leaf(c), g), f));
            right = make_phase(a + b + c + f) * sqrt(hat(e) * hat(g)) * wigner6j(a, b, e, c, f, g).hold();
        });
    return id;
}

const identity& two_pairs_identity() {
    static const identity id =
        make_identity("recoupling of two pairs", "Edmonds (1957) eq. 6.4.2", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, c, d, e, g, h, k, f] = p.angulars({"a", "b", "c", "d", "e", "g", "h", "k", "f"});
            left = defined(p, coupled(coupled(leaf(a), leaf(b), e), coupled(leaf(c), leaf(d), g), f),
                           coupled(coupled(leaf(a), leaf(c), h), coupled(leaf(b), leaf(d), k), f));
            right = sqrt(hat(e) * hat(g) * hat(h) * hat(k)) * wigner9j(a, b, e, c, d, g, h, k, f).hold();
        });
    return id;
}

const identity& exchanged_parts_identity() {
    static const identity id =
        make_identity("exchanging the parts of a coupling",
                      "symmetry of the Clebsch-Gordan coefficient, Edmonds (1957) eq. 3.5.14 (from memory)",
                      [](pattern_table& p, ex& left, ex& right) {
                          auto [a, b, c, d, J] = p.angulars({"a", "b", "c", "d", "J"});
                          left = defined(p, coupled(coupled(leaf(a), leaf(b), c), leaf(d), J),
                                         coupled(coupled(leaf(b), leaf(a), c), leaf(d), J));
                          right = make_phase(a + b - c) * triangle(a, b, c).hold() * triangle(c, d, J).hold();
                      });
    return id;
}

const identity& orthonormal_states_identity() {
    static const identity id = make_identity(
        "orthonormality of coupled states", "common practice, no source", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, c, e, d, J] = p.angulars({"a", "b", "c", "e", "d", "J"});
            left = defined(p, coupled(coupled(leaf(a), leaf(b), c), leaf(d), J),
                           coupled(coupled(leaf(a), leaf(b), e), leaf(d), J));
            right = kdelta(c, e).hold() * triangle(a, b, c).hold() * triangle(c, d, J).hold();
        });
    return id;
}

const identity& recoupling_by_trees_identity() {
    static const identity id = make_identity(
        // Short: the reference is the tag of a LaTeX derivation step, beside the formula.
        "recoupling", "Edmonds (1957) eqs. 6.1.5, 6.4.2, 3.5.14", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, c, d, e, f, J, h, k] = p.angulars({"a", "b", "c", "d", "e", "f", "J", "h", "k"});
            left = defined(p, coupled(coupled(coupled(leaf(a), leaf(b), e), leaf(c), f), leaf(d), J),
                           coupled(leaf(a), coupled(leaf(b), coupled(leaf(c), leaf(d), h), k), J));
            // ((a b) e, c) f, d -> (a b) e, (c d) h: 6.1.5 on (e, c, d); then
            // (a b) e, (c d) h -> a, (b, (c d) h) k: 6.1.5 on (a, b, h).
            right = make_phase(e + c + d + J) * sqrt(hat(f) * hat(h)) * wigner6j(e, c, f, d, J, h).hold() *
                    make_phase(a + b + h + J) * sqrt(hat(e) * hat(k)) * wigner6j(a, b, e, h, J, k).hold();
        });
    return id;
}

}  // namespace couplet::coupling
