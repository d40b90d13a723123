// Which j a projection belongs to is a fact of one statement, not of the program: the phase
// reduction of one statement must not borrow the pairing another statement made.
#include <catch2/catch.hpp>

#include "canonical/phase_reduction.hpp"
#include "eval/evaluate.hpp"
#include "model/fresh_index.hpp"
#include "model/symbols.hpp"
#include "support.hpp"

using namespace couplet;
using GiNaC::ex;
using GiNaC::numeric;

namespace {

GiNaC::symbol named(const quantum_numbers& numbers, const std::string& name) {
    const quantum_number* q = numbers.find(name);
    REQUIRE(q != nullptr);
    return q->symbol;
}

// The statement and its phase-reduced form at one point, exactly.
void check_reduction_at(const std::string& program, const std::vector<std::pair<std::string, numeric>>& point) {
    const lowered_program p = testing::lower_text(program);
    const ex statement = p.statements.back().value;
    const quantum_numbers numbers = p.numbers.for_statement(statement);
    const ex reduced = reduce_phases(statement, numbers);
    assignment at;
    for (const auto& [name, value] : point) at[named(p.numbers, name)] = value;
    const evaluator eval(numbers);
    INFO(program);
    CHECK(eval(reduced, at) == eval(statement, at));
}

}  // namespace

TEST_CASE("a projection's j in one statement does not pair it in the next", "[model][phase]") {
    // Line 2 alone: c is any quantum number, so (-1)^(2c) is -1 at c = 1/2 (the j - m of its
    // own 3j holds: a - M = 0, b + M = 2); line 1's pairing of M with c would make it 1.
    check_reduction_at("3j(c, c, 0; M, -M, 0)\n(-1)^(2*c+2*M)*3j(a, b, l; M, -M, 0)",
                       {{"c", numeric(1, 2)}, {"a", 0}, {"b", 2}, {"l", 2}, {"M", 0}});
    // M stands in no column of line 2 at all.
    check_reduction_at("3j(c, c, 0; M, -M, 0)\n(-1)^(2*c-2*M)", {{"c", numeric(1, 2)}, {"M", -2}});
    // The statement the generated LaTeX document met.
    check_reduction_at("<c (M+1), j12 3 | (j12) 3/2>\n(-1)^(2*j12+2*c)*(-3j(j12-1, j12, l+1/2; -ma, mb+1, M))",
                       {{"c", numeric(1, 2)}, {"j12", 1}, {"l", numeric(1, 2)}, {"mb", -1}, {"ma", 0}, {"M", 0}});
}

TEST_CASE("a statement keeps the pairing its own columns make", "[model][phase]") {
    const lowered_program p = testing::lower_text(
        "3j(a, b, c; m1, m2, m3)*sum(x : 3j(d, d, 0; x, -x, 0))\n"
        "(-1)^(d-m1)*3j(d, e, f; 2*m1, -2*m1, 0)");
    const GiNaC::symbol a = named(p.numbers, "a"), m1 = named(p.numbers, "m1"), x = named(p.numbers, "x");
    REQUIRE(p.numbers.at(m1).owner);
    const quantum_numbers first = p.numbers.for_statement(p.statements[0].value);
    REQUIRE(first.at(m1).owner);
    CHECK((*first.at(m1).owner - a).expand().is_zero());
    // A bound index has no owner among the free columns.
    CHECK(!first.at(x).owner);
    // A column 2*m1 says d - 2 m1 is an integer, not d - m1: only the plain column counts.
    const quantum_numbers second = p.numbers.for_statement(p.statements[1].value);
    CHECK(!second.at(m1).owner);
}

