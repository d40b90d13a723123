// The separation of a network on a cut of two or three lines, checked by exact evaluation: the
// separated product against the defining sum at random admissible points, on networks built
// with a cut and on random ones; and each phase of the separation shown to be needed.
#include <catch2/catch.hpp>

#include <iostream>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "model/fresh_index.hpp"
#include "model/normalize.hpp"
#include "network/cut.hpp"
#include "network/reduce.hpp"
#include "network/rewrites.hpp"
#include "network_points.hpp"
#include "random_network.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

struct prepared {
    lowered_program program;
    GiNaC::ex input, summed;
    std::optional<network::msum_term> term;
};

// The term as the m-sum stage sees it (3j symbols, merged phases), as the benchmark prepares it.
prepared prepare(const std::string& text) {
    prepared p{testing::lower_text(text), 0, 0, std::nullopt};
    p.input = p.program.statements.back().value;
    p.summed = merge_phases(symmetry::canonicalize_symbols(normalize(p.input), p.program.numbers).expand());
    if (GiNaC::is_a<index_sum>(p.summed)) {
        const auto& s = GiNaC::ex_to<index_sum>(p.summed);
        p.term = network::analyze_term(s.body(), s.indices(), p.program.numbers).term;
    }
    return p;
}

std::vector<GiNaC::symbol> three_fresh(const GiNaC::ex& e, const quantum_numbers& numbers) {
    GiNaC::symbol a = fresh_index(e, numbers), b = fresh_index(e * a, numbers), c = fresh_index(e * a * b, numbers);
    return {a, b, c};
}

// The indices a move made (names the program does not know) that no sum in `e` binds.
GiNaC::lst free_fresh_indices(const GiNaC::ex& e, const quantum_numbers& numbers) {
    std::set<GiNaC::ex, GiNaC::ex_is_less> bound, free;
    for (auto it = e.preorder_begin(); it != e.preorder_end(); ++it) {
        if (GiNaC::is_a<index_sum>(*it))
            for (const GiNaC::ex& i : GiNaC::ex_to<index_sum>(*it).indices()) bound.insert(i);
        if (GiNaC::is_a<GiNaC::symbol>(*it) && !numbers.find(GiNaC::ex_to<GiNaC::symbol>(*it))) free.insert(*it);
    }
    GiNaC::lst out;
    for (const GiNaC::ex& s : free)
        if (!bound.count(s)) out.append(s);
    return out;
}

struct tally {
    int cuts = 0, separated = 0, points = 0, equal = 0, nonzero = 0;
};

// Every cut of `size` lines of the term, separated where it can be, compared at points.
void check_cuts(const prepared& p, int size, unsigned seed, tally& t, int samples = 6) {
    if (!p.term) return;
    auto fresh = three_fresh(p.summed, p.program.numbers);
    for (const auto& c : network::find_cuts(*p.term, size)) {
        ++t.cuts;
        auto s = network::separate(*p.term, c, fresh);
        if (!s) continue;
        ++t.separated;
        auto a =
            testing::network_agreement_at_points(p.input, network::joined(*s), p.program.numbers, seed++, samples, 3);
        CHECK(a.equal == a.points);
        t.points += a.points;
        t.equal += a.equal;
        t.nonzero += a.nonzero;
    }
}

// K(3,3) without the edge (2,5), whose vertices 2 and 5 lead to a second part {6, 7} joined by
// one line and carrying the two open lines: a two-line cut.
const std::vector<std::pair<int, int>> cut_of_two_edges = {{0, 3}, {0, 4}, {0, 5}, {1, 3}, {1, 4}, {1, 5},
                                                           {2, 3}, {2, 4}, {2, 6}, {5, 7}, {6, 7}};

