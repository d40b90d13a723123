// Recoupling coefficients written as coupling trees: the closed forms against the published
// ones (Edmonds 1957, ch. 6), every answer against the definition (the Clebsch-Gordan sum) at
// sampled points, the path search against exhaustive search, and the errors a user meets.
#include <catch2/catch.hpp>

#include <random>

#include "coupling/random_trees.hpp"
#include "coupling/recoupling_form.hpp"
#include "model/coupling_tree.hpp"
#include "print/print.hpp"
#include "rules/cli_simplify.hpp"
#include "support.hpp"

using namespace couplet;
using couplet::testing::count_of;
using couplet::testing::require_exact;
using couplet::testing::simplify_and_compare;

namespace {

// `check` compares the definition with the published form exactly at its sample points.
void require_holds(const std::string& identity) {
    auto r = testing::run_cli({"check", "-e", identity});
    INFO(identity << "\n" << r.out << r.err);
    CHECK(r.code == 0);
    CHECK(r.out.rfind("holds", 0) == 0);
}

}  // namespace

TEST_CASE("three angular momenta, both directions, are one 6j", "[coupling][cli]") {
    // Edmonds (1957) eq. 6.1.5; the coefficients are real, so the reverse overlap is the same.
    const std::string form = "(-1)^(j1+j2+j3+J)*sqrt((2*j12+1)*(2*j23+1))*6j{j1, j2, j12; j3, J, j23}";
    require_holds("<(j1, j2) j12, j3; J | j1, (j2, j3) j23; J> == " + form);
    require_holds("<j1, (j2, j3) j23; J | (j1, j2) j12, j3; J> == " + form);
    auto s = simplify_and_compare("", "<(j1, j2) j12, j3; J | j1, (j2, j3) j23; J>");
    require_exact(s);
    CHECK(count_of(s.text, "6j") == 1);
    CHECK(count_of(s.text, "sum(") == 0);
}

TEST_CASE("four angular momenta: one 6j, two 6j without a sum, a 9j, a 9j with its phase", "[coupling][cli][slow]") {
    // ((12)3)4 -> (12)(34): Edmonds 6.1.5 on (j12, j3, j4); the common coupling (12) gives the
    // triangle of (j1, j2, j12) only.
    require_holds(
        "<((j1, j2) j12, j3) j123, j4; J | (j1, j2) j12, (j3, j4) j34; J> == "
        "(-1)^(j12+j3+j4+J)*sqrt((2*j123+1)*(2*j34+1))*6j{j12, j3, j123; j4, J, j34}*tri(j1, j2, j12)");
    // ((12)3)4 -> 1(2(34)): 6.1.5 twice, through (12)(34).
    require_holds(
        "<((j1, j2) j12, j3) j123, j4; J | j1, (j2, (j3, j4) j34) j234; J> == "
        "(-1)^(j12+j3+j4+J)*sqrt((2*j123+1)*(2*j34+1))*6j{j12, j3, j123; j4, J, j34}"
        "*(-1)^(j1+j2+j34+J)*sqrt((2*j12+1)*(2*j234+1))*6j{j1, j2, j12; j34, J, j234}");
    // (12)(34) -> (13)(24): Edmonds 6.4.2 (DLMF 34.6.1 defines the 9j by this overlap).
    require_holds(
        "<(j1, j2) j12, (j3, j4) j34; J | (j1, j3) j13, (j2, j4) j24; J> == "
        "sqrt((2*j12+1)*(2*j34+1)*(2*j13+1)*(2*j24+1))*9j{j1, j2, j12; j3, j4, j34; j13, j24, J}");
    // (12)(34) -> (14)(32): exchange j3, j4 in (34) and j3, j2 in (32) (each (-1)^(a+b-c), the
    // Clebsch-Gordan symmetry), then 6.4.2.
    require_holds(
        "<(j1, j2) j12, (j3, j4) j34; J | (j1, j4) j14, (j3, j2) j32; J> == "
        "(-1)^(j3+j4-j34)*(-1)^(j2+j3-j32)*sqrt((2*j12+1)*(2*j34+1)*(2*j14+1)*(2*j32+1))"
        "*9j{j1, j2, j12; j4, j3, j34; j14, j32, J}");
    auto two = simplify_and_compare("", "<((j1, j2) j12, j3) j123, j4; J | j1, (j2, (j3, j4) j34) j234; J>");
    require_exact(two);
    CHECK(count_of(two.text, "6j") == 2);
    CHECK(count_of(two.text, "sum(") == 0);
    auto nine = simplify_and_compare("", "<(j1, j2) j12, (j3, j4) j34; J | (j1, j4) j14, (j3, j2) j32; J>");
    require_exact(nine);
    CHECK(count_of(nine.text, "9j") == 1);
    CHECK(count_of(nine.text, "6j") == 0);
}

