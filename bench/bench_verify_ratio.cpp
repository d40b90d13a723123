// What self-verification costs next to the simplification it checks, on the network-reduction
// corpus (the m-sum acceptance inputs, tests/network/acceptance_inputs.hpp): per input, the time of
// simplify_expression alone and of verify_simplification alone at default sampling settings
// (every point with free j <= 2, the outside points, 200 random points; no time budget), and the
// ratio verify / simplify.  Each figure is the best processor time of a few runs (argument 1, default 3) after
// one warm-up; argument 2 picks the inputs whose label contains it.  Prints
// figures; asserts nothing.
#include <algorithm>
#include <chrono>
#include <cstdio>
#include <cstdlib>
#include <ctime>
#include <string>
#include <vector>

#include "network/acceptance_inputs.hpp"
#include "parse/lower.hpp"
#include "simplify/simplify.hpp"
#include "verify/simplification_check.hpp"

namespace {

using corpus_case = couplet::testing::acceptance::labelled_input;
const std::vector<corpus_case>& corpus() { return couplet::testing::acceptance::all(); }

// Processor time of this process: on a machine shared with other jobs it varies far less
// than wall time.
template <typename F>
double best_seconds(int runs, F&& f) {
    double best = 1e300;
    for (int r = 0; r < runs; ++r) {
        std::clock_t start = std::clock();
        f();
        best = std::min(best, static_cast<double>(std::clock() - start) / CLOCKS_PER_SEC);
    }
    return best;
}

}  // namespace

int main(int argc, char** argv) {
    using namespace couplet;
    const int runs = argc > 1 ? std::max(1, std::atoi(argv[1])) : 3;
    double total_simplify = 0, total_verify = 0, total_default = 0, worst = 0, worst_default = 0;
    std::printf("%-26s %10s %10s %7s %7s %6s | %10s %7s %7s\n", "input", "simplify", "verify", "ratio", "points",
                "agrees", "default", "ratio", "points");
    const std::string only = argc > 2 ? argv[2] : "";  // run only inputs whose label contains this
    for (const corpus_case& c : corpus()) {
        if (std::string(c.label).find(only) == std::string::npos) continue;
        lowered_program program = read_program(source_file("<bench>", c.input));
        const GiNaC::ex input = program.statements.back().value;
        GiNaC::ex result = simplify_expression(input, program.numbers);  // warm-up
        double simplifying = best_seconds(runs, [&] { result = simplify_expression(input, program.numbers); });
        verify::simplification_check check = verify::verify_simplification(input, result, program.numbers, {});
        double verifying =
            best_seconds(runs, [&] { check = verify::verify_simplification(input, result, program.numbers, {}); });
        // What `couplet simplify` does at default settings: the time-matched budget.
        verify::simplification_check budgeted;
        double by_default =
            best_seconds(runs,
                         [&] {
                             auto t0 = std::chrono::steady_clock::now();
                             GiNaC::ex r = simplify_expression(input, program.numbers);
                             auto budget = verify::matching_budget(std::chrono::steady_clock::now() - t0);
                             budgeted = verify::verify_simplification(input, r, program.numbers, {}, {}, budget);
                         }) -
            simplifying;
        double ratio = verifying / simplifying, ratio_default = by_default / simplifying;
        total_simplify += simplifying;
        total_verify += verifying;
        total_default += by_default;
        worst = std::max(worst, ratio);
        worst_default = std::max(worst_default, ratio_default);
        std::printf("%-26s %8.1fms %8.1fms %7.2f %7zu %6s | %8.1fms %7.2f %7zu\n", c.label, 1e3 * simplifying,
                    1e3 * verifying, ratio, check.points, check.agrees ? "yes" : "NO", 1e3 * by_default, ratio_default,
                    budgeted.points);
    }
    std::printf("every point: simplify %.1f ms, verify %.1f ms, ratio %.2f (worst single input %.2f)\n",
                1e3 * total_simplify, 1e3 * total_verify, total_verify / total_simplify, worst);
    std::printf("default (time-matched, >= 12 points): verify %.1f ms, ratio %.2f (worst single input %.2f)\n",
                1e3 * total_default, total_default / total_simplify, worst_default);
    return 0;
}