// The cube without the rung (3, 7), whose vertices 3 and 7 lead to {8, 9} as above: girth 4
// and no 9j piece, so no closing move applies before the cut.
const std::vector<std::pair<int, int>> cube_cut_of_two_edges = {{0, 1}, {1, 2}, {2, 3}, {3, 0}, {4, 5}, {5, 6}, {6, 7},
                                                                {7, 4}, {0, 4}, {1, 5}, {2, 6}, {3, 8}, {7, 9}, {8, 9}};

}  // namespace

TEST_CASE("a two-line and a three-line cut separate networks built with one exactly", "[network][cuts]") {
    // Common practice, no source: the factorization theorems; checked here only by comparing
    // the separated product with the enumerated defining sum.
    struct example {
        int vertices;
        std::vector<std::pair<int, int>> edges;
        std::vector<int> open;
        int size;
    };
    const std::vector<example> examples = {
        {8, cut_of_two_edges, {6, 7}, 2},
        {4, {{0, 1}, {0, 1}, {0, 2}, {1, 3}, {2, 3}}, {2, 3}, 2},
        {4, {{0, 1}, {0, 1}, {2, 3}, {2, 3}, {0, 2}, {1, 3}}, {}, 2},
        {6, {{0, 1}, {1, 2}, {2, 0}, {0, 3}, {1, 4}, {2, 5}, {3, 4}, {4, 5}}, {3, 5}, 3},
        {6, {{0, 1}, {1, 2}, {2, 0}, {3, 4}, {4, 5}, {5, 3}, {0, 3}, {1, 4}, {2, 5}}, {}, 3},
    };
    tally t;
    unsigned seed = 40;
    for (const auto& x : examples)
        for (unsigned arrangement = 0; arrangement < 4; ++arrangement) {
            auto p = prepare(testing::graph_network_text(x.vertices, x.edges, x.open, 7 + arrangement));
            INFO(testing::graph_network_text(x.vertices, x.edges, x.open, 7 + arrangement));
            REQUIRE(p.term);
            tally here;
            check_cuts(p, x.size, seed, here);
            seed += 50;
            CHECK(here.separated > 0);  // each proper example has a cut A is an invariant on
            t.cuts += here.cuts, t.separated += here.separated, t.points += here.points;
            t.equal += here.equal, t.nonzero += here.nonzero;
        }
    std::cout << "built cuts: " << t.separated << " of " << t.cuts << " separated, " << t.equal << "/" << t.points
              << " points agree, " << t.nonzero << " nonzero\n";
    CHECK(t.equal == t.points);
    CHECK(t.nonzero > t.points / 5);  // the points test something
}

TEST_CASE("every cut of random networks separates exactly or is refused", "[network][cuts]") {
    // Proper and improper random networks (lines without their metric test the refusal and
    // the vertex-rule phase); common practice, no source, as above.
    std::mt19937 rng(77);
    tally t;
    for (int k = 0; k < 120; ++k) {
        auto net = testing::make_random_network(rng, 4, 8, 3, k % 3 != 0);
        INFO(net.text);
        auto p = prepare(net.text);
        check_cuts(p, 2, 1000 + 20 * k, t, 3);
        check_cuts(p, 3, 5000 + 20 * k, t, 3);
    }
    std::cout << "random cuts: " << t.separated << " of " << t.cuts << " separated, " << t.equal << "/" << t.points
              << " points agree, " << t.nonzero << " nonzero\n";
    CHECK(t.equal == t.points);
    CHECK(t.separated >= 20);
    CHECK(t.nonzero > t.points / 10);
}

TEST_CASE("the two-line cut fails its check without the metric of the joined line", "[network][cuts]") {
    auto p = prepare(testing::graph_network_text(8, cut_of_two_edges, {6, 7}, 3));
    REQUIRE(p.term);
    auto cuts = network::find_cuts(*p.term, 2);
    REQUIRE(!cuts.empty());
    network::separation_variant broken;
    broken.closing_metric = false;
    auto s = network::separate(*p.term, cuts.front(), {}, broken);
    REQUIRE(s);
    auto a = testing::network_agreement_at_points(p.input, network::joined(*s), p.program.numbers, 9, 60, 3);
    CHECK(a.equal < a.points);
}

