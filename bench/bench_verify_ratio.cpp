// What self-verification costs next to the simplification it checks, on the network-reduction
// corpus (the m-sum inputs of tests/network/test_network_acceptance.cpp): per input, the time of
// simplify_expression alone and of verify_simplification alone at default sampling settings
// (every point with free j <= 2, the outside points, 200 random points; no time budget), and the
// ratio verify / simplify.  Each figure is the best processor time of a few runs (argument 1, default 3) after
// one warm-up; argument 2 picks the inputs whose label contains it.  Prints
// figures; asserts nothing.
#include <algorithm>
#include <chrono>
#include <ctime>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <vector>

#include "couplet/model/lower.hpp"
#include "couplet/simplify.hpp"
#include "couplet/verify/simplification_check.hpp"

namespace {

struct corpus_case {
    const char* label;
    const char* input;
};

const std::vector<corpus_case>& corpus() {
    static const std::vector<corpus_case> cases = {
        {"CG orthogonality", "sum(m1, m2 : <b m2, a m1 | c M> * <a m1, b m2 | d Mp>)"},
        {"3j squared over all m", "sum(m1, m2, m3 : 3j(b, a, c; m2, m1, m3) * (-1)^(2*a+2*m1) * 3j(c, b, a; -m3, -m2, -m1))"},
        {"four 3j -> 6j",
         "sum(m1, m2, m3, u1, u2, u3 : (-1)^(l1 + l2 + l3 - u1 - u2 - u3) * (-1)^(j1 - j2 - m3) / sqrt(2*j3 + 1)"
         " * <j1 m1, j2 m2 | j3 -m3> * 3j(l3, j1, l2; -u3, m1, u2) * 3j(l1, l3, j2; -u1, u3, m2)"
         " * 3j(j3, l2, l1; m3, -u2, u1))"},
        {"three 3j -> 3j 6j",
         "sum(u1, u2, u3 : (-1)^(l1 + l2 + l3 + u1 + u2 + u3) * 3j(l3, l2, j1; u3, -u2, -m1)"
         " * 3j(j2, l1, l3; -m2, u1, -u3) * 3j(l2, j3, l1; u2, -m3, -u1))"},
        {"line closed on a vertex", "sum(m : (-1)^(j + m) * 3j(j, c, j; m, g, -m))"},
        {"bubble in a network",
         "sum(m1, m2, m3, m4 : 3j(a, b, c; m1, m2, m3) * 3j(b, a, d; -m2, -m1, -m4) * 3j(c, e, f; -m3, M, N)"
         " * 3j(d, e, f; m4, -M, -N) * (-1)^(c - m3 + d - m4))"},
        {"mixed entry, left summed", "sum(m : 3j(a, b, c; m, -M, M - m) * 3j(a, b, c; m, M, N))"},
        {"loop no move matches", "sum(m : 3j(a, a, c; m, -m, 0))"},
        {"six 3j -> 9j",
         "sum(x11, x12, x13, x21, x22, x23, x31, x32, x33 :"
         " 3j(a12, a11, a13; x12, x11, x13) * 3j(a21, a22, a23; x21, x22, x23)"
         " * (-1)^(a32 - a31 - x33) / sqrt(2*a33 + 1) * <a31 x31, a32 x32 | a33 -x33>"
         " * 3j(a11, a21, a31; -x11, -x21, -x31) * 3j(a22, a12, a32; x22, x12, x32)"
         " * 3j(a13, a23, a33; x13, x23, x33) * (-1)^(2*x11 - 2*a11))"},
        {"five 3j -> 3j 9j",
         "sum(x11, x12, x21, x22, x31, x32 :"
         " 3j(a13, a12, a11; x13, x12, x11) * 3j(a21, a22, a23; x21, x22, x23) * 3j(a31, a32, a33; x31, x32, x33)"
         " * 3j(a31, a21, a11; -x31, -x21, -x11) * 3j(a12, a22, a32; x12, x22, x32))"},
    };
    return cases;
}

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
        double verifying = best_seconds(
            runs, [&] { check = verify::verify_simplification(input, result, program.numbers, {}); });
        // What `couplet simplify` does at default settings: the time-matched budget.
        verify::simplification_check budgeted;
        double by_default = best_seconds(runs, [&] {
            auto t0 = std::chrono::steady_clock::now();
            GiNaC::ex r = simplify_expression(input, program.numbers);
            auto budget = verify::matching_budget(std::chrono::steady_clock::now() - t0);
            budgeted = verify::verify_simplification(input, r, program.numbers, {}, {}, budget);
        }) - simplifying;
        double ratio = verifying / simplifying, ratio_default = by_default / simplifying;
        total_simplify += simplifying;
        total_verify += verifying;
        total_default += by_default;
        worst = std::max(worst, ratio);
        worst_default = std::max(worst_default, ratio_default);
        std::printf("%-26s %8.1fms %8.1fms %7.2f %7zu %6s | %8.1fms %7.2f %7zu\n", c.label, 1e3 * simplifying,
                    1e3 * verifying, ratio, check.points, check.agrees ? "yes" : "NO", 1e3 * by_default,
                    ratio_default, budgeted.points);
    }
    std::printf("every point: simplify %.1f ms, verify %.1f ms, ratio %.2f (worst single input %.2f)\n",
                1e3 * total_simplify, 1e3 * total_verify, total_verify / total_simplify, worst);
    std::printf("default (time-matched, >= 12 points): verify %.1f ms, ratio %.2f (worst single input %.2f)\n",
                1e3 * total_default, total_default / total_simplify, worst_default);
    return 0;
}
