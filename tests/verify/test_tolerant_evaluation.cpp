// Evaluation where a vanishing factor excuses an undefined one, and the cases that relies on.
#include <catch2/catch.hpp>

#include <stdexcept>

#include "check_support.hpp"
#include "verify/simplification_check.hpp"
#include "verify/tolerant_evaluation.hpp"

using namespace couplet;

namespace {

assignment values(const lowered_program& p, std::initializer_list<std::pair<const char*, GiNaC::numeric>> list) {
    assignment a;
    for (const auto& [name, v] : list) a[p.numbers.find(name)->symbol] = v;
    return a;
}

}  // namespace

TEST_CASE("a vanishing coupling symbol excuses an undefined factor beside it", "[verify]") {
    // At J = 0 the 3j has j = -1 and vanishes (a symbol that breaks a selection rule is 0, common
    // practice, no source), while sqrt(2J-1) is not real.
    auto p = testing::lower_text("sqrt(2*J-1) * 3j(J-1, a, a; 0, 0, 0) + 1");
    verify::tolerant_expression e(p.statements.back().value, p.numbers);
    CHECK(e.at(values(p, {{"J", 0}, {"a", 1}})) == exact::number(1L));
    // Where the square root is real the value is the plain product: sqrt(3) * 3j(1 1 1; 0 0 0) + 1,
    // and (1 1 1; 0 0 0) = 0 by DLMF 34.3.5 (J = 3 odd).
    CHECK(e.at(values(p, {{"J", 2}, {"a", 1}})) == exact::number(1L));
}

TEST_CASE("an undefined factor beside nonzero ones is still an error", "[verify]") {
    auto p = testing::lower_text("(-1)^(J-1/2) * tri(J, a, a)");
    verify::tolerant_expression e(p.statements.back().value, p.numbers);
    // tri(1, 1, 1) = 1 (common practice, no source), so the half-integer exponent 1/2 matters.
    CHECK_THROWS_AS(e.at(values(p, {{"J", 1}, {"a", 1}})), evaluation_error);
    // tri(3, 1, 1) = 0 since 3 > 1 + 1: the product is 0 although (-1)^(5/2) is not real.
    CHECK(e.at(values(p, {{"J", 3}, {"a", 1}})).is_zero());
}

TEST_CASE("a conversion that brings in sqrt(2j-1) for a shifted j verifies", "[verify]") {
    // DLMF 34.1.1 turns <l m1, J mb | (a-1) mb> into a 3j with sqrt(2(a-1)+1).
    auto p = testing::lower_text(
        "let A = <l m1, J mb | (a-1) mb>\n"
        "let B = (-1)^(l-J+mb) * sqrt(2*a-1) * 3j(l, J, a-1; m1, mb, -mb)");
    auto v = verify::verify_simplification(p.statements[0].value, p.statements[1].value, p.numbers, {});
    CHECK(v.agrees);
    CHECK(v.nonzero > 20);
}

TEST_CASE("a free projection named like a sum's index takes its range from its own column", "[verify]") {
    // mb is summed in the 3j and free in the CG, where it is the projection of 0.
    auto c = testing::check_text(
        "x * <j m, b 1/2 | 0 mb> + sum(mb : 3j(j, l, k; mb, -mb, 0)) == "
        "x * <j m, b 1/2 | 0 mb> + sum(mb : 3j(j, l, k; mb, -mb, 0))");
    CHECK(c.report.result == verify::verdict::holds);
    CHECK(c.report.points > 20);
}

TEST_CASE("an identity over no admissible point holds vacuously, and says so", "[verify]") {
    // With s half-odd, s + s + s is never an integer: no 3j(s s s; ...) is admissible.
    auto c = testing::check_text("half s\n3j(s, s, s; 0, 0, 0) == 1");
    CHECK(c.report.result == verify::verdict::holds);
    CHECK(c.report.points == 0);
    CHECK(c.report.note.find("no assignment") != std::string::npos);
}
