// `couplet table`: rows against GSL and against `eval`, shards, worker processes, bad requests.
#include <gsl/gsl_sf_coupling.h>

#include <catch2/catch.hpp>
#include <cmath>
#include <set>
#include <sstream>

#include "support.hpp"

using couplet::testing::run_cli;

namespace {

using table_rows = std::vector<std::vector<std::string>>;

table_rows csv_rows(const std::string& text) {
    table_rows rows;
    std::istringstream in(text);
    std::string line;
    while (std::getline(in, line)) {
        std::vector<std::string> cells;
        std::istringstream fields(line);
        std::string cell;
        while (std::getline(fields, cell, ',')) cells.push_back(cell);
        if (!line.empty() && line.back() == ',') cells.emplace_back();
        rows.push_back(cells);
    }
    return rows;
}

int twice(const std::string& decimal) { return static_cast<int>(std::lround(2 * std::stod(decimal))); }

bool triangle(int a, int b, int c) { return a + b >= c && a + c >= b && b + c >= a && (a + b + c) % 2 == 0; }

const char* const sixj = "6j{a, b, c; d, e, f}";

}  // namespace

TEST_CASE("a table of 6j values with every j <= 3 agrees with GSL row by row", "[cli][table]") {
    auto r = run_cli({"table", "-e", sixj, "--for", "a, b, c, d, e, f = 0..3", "--allowed-only"});
    REQUIRE(r.code == 0);
    const table_rows rows = csv_rows(r.out);
    REQUIRE(rows.front() == std::vector<std::string>{"a", "b", "c", "d", "e", "f", "value", "decimal"});
    // The admissible symbols counted here by their four triangle conditions, in the same
    // lexicographic order (common practice, no source: the triads of a 6j).
    std::vector<std::array<int, 6>> expected;
    for (int a = 0; a <= 6; ++a)
        for (int b = 0; b <= 6; ++b)
            for (int c = 0; c <= 6; ++c)
                for (int d = 0; d <= 6; ++d)
                    for (int e = 0; e <= 6; ++e)
                        for (int f = 0; f <= 6; ++f)
                            if (triangle(a, b, c) && triangle(a, e, f) && triangle(d, b, f) && triangle(d, e, c))
                                expected.push_back({a, b, c, d, e, f});
    REQUIRE(rows.size() == expected.size() + 1);
    std::size_t mismatches = 0;
    for (std::size_t k = 0; k < expected.size(); ++k) {
        const auto& row = rows[k + 1];
        REQUIRE(row.size() == 8);
        std::array<int, 6> got{};
        for (int c = 0; c < 6; ++c) got[c] = twice(row[c]);
        const auto& s = expected[k];
        const double gsl = gsl_sf_coupling_6j(s[0], s[1], s[2], s[3], s[4], s[5]);  // GSL 2.7 gsl_sf_coupling_6j
        if (got != s || std::fabs(std::stod(row[7]) - gsl) > 1e-12) ++mismatches;
    }
    CHECK(mismatches == 0);
}

TEST_CASE("without --allowed-only a table holds every combination with integral triad sums, the forbidden ones 0",
          "[cli][table]") {
    auto r = run_cli({"table", "-e", sixj, "--for", "a, b, c, d, e, f = 0..1"});
    REQUIRE(r.code == 0);
    const table_rows rows = csv_rows(r.out);
    // Of the 3^6 combinations of 0, 1/2, 1, those whose four triads have integral sums (a value
    // is only defined there; the triangle inequalities may fail).
    std::size_t integral = 0;
    for (int k = 0; k < 729; ++k) {
        int t[6];
        for (int c = 0, v = k; c < 6; ++c, v /= 3) t[c] = v % 3;
        auto even = [&](int x, int y, int z) { return (t[x] + t[y] + t[z]) % 2 == 0; };
        if (even(0, 1, 2) && even(0, 4, 5) && even(3, 1, 5) && even(3, 4, 2)) ++integral;
    }
    REQUIRE(rows.size() == integral + 1);
    std::size_t wrong = 0;
    for (std::size_t k = 1; k < rows.size(); ++k) {
        int t[6];
        for (int c = 0; c < 6; ++c) t[c] = twice(rows[k][c]);
        const double gsl = gsl_sf_coupling_6j(t[0], t[1], t[2], t[3], t[4], t[5]);  // GSL 2.7: 0 when not admissible
        if (std::fabs(std::stod(rows[k][7]) - gsl) > 1e-12) ++wrong;
    }
    CHECK(wrong == 0);
}

