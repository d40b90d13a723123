// The derivation trace as text: one heading line per applied rule with its reference, and the
// term before and after in the re-readable text notation.
#include <catch2/catch.hpp>

#include "rules/engine.hpp"
#include "support.hpp"

using namespace couplet;

TEST_CASE("the j-sum trace formats as rule (reference), before, after", "[rules]") {
    auto program = testing::lower_text("sum(y : (2*y+1) * 6j{a, b, y; c, d, p} * 6j{a, b, y; c, d, q})");
    auto result = rules::reduce_jsums(program.statements.back().value, program.numbers);
    std::vector<std::string> lines = format_jsum_trace(result.trace);
    REQUIRE(lines.size() == 3 * result.trace.size());
    REQUIRE(!lines.empty());
    CHECK(lines[0] == "6j orthogonality (DLMF 34.5.14)");
    CHECK(lines[1] == "  before: sum(y : (2*y+1)*6j{a, b, y; c, d, p}*6j{a, b, y; c, d, q})");
    CHECK(lines[2].rfind("  after:  delta(p, q)*", 0) == 0);
    // The text after "before:" and "after:" reads back as input.
    for (size_t k = 1; k < lines.size(); k += 3)
        for (size_t j = k; j < k + 2; ++j) CHECK_NOTHROW(testing::lower_text(lines[j].substr(10)));
    CHECK(format_jsum_trace({}).empty());
}