TEST_CASE("the cut fails its check without the phase the vertex rules move across", "[network][cuts]") {
    // The two lines inside A = {first two 3j} carry no metric, so a vertex rule m1+m2+m3 = 0
    // must make them proper, and it leaves (-1)^(j3 + m3) on the cut line m3.
    std::string text =
        "sum(m0, m1, m2, m3, m4 : 3j(j0, j1, j2; m0, m1, m2) * 3j(j0, j1, j3; -m0, -m1, m3) * "
        "3j(j2, j4, J0; -m2, m4, M0) * 3j(j3, j4, J1; -m3, -m4, M1) * (-1)^(j2-m2) * (-1)^(j3-m3) * (-1)^(j4-m4))";
    auto p = prepare(text);
    REQUIRE(p.term);
    auto cuts = network::find_cuts(*p.term, 2);
    REQUIRE(!cuts.empty());
    for (bool keep : {true, false}) {
        network::separation_variant variant;
        variant.rule_phase = keep;
        auto s = network::separate(*p.term, cuts.front(), {}, variant);
        REQUIRE(s);
        auto a = testing::network_agreement_at_points(p.input, network::joined(*s), p.program.numbers, 12, 60, 3);
        CHECK(a.nonzero > 5);
        if (keep)
            CHECK(a.equal == a.points);
        else
            CHECK(a.equal < a.points);
    }
}

TEST_CASE("the reduction separates on a two-line cut before any interchange", "[network][cuts]") {
    auto p = prepare(testing::graph_network_text(10, cube_cut_of_two_edges, {8, 9}, 5));
    std::vector<network::reduction_step> steps;
    GiNaC::ex out = network::reduce_msums(p.summed, p.program.numbers, &steps);
    REQUIRE(!steps.empty());
    CHECK(steps.front().rule == network::two_line_cut_identity().name);
    CHECK(steps.front().reference == network::two_line_cut_identity().reference);
    INFO(out);
    CHECK(testing::msum_indices_in(out) == 0);
    auto a = testing::network_agreement_at_points(p.input, out, p.program.numbers, 21, 20, 3);
    CHECK(a.equal == a.points);
    CHECK(a.nonzero > 2);
}

TEST_CASE("each recorded move holds the term it changed and what it made of it (equal in value)", "[network][cuts]") {
    auto p = prepare(testing::graph_network_text(10, cube_cut_of_two_edges, {8, 9}, 5));
    std::vector<network::reduction_step> steps;
    network::reduce_msums(p.summed, p.program.numbers, &steps);
    REQUIRE(steps.size() >= 3);
    for (std::size_t k = 0; k < steps.size(); ++k) {
        INFO(steps[k].rule << ": " << steps[k].before << " -> " << steps[k].after);
        CHECK_FALSE(steps[k].before.is_equal(steps[k].after));
        if (k > 0) CHECK_FALSE(steps[k].before.is_equal(steps[k - 1].before));
        // A move keeps the value (the moves' own DLMF identities): checked exactly at points.  A
        // move inside an interchange's sum leaves that sum's index free: both sides are summed over it.
        GiNaC::lst outer = free_fresh_indices(steps[k].before, p.program.numbers);
        auto a = testing::network_agreement_at_points(make_sum(steps[k].before, outer), make_sum(steps[k].after, outer),
                                                      p.program.numbers, 31 + k, 20, 3);
        CHECK(a.equal == a.points);
        CHECK(a.points > 0);
        // The trace prints the term with its phases reduced: that form has the same value.
        GiNaC::ex read = phases_reduced_for_reading(steps[k].before, p.program.numbers);
        auto r = testing::network_agreement_at_points(make_sum(steps[k].before, outer), make_sum(read, outer),
                                                      p.program.numbers, 41 + k, 20, 3);
        CHECK(r.equal == r.points);
    }
}
