// Property: random products of 6j symbols sharing a summed index x, with random weights and
// phases, simplify to something exactly equal to the input.  Half of the cases are a rule's left
// side under random symmetries and renamings (so the rules fire), half are arbitrary.
#include <catch2/catch.hpp>

#include <random>

#include "couplet/model/symbols.hpp"
#include "couplet/rules/rule.hpp"
#include "couplet/simplify.hpp"
#include "couplet/symmetry/symmetries.hpp"
#include "jsum_check.hpp"
#include "support.hpp"

using namespace couplet;

namespace {

struct random_case {
    std::mt19937 rng;
    quantum_numbers numbers;
    std::vector<GiNaC::symbol> pool;
    GiNaC::symbol x;

    explicit random_case(unsigned seed) : rng(seed) {
        for (const char* n : {"a", "b", "c", "d", "e", "f", "g", "h", "p", "q"}) pool.push_back(angular(n));
        x = angular("x");
    }
    GiNaC::symbol angular(const std::string& name) {
        GiNaC::symbol s = numbers.symbol_for(name, 0);
        numbers.assign_role(s, qn_role::angular, 0);
        return s;
    }
    int pick(int n) { return std::uniform_int_distribution<int>(0, n - 1)(rng); }
    GiNaC::ex any_symbol() { return pool[pick(static_cast<int>(pool.size()))]; }

    // A random arrangement of the symbol (value unchanged: the orbit's phase goes with it).
    GiNaC::ex scramble(const GiNaC::ex& s) {
        auto images = rules::arrangements(s);
        const auto& image = images[pick(static_cast<int>(images.size()))];
        return make_phase(image.phase) * image.symbol;
    }

    GiNaC::ex from_rule() {
        // The single sums (their factors are 6j or tri): the double sums are rules on 9j.
        std::vector<const rules::sum_rule*> sixj_rules;
        for (const rules::sum_rule& r : rules::sum_rules())
            if (!r.second_index) sixj_rules.push_back(&r);
        const rules::sum_rule& r = *sixj_rules[pick(static_cast<int>(sixj_rules.size()))];
        GiNaC::exmap rename;
        for (const quantum_number& q : r.numbers.all())
            rename[q.symbol] = q.symbol.is_equal(r.index) ? GiNaC::ex(x) : any_symbol();
        GiNaC::ex body = GiNaC::pow(2 * x + 1, r.weight) * make_phase(r.phase.subs(rename) + 4 * x * pick(2));
        for (const GiNaC::ex& f : r.factors) body *= scramble(f.subs(rename));
        return make_sum(body, GiNaC::lst{x});
    }

    GiNaC::ex arbitrary() {
        int count = 1 + pick(3);
        GiNaC::ex body = GiNaC::pow(2 * x + 1, pick(2));
        if (pick(2)) body *= make_phase(x + any_symbol() + any_symbol());
        for (int k = 0; k < count; ++k) {
            GiNaC::exvector entries{x, any_symbol(), any_symbol(), any_symbol(), any_symbol(), any_symbol()};
            body *= scramble(wigner6j(entries[0], entries[1], entries[2], entries[3], entries[4], entries[5]).hold());
        }
        return make_sum(body, GiNaC::lst{x});
    }
};

}  // namespace

TEST_CASE("random 6j products summed over x simplify to an exactly equal expression", "[rules][prop]") {
    int cases = 0, reduced = 0, refused = 0, mismatches = 0;
    for (unsigned seed = 1; seed <= 60; ++seed) {
        random_case c(seed);
        GiNaC::ex input = seed % 2 ? c.from_rule() : c.arbitrary();
        GiNaC::ex output;
        try {
            output = simplify_expression(input, c.numbers);
        } catch (const refusal&) {
            ++refused;  // a random phase that is no integer everywhere: refused, rightly
            continue;
        }
        ++cases;
        if (testing::bound_indices(output).empty()) ++reduced;
        auto report = testing::compare_at_points(input, output, c.numbers, seed, 40, 6);
        INFO("input: " << input << "\noutput: " << output << "\n" << report.first_mismatch);
        CHECK(report.mismatches == 0);
        mismatches += report.mismatches;
    }
    INFO("cases " << cases << ", reduced " << reduced << ", refused " << refused);
    CHECK(mismatches == 0);
    CHECK(cases >= 40);
    CHECK(reduced >= 15);
    WARN("property: " << cases << " cases, " << reduced << " without a sum, " << refused << " refused");
}
