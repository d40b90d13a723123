// Figures for recoupling coefficients <T1; J | T2; J> of random pairs of coupling trees with
// n = 3..12 leaves: the time of the path search and closed form alone and of the whole
// simplification (median and maximum), the sums and 6j/9j symbols of the answer, and for
// n <= 6 the exhaustive minimum (the same search without its lower bound, every cheaper state
// first).  Processor time.  Prints a table; asserts nothing.
//   bench_recoupling [PAIRS_PER_SIZE = 20] [MAX_LEAVES = 12]
#include <algorithm>
#include <cstdio>
#include <cstdlib>
#include <ctime>
#include <random>
#include <string>
#include <vector>

#include "coupling/random_trees.hpp"
#include "coupling/recoupling_form.hpp"
#include "model/coupling_tree.hpp"
#include "model/symbols.hpp"
#include "parse/lower.hpp"
#include "simplify/simplify.hpp"

using namespace couplet;

namespace {

double ms_since(std::clock_t t0) { return 1000.0 * static_cast<double>(std::clock() - t0) / CLOCKS_PER_SEC; }

double median(std::vector<double> v) {
    std::sort(v.begin(), v.end());
    return v.empty() ? 0 : v[v.size() / 2];
}

}  // namespace

int main(int argc, char** argv) {
    const int pairs = argc > 1 ? std::atoi(argv[1]) : 20;
    const int max_leaves = argc > 2 ? std::atoi(argv[2]) : 12;
    std::mt19937 rng(2026);
    std::printf("%3s %6s %10s %10s %10s %10s %6s %6s %6s %10s %s\n", "n", "pairs", "search ms", "(max)", "simplify",
                "(max)", "sums", "6j", "9j", "exhaustive", "not searched to the end");
    for (int n = 3; n <= max_leaves; ++n) {
        std::vector<double> search_ms, simplify_ms;
        double sums = 0, sixj = 0, ninej = 0;
        int above_minimum = 0, gave_up = 0, compared = 0;
        std::string slowest;
        for (int k = 0; k < pairs; ++k) {
            const std::string text = testing::random_recoupling_text(n, rng);
            const lowered_program p = read_program(source_file("<bench>", text));
            const GiNaC::ex held = p.statements.front().written;
            const coupling_tree bra = tree_from_held(held.op(0)), ket = tree_from_held(held.op(1));
            std::clock_t t0 = std::clock();
            const auto form = coupling::closed_recoupling(bra, ket, p.numbers, held);
            search_ms.push_back(ms_since(t0));
            if (!form.cheapest) ++gave_up;
            sums += form.cost.sums;
            std::size_t nine = 0, six = 0;
            for (auto it = form.value.preorder_begin(); it != form.value.preorder_end(); ++it) {
                if (kind_of(*it) == symbol_kind::sixj) ++six;
                if (kind_of(*it) == symbol_kind::ninej) ++nine;
            }
            sixj += static_cast<double>(six);
            ninej += static_cast<double>(nine);
            if (n <= 6) {
                std::vector<GiNaC::ex> leaves;
                for (const coupling_tree* l : leaves_of(bra)) leaves.push_back(l->label);
                coupling::search_options exhaustive;
                exhaustive.use_lower_bound = false;
                exhaustive.max_expanded = 100000000;
                const auto best = coupling::cheapest_recoupling(coupling::shape_of(bra, leaves),
                                                                coupling::shape_of(ket, leaves), exhaustive);
                ++compared;
                if (best.cost < form.cost) ++above_minimum;
            }
            t0 = std::clock();
            simplify_expression(held, p.numbers);
            simplify_ms.push_back(ms_since(t0));
            if (simplify_ms.back() >= *std::max_element(simplify_ms.begin(), simplify_ms.end())) slowest = text;
        }
        const double done = pairs;
        char exhaustive[32] = "-";
        if (compared) std::snprintf(exhaustive, sizeof exhaustive, "%d above", above_minimum);
        std::printf("%3d %6d %10.2f %10.2f %10.1f %10.1f %6.2f %6.2f %6.2f %10s %d\n", n, pairs, median(search_ms),
                    *std::max_element(search_ms.begin(), search_ms.end()), median(simplify_ms),
                    simplify_ms.empty() ? 0.0 : *std::max_element(simplify_ms.begin(), simplify_ms.end()),
                    done ? sums / done : 0, done ? sixj / done : 0, done ? ninej / done : 0, exhaustive, gave_up);
        std::fprintf(stderr, "n = %d, slowest simplification: %s\n", n, slowest.c_str());
        std::fflush(stdout);
    }
}
