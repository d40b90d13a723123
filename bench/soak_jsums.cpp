// Soak run of the j-sum stage: random sums over x of 6j products (a sum rule's left side in a
// random disguise, or arbitrary), some with a 9j among the factors, simplified and checked
// exactly against evaluation of the input at random points.  Prints the counts of inputs,
// mismatches, refusals (a random phase that is not an integer everywhere) and sums left.
// Usage: soak_jsums [COUNT] [SEED]   (default 10000 sums, seed 11).  With soak_network this is
// the soundness soak.
#include <chrono>
#include <cstdlib>
#include <iostream>
#include <string>

#include "model/result_shape.hpp"
#include "print/print.hpp"
#include "rules/jsum_check.hpp"
#include "rules/random_jsum.hpp"
#include "simplify/simplify.hpp"

using namespace couplet;

int main(int argc, char** argv) {
    const int count = argc > 1 ? std::atoi(argv[1]) : 10000;
    const unsigned seed = argc > 2 ? static_cast<unsigned>(std::atoi(argv[2])) : 11;
    int inputs = 0, longer = 0, mismatches = 0, refused = 0, errors = 0, closed = 0, left_summed = 0, compared = 0;
    double slowest_ms = 0;
    std::string slowest;
    auto start = std::chrono::steady_clock::now();
    for (int k = 0; k < count; ++k) {
        testing::random_jsum_case c(seed * 100003u + static_cast<unsigned>(k));
        GiNaC::ex input = k % 2 ? c.from_rule() : k % 4 == 0 ? c.arbitrary() : c.arbitrary_with_ninej();
        ++inputs;
        try {
            auto t0 = std::chrono::steady_clock::now();
            GiNaC::ex output;
            try {
                output = simplify_expression(input, c.numbers);
            } catch (const refusal&) {
                ++refused;
                continue;
            }
            double ms = std::chrono::duration<double, std::milli>(std::chrono::steady_clock::now() - t0).count();
            if (ms > slowest_ms) slowest_ms = ms, slowest = to_text(input);
            if (term_count(output) > term_count(canonical_form(input, c.numbers))) ++longer;
            (testing::bound_indices(output).empty() ? closed : left_summed) += 1;
            auto report = testing::compare_at_points(input, output, c.numbers, 5000u + static_cast<unsigned>(k), 6, 6);
            compared += report.compared;
            if (report.mismatches != 0) {
                ++mismatches;
                std::cout << "MISMATCH: " << to_text(input) << "\n  -> " << to_text(output) << "\n  "
                          << report.first_mismatch << "\n";
            }
        } catch (const std::exception& e) {
            ++errors;
            std::cout << "FAILED: " << to_text(input) << "\n  " << e.what() << "\n";
        }
    }
    double total_s = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    std::cout << "inputs " << inputs << "\nmismatches " << mismatches << "\nerrors " << errors << "\nrefused "
              << refused << "\nclosed (no sum left) " << closed << "\nleft as a sum " << left_summed
              << "\nmore terms than the input's own form " << longer << "\npoints compared " << compared
              << "\nslowest simplify " << slowest_ms << " ms\ntotal " << total_s << " s\n";
    if (!slowest.empty()) std::cout << "slowest input: " << slowest << "\n";
    return mismatches == 0 && errors == 0 ? 0 : 1;
}