TEST_CASE("a table of a derived recoupling formula agrees with eval of its definition at each row", "[cli][table]") {
    const std::string definition =
        "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M> * "
        "<j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)";
    auto derived = run_cli({"simplify", "-e", definition});
    REQUIRE(derived.code == 0);
    const std::string formula = derived.out.substr(0, derived.out.find('\n'));
    REQUIRE(formula.find("sum") == std::string::npos);
    auto r = run_cli({"table", "-e", formula, "--for", "j1, j2, j3 = 0..1", "--allowed-only"});
    REQUIRE(r.code == 0);
    const table_rows rows = csv_rows(r.out);
    REQUIRE(rows.size() > 40);
    const auto& header = rows.front();
    std::size_t mismatches = 0;
    for (std::size_t k = 1; k < rows.size(); ++k) {
        std::string at;
        std::string j_total;
        for (std::size_t c = 0; c + 2 < header.size(); ++c) {
            at += (c ? ", " : "") + header[c] + "=" + std::to_string(twice(rows[k][c])) + "/2";
            if (header[c] == "J") j_total = std::to_string(twice(rows[k][c])) + "/2";
        }
        auto e = run_cli({"eval", "-e", "eval " + definition + " at " + at + ", M=" + j_total});
        REQUIRE(e.code == 0);
        if (e.out.substr(0, e.out.find(' ')) != rows[k][header.size() - 2]) ++mismatches;
    }
    CHECK(mismatches == 0);
}

TEST_CASE("shards joined with cat are the whole table", "[cli][table]") {
    const std::vector<std::string> base = {"table", "-e", "<j1 m1, j2 m2 | J M>", "--for", "j1, j2 = 0..3/2"};
    auto whole = run_cli(base);
    REQUIRE(whole.code == 0);
    for (const char* format : {"csv", "jsonl"}) {
        auto all = base;
        all.insert(all.end(), {"--format", format});
        const std::string expected = run_cli(all).out;
        std::string joined;
        for (int i = 1; i <= 3; ++i) {
            auto part = all;
            part.insert(part.end(), {"--shard", std::to_string(i) + "/3"});
            auto p = run_cli(part);
            REQUIRE(p.code == 0);
            CHECK(!p.out.empty());
            joined += p.out;
        }
        CHECK(joined == expected);
    }
}

TEST_CASE("a table with --jobs 2 writes the same bytes as with --jobs 1", "[cli][table]") {
    const std::vector<std::string> base = {"table", "-e", sixj, "--for", "a, b, c, d, e, f = 0..5/2", "--allowed-only"};
    auto one = run_cli(base);
    auto two_args = base;
    two_args.insert(two_args.end(), {"--jobs", "2"});
    auto two = run_cli(two_args);
    REQUIRE(one.code == 0);
    REQUIRE(two.code == 0);
    CHECK(csv_rows(one.out).size() > 1024);  // more than one block of rows
    CHECK(two.out == one.out);
}

TEST_CASE("a table's JSON lines carry the numbers and both forms of the value", "[cli][table]") {
    auto r = run_cli({"table", "--format", "jsonl", "-e", "3j(a, b, c; 0, 0, 0)", "--for", "a, b = 0..1", "--nonzero"});
    REQUIRE(r.code == 0);
    std::istringstream lines(r.out);
    std::string line;
    std::size_t n = 0;
    while (std::getline(lines, line)) {
        auto j = nlohmann::json::parse(line);
        const int a = twice(std::to_string(j.at("a").get<double>())),
                  b = twice(std::to_string(j.at("b").get<double>())),
                  c = twice(std::to_string(j.at("c").get<double>()));
        const double gsl = gsl_sf_coupling_3j(a, b, c, 0, 0, 0);  // GSL 2.7 gsl_sf_coupling_3j
        CHECK(gsl != 0);
        CHECK(j.at("decimal").get<double>() == Approx(gsl).margin(1e-12));
        CHECK(j.at("value").is_string());
        ++n;
    }
    // (a, b) in {0, 1/2, 1}^2 with a + b + c even and c a triangle's third side:
    // (0,0,0) (0,1,1) (1,0,1) (1,1,0) (1,1,2), and nothing with a half-odd a or b
    // (common practice, no source: (a b c; 0 0 0) vanishes unless a + b + c is even).
    CHECK(n == 5);
}

