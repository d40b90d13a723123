// Random networks reduced by simplify and checked exactly against brute-force evaluation of
// the input (the evaluator enumerates every summed projection) at random admissible points.
#include <catch2/catch.hpp>

#include <iostream>

#include "couplet/simplify.hpp"
#include "network_points.hpp"
#include "random_network.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

int sums_in(const GiNaC::ex& e) {
    int n = 0;
    for (GiNaC::const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
        if (GiNaC::is_a<index_sum>(*it)) n += static_cast<int>(GiNaC::ex_to<index_sum>(*it).indices().nops());
    return n;
}

}  // namespace

TEST_CASE("random networks of 2 to 6 vertices reduce without a single mismatch", "[network][random]") {
    // Common practice, no source: an identity holds when both sides agree exactly at every
    // sampled admissible point; the input side is the defining sum, enumerated.
    std::mt19937 rng(2026);
    int networks = 0, closed = 0, partly = 0, unreduced = 0, mismatches = 0, points = 0, nonzero = 0;
    for (int k = 0; k < 500; ++k) {
        auto net = testing::make_random_network(rng, 2, 6, 3);
        INFO(net.text);
        auto program = testing::lower_text(net.text);
        GiNaC::ex input = program.statements.back().value;
        GiNaC::ex output = simplify_expression(input, program.numbers);
        int before = net.lines, after = sums_in(output);
        (after == 0 ? closed : after < before ? partly : unreduced) += 1;
        auto a = testing::compare_at_points(input, output, program.numbers, 100 + k, 4, 2);
        INFO("  -> " << output);
        CHECK(a.equal == a.points);
        mismatches += a.points - a.equal;
        points += a.points;
        nonzero += a.nonzero;
        ++networks;
    }
    std::cout << "random networks: " << networks << " (" << closed << " without sums, " << partly
              << " with fewer sums, " << unreduced << " unreduced), " << points << " points (" << nonzero
              << " nonzero), " << mismatches << " mismatches\n";
    CHECK(mismatches == 0);
    // Without the interchange move longer cycles stay summed; the moves must still bite.
    CHECK(closed >= networks / 20);
    CHECK(closed + partly >= networks * 2 / 5);
}
