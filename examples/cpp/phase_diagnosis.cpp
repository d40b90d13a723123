// Invented scenario: a draft swaps the first two columns of a 3j symbol and forgets the phase
// that comes with it.  The program asks couplet whether the identity holds, reads the verdict
// and the missing phase, and prints the result as one JSON line for a script.
#include <couplet/couplet.hpp>

#include <iostream>

int main() {
    try {
        couplet::result r = couplet::check("3j(a, b, c; ma, mb, mc) == 3j(b, a, c; mb, ma, mc)");
        const couplet::check_record& c = *r.check;
        std::cout << "verdict: " << c.summary << "\n";
        if (c.missing_phase) std::cout << "missing phase exponent: " << couplet::to_text(*c.missing_phase) << "\n";
        std::cout << couplet::to_json(r) << "\n";
        return c.result == couplet::verdict::fails_by_phase ? 0 : 1;
    } catch (const couplet::input_error& e) {
        std::cerr << e.diagnostic();
        return 2;
    }
}
