// The sample points of `check` and of simplify's self-check: admissible, exhaustive where
// promised, small first, reproducible.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cstdlib>

#include "support.hpp"
#include "verify/domain.hpp"
#include "verify/sampler.hpp"

using namespace couplet;

namespace {

struct sampled {
    lowered_program program;
    verify::sampling_domain domain;
    verify::sample_set samples;
};

// The domain of the last statement, an `A == B` check.
sampled sample(const std::string& text, verify::sampling_options options = {}) {
    sampled s{testing::lower_text(text), {}, {}};
    const lowered_statement& st = s.program.statements.back();
    s.domain = verify::build_domain({st.value, st.rhs}, s.program.numbers);
    s.samples = verify::sample_points(s.domain, options);
    return s;
}

long twice(const sampled& s, const verify::point& p, const std::string& name) {
    std::size_t k = s.domain.index_of(name);
    REQUIRE(k < p.size());
    return p[k];
}

// |a-b| <= c <= a+b with a+b+c an integer, on doubled values (common practice, no source).
bool triangle(long a, long b, long c) { return std::labs(a - b) <= c && c <= a + b && (a + b + c) % 2 == 0; }

}  // namespace

TEST_CASE("sample points respect int and half declarations", "[verify]") {
    auto s = sample("int l\nhalf s\n3j(l, s, j; m1, m2, m3) == 0");
    REQUIRE(!s.samples.points.empty());
    for (const auto& p : s.samples.points) {
        CHECK(twice(s, p, "l") % 2 == 0);             // an integer l has 2l even (the meaning of 'int')
        CHECK(std::labs(twice(s, p, "s")) % 2 == 1);  // a half-odd s has 2s odd (the meaning of 'half')
    }
}

TEST_CASE("projections keep |m| <= j with j - m an integer", "[verify]") {
    // Admissibility of a projection (common practice, no source).
    auto s = sample("3j(a, b, c; ma, mb, mc) == 0");
    for (const auto& p : s.samples.points)
        for (auto [j, m] : {std::pair{"a", "ma"}, std::pair{"b", "mb"}, std::pair{"c", "mc"}}) {
            long tj = twice(s, p, j), tm = twice(s, p, m);
            CHECK(std::labs(tm) <= tj);
            CHECK((tj - tm) % 2 == 0);
        }
}

TEST_CASE("a projection in a linear-form slot is still a projection of its j", "[verify]") {
    // The slots of DLMF 34.3.3: (j j 1; m, -m-1, 1).
    auto s = sample("3j(j, j, 1; m, -m-1, 1) == 0");
    bool reaches_edge = false;
    for (const auto& p : s.samples.points) {
        long tj = twice(s, p, "j"), tm = twice(s, p, "m");
        CHECK(std::labs(tm) <= tj);  // common practice, no source
        CHECK((tj - tm) % 2 == 0);
        reaches_edge = reaches_edge || (std::labs(tm) == tj && tj > 0);
    }
    CHECK(reaches_edge);
}

TEST_CASE("the exhaustive pass holds every admissible triad with j <= depth", "[verify]") {
    for (int depth : {1, 2}) {
        verify::sampling_options o;
        o.depth = depth;
        auto s = sample("tri(a, b, c) == 1", o);
        REQUIRE(s.samples.complete);
        long expected = 0;
        for (long a = 0; a <= 2 * depth; ++a)
            for (long b = 0; b <= 2 * depth; ++b)
                for (long c = 0; c <= 2 * depth; ++c) expected += triangle(a, b, c);
        long found = 0;
        for (const auto& p : s.samples.points) {
            long a = twice(s, p, "a"), b = twice(s, p, "b"), c = twice(s, p, "c");
            found += a <= 2 * depth && b <= 2 * depth && c <= 2 * depth && triangle(a, b, c);
        }
        CHECK(found == expected);
        CHECK(s.samples.exhaustive == static_cast<std::size_t>(expected));
    }
}

TEST_CASE("a few points that break a selection rule are sampled too", "[verify]") {
    auto s = sample("6j{a, b, c; d, e, f} == 0");
    CHECK(s.samples.outside > 0);
    CHECK(s.samples.outside <= verify::sampling_options{}.outside_limit);
    std::size_t breaking = 0;
    for (const auto& p : s.samples.points) {
        long a = twice(s, p, "a"), b = twice(s, p, "b"), c = twice(s, p, "c"), d = twice(s, p, "d"),
             e = twice(s, p, "e"), f = twice(s, p, "f");
        // The triads of a 6j (common practice, no source): (abc) (aef) (dbf) (dec).
        bool all = triangle(a, b, c) && triangle(a, e, f) && triangle(d, b, f) && triangle(d, e, c);
        breaking += !all;
        if (!all) CHECK(!s.domain.preferred(p));
    }
    CHECK(breaking >= s.samples.outside);  // random points may break one as well
}

TEST_CASE("random points reach beyond the exhaustive depth", "[verify]") {
    verify::sampling_options o;
    o.depth = 1;
    o.samples = 50;
    o.random_max_j = 5;
    auto s = sample("6j{a, b, c; d, e, f} == 0", o);
    CHECK(s.samples.random == 50);
    long largest = 0;
    for (const auto& p : s.samples.points)
        for (long v : p) largest = std::max(largest, v);
    CHECK(largest > 2);
    CHECK(largest <= 10);
}

TEST_CASE("plain variables take small non-negative values", "[verify]") {
    auto s = sample("delta(x, y) == delta(y, x)");
    bool positive = false;
    for (const auto& p : s.samples.points) {
        long x = twice(s, p, "x");
        CHECK(x >= 0);
        CHECK(x <= 4);
        positive = positive || x > 0;
    }
    CHECK(positive);
}

TEST_CASE("sampling is reproducible, and the seed changes the random part", "[verify]") {
    const char* text = "3j(a, b, c; ma, mb, mc) == 0";
    auto first = sample(text), again = sample(text);
    CHECK(first.samples.points == again.samples.points);
    verify::sampling_options other;
    other.seed = 12345;
    CHECK(sample(text, other).samples.points != first.samples.points);
}

TEST_CASE("points come smallest first", "[verify]") {
    auto s = sample("6j{a, b, c; d, e, f} == 0");
    CHECK(std::is_sorted(s.samples.points.begin(), s.samples.points.end(), verify::smaller_point));
    const auto& first = s.samples.points.front();
    CHECK(std::all_of(first.begin(), first.end(), [](long v) { return v == 0; }));
}

TEST_CASE("names bound by a sum are not free", "[verify]") {
    auto s = sample("sum(m : (-1)^(j-m) * 3j(j, j, 0; m, -m, 0)) == 1");
    REQUIRE(s.domain.numbers.size() == 1);
    CHECK(s.domain.numbers[0].symbol.get_name() == "j");
}

TEST_CASE("without free quantum numbers there is one point", "[verify]") {
    auto s = sample("6j{1, 1, 1; 1, 1, 1} == 1/6");
    CHECK(s.domain.numbers.empty());
    CHECK(s.samples.points.size() == 1);
}
