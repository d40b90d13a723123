// Whole-expression exact evaluation: sums over projections and over angular momenta, phases,
// roots, deltas, and the errors that stop an evaluation.
#include <catch2/catch.hpp>

#include <functional>

#include "admissible.hpp"
#include "eval/evaluate.hpp"
#include "support.hpp"

using namespace couplet;
using exact::number;

namespace {

struct prepared {
    lowered_program program;
    std::vector<compiled_expression> sides;

    explicit prepared(const std::string& text) : program(testing::lower_text(text)) {
        for (const auto& s : program.statements) {
            sides.emplace_back(s.value, program.numbers);
            if (s.kind == request_kind::check) sides.emplace_back(s.rhs, program.numbers);
        }
    }
    GiNaC::symbol sym(const std::string& name) const { return program.numbers.find(name)->symbol; }
};

// Every assignment of `names` to 0, 1/2, ..., max (projections to -max..max).
void for_each_assignment(const prepared& p, const std::vector<std::string>& names, int twice_max,
                         const std::function<void(const assignment&)>& body) {
    std::vector<int> twice(names.size(), 0);
    std::vector<int> low(names.size(), 0);
    for (std::size_t k = 0; k < names.size(); ++k)
        if (p.program.numbers.find(names[k])->role == qn_role::projection) low[k] = twice[k] = -twice_max;
    while (true) {
        assignment at;
        for (std::size_t k = 0; k < names.size(); ++k) at[p.sym(names[k])] = GiNaC::numeric(twice[k], 2);
        body(at);
        std::size_t k = 0;
        while (k < names.size() && ++twice[k] > twice_max) twice[k++] = low[k];
        if (k == names.size()) return;
    }
}

number sqrt_of(long n) { return number::sqrt_of(cln::cl_RA(n)); }

}  // namespace

TEST_CASE("sum over m of (-1)^(j-m) 3j(j j 0 | m -m 0) is sqrt(2j+1)", "[eval]") {
    // DLMF 34.3.1 gives each term as 1/sqrt(2j+1); there are 2j+1 terms.
    prepared p("sum(m : (-1)^(j-m) * 3j(j, j, 0; m, -m, 0))");
    for (int twice_j = 0; twice_j <= 16; ++twice_j) {
        assignment at{{p.sym("j"), GiNaC::numeric(twice_j, 2)}};
        CHECK(p.sides[0].at(at) == sqrt_of(twice_j + 1));
    }
}

TEST_CASE("3j orthogonality over m1, m2 (DLMF 34.3.16)", "[eval]") {
    prepared p("(2*j3+1) * sum(m1, m2 : 3j(j1, j2, j3; m1, m2, m3) * 3j(j1, j2, k3; m1, m2, n3))");
    int checked = 0;
    for_each_assignment(p, {"j1", "j2", "j3", "k3", "m3", "n3"}, 3, [&](const assignment& at) {
        auto v = [&](const char* n) { return at.at(p.sym(n)); };
        bool admissible_triangle = abs(v("j1") - v("j2")) <= v("j3") && v("j3") <= v("j1") + v("j2") &&
                                   (v("j1") + v("j2") + v("j3")).is_integer() && abs(v("m3")) <= v("j3") &&
                                   (v("j3") - v("m3")).is_integer();
        bool expected_one = admissible_triangle && v("j3") == v("k3") && v("m3") == v("n3");
        INFO(describe(at));
        CHECK(p.sides[0].at(at) == number(expected_one ? 1L : 0L));
        ++checked;
    });
    CHECK(checked > 1000);
}

TEST_CASE("6j orthogonality summed over an angular momentum (DLMF 34.5.14)", "[eval]") {
    // sum_x (2x+1)(2p+1) {a b x; c d p}{c d x; a b q} = delta(p, q) when (a d p), (b c p)
    // are triads; x is bounded only by the triangles of the 6j symbols.
    prepared p(
        "(2*p+1) * sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{c, d, x; a, b, q})\n"
        "delta(p, q) * tri(a, d, p) * tri(b, c, p) * tri(a, b, p) * 0 + delta(p, q) * tri(a, d, p) * tri(b, c, p)");
    int nonzero = 0;
    for_each_assignment(p, {"a", "b", "c", "d", "p", "q"}, 4, [&](const assignment& at) {
        number lhs = p.sides[0].at(at);
        INFO(describe(at));
        // The right side needs the triads the left side's symbols impose through x as well:
        // compare only where some x makes both 6j symbols admissible, i.e. lhs != 0 or p != q.
        if (!lhs.is_zero()) {
            CHECK(lhs == p.sides[1].at(at));
            ++nonzero;
        } else if (at.at(p.sym("p")) != at.at(p.sym("q"))) {
            CHECK(p.sides[1].at(at).is_zero());
        }
    });
    CHECK(nonzero > 100);
}

