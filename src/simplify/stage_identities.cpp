#include "simplify/stage_identities.hpp"

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

constexpr auto six = held_sixj;

}  // namespace

const identity& clebsch_as_threej_identity() {
    static const identity id = make_identity(
        "Clebsch-Gordan coefficients as 3j symbols", "DLMF 34.1.1", [](pattern_table& p, ex& left, ex& right) {
            auto [j1, j2, J] = p.angulars({"j1", "j2", "J"});
            symbol m1 = p.projection("m1", j1), m2 = p.projection("m2", j2), M = p.projection("M", J);
            left = clebsch(j1, m1, j2, m2, J, M).hold();
            right = make_phase(j1 - j2 + M) * sqrt(2 * J + 1) * wigner3j(j1, j2, J, m1, m2, -M).hold();
        });
    return id;
}

const identity& phase_reduction_identity() {
    static const identity id = make_identity("phases reduced in the phase group", "common practice, no source",
                                             [](pattern_table& p, ex& left, ex& right) {
                                                 auto [a, b, c, d, e, f] = p.angulars({"a", "b", "c", "d", "e", "f"});
                                                 // 3a-b+5c and a+b-c differ by 2(a+b+c) - 4b + 4c, even where (a, b, c)
                                                 // is a triad.
                                                 left = make_phase(3 * a - b + 5 * c) * six(a, b, c, d, e, f);
                                                 right = make_phase(a + b - c) * six(a, b, c, d, e, f);
                                             });
    return id;
}

const identity& closed_form_identity() {
    static const identity id =
        make_identity("like terms collected, implied triangles dropped", "common practice, no source",
                      [](pattern_table& p, ex& left, ex& right) {
                          auto [a, b, c, d, e, f] = p.angulars({"a", "b", "c", "d", "e", "f"});
                          left = triangle(a, b, c).hold() * six(a, b, c, d, e, f) + six(a, b, c, d, e, f);
                          right = 2 * six(a, b, c, d, e, f);
                      });
    return id;
}

// proj(j, m) is 1 wherever a column (j, m) of a coupling symbol can be nonzero, so it may join
// one; the answer keeps it only where the reduction removed every such column.
const identity& projection_range_identity() {
    static const identity id = make_identity("proj(j, m) kept where a phase holds m and no column does",
                                             "common practice, no source", [](pattern_table& p, ex& left, ex& right) {
                                                 auto [a, b, c] = p.angulars({"a", "b", "c"});
                                                 symbol ma = p.projection("ma", a), mb = p.projection("mb", b),
                                                        mc = p.projection("mc", c);
                                                 left = make_phase(a - ma) * wigner3j(a, b, c, ma, mb, mc).hold();
                                                 right = left * projection_of(a, ma).hold();
                                             });
    return id;
}

const identity& input_form_identity() {
    static const identity id =
        make_identity("the input's own form kept", "no reduction with fewer terms, sums and symbols",
                      [](pattern_table& p, ex& left, ex& right) {
                          auto [a, b, c, d, e, f] = p.angulars({"a", "b", "c", "d", "e", "f"});
                          left = six(b, a, c, e, d, f);
                          right = six(a, b, c, d, e, f);
                      });
    return id;
}

}  // namespace couplet
