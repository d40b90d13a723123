// Every symmetry transformation and every canonicalization is checked by the exact evaluator
// at 1000 random admissible points.
#include <catch2/catch.hpp>

#include "admissible.hpp"
#include "canonical/symmetries.hpp"
#include "eval/evaluate.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

constexpr int points_per_transformation = 1000;

struct symbolic {
    lowered_program program;
    GiNaC::ex symbol;
    std::vector<GiNaC::symbol> names;

    symbolic(const std::string& text, const std::vector<std::string>& order)
        : program(testing::lower_text(text)), symbol(program.statements.back().value) {
        for (const auto& n : order) names.push_back(program.numbers.find(n)->symbol);
    }

    assignment at(const std::vector<int>& twice) const {
        assignment a;
        for (std::size_t k = 0; k < names.size(); ++k) a[names[k]] = GiNaC::numeric(twice[k], 2);
        return a;
    }
};

const char* threej_text = "3j(a, b, c; ma, mb, mc)";
const std::vector<std::string> threej_names{"a", "b", "c", "ma", "mb", "mc"};
const char* sixj_text = "6j{a, b, c; d, e, f}";
const std::vector<std::string> sixj_names{"a", "b", "c", "d", "e", "f"};
const char* ninej_text = "9j{a, b, c; d, e, f; g, h, i}";
const std::vector<std::string> ninej_names{"a", "b", "c", "d", "e", "f", "g", "h", "i"};

// symbol == (-1)^phase * result at `count` points drawn by `draw`.
template <typename Draw>
void check_transformation(const symbolic& s, const symmetry::transformed& t, Draw draw, const std::string& what) {
    compiled_expression lhs(s.symbol, s.program.numbers);
    compiled_expression rhs(make_phase(t.phase) * t.symbol, s.program.numbers);
    int nonzero = 0;
    for (int n = 0; n < points_per_transformation; ++n) {
        assignment at = s.at(draw());
        exact::number l = lhs.at(at);
        INFO(what << " at " << describe(at) << ": " << to_text(t.symbol) << " with phase " << to_text(t.phase));
        REQUIRE(l == rhs.at(at));
        nonzero += !l.is_zero();
    }
    CHECK(nonzero > points_per_transformation / 10);
}

}  // namespace

TEST_CASE("3j generators, Regge's included, hold exactly (DLMF 34.3.8-34.3.11)", "[symmetry]") {
    symbolic s(threej_text, threej_names);
    testing::admissible_points gen(3811, 10);
    for (const auto& g : symmetry::threej_symmetries())
        check_transformation(
            s, g.apply(s.symbol), [&] { return gen.threej(); }, g.name + " (" + g.reference + ")");
}

TEST_CASE("6j generators, Regge's included, hold exactly (DLMF 34.5.8-34.5.9)", "[symmetry]") {
    symbolic s(sixj_text, sixj_names);
    testing::admissible_points gen(3458, 10);
    for (const auto& g : symmetry::sixj_symmetries())
        check_transformation(
            s, g.apply(s.symbol), [&] { return gen.sixj(); }, g.name + " (" + g.reference + ")");
}

TEST_CASE("9j generators hold exactly (DLMF 34.7(ii))", "[symmetry]") {
    symbolic s(ninej_text, ninej_names);
    testing::admissible_points gen(347, 6);
    for (const auto& g : symmetry::ninej_symmetries())
        check_transformation(
            s, g.apply(s.symbol), [&] { return gen.ninej(); }, g.name + " (" + g.reference + ")");
}

TEST_CASE("the orbits have the classical sizes and every arrangement holds", "[symmetry][slow]") {
    symbolic s3(threej_text, threej_names), s6(sixj_text, sixj_names), s9(ninej_text, ninej_names);
    auto o3 = symmetry::threej_orbit(s3.symbol);
    auto o6 = symmetry::sixj_orbit(s6.symbol);
    auto o9 = symmetry::ninej_orbit(s9.symbol);
    // 12, 24 and 72 classical symmetries: common practice, no source (DLMF 34.3(ii), 34.5(ii), 34.7(ii)).
    auto distinct = [](const std::vector<symmetry::transformed>& o) {
        std::set<std::string> seen;
        for (const auto& t : o) seen.insert(to_text(t.symbol));
        return seen.size();
    };
    CHECK(distinct(o3) == 12);
    CHECK(distinct(o6) == 24);
    CHECK(distinct(o9) == 72);
    testing::admissible_points gen(1234, 8);
    for (const auto& t : o3)
        check_transformation(
            s3, t, [&] { return gen.threej(); }, "3j arrangement");
    for (const auto& t : o6)
        check_transformation(
            s6, t, [&] { return gen.sixj(); }, "6j arrangement");
    testing::admissible_points gen9(4321, 4);
    for (const auto& t : o9)
        check_transformation(
            s9, t, [&] { return gen9.ninej(); }, "9j arrangement");
}