TEST_CASE("LS to jj coupling of two electrons is one 9j", "[coupling][cli]") {
    // Edmonds (1957) eq. 6.4.2 with (l1 s1) j1, (l2 s2) j2 -> (l1 l2) L, (s1 s2) S; s = 1/2.
    require_holds(
        "half s1, s2; <(l1, s1) j1, (l2, s2) j2; J | (l1, l2) L, (s1, s2) S; J> == "
        "sqrt((2*j1+1)*(2*j2+1)*(2*L+1)*(2*S+1))*9j{l1, s1, j1; l2, s2, j2; L, S, J}");
    auto r = testing::run_cli({"eval", "-e",
                               "<(l1, s1) j1, (l2, s2) j2; J | (l1, l2) L, (s1, s2) S; J> at l1=1, s1=1/2, j1=3/2, "
                               "l2=1, s2=1/2, j2=3/2, L=2, S=1, J=3"});
    INFO(r.out << r.err);
    // Stretched couplings: |j1=3/2, j2=3/2; J=3> is |L=2, S=1; J=3> alone, so the overlap is 1
    // (common practice, no source).
    CHECK(r.out.rfind("1", 0) == 0);
}

TEST_CASE("a 9j or 6j that recoupling makes is printed in the textbook's layout", "[coupling][cli]") {
    // Edmonds (1957) eq. 6.4.2: the 9j's rows are the left side's couplings (l1 s1 j1), (l2 s2
    // j2), then the totals (L S J); eq. 6.1.5: {j12 j3 j123; j4 J j34} for ((12)3)4 -> (12)(34).
    auto nine = simplify_and_compare("", "<(l1, s1) j1, (l2, s2) j2; J | (l1, l2) L, (s1, s2) S; J>");
    require_exact(nine);
    CHECK(nine.text.find("9j{l1, s1, j1; l2, s2, j2; L, S, J}") != std::string::npos);
    auto six = simplify_and_compare("", "<((j1, j2) j12, j3) j123, j4; J | (j1, j2) j12, (j3, j4) j34; J>");
    require_exact(six);
    CHECK(six.text.find("6j{j12, j3, j123; j4, J, j34}") != std::string::npos);
}

TEST_CASE("latex and JSON show a recoupling coefficient as the bracket it was written as", "[coupling][cli]") {
    // The overlap notation <T1; J | T2; J> (Edmonds 1957, ch. 6), not its Clebsch-Gordan sum.
    const std::string coefficient = "<(j1, j2) j12, j3; J | j1, (j2, j3) j23; J>";
    auto doc = testing::run_cli({"latex", "--steps", "-e", "let W = " + coefficient + "; W"});
    INFO(doc.out << doc.err);
    CHECK(doc.code == 0);
    CHECK(doc.out.find("W = \\left\\langle (j_{1}, j_{2})\\, j_{12}") != std::string::npos);
    CHECK(doc.out.find("\\sum") == std::string::npos);
    auto json = testing::run_cli({"simplify", "--format", "json", "-e", coefficient});
    INFO(json.out);
    CHECK(json.out.find("\\middle|") != std::string::npos);
    CHECK(json.out.find("\\sum") == std::string::npos);
}

TEST_CASE("a sum over an intermediate label of two recouplings is their composition", "[coupling][cli]") {
    // Completeness of the coupled states |(j1, (j2, j3) y); J> (common practice, no source).
    auto s = simplify_and_compare(
        "", "sum(y : <(j1, j2) p, j3; J | j1, (j2, j3) y; J> * <j1, (j2, j3) y; J | (j1, j2) q, j3; J>)");
    require_exact(s);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
}