TEST_CASE("a phase over a summation index a stage made keeps that index's symbol", "[model][phase]") {
    // A fresh index (the 9j expansion's, an interchange's) is in no program table; the reduced
    // phase must name the sum's own symbol, or the sum no longer binds it.
    const lowered_program p = testing::lower_text("sum(y : (-1)^(3*y+a+b) * (2*y+1) * 6j{a, b, y; d, e, c})");
    const GiNaC::symbol y = named(p.numbers, "y");
    const ex summed = p.statements.back().value;
    REQUIRE(GiNaC::is_a<index_sum>(summed));
    const GiNaC::symbol x = fresh_index(summed, p.numbers);
    const ex renamed = make_sum(GiNaC::ex_to<index_sum>(summed).body().subs(y == x), GiNaC::lst{x});
    const ex reduced = reduce_phases(renamed, p.numbers);
    INFO(reduced);
    REQUIRE(reduced.has(x));
    for (auto it = reduced.preorder_begin(); it != reduced.preorder_end(); ++it) {
        if (!GiNaC::is_a<GiNaC::symbol>(*it)) continue;
        const auto& s = GiNaC::ex_to<GiNaC::symbol>(*it);
        const quantum_number* q = p.numbers.find(s.get_name());
        CHECK((q ? ex(q->symbol) : ex(x)).is_equal(s));
    }
}

TEST_CASE("the proof-only phase walk refuses exactly what the reduction refuses", "[model][phase]") {
    // (-1)^(a+b+c) beside a 3j with triad (a, b, c) is integral (DLMF 34.2: a+b+c is an
    // integer); (-1)^(a+b) is not where a+b may be half-odd (common practice, no source).
    for (const std::string text : {"(-1)^(a+b+c) * 3j(a, b, c; 0, 0, 0)", "(-1)^(a+b) * 6j{a, b, c; d, e, f}",
                                   "(-1)^(a+e+f) * 6j{a, b, c; d, e, f}", "(-1)^(2*m) * 3j(a, b, c; m, -m, 0)"}) {
        const lowered_program p = testing::lower_text(text);
        const ex e = p.statements.back().value;
        bool reduction_refuses = false, proof_refuses = false;
        try {
            reduce_phases(e, p.numbers);
        } catch (const phase_not_integer&) {
            reduction_refuses = true;
        }
        try {
            prove_phases_integral(e, p.numbers);
        } catch (const phase_not_integer&) {
            proof_refuses = true;
        }
        INFO(text);
        CHECK(reduction_refuses == proof_refuses);
        CHECK(reduction_refuses == (text.find("(a+b)") != std::string::npos));
    }
}

namespace {

// The message of the error that lowering `program` raises, or "" when it lowers.
std::string lowering_error(const std::string& program) {
    try {
        testing::lower_text(program);
    } catch (const user_error& e) {
        return e.what();
    }
    return "";
}

}  // namespace

TEST_CASE("an eval's values are judged by the columns of its own value", "[model]") {
    // The same name under j = 1/2 on one line and j = 1 on the next: each line is admissible
    // on its own (j - m integral in its own column).
    CHECK(lowering_error("eval 3j(1/2, 1, 1/2; n, -1, 1/2) at n=1/2\neval 3j(1, 1, 1; n, -1, 0) at n=1") == "");
    // A compound entry is judged by its value: m - 1/2 = 1/2 under j = 1/2.
    CHECK(lowering_error("eval 3j(1/2, 1, 1/2; m-1/2, -1, 1/2) at m=1") == "");
    // A name under j's of both parities: one column admits it, the other's selection rule
    // makes the symbol 0 (DLMF 34.2: j - m must be an integer).
    CHECK(lowering_error("eval 3j(1/2, 1, 1/2; n, n, -2*n) at n=1/2") == "");
    // No column admits it: refused, the compound entry named with its value.
    CHECK_THAT(lowering_error("eval 3j(1, 1, 1; n, -1, 0) at n=1/2"),
               Catch::Contains("its angular momentum is 1, and j - m must be an integer"));
    CHECK_THAT(lowering_error("eval 3j(1, 1, 1; n+1/2, -1, 0) at n=1"),
               Catch::Contains("its entry n+1/2 = 3/2 stands under the angular momentum 1"));
}

TEST_CASE("a value inadmissible in one column of two evaluates to 0", "[model][eval]") {
    // 3j(1/2, 1, 1/2; 1/2, 1/2, -1): the middle column has j - m = 1/2 (DLMF 34.2), so 0.
    const auto r = testing::run_cli({"eval", "-e", "eval 3j(1/2, 1, 1/2; n, n, -2*n) at n=1/2"});
    CHECK(r.code == 0);
    CHECK_THAT(r.out, Catch::StartsWith("0"));
}
