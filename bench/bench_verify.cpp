// Exact sample points per second of `check` at a 9j level (DLMF 34.6.2: a 9j against its sum
// of three 6j) and at a 12j level (a sum over x of four 6j against the same sum with every 6j
// rearranged by a tetrahedral symmetry, DLMF 34.5.8).  A point is both sides evaluated
// exactly.  Prints figures; asserts nothing.
#include <chrono>
#include <cstdio>
#include <string>

#include "eval/evaluate.hpp"
#include "parse/lower.hpp"
#include "verify/domain.hpp"
#include "verify/identity_check.hpp"
#include "verify/sampler.hpp"

namespace {

using clock_type = std::chrono::steady_clock;

double seconds_since(clock_type::time_point start) {
    return std::chrono::duration<double>(clock_type::now() - start).count();
}

void measure(const char* label, const std::string& identity) {
    using namespace couplet;
    lowered_program program = read_program(source_file("<bench>", identity));
    const lowered_statement& s = program.statements.back();

    // Evaluation alone, over the points `check` samples at default settings.
    verify::sampling_options options;
    auto start = clock_type::now();
    verify::sampling_domain domain = verify::build_domain({s.value, s.rhs}, program.numbers);
    verify::sample_set samples = verify::sample_points(domain, options);
    double sampling = seconds_since(start);
    compiled_expression lhs(s.value, program.numbers), rhs(s.rhs, program.numbers);
    start = clock_type::now();
    std::size_t agree = 0;
    for (const verify::point& p : samples.points) {
        assignment at = verify::to_assignment(domain, p);
        agree += lhs.at(at) == rhs.at(at);
    }
    double evaluating = seconds_since(start);

    // The whole check, as the command line runs it.
    start = clock_type::now();
    verify::check_report report = verify::check_identity(s.value, s.rhs, program.numbers);
    double checking = seconds_since(start);

    std::printf("%s: %zu free quantum numbers, %zu points (%zu exhaustive%s, %zu outside, %zu random)\n", label,
                domain.numbers.size(), samples.points.size(), samples.exhaustive, samples.complete ? "" : " of more",
                samples.outside, samples.random);
    std::printf("  sampling %.3f s; evaluating both sides %.3f s = %.0f points/s (%zu agree)\n", sampling, evaluating,
                samples.points.size() / evaluating, agree);
    std::printf("  whole check %.3f s = %.0f points/s, verdict: %s\n", checking, report.points / checking,
                verify::verdict_name(report.result));
}

}  // namespace

int main() {
    measure("9j level, DLMF 34.6.2",
            "9j{a, b, c; d, e, f; g, h, i} == sum(x : (-1)^(2*x) * (2*x+1) * 6j{a, d, g; h, i, x} * "
            "6j{b, e, h; d, x, f} * 6j{c, f, i; x, a, b})");
    // Four 6j around a ring, each sharing x: a 12j of the first kind, up to a phase.
    measure("12j level, four 6j summed over x",
            "sum(x : (2*x+1) * 6j{j1, k1, x; k2, j2, l1} * 6j{j2, k2, x; k3, j3, l2} * "
            "6j{j3, k3, x; k4, j4, l3} * 6j{j4, k4, x; j1, k1, l4}) == "
            "sum(x : (2*x+1) * 6j{k1, x, j1; j2, l1, k2} * 6j{x, j2, k2; l2, k3, j3} * "
            "6j{j3, j4, l3; k4, k3, x} * 6j{k1, j4, l4; k4, j1, x})");
    return 0;
}
