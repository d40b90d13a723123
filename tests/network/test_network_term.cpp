// The term analysis: which factors are vertices, which summed projections are lines, which
// projections are open ends, and why a term is not a network.
#include <catch2/catch.hpp>

#include "model/symbols.hpp"
#include "network/term.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

network::term_analysis analyze(const std::string& text) {
    static std::vector<lowered_program> keep;  // the analysis refers to the program's symbols
    keep.push_back(testing::lower_text(text));
    GiNaC::ex e = keep.back().statements.back().value;
    REQUIRE(GiNaC::is_a<index_sum>(e));
    const auto& s = GiNaC::ex_to<index_sum>(e);
    return network::analyze_term(s.body(), s.indices(), keep.back().numbers);
}

}  // namespace

TEST_CASE("a triangle with three open ends: three vertices, three lines, three open ends", "[network][term]") {
    // Common practice, no source: the Yutsis picture of a sum of three 3j pairwise sharing an m.
    auto a = analyze(
        "sum(u1, u2, u3 : (-1)^(u1 + u2 + u3 + l1 + l2 + l3) * 7 * 6j{a, b, c; d, e, f}"
        " * 3j(j1, l2, l3; m1, u2, -u3) * 3j(l1, j2, l3; -u1, m2, u3) * 3j(l1, l2, j3; u1, -u2, m3))");
    REQUIRE(a.term);
    CHECK(a.term->threejs.size() == 3);
    CHECK(a.term->lines.size() == 3);
    CHECK(a.term->open_ends.size() == 3);
    for (const auto& l : a.term->lines) CHECK(l.ends[0] != l.ends[1]);
    bool sixj_in_rest = false;
    for (auto it = a.term->rest.preorder_begin(); it != a.term->rest.preorder_end(); ++it)
        sixj_in_rest = sixj_in_rest || kind_of(*it) == symbol_kind::sixj;
    CHECK(sixj_in_rest);  // an m-independent factor stays outside the network
    CHECK_FALSE(a.term->exponent.is_zero());
}

TEST_CASE("a squared 3j counts twice and a loop joins a vertex to itself", "[network][term]") {
    auto a = analyze("sum(m1, m2, m3 : 3j(a, b, c; m1, m2, m3)^2)");
    REQUIRE(a.term);
    CHECK(a.term->threejs.size() == 2);
    CHECK(a.term->lines.size() == 3);
    auto b = analyze("sum(m : (-1)^(j - m) * 3j(j, j, c; m, -m, g))");
    REQUIRE(b.term);
    CHECK(b.term->lines.size() == 1);
    CHECK(b.term->lines[0].ends[0] == b.term->lines[0].ends[1]);
}

TEST_CASE("terms that are not networks say why", "[network][term]") {
    CHECK_FALSE(analyze("sum(m : 3j(a, b, c; m, M, -m - M))").term);                     // a mixed entry
    CHECK_FALSE(analyze("sum(m : 3j(a, b, c; m, M, N))").term);                          // one slot only
    CHECK_FALSE(analyze("sum(m : 3j(a, b, c; m, M, N) * 3j(a, b, c; m, m, N) )").term);  // three slots
    CHECK_FALSE(analyze("sum(m : delta(m, M) * 3j(a, b, c; m, M, N) * 3j(a, b, c; m, M, N))").term);
    auto a = analyze("sum(m : 3j(a, b, c; m, M, N))");
    CHECK(a.why_not.find("fewer than two") != std::string::npos);
}
