// simplify --steps: the derivation trace after each result, as comments in text (so the output
// stays valid input) and as a structured list in JSON.
#include <catch2/catch.hpp>

#include "support.hpp"

using couplet::testing::run_cli;

TEST_CASE("steps: lists each applied rule with its reference", "[cli][steps]") {
    // 6j orthogonality, DLMF 34.5.14, with the columns of the second 6j permuted.
    const std::string input = "sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{d, c, x; b, a, q})";
    auto r = run_cli({"simplify", "--steps", "-e", input});
    INFO(r.out << r.err);
    REQUIRE(r.code == 0);
    CHECK(r.out.find("#   6j orthogonality (DLMF 34.5.14)") != std::string::npos);
    CHECK(r.out.find("#     before: sum(x :") != std::string::npos);
    // Every line after the first is a comment: the output re-reads as input.
    auto comments = r.out.substr(r.out.find('\n') + 1);
    for (std::size_t at = 0; at < comments.size(); at = comments.find('\n', at) + 1) CHECK(comments[at] == '#');
    CHECK(run_cli({"simplify", "--no-verify", "-"}, r.out).code == 0);

    auto json = run_cli({"simplify", "--steps", "--format", "json", "-e", input});
    auto record = nlohmann::json::parse(json.out);
    REQUIRE(record.at("steps").is_array());
    bool found = false;
    for (const auto& step : record.at("steps"))
        found = found || (step.at("reference") == "DLMF 34.5.14" && step.contains("before") && step.contains("after"));
    CHECK(found);
    CHECK_FALSE(record.contains("steps_text"));
}

TEST_CASE("steps: says so when nothing applies, and the network moves are listed", "[cli][steps]") {
    auto none = run_cli({"simplify", "--steps", "-e", "6j{a, b, c; d, e, f}"});
    CHECK(none.out.find("# ") != std::string::npos);
    CHECK(none.out.find("no move or rule applied") != std::string::npos);
    // CG orthogonality, DLMF 34.3.16 through the CG-3j relation DLMF 34.1.1.
    auto bubble = run_cli({"simplify", "--steps", "-e", "sum(m1, m2 : <a m1, b m2 | c M> * <a m1, b m2 | d Mp>)"});
    CHECK(bubble.out.find("(DLMF 34.3.16)") != std::string::npos);
}

TEST_CASE("steps: each network move shows the term it changed, with phases reduced", "[cli][steps]") {
    // An invented square of four 3j with four open lines: an interchange, then the triangle
    // (DLMF 34.5.23), then the projection the selection rule fixes.
    const std::string square =
        "sum(m1, m2, m3, m4 : (-1)^(a-m1+b-m2+c-m3+d-m4) * 3j(a, d, e; m1, -m4, M1) * 3j(b, a, f; m2, -m1, M2)"
        " * 3j(c, b, g; m3, -m2, M3) * 3j(d, c, h; m4, -m3, M4))";
    auto r = run_cli({"simplify", "--steps", "--format", "json", "-e", square});
    INFO(r.out << r.err);
    REQUIRE(r.code == 0);
    auto steps = nlohmann::json::parse(r.out).at("steps");
    REQUIRE(steps.size() >= 3);
    for (std::size_t k = 1; k < steps.size(); ++k) {
        CHECK(steps[k].at("before") != steps[k - 1].at("before"));
        CHECK(steps[k].at("before") != steps[k].at("after"));
    }
    // The input's metric phase (-1)^(a-m1+...) is printed reduced, not as the move took it.
    CHECK(steps[0].at("before").get<std::string>().find("-m1-m2-m3-m4") == std::string::npos);
}
