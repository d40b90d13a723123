// proj(j, m): the factor an answer carries when a reduction removed every column of a free
// projection m that a phase still holds.  The printed answer must read back as input (it is
// refused without the factor: nothing else says (-1)^m is an integer power), and keep its value.
#include <catch2/catch.hpp>

#include "../rules/cli_simplify.hpp"
#include "eval/evaluate.hpp"
#include "support.hpp"

using namespace couplet;
using couplet::testing::count_of;
using couplet::testing::run_cli;
using couplet::testing::trimmed;

namespace {

// The orthogonality of 3j symbols (DLMF 34.3.18) with a phase in the free projection m_d: the
// sum leaves delta(c, d) delta(m_c, -m_d) tri(a, b, c)/(2c+1), and no column of m_d.
const char* const orthogonality_with_phase =
    "(-1)^(2*a+c+md) * sum(ma, mb: 3j(a, b, c; ma, mb, mc) * 3j(a, b, d; ma, mb, -md))";

}  // namespace

TEST_CASE("a phase whose projection lost its column keeps proj(j, m), and the answer reads back", "[simplify][cli]") {
    auto first = run_cli({"simplify", "-e", orthogonality_with_phase});
    INFO("stderr: " << first.err);
    REQUIRE(first.code == 0);
    const std::string answer = trimmed(first.out);
    INFO(answer);
    // DLMF 34.3.18: two deltas, the triangle and 1/(2c+1); no sum and no 3j left.
    CHECK(count_of(answer, "sum(") == 0);
    CHECK(count_of(answer, "3j(") == 0);
    CHECK(count_of(answer, "delta(") == 2);
    CHECK(count_of(answer, "proj(") == 1);
    // Read back on its own, it simplifies (and self-verifies) again.
    auto again = run_cli({"simplify", "-e", answer});
    INFO("stderr of the second run: " << again.err);
    CHECK(again.code == 0);
    CHECK(count_of(again.out, "proj(") == 1);
}

TEST_CASE("proj(j, m) keeps the value of the input at every admissible point with j <= 2", "[simplify][cli]") {
    auto r = run_cli({"simplify", "-e", orthogonality_with_phase});
    REQUIRE(r.code == 0);
    const lowered_program both = couplet::testing::lower_text(std::string(orthogonality_with_phase) + "\n" + r.out);
    const compiled_expression input(both.statements[0].value, both.numbers),
        answer(both.statements[1].value, both.numbers);
    auto sym = [&](const char* n) { return both.numbers.find(n)->symbol; };
    int compared = 0, nonzero = 0;
    for (int a = 0; a <= 4; ++a)
        for (int b = 0; b <= 4; ++b)
            for (int c = 0; c <= 4; ++c)
                for (int d = c % 2; d <= 4; d += 2)  // c + d integral: the input's phase is defined
                    for (int mc = -c; mc <= c; mc += 2)
                        for (int md = -d; md <= d; md += 2) {
                            const assignment at{{sym("a"), GiNaC::numeric(a, 2)},   {sym("b"), GiNaC::numeric(b, 2)},
                                                {sym("c"), GiNaC::numeric(c, 2)},   {sym("d"), GiNaC::numeric(d, 2)},
                                                {sym("mc"), GiNaC::numeric(mc, 2)}, {sym("md"), GiNaC::numeric(md, 2)}};
                            INFO(describe(at));
                            const exact::number expected = input.at(at);
                            CHECK(answer.at(at) == expected);
                            ++compared;
                            if (expected != exact::number(0L)) ++nonzero;
                        }
    CHECK(compared > 1000);
    CHECK(nonzero > 20);
}

TEST_CASE("proj(j, m) is 1 exactly for m = -j, -j+1, ..., j", "[simplify][eval]") {
    // The definition of the projections of j (common practice, no source).
    auto value = [](const std::string& e) { return trimmed(run_cli({"eval", "-e", "eval " + e}).out); };
    CHECK(value("proj(1, 1)").rfind("1 ", 0) == 0);
    CHECK(value("proj(3/2, -3/2)").rfind("1 ", 0) == 0);
    CHECK(value("proj(1, 2)").rfind("0 ", 0) == 0);
    CHECK(value("proj(1/2, 1)").rfind("0 ", 0) == 0);  // j - m is not an integer
    // 2j+1 projections.
    CHECK(value("sum(m: proj(5/2, m))").rfind("6 ", 0) == 0);
}