TEST_CASE("a 9j equals its sum over x of three 6j symbols (DLMF 34.6.2)", "[eval]") {
    prepared p(
        "9j{a, b, c; d, e, f; g, h, i}\n"
        "sum(x : (-1)^(2*x) * (2*x+1) * 6j{a, b, c; f, i, x} * 6j{d, e, f; b, x, h} * 6j{g, h, i; x, a, d})");
    testing::admissible_points gen(34062, 6);
    int nonzero = 0;
    for (int n = 0; n < 1000; ++n) {
        assignment at;
        std::vector<int> twice = gen.ninej();
        int k = 0;
        for (const char* name : {"a", "b", "c", "d", "e", "f", "g", "h", "i"})
            at[p.sym(name)] = GiNaC::numeric(twice[k++], 2);
        number direct = p.sides[0].at(at);
        INFO(describe(at));
        CHECK(direct == p.sides[1].at(at));
        nonzero += !direct.is_zero();
    }
    CHECK(nonzero > 500);
}

TEST_CASE("Clebsch-Gordan agrees with its 3j form (DLMF 34.1.1)", "[eval]") {
    prepared p("<j1 m1, j2 m2 | J M>\n(-1)^(j1-j2+M) * sqrt(2*J+1) * 3j(j1, j2, J; m1, m2, -M)");
    int checked = 0;
    for_each_assignment(p, {"j1", "m1", "j2", "m2", "J", "M"}, 2, [&](const assignment& at) {
        auto v = [&](const char* n) { return at.at(p.sym(n)); };
        // The phase needs j1-j2+M integer, which every admissible triad implies; skip the rest.
        if (!(v("j1") - v("m1")).is_integer() || !(v("j2") - v("m2")).is_integer() || !(v("J") - v("M")).is_integer() ||
            !(v("j1") + v("j2") + v("J")).is_integer())
            return;
        INFO(describe(at));
        CHECK(p.sides[0].at(at) == p.sides[1].at(at));
        ++checked;
    });
    CHECK(checked > 200);
}

TEST_CASE("declared parities restrict a summation index", "[eval]") {
    // With x integer, sum_x (2x+1) over the triangle of (1/2... ) keeps only integer x.
    prepared p("int x\nsum(x : (2*x+1) * tri(a, b, x))");
    assignment at{{p.sym("a"), GiNaC::numeric(2)}, {p.sym("b"), GiNaC::numeric(1)}};
    // Triangle (2, 1, x): x = 1, 2, 3 -> 3 + 5 + 7 = (2a+1)(2b+1), common practice, no source.
    CHECK(p.sides[1].at(at) == number(15L));
}

TEST_CASE("evaluation errors name their cause", "[eval]") {
    auto message_of = [](const std::string& text, const std::string& value_text) {
        auto r = testing::run_cli({"eval", "-e", text + (value_text.empty() ? "" : " at " + value_text)});
        CHECK(r.code == 2);
        return r.err;
    };
    CHECK_THAT(message_of("(-1)^(j)", "j=1/2"), Catch::Contains("the exponent of (-1)^(j) is 1/2"));
    CHECK_THAT(message_of("sum(x : (2*x+1))", ""), Catch::Contains("nothing bounds the summation index 'x'"));
    CHECK_THAT(message_of("6j{a, b, c; 1, 1, 1}", "a=1"), Catch::Contains("no value given for b, c"));
    CHECK_THAT(message_of("3j(j, j, 0; 0, 0, 0)", "j=20000"), Catch::Contains("too large"));
    CHECK_THAT(message_of("sqrt(a-2)", "a=1"), Catch::Contains("sqrt of -1"));
}

TEST_CASE("a summation index may share its name with a free quantum number", "[eval]") {
    prepared p("m * sum(m : 3j(j, j, 0; m, -m, 0)^2)");
    assignment at{{p.sym("j"), GiNaC::numeric(1)}, {p.sym("m"), GiNaC::numeric(5)}};
    // sum_m 3j(1 1 0; m -m 0)^2 = 1 (DLMF 34.3.1: each term is 1/3), times the free m = 5.
    CHECK(p.sides[0].at(at) == number(5L));
}