TEST_CASE("canonical forms do not depend on the arrangement typed", "[symmetry]") {
    symbolic s3(threej_text, threej_names), s6(sixj_text, sixj_names), s9(ninej_text, ninej_names);
    for (const auto* s : {&s3, &s6, &s9}) {
        auto orbit = s->symbol.nops() == 6 && kind_of(s->symbol) == symbol_kind::threej
                         ? symmetry::threej_orbit(s->symbol)
                     : kind_of(s->symbol) == symbol_kind::sixj ? symmetry::sixj_orbit(s->symbol)
                                                               : symmetry::ninej_orbit(s->symbol);
        std::set<std::string> forms;
        for (const auto& t : orbit) forms.insert(to_text(symmetry::canonical(t.symbol, s->program.numbers).symbol));
        CHECK(forms.size() == 1);
    }
}

TEST_CASE("Clebsch-Gordan to 3j (DLMF 34.1.1) holds exactly", "[symmetry]") {
    symbolic s("<a ma, b mb | c mc>", {"a", "ma", "b", "mb", "c", "mc"});
    testing::admissible_points gen(3411, 10);
    auto draw = [&] {
        auto v = gen.threej();  // (a b c; ma mb -mc) admissible
        return std::vector<int>{v[0], v[3], v[1], v[4], v[2], -v[5]};
    };
    check_transformation(s, {symmetry::clebsch_as_threej(s.symbol), 0}, draw, "CG as 3j");
}

TEST_CASE("3j to Clebsch-Gordan form (DLMF 34.1.1 read backwards) holds exactly", "[symmetry]") {
    symbolic s(threej_text, threej_names);
    testing::admissible_points gen(3412, 10);
    check_transformation(
        s, {symmetry::threej_as_clebsch(s.symbol), 0}, [&] { return gen.threej(); }, "3j as CG");
}

TEST_CASE("simplify examples from the command line", "[symmetry][cli]") {
    auto simplify = [](const std::string& text) {
        auto r = testing::run_cli({"simplify", "--no-verify", "-e", text});
        INFO(r.err);
        REQUIRE(r.code == 0);
        return r.out;
    };
    CHECK(simplify("(-1)^(4*j)") == "1\n");
    CHECK(simplify("(-1)^(2*a+2*b+2*c) * 3j(a, b, c; 0, 0, 0)") == "3j(a, b, c; 0, 0, 0)\n");
    CHECK(simplify("3j(b, a, c; mb, ma, mc)") == "(-1)^(a+b+c)*3j(a, b, c; ma, mb, mc)\n");
    CHECK(simplify("6j{d, e, c; a, b, f}") == simplify("6j{a, b, c; d, e, f}"));
    CHECK(simplify("9j{d, e, f; a, b, c; g, h, i}") == "(-1)^(a+b+c+d+e+f+g+h+i)*9j{a, b, c; d, e, f; g, h, i}\n");
    CHECK(simplify("<j1 m1, j2 m2 | J M>") == "(-1)^(j1-j2+M)*sqrt(2*J+1)*3j(j1, j2, J; m1, m2, -M)\n");
    // Like terms collect once their symbols are canonical.
    CHECK(simplify("3j(a, b, c; ma, mb, mc) - (-1)^(a+b+c) * 3j(b, a, c; mb, ma, mc)") == "0\n");
    CHECK(simplify("6j{a, b, c; d, e, f} + 6j{e, d, c; b, a, f}") == "2*6j{a, b, c; d, e, f}\n");
}

TEST_CASE("simplify refuses a phase that is not always an integer", "[symmetry][cli]") {
    auto r = testing::run_cli({"simplify", "-e", "(-1)^(j) * 3j(j, j, 0; m, -m, 0)"});
    CHECK(r.code == 2);
    CHECK_THAT(r.err, Catch::Contains("(-1)^(j)") && Catch::Contains("not an integer") && Catch::Contains("j=1/2"));
    // Declaring j integer makes it acceptable.
    r = testing::run_cli({"simplify", "-e", "int j; (-1)^(j) * 3j(j, j, 0; m, -m, 0)"});
    CHECK(r.code == 0);
}

TEST_CASE("the option --prefer cg writes results with Clebsch-Gordan coefficients", "[symmetry][cli]") {
    auto r = testing::run_cli({"simplify", "--prefer", "cg", "-e", "<j1 m1, j2 m2 | J M>"});
    CHECK(r.code == 0);
    CHECK(r.out == "<j1 m1, j2 m2 | J M>\n");
    // CG orthogonality summed over m1, m2 (DLMF 34.3.16 in CG form) stays free of 3j symbols.
    r = testing::run_cli(
        {"simplify", "--prefer", "cg", "-e", "sum(m1, m2 : <a m1, b m2 | c m3> * <a m1, b m2 | d m4>)"});
    CHECK(r.code == 0);
    CHECK(r.out == "delta(c, d)*delta(m3, m4)*tri(a, b, c)\n");
    CHECK(testing::run_cli({"simplify", "--prefer", "9j", "-e", "1"}).code == 2);
}
