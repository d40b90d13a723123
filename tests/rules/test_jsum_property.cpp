// Property: random products of 6j symbols sharing a summed index x (random_jsum.hpp) simplify
// to something exactly equal to the input.
#include <catch2/catch.hpp>

#include <random>

#include "canonical/symmetries.hpp"
#include "jsum_check.hpp"
#include "model/symbols.hpp"
#include "random_jsum.hpp"
#include "rules/rule.hpp"
#include "simplify/simplify.hpp"
#include "support.hpp"

using namespace couplet;

TEST_CASE("random 6j products summed over x simplify to an exactly equal expression", "[rules][prop]") {
    int cases = 0, reduced = 0, refused = 0, mismatches = 0;
    for (unsigned seed = 1; seed <= 60; ++seed) {
        testing::random_jsum_case c(seed);
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
