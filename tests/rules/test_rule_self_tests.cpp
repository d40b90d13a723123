// Every j-sum rule proves itself: both sides exactly at >= 200 points where the free triads
// hold (every j <= 4) and 100 arbitrary points where both sides must vanish together.
#include <catch2/catch.hpp>

#include "model/symbols.hpp"
#include "rules/rule.hpp"

using namespace couplet;
using namespace couplet::rules;

namespace {

const sum_rule& rule_named(const std::string& name) {
    for (const sum_rule& r : sum_rules())
        if (r.name == name) return r;
    throw std::logic_error("no rule " + name);
}

}  // namespace

TEST_CASE("each sum rule equals its left side exactly at sampled points", "[rules]") {
    // References beside each rule: 6j orthogonality DLMF 34.5.14, Racah sum rule DLMF 34.5.15,
    // Biedenharn-Elliott DLMF 34.5.16-34.5.17, three 6j -> 9j DLMF 34.6.2, sum of (2x+1) over a
    // triangle common practice, no source, 9j orthogonality DLMF 34.7.2, the 9j sum rule DLMF
    // 34.7.3, the one-6j sums Varshalovich et al. (1988) sec. 9.8 (from memory).  The table holds
    // each rule's reference string; every rule in it is tested here.
    REQUIRE(!sum_rules().empty());
    for (const sum_rule& r : sum_rules()) {
        INFO(r.name << " (" << r.reference << ")");
        self_test_report report;
        REQUIRE_NOTHROW(report = self_test(r, 2026));
        CHECK(report.compared >= 200);
        // Orthogonality is nonzero only where the deltas hold; the other points check that it vanishes.
        CHECK(report.nonzero >= 10);
    }
}

TEST_CASE("each local rule equals its symbol exactly at sampled points", "[rules]") {
    // 6j with a zero argument DLMF 34.5.1; 9j with a zero argument DLMF 34.7.1.
    REQUIRE(!local_rules().empty());
    for (const local_rule& r : local_rules()) {
        INFO(r.name << " (" << r.reference << ")");
        self_test_report report;
        REQUIRE_NOTHROW(report = self_test(r, 2027));
        CHECK(report.compared >= 300);
        CHECK(report.nonzero >= 100);
    }
}

TEST_CASE("the self-test catches a rule with a phase or a triangle missing", "[rules]") {
    // The Racah sum rule without its phase (-1)^(p+q+x) (DLMF 34.5.15 has it) must fail.
    sum_rule wrong = rule_named("Racah sum rule");
    wrong.phase = 0;
    CHECK_THROWS_AS(self_test(wrong, 5), std::logic_error);
    // Orthogonality without the triangles of p (DLMF 34.5.14) differs where a triangle fails.
    sum_rule loose = rule_named("6j orthogonality");
    GiNaC::ex p = loose.numbers.find("p")->symbol, q = loose.numbers.find("q")->symbol;
    loose.result = kdelta(p, q).hold() / (2 * p + 1);
    CHECK_THROWS_AS(self_test(loose, 5), std::logic_error);
    // The 9j sum rule without the (-1)^(2 j2) of DLMF 34.7.3 differs wherever j2 is half-odd.
    sum_rule unsigned_sum = rule_named("9j sum rule");
    GiNaC::ex b = unsigned_sum.numbers.find("b")->symbol;
    unsigned_sum.phase = (unsigned_sum.phase - 2 * b).expand();
    CHECK_THROWS_AS(self_test(unsigned_sum, 5), std::logic_error);
    // The signed one-6j sum without its (-1)^(a+b+x) is a different sum (common practice, no source).
    sum_rule unsigned_one = rule_named("sum of (-1)^(a+b+x) (2x+1) times one 6j");
    unsigned_one.phase = 0;
    CHECK_THROWS_AS(self_test(unsigned_one, 5), std::logic_error);
    // The alike-rows one-6j sum without the triangle of c is nonzero where (a b c) fails.
    sum_rule untriangled = rule_named("sum of (2x+1) times one 6j");
    GiNaC::ex a1 = untriangled.numbers.find("a")->symbol, b1 = untriangled.numbers.find("b")->symbol;
    untriangled.result = make_phase(2 * a1 + 2 * b1);
    CHECK_THROWS_AS(self_test(untriangled, 5), std::logic_error);
}
