// Every identity the simplifier can apply is in one registry, and each one holds: its
// instance's two sides agree by exact evaluation at the verifier's sample points.  The
// references are the identities' own (DLMF chapter 34 equations, Varshalovich et al. (1988)
// sec. 9.8 from memory, and rewrites marked "common practice, no source").
#include <catch2/catch.hpp>

#include <iostream>
#include <set>

#include "couplet/couplet.hpp"
#include "print/print.hpp"
#include "simplify/identity_registry.hpp"
#include "verify/identity_self_test.hpp"

using namespace couplet;

TEST_CASE("every identity in the registry has a name, a reference and a self-test that holds", "[identities]") {
    REQUIRE_FALSE(all_identities().empty());
    std::set<std::string> names;
    for (const identity* id : all_identities()) {
        INFO(id->name << " (" << id->reference << "): " << to_text(id->left) << " == " << to_text(id->right));
        CHECK_FALSE(id->name.empty());
        CHECK_FALSE(id->reference.empty());
        CHECK(names.insert(id->name).second);
        verify::identity_test t = verify::self_test(*id);
        INFO(t.disagreement);
        CHECK(t.holds);
        CHECK(t.points >= 12);
        CHECK(t.nonzero >= 3);  // the points test something
        std::cout << "identity " << id->name << ": " << t.points << " points, " << t.nonzero << " nonzero\n";
    }
}

TEST_CASE("every step of a derivation names an identity of the registry", "[identities]") {
    std::set<std::string> names;
    for (const identity* id : all_identities()) names.insert(id->name);
    // Invented inputs that exercise the CG conversion, network moves, phases and j-sum rules.
    const char* inputs[] = {
        "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M>"
        " * <j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)",
        "sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; c, d, q})",
        "sum(x : (-1)^(p+q+x) * (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; d, c, q})",
    };
    for (const char* text : inputs) {
        auto r = couplet::simplify(text, [] {
            couplet::options o;
            o.steps = true;
            o.verify = false;
            return o;
        }());
        REQUIRE(r.steps);
        CHECK_FALSE(r.steps->empty());
        for (const auto& s : *r.steps) {
            INFO(text << ": " << s.rule);
            CHECK(names.count(s.rule) == 1);
        }
    }
}
