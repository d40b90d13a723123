// Fitting a phase (-1)^E to the signs at sample points: the sign pattern of a known phase must
// give that phase back (or one equal to it at every point), and a pattern no phase has, none.
#include <catch2/catch.hpp>

#include "eval/evaluate.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "support.hpp"
#include "verify/domain.hpp"
#include "verify/phase_fit.hpp"
#include "verify/sampler.hpp"

using namespace couplet;
using GiNaC::ex;

namespace {

struct fitted {
    std::optional<std::string> text;
    bool reproduces = false;  // the fitted phase has the needed sign at every point
};

// The points of the expression on the last line, and the signs of (-1)^(exponent) there
// (exponent given in the same program, on the line before as `let E = ...`).
fitted fit_signs_of(const std::string& program_text) {
    lowered_program p = testing::lower_text(program_text);
    const ex& target = p.statements.back().value;
    ex exponent = p.statements[p.statements.size() - 2].value;
    verify::sampling_domain d = verify::build_domain({target, exponent}, p.numbers);
    verify::sample_set s = verify::sample_points(d, {});
    compiled_expression sign(make_phase(exponent), p.numbers);
    std::vector<verify::sign_need> needs;
    for (const auto& t : s.points)
        needs.push_back(sign.at(verify::to_assignment(d, t)).sign() < 0 ? verify::sign_need::flip
                                                                        : verify::sign_need::keep);
    fitted out;
    auto e = verify::fit_phase(s.points, needs);
    if (!e) return out;
    out.text = verify::phase_text(verify::exponent_ex(*e, d));
    compiled_expression fit(make_phase(verify::exponent_ex(*e, d)), p.numbers);
    out.reproduces = true;
    for (std::size_t k = 0; k < s.points.size(); ++k) {
        bool flip = fit.at(verify::to_assignment(d, s.points[k])).sign() < 0;
        out.reproduces = out.reproduces && flip == (needs[k] == verify::sign_need::flip);
    }
    return out;
}

}  // namespace

TEST_CASE("the sign pattern of a phase gives the phase back", "[verify]") {
    auto f = fit_signs_of("int a, b\nlet E = a + b\n3j(a, b, c; 0, 0, 0)");
    REQUIRE(f.text);
    CHECK(*f.text == "(-1)^(a+b)");
    CHECK(f.reproduces);
}

TEST_CASE("a projection's phase: j + m and 2j for j of either parity", "[verify]") {
    // j - m is an integer (common practice, no source), so (-1)^(j+m) and (-1)^(2j) are phases.
    auto f = fit_signs_of("let E = j + m\n3j(j, j, 0; m, -m, 0)");
    REQUIRE(f.text);
    CHECK(*f.text == "(-1)^(j+m)");
    CHECK(f.reproduces);
    f = fit_signs_of("let E = 2*j\n3j(j, j, 0; m, -m, 0)");
    REQUIRE(f.text);
    CHECK(*f.text == "(-1)^(2*j)");
    // (-1)^(j-m) equals (-1)^(j+m) times (-1)^(2m), and 2m has the parity of 2j.
    f = fit_signs_of("let E = j - m + 2*j\n3j(j, j, 0; m, -m, 0)");
    REQUIRE(f.text);
    CHECK(*f.text == "(-1)^(j+m)");
}

TEST_CASE("a half-odd number needs a half-odd constant", "[verify]") {
    auto f = fit_signs_of("half s\nlet E = s + 1/2\n3j(s, s, 1; m, -m, 0)");
    REQUIRE(f.text);
    CHECK(f.reproduces);
    CHECK(*f.text == "(-1)^(s+1/2)");
}

TEST_CASE("a constant sign flip is the phase -1", "[verify]") {
    auto f = fit_signs_of("let E = 1\n6j{a, b, c; d, e, f}");
    REQUIRE(f.text);
    CHECK(*f.text == "-1");
}

TEST_CASE("a sign pattern that no phase has is not fitted", "[verify]") {
    // Flipped only at l = 1: a phase (-1)^(c l + c0) of an integer l repeats with period 2.
    lowered_program p = testing::lower_text("int l\n3j(l, l, 0; 0, 0, 0)");
    verify::sampling_domain d = verify::build_domain({p.statements.back().value}, p.numbers);
    verify::sample_set s = verify::sample_points(d, {});
    std::vector<verify::sign_need> needs;
    for (const auto& t : s.points) needs.push_back(t[0] == 2 ? verify::sign_need::flip : verify::sign_need::keep);
    CHECK_FALSE(verify::fit_phase(s.points, needs).has_value());
}
