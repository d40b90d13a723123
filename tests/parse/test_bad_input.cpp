// Malformed input: every case must give a user_error at the right place, and through the
// command line a FILE:LINE:COLUMN message with a caret and exit code 2 -- never a crash.
#include <catch2/catch.hpp>

#include "support.hpp"

using namespace couplet;

namespace {

struct bad_case {
    const char* text;
    std::size_t line, column;
    const char* message_part;
};

// Each input is malformed on purpose; the position is where a reader would look first.
const bad_case bad_cases[] = {
    {"3j(a, b, c; ma, mb", 1, 3, "unclosed '('"},
    {"6j{a, b, c; d, e, f", 1, 3, "unclosed '{'"},
    {"3j(a, b, c; ma, mb, mc))", 1, 24, "unmatched ')'"},
    {"6j{a, b, c; d, e, f)", 1, 20, "does not match"},
    {"3j(a, b, c, ma, mb, mc)", 1, 1, "2 rows"},
    {"3j(a, b; ma, mb)", 1, 4, "row 1 of this 3j has 2 entries"},
    {"9j{a, b, c; d, e, f}", 1, 1, "3 rows"},
    {"9j{a, b, c; d, e, f; g, h}", 1, 22, "row 3 of this 9j has 2 entries"},
    {"6j{a, b, c; d, e, f; g, h, i}", 1, 1, "2 rows"},
    {"a + @", 1, 5, "found '@'"},
    {"@a", 1, 1, "unexpected '@'"},
    {"a $ b", 1, 3, "found '$'"},
    {"sum( : 3j(a, b, c; m, -m, 0))", 1, 6, "expected summation index"},
    {"sum(m 3j(a, b, c; m, -m, 0))", 1, 7, "expected ':'"},
    {"sum(k : 3j(a, b, c; m, -m, 0))", 1, 5, "'k' does not occur"},
    {"sum(m, m : 3j(a, b, c; m, -m, 0))", 1, 8, "listed twice"},
    {"3j(a, b, c; m, -m, 0) * 3j(m, b, c; x, -x, 0)", 1, 28, "as an angular momentum"},
    {"let W = V * 2\nlet V = a", 1, 9, "used before its definition"},
    {"let W = a\nlet W = b", 2, 5, "already defined"},
    {"foo(a)", 1, 1, "unknown function 'foo'"},
    {"sqrt(a, b)", 1, 1, "sqrt takes 1 argument"},
    {"delta(a)", 1, 1, "delta takes 2 arguments"},
    {"(-1)^(j*j)", 1, 6, "must be linear"},
    {"2^j", 1, 3, "only (-1) may be raised"},
    {"3j(a*b, b, c; 0, 0, 0)", 1, 4, "must be linear"},
    {"a / 0", 1, 5, "division by zero"},
    {"eval 3j(1, 1, 2; m, -m, 0) at m=1/2", 1, 33, "not admissible"},
    {"int j\neval (-1)^(2*j) * 3j(j, j, 0; 0, 0, 0) at j=1/2", 2, 45, "declared 'int'"},
    {"eval 6j{a, 1, 1; 1, 1, 1} at a=-1", 1, 32, "never negative"},
    {"eval 6j{a, 1, 1; 1, 1, 1} at a=1/3", 1, 32, "multiples of 1/2"},
    {"eval 6j{a, 1, 1; 1, 1, 1} at z=1", 1, 30, "does not occur"},
    {"eval 6j{a, 1, 1; 1, 1, 1} at a=1, a=2", 1, 35, "assigned twice"},
    {"check a = b", 1, 9, "expected '=='"},
    {"let = a", 1, 5, "expected name"},
    {"int", 1, 4, "expected name"},
    {"<a ma, b mb | c>", 1, 16, "expected Clebsch-Gordan entry"},
    {"<a ma b mb | c mc>", 1, 7, "expected ','"},
    {"<a m-1, b 1 | c m>", 1, 5, "expected ','"},
    {"12345678901234567890123456789012345678901234567890123456789012345678901234567890"
     "12345678901234567890123456789012345678901234567890123456789012345678901234567890"
     "1234567890123456789012345678901234567890123456789012345678901234567890",
     1, 1, "number too long"},
    {"a^1001", 1, 3, "exponent too large"},
    {"2j", 1, 2, "found 'j'"},
    {"3j(a, b, c; ma, mb, mc) 6j{a, b, c; d, e, f}", 1, 25, "found '6'"},
    {"simplify", 1, 9, "expected expression"},
    {"eval 3j(a, b, c; 0, 0, 0) at", 1, 29, "expected assignment"},
    {"int j\nhalf j", 2, 6, "both 'int' and 'half'"},
    {"a +\n b", 1, 4, "expected expression"},
    {"⟨a ma, b mb | c mc⟩", 1, 1, "unexpected '⟨'"},
};

}  // namespace

