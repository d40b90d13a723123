// The second 3j orthogonality relation (DLMF 34.3.17) through `couplet simplify`: each input is
// written away from its textbook form, the printed result must be the two deltas, and input and
// result are compared exactly at random admissible points.  Inputs the identity does not cover
// must stay sums, and still be correct.
#include <catch2/catch.hpp>

#include <nlohmann/json.hpp>

#include "network_points.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

struct simplified {
    std::string result;
    std::string steps;
    testing::agreement agreement;
};

simplified simplify_and_compare(const std::string& input, unsigned seed) {
    auto r = testing::run_cli({"simplify", "--steps", "--format", "json", "-e", input});
    INFO("input: " << input << "\nstderr: " << r.err);
    REQUIRE(r.code == 0);  // 0: the command line's own exact check passed
    auto json = nlohmann::json::parse(r.out);
    std::string result = json.at("result");
    auto program = testing::lower_text(input + "\n" + result);
    auto a = testing::network_agreement_at_points(program.statements[0].value, program.statements[1].value,
                                                  program.numbers, seed, 200, 6);
    return {result, json.at("steps").dump(), a};
}

void require_agreement(const simplified& s) {
    INFO("result: " << s.result);
    CHECK(s.agreement.points >= 100);
    CHECK(s.agreement.equal == s.agreement.points);
    CHECK(s.agreement.nonzero >= 10);
}

}  // namespace

TEST_CASE("3j completeness: disguised sums over J and M become two deltas", "[network][completeness]") {
    // DLMF 34.3.17: sum(j3, m3 : (2 j3 + 1) 3j(j1 j2 j3; m1 m2 m3) 3j(j1 j2 j3; m1' m2' m3))
    //               = delta(m1, m1') delta(m2, m2').
    const char* inputs[] = {
        // Clebsch-Gordan form, two nested sums (DLMF 34.1.1 turns it into the 3j form).
        "sum(J : sum(M : <a ma, b mb | J M> * <a na, b nb | J M>))",
        // Columns rotated and swapped, bottom row negated, the weight outside the inner sum, and
        // the (-1)^(a+b+J) of the odd permutation written out to cancel it.
        "sum(J : (2*J+1) * sum(M : (-1)^(a+b+J) * 3j(J, b, a; -M, -mb, -ma) * 3j(b, a, J; nb, na, M)))",
        // One sum over both, columns rotated, an extra (-1)^(2J+2a+2b) (J enters with an even
        // multiple) and a factor free of J and M.
        "sum(M, J : sqrt(2*a+1) * (-1)^(2*J+2*a+2*b) * (2*J+1) * 3j(J, a, b; M, ma, mb) * 3j(a, b, J; na, nb, M))",
    };
    unsigned seed = 3417;
    for (const char* input : inputs) {
        auto s = simplify_and_compare(input, seed++);
        INFO("input: " << input << "\nresult: " << s.result);
        CHECK(s.result.find("sum(") == std::string::npos);
        CHECK(s.result.find("delta(ma, na)") != std::string::npos);
        CHECK(s.result.find("delta(mb, nb)") != std::string::npos);
        CHECK(s.steps.find("DLMF 34.3.17") != std::string::npos);
        require_agreement(s);
    }
}

TEST_CASE("3j completeness: sums it does not cover stay sums and stay correct", "[network][completeness]") {
    const char* inputs[] = {
        // (-1)^(J-M) is not a phase the identity can absorb: J enters with an odd multiple.
        "sum(J, M : (2*J+1) * (-1)^(J-M) * 3j(a, b, J; ma, mb, M) * 3j(a, b, J; na, nb, M))",
        // A shifted projection: a delta could count ma+1 beyond the range of a.
        "sum(J, M : (2*J+1) * 3j(a, b, J; ma+1, mb, M) * 3j(a, b, J; na, nb, M))",
        // A factor depending on J.
        "sum(J, M : (2*J+1) * 6j{J, a, b; 1, 1, 1} * 3j(a, b, J; ma, mb, M) * 3j(a, b, J; na, nb, M))",
    };
    unsigned seed = 3418;
    for (const char* input : inputs) {
        auto s = simplify_and_compare(input, seed++);
        INFO("input: " << input << "\nresult: " << s.result);
        CHECK(s.steps.find("DLMF 34.3.17") == std::string::npos);
        CHECK(s.agreement.equal == s.agreement.points);
    }
}

TEST_CASE("3j completeness: a projection some sum binds is not turned into a delta", "[network][completeness]") {
    // The two 3j are what bound the sum over m; the deltas alone would leave it unbounded.
    auto r = testing::run_cli(
        {"simplify", "--steps", "-e", "sum(m : sum(J, M : (2*J+1) * 3j(a, b, J; m, mb, M) * 3j(a, b, J; na, nb, M)))"});
    INFO("stderr: " << r.err);
    REQUIRE(r.code == 0);
    CHECK(r.out.find("DLMF 34.3.17") == std::string::npos);
}

TEST_CASE("a flat sum over J, M and projections is reduced as the iterated sum", "[network][completeness]") {
    // DLMF 34.3.16 summed over the m's gives tri(a, b, J); then sum over J of (2J+1) over the
    // triangle is (2a+1)(2b+1) (common practice, no source).
    auto s =
        simplify_and_compare("sum(J, M, m1, m2 : (2*J+1) * 3j(a, b, J; m1, m2, M) * 3j(J, a, b; M, m1, m2))", 3419);
    INFO("result: " << s.result);
    CHECK(s.result == "(2*a+1)*(2*b+1)");
    CHECK(s.agreement.equal == s.agreement.points);
    CHECK(s.agreement.points >= 100);
}
