// Invented scenario: a referee asks where the 6j in a three-spin recoupling comes from.  The
// program reduces the sum over projections of four 3j symbols, prints the answer in couplet's
// notation and as LaTeX, and lists the identities used with their references.
#include <couplet/couplet.hpp>

#include <iostream>

int main() {
    couplet::options o;
    o.steps = true;
    try {
        // The overlap of ((j1 j2) j12, j3) J M with (j1, (j2 j3) j23) J M, as four CG summed.
        couplet::result r = couplet::simplify(
            "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M>"
            " * <j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)",
            o);
        std::cout << "answer:  " << couplet::to_text(r.answer) << "\n";
        std::cout << "latex:   " << couplet::to_latex(r) << "\n";
        std::cout << "checked: " << (r.checked.verified ? "yes" : "no") << ", at " << r.checked.points << " points\n";
        for (const couplet::step& s : *r.steps) std::cout << "step:    " << s.rule << " (" << s.reference << ")\n";
        return r.checked.verified ? 0 : 1;
    } catch (const couplet::input_error& e) {
        std::cerr << e.diagnostic();
        return 2;
    }
}
