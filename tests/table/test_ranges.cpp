// The --for text of a table: names, values doubled, steps, and where an error points.
#include <catch2/catch.hpp>

#include "source/source.hpp"
#include "table/ranges.hpp"

using couplet::table_detail::read_ranges;

namespace {

std::size_t error_offset(const std::string& text) {
    try {
        read_ranges(text);
    } catch (const couplet::user_error& e) {
        return e.offset();
    }
    return std::string::npos;
}

}  // namespace

TEST_CASE("table ranges: names share one range, values are held doubled", "[table][ranges]") {
    auto r = read_ranges(" j1 , j2' = 1/2 .. 9/2 step 1 ");
    REQUIRE(r.size() == 2);
    CHECK(r[0].name == "j1");
    CHECK(r[0].offset == 1);
    CHECK(r[1].name == "j2'");
    CHECK(r[1].offset == 6);
    for (const auto& x : r) {
        CHECK(x.from == 1);
        CHECK(x.to == 9);
        CHECK(x.step == 2);
    }
    auto one = read_ranges("m = -3/2");
    REQUIRE(one.size() == 1);
    CHECK(one[0].from == -3);
    CHECK(one[0].to == -3);
    CHECK(one[0].step == 1);
    auto whole = read_ranges("J=0..10000");
    CHECK(whole[0].to == 20000);
}

TEST_CASE("table ranges: each mistake is reported where it stands", "[table][ranges]") {
    CHECK(error_offset("= 0..2") == 0);            // no name
    CHECK(error_offset("a 0..2") == 2);            // no '='
    CHECK(error_offset("a = x") == 4);             // not a number
    CHECK(error_offset("a = 1/3") == 4);           // not a multiple of 1/2
    CHECK(error_offset("a = 1/0") == 6);           // a denominator of 0
    CHECK(error_offset("a = 1/") == 6);            // no denominator
    CHECK(error_offset("a = 2..1") == 4);          // empty
    CHECK(error_offset("a = 0..2 step 0") == 14);  // a step must be positive
    CHECK(error_offset("a = 0..2 by 1") == 9);     // text after the range
    CHECK(error_offset("a = 10001") == 4);         // beyond 2j <= 20000
    CHECK(error_offset("a = 99999999999999999999") == 4);
}