TEST_CASE("random pairs of coupling trees equal their definition, by the cheapest path", "[coupling][slow]") {
    std::mt19937 rng(19);
    int pairs = 0, mismatches = 0;
    // 300 pairs, fewer of the larger trees: their definitions sum over 2n - 1 projections.
    const int pairs_of_size[] = {0, 0, 0, 110, 100, 60, 20, 10};
    for (int n = 3; n <= 7; ++n)
        for (int k = 0; k < pairs_of_size[n]; ++k, ++pairs) {
            const std::string text = testing::random_recoupling_text(n, rng);
            auto r = testing::run_cli({"simplify", "--no-verify", "-e", text});
            INFO(text << "\n" << r.err);
            REQUIRE(r.code == 0);
            auto both = testing::lower_text(text + "\n" + testing::trimmed(r.out));
            auto report = testing::compare_at_points(both.statements[0].value, both.statements[1].value, both.numbers,
                                                     7, n <= 5 ? 12 : 3, n <= 5 ? 4 : 2);
            mismatches += report.mismatches;
            if (report.mismatches) FAIL_CHECK(text << " -> " << r.out);
            if (n > 6) continue;
            // The fewest sums, then symbols, within the family of 6j and 9j steps: the search
            // with its lower bound against every state in order of cost.
            const GiNaC::ex held = both.statements[0].written;
            const coupling_tree bra = tree_from_held(held.op(0)), ket = tree_from_held(held.op(1));
            std::vector<GiNaC::ex> leaves;
            for (const coupling_tree* l : leaves_of(bra)) leaves.push_back(l->label);
            coupling::search_options exhaustive;
            exhaustive.use_lower_bound = false;
            const auto best = coupling::cheapest_recoupling(coupling::shape_of(bra, leaves),
                                                            coupling::shape_of(ket, leaves), exhaustive);
            const auto found = coupling::closed_recoupling(bra, ket, both.numbers, held);
            CHECK(found.cheapest);
            CHECK(found.cost == best.cost);
        }
    CHECK(pairs == 300);
    CHECK(mismatches == 0);
}

TEST_CASE("where the search gives up, the path taken is still right and no dearer than the built one",
          "[coupling][slow]") {
    // Forced to give up after a few states: the quick search's path, or the one built from
    // T2's couplings up, whichever is cheaper; its closed form still equals the definition.
    std::mt19937 rng(23);
    coupling::search_options hurried;
    hurried.always_cheapest_up_to = 0;
    hurried.max_expanded = 3;
    int mismatches = 0, quick_cheaper = 0;
    for (int n = 5; n <= 6; ++n)
        for (int k = 0; k < 10; ++k) {
            const std::string text = testing::random_recoupling_text(n, rng);
            INFO(text);
            auto p = testing::lower_text(text);
            const GiNaC::ex held = p.statements[0].written;
            const coupling_tree bra = tree_from_held(held.op(0)), ket = tree_from_held(held.op(1));
            std::vector<GiNaC::ex> leaves;
            for (const coupling_tree* l : leaves_of(bra)) leaves.push_back(l->label);
            const auto from = coupling::shape_of(bra, leaves), to = coupling::shape_of(ket, leaves);
            const auto form = coupling::closed_recoupling(bra, ket, p.numbers, held, hurried);
            const auto exact = coupling::cheapest_recoupling(from, to);
            const auto built = coupling::constructed_recoupling(from, to);
            CHECK(!(form.cost < exact.cost));
            CHECK(!(built.cost < form.cost));
            quick_cheaper += built.cost.sums > form.cost.sums ? 1 : 0;
            auto both = testing::lower_text(text + "\n" + to_text(form.value));
            auto report =
                testing::compare_at_points(both.statements[0].value, both.statements[1].value, both.numbers, 29, 3, 2);
            mismatches += report.mismatches;
            if (report.mismatches) FAIL_CHECK(text << " -> " << form.value);
        }
    CHECK(mismatches == 0);
    CHECK(quick_cheaper > 0);  // the quick search's path was taken, with fewer sums
}

TEST_CASE("a recoupling coefficient that cannot be read says where", "[coupling][cli]") {
    auto error_of = [](const std::string& text) {
        auto r = testing::run_cli({"simplify", "-e", text});
        CHECK(r.code == 2);
        return r.err;
    };
    CHECK_THAT(error_of("<(j1, j2) j12, j3; J | j1, (j2, j4) j23; J>"),
               Catch::Contains("1:16") && Catch::Contains("'j3' is coupled on the left side only"));
    CHECK_THAT(error_of("<(j1, j2) j12, j3; J | j1, (j2, j3) j23; K>"), Catch::Contains("couple to the same total"));
    CHECK_THAT(error_of("<(j1, j1) j12, j3; J | j1, (j2, j3) j23; J>"), Catch::Contains("coupled twice"));
    std::string thirteen = "j1", other = "j1";
    for (int i = 2; i <= 13; ++i) {
        thirteen = "(" + thirteen + ", j" + std::to_string(i) + ") a" + std::to_string(i);
        other = "(" + other + ", j" + std::to_string(i) + ") b" + std::to_string(i);
    }
    CHECK_THAT(error_of("<" + thirteen + ", k; J | " + other + ", k; J>"), Catch::Contains("at most 12"));
}
