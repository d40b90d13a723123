// Text output is valid input: parse(print(e)) gives back e, on generated expressions.
#include <catch2/catch.hpp>

#include "print/print.hpp"
#include "print/random_source.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

bool same_expression(const GiNaC::ex& a, const GiNaC::ex& b) { return a.is_equal(b) || (a - b).expand().is_zero(); }

}  // namespace

TEST_CASE("printing then parsing gives back the expression (300 generated cases)", "[print][roundtrip]") {
    testing::random_source gen(20261201);
    int checked = 0;
    for (int i = 0; i < 300; ++i) {
        std::string original = gen.expression(1 + i % 4);
        INFO("generated: " << original);
        lowered_program first;
        try {
            first = testing::lower_text(original);
        } catch (const user_error&) {
            continue;  // e.g. a summand that vanishes by a numeric selection rule
        }
        std::string printed = to_text(first.statements.back().value);
        INFO("printed:   " << printed);
        // Both in one program, so that they share the symbol table.
        lowered_program both = testing::lower_text(original + "\n" + printed);
        REQUIRE(both.statements.size() == 2);
        CHECK(same_expression(both.statements[0].value, both.statements[1].value));
        ++checked;
    }
    CHECK(checked >= 200);
}

TEST_CASE("printing is independent of GiNaC's internal term order", "[print]") {
    // Same expression built in two different orders prints identically.
    auto q = testing::lower_text(
        "a + b*c - 3j(a, b, c; ma, mb, mc) + 1/2\n"
        "1/2 - 3j(a, b, c; ma, mb, mc) + c*b + a");
    CHECK(to_text(q.statements[0].value) == to_text(q.statements[1].value));
    CHECK(to_text(q.statements[0].value) == "a + b*c - 3j(a, b, c; ma, mb, mc) + 1/2");
}

TEST_CASE("text printing of the language's forms", "[print]") {
    auto show = [](const std::string& text) { return to_text(testing::lower_last(text)); };
    CHECK(show("3j(j1, j2, j3; m1, m2, -m1-m2)") == "3j(j1, j2, j3; m1, m2, -m1-m2)");
    CHECK(show("6j{a, b, c; d, e, f}") == "6j{a, b, c; d, e, f}");
    CHECK(show("9j{a, b, c; d, e, f; g, h, i}") == "9j{a, b, c; d, e, f; g, h, i}");
    CHECK(show("<a (m-1), b 1 | c m>") == "<a (m-1), b 1 | c m>");
    CHECK(show("<l 0, 1/2 -1/2 | j -1/2>") == "<l 0, 1/2 -1/2 | j -1/2>");
    CHECK(show("delta(p, q)/(2*p+1)") == "delta(p, q)/(2*p+1)");
    CHECK(show("(-1)^(a+b+3)") == "(-1)^(a+b+1)");
    CHECK(show("sqrt(2*j+1)*3j(j, j, 0; m, -m, 0)") == "sqrt(2*j+1)*3j(j, j, 0; m, -m, 0)");
    CHECK(show("sum(m1, m2 : 3j(a, b, c; m1, m2, m3))") == "sum(m1, m2 : 3j(a, b, c; m1, m2, m3))");
    CHECK(show("1/sqrt(2*j+1)") == "1/sqrt(2*j+1)");
    CHECK(show("-3*x/(2*y)") == "-3*x/(2*y)");
    CHECK(show("J'+lambda") == "J'+lambda");
    // A half entry divides by a bare integer, without parentheses round it.
    CHECK(show("6j{(a+b)/2, a, b; (d-b)/2, c, d}") == "6j{a/2+b/2, a, b; -b/2+d/2, c, d}");
    CHECK(show("x/2 + 3*x/(4*y)") == "x/2 + 3*x/(4*y)");
}