TEST_CASE("proj(j, m) beside a column (j, m) is dropped: the column says as much", "[simplify][cli]") {
    auto r = run_cli({"simplify", "-e", "proj(j, m) * 3j(j, k, l; m, q, -m-q)"});
    INFO(r.err);
    REQUIRE(r.code == 0);
    CHECK(trimmed(r.out) == "3j(j, k, l; m, q, -m-q)");
    auto shifted = run_cli({"simplify", "-e", "proj(j, 1-m) * 3j(j, k, l; m-1, q, -m-q+1)"});
    REQUIRE(shifted.code == 0);
    CHECK(count_of(shifted.out, "proj(") == 0);
}

TEST_CASE("proj takes an angular momentum and its projection", "[simplify][cli]") {
    auto arity = run_cli({"simplify", "-e", "proj(j)"});
    CHECK(arity.code == 2);
    CHECK(arity.err.find("proj takes 2 arguments") != std::string::npos);
    auto roles = run_cli({"simplify", "-e", "proj(m, j) * 3j(j, k, l; m, q, -m-q)"});
    CHECK(roles.code == 2);
    CHECK(roles.err.find("1:17:") != std::string::npos);
}

TEST_CASE("LaTeX writes proj(j, m) as a bracket [|m| <= j] and explains it once", "[simplify][latex]") {
    auto r = run_cli({"latex", "-e", std::string("simplify ") + orthogonality_with_phase});
    REQUIRE(r.code == 0);
    CHECK(count_of(r.out, "[\\,|\\mathit{md}| \\le d\\,]") == 1);
    CHECK(count_of(r.out, "is $1$ when $m$ is one of the projections") == 1);
}

TEST_CASE("a phase outside a sum is never rewritten into the sum's indices", "[simplify][cli]") {
    // Inside the sum m_c = -m_a-m_b = m_d (the zero sums of the two 3j, DLMF 34.3.1's selection
    // rule), but m_c is bound there: outside, (-1)^(c+md) must not become (-1)^(c+mc).
    for (const char* input : {"(-1)^(c+md) * sum(ma, mb, mc: 3j(a, b, c; ma, mb, mc) * 3j(a, b, d; ma, mb, md))",
                              "(-1)^(2*a+c+md) * sum(ma, mb, mc: 3j(a, b, c; ma, mb, mc) * 3j(a, b, d; ma, mb, md))"}) {
        INFO(input);
        auto r = run_cli({"simplify", "-e", input});
        INFO("stderr: " << r.err);
        CHECK(r.code == 0);  // was 3: the answer held a free mc and failed its own check
        CHECK(r.err.find("internal check failed") == std::string::npos);
        const std::string answer = trimmed(r.out);
        const std::string outside = answer.substr(0, answer.find("sum("));
        CHECK(outside.find("mc") == std::string::npos);
    }
}

TEST_CASE("the step that adds proj(j, m) has its own name in --steps", "[simplify][cli]") {
    auto r = run_cli({"simplify", "--steps", "-e", orthogonality_with_phase});
    REQUIRE(r.code == 0);
    CHECK(r.out.find("proj(j, m) kept where a phase holds m and no column does") != std::string::npos);
    // The answer comes first; among the steps after it, that step's "after" is where proj
    // first appears (m_d lost its columns to c = d).
    const std::size_t steps = r.out.find("\n#");
    const std::size_t step = r.out.find("proj(j, m) kept where");
    REQUIRE(steps != std::string::npos);
    REQUIRE(step != std::string::npos);
    CHECK(r.out.substr(steps, step - steps).find("proj(d, md)") == std::string::npos);
    CHECK(r.out.find("proj(d, md)", step) != std::string::npos);
}
