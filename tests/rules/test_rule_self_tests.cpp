// The shared self-test can fail: a sum rule with a phase or a triangle missing is caught by
// exact evaluation of its two sides (every rule in the registry passes it:
// tests/simplify/test_identity_registry.cpp).
#include <catch2/catch.hpp>

#include "model/symbols.hpp"
#include "rules/rule.hpp"
#include "verify/identity_self_test.hpp"

using namespace couplet;
using namespace couplet::rules;

namespace {

const sum_rule& rule_named(const std::string& name) {
    for (const sum_rule& r : sum_rules())
        if (r.name == name) return r;
    throw std::logic_error("no rule " + name);
}

// The rule's instance rebuilt from its (altered) pattern.
bool holds(sum_rule r) {
    r.left = r.left_side();
    r.right = r.result;
    return verify::self_test(r).holds;
}

}  // namespace

TEST_CASE("the self-test catches a rule with a phase or a triangle missing", "[rules]") {
    // The Racah sum rule without its phase (-1)^(p+q+x) (DLMF 34.5.15 has it) must fail.
    sum_rule wrong = rule_named("Racah sum rule");
    CHECK(holds(wrong));
    wrong.phase = 0;
    CHECK_FALSE(holds(wrong));
    // Orthogonality without the triangles of p (DLMF 34.5.14) differs where a triangle fails.
    sum_rule loose = rule_named("6j orthogonality");
    GiNaC::ex p = loose.numbers.find("p")->symbol, q = loose.numbers.find("q")->symbol;
    loose.result = kdelta(p, q).hold() / (2 * p + 1);
    CHECK_FALSE(holds(loose));
    // The 9j sum rule without the (-1)^(2 j2) of DLMF 34.7.3 differs wherever j2 is half-odd.
    sum_rule unsigned_sum = rule_named("9j sum rule");
    GiNaC::ex b = unsigned_sum.numbers.find("b")->symbol;
    unsigned_sum.phase = (unsigned_sum.phase - 2 * b).expand();
    CHECK_FALSE(holds(unsigned_sum));
    // The signed one-6j sum without its (-1)^(a+b+x) is a different sum (common practice, no source).
    sum_rule unsigned_one = rule_named("sum of (-1)^(a+b+x) (2x+1) times one 6j");
    unsigned_one.phase = 0;
    CHECK_FALSE(holds(unsigned_one));
    // The alike-rows one-6j sum without the triangle of c is nonzero where (a b c) fails.
    sum_rule untriangled = rule_named("sum of (2x+1) times one 6j");
    GiNaC::ex a1 = untriangled.numbers.find("a")->symbol, b1 = untriangled.numbers.find("b")->symbol;
    untriangled.result = make_phase(2 * a1 + 2 * b1);
    CHECK_FALSE(holds(untriangled));
}
