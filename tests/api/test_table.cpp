// couplet::table from C++: shards, rows and their values.
#include <catch2/catch.hpp>
#include <sstream>

#include "couplet/couplet.hpp"

TEST_CASE("api: a table's shards partition its rows, and write and append agree", "[api][table]") {
    const couplet::program p = couplet::parse("<j1 m1, j2 m2 | J M>");
    couplet::table_options o;
    o.ranges = {"j1 = 1/2", "j2 = 1"};
    o.allowed_only = true;
    const couplet::table whole(p, o);
    CHECK(whole.columns() == std::vector<std::string>{"j1", "j2", "J", "m1", "m2", "M"});
    // j1 = 1/2 and j2 = 1 couple to J = 1/2 and 3/2; a row is a pair (m1, m2) with
    // M = m1 + m2 and |M| <= J (common practice, no source).
    std::size_t expected = 0;
    for (int J2 : {1, 3})
        for (int m1 = -1; m1 <= 1; m1 += 2)
            for (int m2 = -2; m2 <= 2; m2 += 2)
                if (std::abs(m1 + m2) <= J2) ++expected;
    CHECK(whole.size() == expected);
    CHECK(whole.total_size() == expected);
    std::string appended;
    CHECK(whole.append(0, whole.size(), appended) == expected);
    std::ostringstream written;
    whole.write(0, whole.size(), written);
    CHECK(written.str() == appended);

    std::string joined;
    for (std::size_t i = 1; i <= 4; ++i) {
        o.shard = i;
        o.shards = 4;
        const couplet::table part(p, o);
        CHECK(part.total_size() == expected);
        joined += part.header();
        part.append(0, part.size(), joined);
    }
    CHECK(joined == whole.header() + appended);
}
