// Exact proof of a rule at sampled points: both sides through the exact evaluator.
#include <optional>
#include <random>
#include <stdexcept>

#include "eval/evaluate.hpp"
#include "rules/rule.hpp"
#include "rules/structure.hpp"

namespace couplet::rules {

using namespace GiNaC;

namespace {

bool fits(int a, int b, int c) { return c >= std::abs(a - b) && c <= a + b && (a + b + c) % 2 == 0; }

}  // namespace

self_test_report compare_sides(const std::string& what, const ex& left_side, const ex& right_side,
                               const quantum_numbers& numbers, const std::vector<symbol>& indices,
                               unsigned seed, int admissible, int arbitrary, int twice_max) {
    std::vector<symbol> free;
    auto is_index = [&](const ex& e) {
        for (const symbol& i : indices)
            if (e.has(i)) return true;
        return false;
    };
    for (const quantum_number& q : numbers.all())
        if (!is_index(q.symbol)) free.push_back(q.symbol);
    // Triads of the left side that do not involve the index: where one fails, both sides vanish,
    // so the points that test the identity are the ones that satisfy them all.
    std::vector<triad> free_triads;
    for (const triad& t : all_triads(left_side))
        if (!is_index(t[0]) && !is_index(t[1]) && !is_index(t[2])) free_triads.push_back(t);
    if (free_triads.empty()) arbitrary = 0;  // every point is admissible

    compiled_expression lhs(left_side, numbers), rhs(right_side, numbers);
    std::mt19937 rng(seed);
    std::uniform_int_distribution<int> twice(0, twice_max);
    self_test_report report;
    int wanted_admissible = admissible, wanted_arbitrary = arbitrary;
    for (long attempt = 0; (wanted_admissible > 0 || wanted_arbitrary > 0) && attempt < 5'000'000; ++attempt) {
        assignment at;
        std::map<std::string, int> doubled;
        for (const symbol& s : free) {
            int v = twice(rng);
            doubled[s.get_name()] = v;
            at[s] = numeric(v, 2);
        }
        bool holds = true;
        for (const triad& t : free_triads) {
            auto value = [&](const ex& e) {
                return is_a<numeric>(e) ? (2 * ex_to<numeric>(e)).to_int() : doubled.at(ex_to<symbol>(e).get_name());
            };
            holds = holds && fits(value(t[0]), value(t[1]), value(t[2]));
        }
        if (holds ? wanted_admissible <= 0 : wanted_arbitrary <= 0) continue;
        exact::number left, right;
        try {
            left = lhs.at(at);
        } catch (const evaluation_error&) {
            continue;  // a phase that is no integer where the left side is not defined
        }
        try {
            right = rhs.at(at);
        } catch (const evaluation_error&) {
            // A phase with no integer exponent here is harmless only on a vanishing product.
            if (!compiled_expression(without_phases(right_side), numbers).at(at).is_zero()) throw;
            right = exact::number();
        }
        if (!(left == right))
            throw std::logic_error(what + " fails at " + describe(at) + ": " +
                                   left.to_string() + " != " + right.to_string());
        ++report.compared;
        if (!left.is_zero()) ++report.nonzero;
        --(holds ? wanted_admissible : wanted_arbitrary);
    }
    return report;
}

self_test_report self_test(const sum_rule& r, unsigned seed, int admissible, int arbitrary, int twice_max) {
    return compare_sides(r.name + " (" + r.reference + ")", r.left_side(), r.result, r.numbers, r.indices(), seed,
                         admissible, arbitrary, twice_max);
}

self_test_report self_test(const local_rule& r, unsigned seed, int admissible, int arbitrary, int twice_max) {
    return compare_sides(r.name + " (" + r.reference + ")", r.pattern, r.result, r.numbers, {}, seed,
                         admissible, arbitrary, twice_max);
}

}  // namespace couplet::rules
