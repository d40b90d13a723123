// Random networks reduced by simplify and checked exactly against brute-force evaluation of
// the input (the evaluator enumerates every summed projection) at random admissible points.
#include <catch2/catch.hpp>

#include <iostream>

#include "network_points.hpp"
#include "random_network.hpp"
#include "simplify/simplify.hpp"
#include "support.hpp"

using namespace couplet;

TEST_CASE("random networks of 2 to 10 vertices reduce without a single mismatch", "[network][random]") {
    // Common practice, no source: an identity holds when both sides agree exactly at every
    // sampled admissible point; the input side is the defining sum, enumerated.  Every other
    // network is a proper Yutsis network (each line with its metric), which the moves must
    // reduce completely (not yet reached: a few still keep an m-sum, so the bound below is a
    // floor to raise); the others may keep lines no move fits, but never a wrong value.
    std::mt19937 rng(2026);
    int networks = 0, closed = 0, partly = 0, unreduced = 0, mismatches = 0, points = 0, nonzero = 0;
    int proper = 0, proper_with_msum = 0;
    for (int k = 0; k < 500; ++k) {
        bool every_line_metric = k % 2 == 0;
        auto net = testing::make_random_network(rng, 2, 10, 3, every_line_metric);
        INFO(net.text);
        auto program = testing::lower_text(net.text);
        GiNaC::ex input = program.statements.back().value;
        GiNaC::ex output = simplify_expression(input, program.numbers);
        INFO("  -> " << output);
        int before = net.lines, after = testing::msum_indices_in(output);
        (after == 0 ? closed : after < before ? partly : unreduced) += 1;
        if (every_line_metric) {
            ++proper;
            proper_with_msum += after > 0;
        }
        auto a = testing::network_agreement_at_points(input, output, program.numbers, 100 + k, 2, 2);
        CHECK(a.equal == a.points);
        mismatches += a.points - a.equal;
        points += a.points;
        nonzero += a.nonzero;
        ++networks;
    }
    std::cout << "random networks: " << networks << " (" << closed << " without m-sums, " << partly << " with fewer, "
              << unreduced << " unreduced; " << proper_with_msum << " of " << proper
              << " proper ones with an m-sum left), " << points << " points (" << nonzero << " nonzero), " << mismatches
              << " mismatches\n";
    CHECK(mismatches == 0);
    // Not every proper network is reduced to the end yet (1-4 of 250 keep an m-sum, the count
    // varying with GiNaC's term order; 54-63 before deltas on negated projections were resolved
    // and cuts separated); this guards against a regression, not a goal.
    CHECK(proper_with_msum * 25 <= proper);
    CHECK(nonzero >= points / 10);  // the points test something
}
