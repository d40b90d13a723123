// Soak run of the m-sum stage: random coupling networks (2 to 10 vertices, 0 to 3 open lines)
// simplified and checked exactly against brute-force evaluation of the input at random
// admissible points.  Prints the counts of inputs, mismatches, and terms left unreduced.
// Usage: soak_network [COUNT] [SEED]   (default 10000 networks, seed 7)
#include <chrono>
#include <cstdlib>
#include <iostream>
#include <string>

#include "model/result_shape.hpp"
#include "network/network_points.hpp"
#include "network/random_network.hpp"
#include "parse/lower.hpp"
#include "simplify/simplify.hpp"

using namespace couplet;

int main(int argc, char** argv) {
    const int count = argc > 1 ? std::atoi(argv[1]) : 10000;
    const unsigned seed = argc > 2 ? static_cast<unsigned>(std::atoi(argv[2])) : 7;
    std::mt19937 rng(seed);
    int inputs = 0, longer = 0, mismatches = 0, unreduced = 0, partly = 0, closed = 0, failures = 0, points = 0,
        nonzero = 0;
    double slowest_ms = 0, simplify_ms = 0, check_ms = 0;
    std::string slowest;
    auto start = std::chrono::steady_clock::now();
    for (int k = 0; k < count; ++k) {
        auto net = testing::make_random_network(rng, 2, 10, 3);
        ++inputs;
        try {
            auto program = read_program(source_file("<soak>", net.text));
            GiNaC::ex input = program.statements.back().value;
            auto t0 = std::chrono::steady_clock::now();
            GiNaC::ex output = simplify_expression(input, program.numbers);
            double ms = std::chrono::duration<double, std::milli>(std::chrono::steady_clock::now() - t0).count();
            simplify_ms += ms;
            if (ms > slowest_ms) slowest_ms = ms, slowest = net.text;
            if (term_count(output) > term_count(canonical_form(input, program.numbers))) ++longer;
            int after = testing::msum_indices_in(output);
            (after == 0 ? closed : after < net.lines ? partly : unreduced) += 1;
            auto t1 = std::chrono::steady_clock::now();
            auto a = testing::network_agreement_at_points(input, output, program.numbers, 1000 + k, 3, 2);
            check_ms += std::chrono::duration<double, std::milli>(std::chrono::steady_clock::now() - t1).count();
            points += a.points;
            nonzero += a.nonzero;
            if (a.equal != a.points) {
                ++mismatches;
                std::cout << "MISMATCH: " << net.text << "\n  -> " << output << "\n";
            }
        } catch (const std::exception& e) {
            ++failures;
            std::cout << "FAILED: " << net.text << "\n  " << e.what() << "\n";
        }
    }
    double total_s = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    std::cout << "inputs " << inputs << "\nmismatches " << mismatches << "\nerrors " << failures
              << "\nunreduced (no m-sum removed) " << unreduced << "\npartly reduced " << partly
              << "\nclosed (no m-sum left) " << closed << "\nmore terms than the input's own form " << longer
              << "\npoints checked " << points << " (" << nonzero << " nonzero)\nslowest simplify " << slowest_ms
              << " ms\ntime in simplify " << simplify_ms / 1000 << " s, in the exact check " << check_ms / 1000
              << " s, total " << total_s << " s\n";
    if (!slowest.empty()) std::cout << "slowest input: " << slowest << "\n";
    return mismatches == 0 && failures == 0 ? 0 : 1;
}
