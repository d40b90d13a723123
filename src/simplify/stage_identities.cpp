#include "simplify/stage_identities.hpp"

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

ex six(const ex& a, const ex& b, const ex& c, const ex& d, const ex& e, const ex& f) {
    return wigner6j(a, b, c, d, e, f).hold();
}

}  // namespace

const identity& clebsch_as_threej_identity() {
    static const identity id = [] {
        identity i = named_identity("Clebsch-Gordan coefficients as 3j symbols", "DLMF 34.1.1");
        pattern_table p(i.numbers);
        symbol j1 = p.angular("j1"), j2 = p.angular("j2"), J = p.angular("J");
        symbol m1 = p.projection("m1", j1), m2 = p.projection("m2", j2), M = p.projection("M", J);
        i.left = clebsch(j1, m1, j2, m2, J, M).hold();
        i.right = make_phase(j1 - j2 + M) * sqrt(2 * J + 1) * wigner3j(j1, j2, J, m1, m2, -M).hold();
        return i;
    }();
    return id;
}

const identity& phase_reduction_identity() {
    static const identity id = [] {
        identity i = named_identity("phases reduced in the phase group", "common practice, no source");
        pattern_table p(i.numbers);
        symbol a = p.angular("a"), b = p.angular("b"), c = p.angular("c"), d = p.angular("d");
        symbol e = p.angular("e"), f = p.angular("f");
        // 3a-b+5c and a+b-c differ by 2(a+b+c) - 4b + 4c, even where (a, b, c) is a triad.
        i.left = make_phase(3 * a - b + 5 * c) * six(a, b, c, d, e, f);
        i.right = make_phase(a + b - c) * six(a, b, c, d, e, f);
        return i;
    }();
    return id;
}

const identity& closed_form_identity() {
    static const identity id = [] {
        identity i = named_identity("like terms collected, implied triangles dropped", "common practice, no source");
        pattern_table p(i.numbers);
        symbol a = p.angular("a"), b = p.angular("b"), c = p.angular("c"), d = p.angular("d");
        symbol e = p.angular("e"), f = p.angular("f");
        i.left = triangle(a, b, c).hold() * six(a, b, c, d, e, f) + six(a, b, c, d, e, f);
        i.right = 2 * six(a, b, c, d, e, f);
        return i;
    }();
    return id;
}

const identity& input_form_identity() {
    static const identity id = [] {
        identity i = named_identity("the input's own form kept", "no reduction with fewer terms, sums and symbols");
        pattern_table p(i.numbers);
        symbol a = p.angular("a"), b = p.angular("b"), c = p.angular("c"), d = p.angular("d");
        symbol e = p.angular("e"), f = p.angular("f");
        i.left = six(b, a, c, e, d, f);
        i.right = six(a, b, c, d, e, f);
        return i;
    }();
    return id;
}

}  // namespace couplet