TEST_CASE("a row where the expression divides by 0 is written as undefined", "[cli][table]") {
    auto r = run_cli({"table", "-e", "1/(2*j - 1)", "--for", "j = 0..1"});
    REQUIRE(r.code == 0);
    CHECK(r.out == "j,value,decimal\n0,-1,-1\n0.5,undefined,\n1,1,1\n");
}

TEST_CASE("a table names what it needs: a range, a known name, a readable value", "[cli][table]") {
    auto unbounded = run_cli({"table", "-e", sixj, "--for", "a = 0..2"});
    CHECK(unbounded.code == 2);
    CHECK(unbounded.err.find("nothing bounds b, c, d, e, f") != std::string::npos);

    auto unknown = run_cli({"table", "-e", sixj, "--for", "a, q = 0..2"});
    CHECK(unknown.code == 2);
    CHECK(unknown.err.find("--for:1:4: error: 'q' is not a free quantum number") != std::string::npos);

    auto unreadable = run_cli({"table", "-e", sixj, "--for", "a = 0..1/3"});
    CHECK(unreadable.code == 2);
    CHECK(unreadable.err.find("--for:1:8: error: a quantum number is a multiple of 1/2") != std::string::npos);

    auto twice_named = run_cli({"table", "-e", sixj, "--for", "a = 0..1", "--for", "a = 2"});
    CHECK(twice_named.code == 2);
    CHECK(twice_named.err.find("'a' has a range already") != std::string::npos);

    auto too_many = run_cli({"table", "-e", sixj, "--for", "a, b, c, d, e, f = 0..3", "--max-rows", "100"});
    CHECK(too_many.code == 2);
    CHECK(too_many.err.find("above the limit of 100") != std::string::npos);

    auto bad_shard = run_cli({"table", "-e", sixj, "--shard", "4/3"});
    CHECK(bad_shard.code == 2);
    CHECK(bad_shard.err.find("--shard takes I/N") != std::string::npos);

    auto a_check = run_cli({"table", "-e", "6j{a,b,c;d,e,f} == 6j{b,a,c;e,d,f}"});
    CHECK(a_check.code == 2);
    CHECK(a_check.err.find("a table needs an expression") != std::string::npos);

    auto fixed_by_at = run_cli({"table", "-e", "eval 6j{a,b,c;d,e,f} at a=1"});
    CHECK(fixed_by_at.code == 2);
    CHECK(fixed_by_at.err.find("not from 'at': write --for 'a = ...' instead") != std::string::npos);

    auto no_let = run_cli({"table", "--of", "W", "-e", "let V = 6j{a,b,c;d,e,f}"});
    CHECK(no_let.code == 2);
    CHECK(no_let.err.find("no let named 'W'") != std::string::npos);
}

TEST_CASE("a table of a let named by --of, where a name without a range takes what its symbols allow", "[cli][table]") {
    auto r = run_cli({"table", "--of", "W", "-", "--for", "j1, j2 = 1/2", "--allowed-only"},
                     "let W = <j1 m1, j2 m2 | J M>^2\nlet V = 1\n");
    REQUIRE(r.code == 0);
    const table_rows rows = csv_rows(r.out);
    // Two spin-1/2 coupled: J = 0 with M = 0 (two rows), J = 1 with its four (m1, m2) pairs
    // that have M = m1 + m2 (common practice, no source).
    REQUIRE(rows.size() == 1 + 6);
    CHECK(rows.front() == std::vector<std::string>{"j1", "j2", "J", "m1", "m2", "M", "value", "decimal"});
    std::set<std::string> values;
    for (std::size_t k = 1; k < rows.size(); ++k) {
        CHECK(twice(rows[k][3]) + twice(rows[k][4]) == twice(rows[k][5]));
        values.insert(rows[k][6]);
    }
    CHECK(values == std::set<std::string>{"1", "1/2"});
}
