#include "network/rewrites.hpp"

#include "model/symbols.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

ex three(const ex& a, const ex& b, const ex& c, const ex& x, const ex& y, const ex& z) {
    return wigner3j(a, b, c, x, y, z).hold();
}

// The triangle of DLMF 34.4.1's network (its last three 3j with their phase): by DLMF 34.5.23
// it equals 3j(j1 j2 j3; m1 m2 m3) times 6j{j1 j2 j3; l1 l2 l3}.
ex triangle_of(const symbol& j1, const symbol& j2, const symbol& j3, const symbol& m1, const symbol& m2,
               const symbol& m3, const symbol& l1, const symbol& l2, const symbol& l3, const symbol& u1,
               const symbol& u2, const symbol& u3) {
    return make_phase(l1 + l2 + l3 + u1 + u2 + u3) * three(j1, l2, l3, m1, u2, -u3) * three(l1, j2, l3, -u1, m2, u3) *
           three(l1, l2, j3, u1, -u2, m3);
}

}  // namespace

const identity& projection_delta_identity() {
    static const identity id =
        make_identity("delta on a summed projection", "definition of the Kronecker delta, common practice, no source",
                      [](pattern_table& p, ex& left, ex& right) {
                          auto [j1, j2, j3] = p.angulars({"j1", "j2", "j3"});
                          symbol m1 = p.projection("m1", j1), n1 = p.projection("n1", j1), m2 = p.projection("m2", j2);
                          symbol m3 = p.projection("m3", j3);
                          left = make_sum(kdelta(m1, n1).hold() * three(j1, j2, j3, m1, m2, m3), lst{m1});
                          right = three(j1, j2, j3, n1, m2, m3);
                      });
    return id;
}

const identity& fixed_projection_identity() {
    static const identity id =
        make_identity("sum over a projection the selection rule fixes", "DLMF 34.2 (m1+m2+m3 = 0)",
                      [](pattern_table& p, ex& left, ex& right) {
                          auto [j1, j2, j3, j4, j5] = p.angulars({"j1", "j2", "j3", "j4", "j5"});
                          symbol m1 = p.projection("m1", j1), m2 = p.projection("m2", j2), m3 = p.projection("m3", j3);
                          symbol m4 = p.projection("m4", j4), m5 = p.projection("m5", j5);
                          left = make_sum(three(j1, j2, j3, m1, m2, m3) * three(j3, j4, j5, -m3, m4, m5), lst{m3});
                          right = three(j1, j2, j3, m1, m2, -m1 - m2) * three(j3, j4, j5, m1 + m2, m4, m5);
                      });
    return id;
}

const identity& two_line_cut_identity() {
    static const identity id = make_identity(
        "two-line cut", "factorization theorem, common practice, no source", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, c, d, j, k] = p.angulars({"a", "b", "c", "d", "j", "k"});
            symbol al = p.projection("al", a), be = p.projection("be", b), ga = p.projection("ga", c);
            symbol de = p.projection("de", d), mj = p.projection("mj", j), mk = p.projection("mk", k);
            // Two bubbles joined by the lines j and k.  Cut there: delta(j, k)/(2j+1) times each side
            // closed, and a closed bubble is sum(m's : 3j^2) = tri (DLMF 34.3.16 with 34.3.18).
            left = make_sum(three(a, b, j, al, be, mj) * three(a, b, k, al, be, mk) * three(j, c, d, mj, ga, de) *
                                three(k, c, d, mk, ga, de),
                            lst{al, be, ga, de, mj, mk});
            right = kdelta(j, k).hold() * triangle(a, b, j).hold() * triangle(j, c, d).hold() / (2 * j + 1);
        });
    return id;
}

const identity& three_line_cut_identity() {
    static const identity id =
        make_identity("three-line cut", "factorization theorem, common practice, no source",
                      [](pattern_table& p, ex& left, ex& right) {
                          auto [j1, j2, j3, l1, l2, l3, k1, k2, k3] =
                              p.angulars({"j1", "j2", "j3", "l1", "l2", "l3", "k1", "k2", "k3"});
                          symbol m1 = p.projection("m1", j1), m2 = p.projection("m2", j2), m3 = p.projection("m3", j3);
                          symbol u1 = p.projection("u1", l1), u2 = p.projection("u2", l2), u3 = p.projection("u3", l3);
                          symbol v1 = p.projection("v1", k1), v2 = p.projection("v2", k2), v3 = p.projection("v3", k3);
                          // Two triangles joined by the lines j1, j2, j3 (a prism).  Cut there, each side closed
                          // with 3j(j1 j2 j3) is a 6j (DLMF 34.4.1); the two closing 3j squared and summed give
                          // the triangle of (j1 j2 j3) (DLMF 34.3.18), which each 6j already carries.
                          left = make_sum(triangle_of(j1, j2, j3, m1, m2, m3, l1, l2, l3, u1, u2, u3) *
                                              triangle_of(j1, j2, j3, m1, m2, m3, k1, k2, k3, v1, v2, v3),
                                          lst{m1, m2, m3, u1, u2, u3, v1, v2, v3});
                          right = wigner6j(j1, j2, j3, l1, l2, l3).hold() * wigner6j(j1, j2, j3, k1, k2, k3).hold();
                      });
    return id;
}

const identity& completeness_identity() {
    static const identity id =
        make_identity("3j completeness", "DLMF 34.3.17", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, J] = p.angulars({"a", "b", "J"});
            symbol ma = p.projection("ma", a), na = p.projection("na", a), mb = p.projection("mb", b);
            symbol nb = p.projection("nb", b), M = p.projection("M", J);
            left = make_sum((2 * J + 1) * three(a, b, J, ma, mb, M) * three(a, b, J, na, nb, M), lst{J, M});
            right = kdelta(ma, na).hold() * kdelta(mb, nb).hold();
        });
    return id;
}

}  // namespace couplet::network
