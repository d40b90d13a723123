// Figures for the m-sum stage: for each network of the acceptance corpus and for random proper
// networks of 6 to 30 vertices, the time to simplify (the network stage alone, and the whole
// pipeline with the j-sum rules), the number of summation indices and of 6j factors in the
// result, how many cuts the network stage separated on, and whether an m-sum is left.
// Prints a table; asserts nothing.
// Usage: bench_network [RANDOM_PER_SIZE]   (default 3)
#include <cstdio>
#include <cstdlib>
#include <ctime>
#include <string>

#include "canonical/symmetries.hpp"
#include "cli/fixed_layout.hpp"
#include "model/normalize.hpp"
#include "model/result_shape.hpp"
#include "network/cut.hpp"
#include "network/network_corpus.hpp"
#include "network/random_network.hpp"
#include "network/reduce.hpp"
#include "network/rewrites.hpp"
#include "parse/lower.hpp"
#include "simplify/simplify.hpp"

using namespace couplet;

namespace {

// Processor time, not wall time: the machine is shared, and wall time measures the neighbours.
double ms_since(std::clock_t t0) { return 1000.0 * static_cast<double>(std::clock() - t0) / CLOCKS_PER_SEC; }

void row(const std::string& name, const std::string& text) {
    auto program = read_program(source_file("<bench>", text));
    GiNaC::ex input = program.statements.back().value;
    auto t0 = std::clock();
    GiNaC::ex x = merge_phases(symmetry::canonicalize_symbols(normalize(input), program.numbers).expand());
    std::vector<network::reduction_step> steps;
    GiNaC::ex reduced = network::reduce_msums(x, program.numbers, &steps);
    double network_ms = ms_since(t0);
    int cuts = 0;
    for (const auto& s : steps)
        cuts += s.rule == network::two_line_cut_identity().name || s.rule == network::three_line_cut_identity().name;
    auto t1 = std::clock();
    GiNaC::ex out = simplify_expression(input, program.numbers);
    double total_ms = ms_since(t1);
    result_shape after_network = shape_of(reduced), after = shape_of(out);
    std::printf("%-50s %9.1f %9.1f %5d/%-3d %5d/%-3d %4d %s\n", name.c_str(), network_ms, total_ms,
                after_network.indices, after.indices, after_network.sixj, after.sixj, cuts,
                testing::msum_indices_in(out) > 0 ? "yes" : "no");
}

}  // namespace

int main(int argc, char** argv) {
    couplet::cli::run_with_fixed_address_layout(argv);  // the same shapes on every run
    const int per_size = argc > 1 ? std::atoi(argv[1]) : 3;
    std::printf("%-50s %9s %9s %9s %9s %4s %s\n", "case", "net ms", "all ms", "sums", "6j", "cuts", "m-sum left");
    std::printf("%-50s %9s %9s %9s %9s\n", "", "", "", "net/all", "net/all");
    for (const auto& g : testing::network_corpus())
        row(g.name, testing::graph_network_text(g.vertices, g.edges, g.open, 5));
    std::mt19937 rng(2027);
    for (int n = 6; n <= 30; n += 4)
        for (int k = 0; k < per_size; ++k) {
            auto net = testing::make_random_network(rng, n, n, 3, true);
            row("random proper network, " + std::to_string(n) + " vertices, " + std::to_string(net.open) + " open",
                net.text);
        }
}