TEST_CASE("malformed input is reported at its position", "[parse][bad-input]") {
    for (const bad_case& c : bad_cases) {
        INFO("input: " << c.text);
        source_file src("<test>", c.text);
        bool thrown = false;
        try {
            (void)read_program(src);
            // Errors found only when a statement is carried out (evaluation) come from the CLI.
            auto r = testing::run_cli({"simplify", "-e", c.text});
            if (r.code == 2) {
                thrown = true;
                CHECK(r.err.find(c.message_part) != std::string::npos);
            }
        } catch (const user_error& e) {
            thrown = true;
            auto pos = src.locate(e.offset());
            CHECK(std::string(e.what()).find(c.message_part) != std::string::npos);
            INFO("message: " << e.what());
            CHECK(pos.line == c.line);
            CHECK(pos.column == c.column);
        }
        CHECK(thrown);
    }
}

TEST_CASE("there are at least 30 malformed inputs under test", "[parse][bad-input]") {
    CHECK(std::size(bad_cases) >= 30);
}

TEST_CASE("the command line prints FILE:LINE:COLUMN, the line and a caret, exit 2", "[parse][cli]") {
    auto r = testing::run_cli({"simplify", "-"}, "int j\n3j(j, j, 0; m, -m 0)\n");
    CHECK(r.code == 2);
    CHECK(r.err == "<stdin>:2:19: error: expected ')', found '0'\n  3j(j, j, 0; m, -m 0)\n                    ^\n");
    CHECK(r.out.empty());
}

TEST_CASE("JSON mode reports errors as an object with line and column", "[parse][cli]") {
    auto r = testing::run_cli({"simplify", "--format", "json", "-e", "6j{a, b; c}"});
    CHECK(r.code == 2);
    auto j = nlohmann::json::parse(r.out);
    CHECK(j.at("line") == 1);
    CHECK(j.at("column") == 4);
    CHECK(j.at("error").get<std::string>().find("row 1 of this 6j has 2 entries") != std::string::npos);
}

TEST_CASE("10 000 nested parentheses are refused, not a stack overflow", "[parse][bad-input]") {
    std::string deep = std::string(10000, '(') + "a" + std::string(10000, ')');
    auto r = testing::run_cli({"simplify", "-e", deep});
    CHECK(r.code == 2);
    CHECK(r.err.find("nested too deeply") != std::string::npos);
    std::string minus(10000, '-');
    r = testing::run_cli({"simplify", "-e", minus + "a"});
    CHECK(r.code == 2);
    std::string tower = "a";
    for (int i = 0; i < 5000; ++i) tower += "^a";
    r = testing::run_cli({"simplify", "-e", tower});
    CHECK(r.code == 2);
}

TEST_CASE("nesting within the bound still parses", "[parse]") {
    std::string deep = std::string(150, '(') + "a" + std::string(150, ')');
    auto r = testing::run_cli({"simplify", "-e", deep});
    CHECK(r.code == 0);
    CHECK(r.out == "a\n");
}

TEST_CASE("huge numbers stay exact within the digit bound", "[parse]") {
    auto r = testing::run_cli({"simplify", "-e", "123456789012345678901234567890 * 2"});
    CHECK(r.code == 0);
    CHECK(r.out == "246913578024691357802469135780\n");
    r = testing::run_cli({"eval", "-e", "6j{a, 1, 1; 1, 1, 1} at a=99999999999999999999999"});
    CHECK(r.code == 2);
    CHECK(r.err.find("too large") != std::string::npos);
}

TEST_CASE("random junk never crashes the parser", "[parse][bad-input]") {
    const std::string alphabet = "()<>{}|;:,=+-*/^#'_ \n\tabjm0123456789sumlet3j6j9jevalat";
    std::mt19937 rng(12345);
    for (int i = 0; i < 2000; ++i) {
        std::string text;
        int n = std::uniform_int_distribution<int>(0, 40)(rng);
        for (int k = 0; k < n; ++k)
            text += alphabet[std::uniform_int_distribution<std::size_t>(0, alphabet.size() - 1)(rng)];
        INFO("input: " << text);
        auto r = testing::run_cli({"simplify", "-e", text});
        CHECK((r.code == 0 || r.code == 1 || r.code == 2));
        if (r.code == 2) CHECK(r.err.find("error: ") != std::string::npos);
    }
}
