// The public interface, used as a C++ program uses it: only couplet/couplet.hpp, plus GSL for
// an outside value and nlohmann to read the JSON back.
#include <gsl/gsl_sf_coupling.h>
#include <catch2/catch.hpp>

#include <cmath>
#include <nlohmann/json.hpp>
#include <stdexcept>

#include "couplet/couplet.hpp"

TEST_CASE("the front door simplifies, verifies and records the derivation", "[api]") {
    couplet::options o;
    o.steps = true;
    couplet::result r = couplet::simplify("sum(ma, mb : 3j(a, b, c; ma, mb, mc) * 3j(a, b, d; ma, mb, md))", o);
    // DLMF 34.3.16: the orthogonality of 3j symbols over ma, mb.
    CHECK(couplet::to_text(r.answer) == "delta(c, d)*delta(mc, md)*tri(a, b, c)/(2*c+1)");
    CHECK(r.checked.attempted);
    CHECK(r.checked.verified);
    CHECK(r.checked.points > 0);
    REQUIRE(r.steps);
    CHECK_FALSE(r.steps->empty());
    CHECK(r.steps->front().reference.find("DLMF") != std::string::npos);
    auto json = nlohmann::json::parse(couplet::to_json(r));
    CHECK(json.at("kind") == "simplify");
    CHECK(json.at("verified") == true);
    CHECK(json.at("steps").size() == r.steps->size());
    // Without the option there is no derivation at all (not an empty one).
    CHECK_FALSE(couplet::simplify("6j{a, b, c; d, e, f}").steps);
}

TEST_CASE("the front door names the missing phase of a wrong identity", "[api]") {
    // DLMF 34.3.9: swapping two columns of a 3j multiplies it by (-1)^(a+b+c).
    couplet::result r = couplet::check("3j(a, b, c; ma, mb, mc) == 3j(b, a, c; mb, ma, mc)");
    REQUIRE(r.check);
    CHECK(r.check->result == couplet::verdict::fails_by_phase);
    REQUIRE(r.check->missing_phase);
    CHECK(couplet::to_text(*r.check->missing_phase) == "a+b+c");
    CHECK(r.failed());
    CHECK(couplet::to_latex(r).find("\\neq") != std::string::npos);
    CHECK_FALSE(couplet::check("3j(a, b, c; ma, mb, mc) == (-1)^(a+b+c) * 3j(b, a, c; mb, ma, mc)").failed());
}

TEST_CASE("the front door evaluates exactly", "[api]") {
    couplet::result r = couplet::eval("6j{1, 1, 1; 1, 1, 1}");
    REQUIRE(r.value);
    CHECK(r.value->exact == "1/6");
    CHECK(r.value->rational);
    // GSL 2.7 gsl_sf_coupling_6j (doubled arguments).
    CHECK(std::stod(r.value->decimal) == Approx(gsl_sf_coupling_6j(2, 2, 2, 2, 2, 2)));
    couplet::result cg = couplet::eval("<1 1, 1/2 -1/2 | 3/2 1/2>");
    REQUIRE(cg.value);
    CHECK_FALSE(cg.value->rational);
    CHECK(cg.value->exact == "sqrt(3)/3");  // sqrt(1/3), common practice, no source
}

TEST_CASE("a program runs statement by statement and stops at the first bad one", "[api]") {
    couplet::program p =
        couplet::parse("let W = 6j{a, b, c; d, e, f}\neval 6j{1, 1, 1; 1, 1, 1}\neval 1/x at x=0\n", "f.cpl");
    REQUIRE(p.size() == 3);
    CHECK(p[0].kind == couplet::statement_kind::definition);
    CHECK(p[0].name == "W");
    std::vector<couplet::statement_kind> seen;
    try {
        couplet::run_all(p, {}, [&](const couplet::result& r) { seen.push_back(r.done); });
        FAIL("division by zero was not reported");
    } catch (const couplet::input_error& e) {
        CHECK(e.line() == 3);
        CHECK(e.column() == 1);
        CHECK(e.diagnostic().find("f.cpl:3:1: error:") == 0);
        CHECK(nlohmann::json::parse(couplet::to_json(e)).at("line") == 3);
    }
    CHECK(seen ==
          std::vector<couplet::statement_kind>{couplet::statement_kind::definition, couplet::statement_kind::eval});
    CHECK_THROWS_AS(couplet::parse("6j{a, b"), couplet::input_error);
    CHECK_THROWS_AS(couplet::check("6j{a, b, c; d, e, f}"), couplet::input_error);
}
