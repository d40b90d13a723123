// What the command line does with a statement that fails, with its output stream and with odd
// input paths (regressions of #18; expected outcomes are common practice, no source: a batch
// tool reports every error it can and never reports success when its output is gone).
#include <catch2/catch.hpp>

#include <filesystem>
#include <nlohmann/json.hpp>
#include <sstream>
#include <streambuf>

#include "cli/run.hpp"
#include "couplet/couplet.hpp"
#include "support.hpp"

using couplet::testing::run_cli;

namespace {

int count_of(const std::string& text, const std::string& what) {
    int n = 0;
    for (std::size_t at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
    return n;
}

// A stream buffer that counts how often it is asked to flush.
class counting_buffer : public std::stringbuf {
public:
    int flushes = 0;

protected:
    int sync() override {
        ++flushes;
        return std::stringbuf::sync();
    }
};

}  // namespace

TEST_CASE("a statement that fails is reported and the statements after it still run", "[cli]") {
    auto r = run_cli({"eval", "-e", "eval 1\neval 1/x at x=0\neval 2"});
    CHECK(r.code == 2);
    CHECK(r.out == "1  ~ 1.0000000000000000000\n2  ~ 2.0000000000000000000\n");
    CHECK(r.err.find("<expression>:2:1: error:") != std::string::npos);
    CHECK(count_of(r.err, "error:") == 1);
    // Every JSON line says where its statement stands; the error is a line of its own.
    auto j = run_cli({"eval", "--format", "json", "-e", "eval 1\neval 1/x at x=0\neval 2"});
    CHECK(j.code == 2);
    std::istringstream lines(j.out);
    std::vector<nlohmann::json> records;
    for (std::string line; std::getline(lines, line);) records.push_back(nlohmann::json::parse(line));
    REQUIRE(records.size() == 3);
    CHECK(records[0].at("line") == 1);
    CHECK(records[1].at("line") == 2);
    CHECK(records[1].contains("error"));
    CHECK(records[2].at("line") == 3);
    CHECK(records[2].at("exact") == "2");
}

TEST_CASE("a failing statement outranks a failing check in the exit status", "[cli]") {
    // DLMF 34.3.9: the column exchange needs (-1)^(a+b+c), so the check fails (1); the
    // division by zero is an error (2); the higher one is the status.
    auto r = run_cli({"check", "-e", "3j(a, b, c; ma, mb, mc) == 3j(b, a, c; mb, ma, mc)\neval 1/x at x=0"});
    CHECK(r.code == 2);
    CHECK(r.out.find("fails by a phase") != std::string::npos);
}

TEST_CASE("each result is flushed as soon as it is written", "[cli]") {
    counting_buffer buffer;
    std::ostream out(&buffer);
    std::ostringstream err;
    std::istringstream in;
    int code = couplet::cli::run({"couplet", "eval", "-e", "eval 1; eval 2; eval 3"}, in, out, err);
    CHECK(code == 0);
    CHECK(count_of(buffer.str(), "\n") == 3);
    CHECK(buffer.flushes >= 3);
}

TEST_CASE("output that cannot be written is an error, not a silent success", "[cli]") {
    std::ostringstream out, err;
    out.setstate(std::ios::badbit);  // as a closed standard output or a full disk leaves it
    std::istringstream in;
    int code = couplet::cli::run({"couplet", "eval", "-e", "eval 1"}, in, out, err);
    CHECK(code == 2);
    CHECK(err.str().find("could not be written") != std::string::npos);
}

TEST_CASE("a directory given as the input file is refused", "[cli]") {
    auto r = run_cli({"eval", std::filesystem::temp_directory_path().string()});
    CHECK(r.code == 2);
    CHECK(r.err.find("is a directory") != std::string::npos);
}

TEST_CASE("a time limit that is not a number is refused", "[cli]") {
    for (const char* bad : {"nan", "inf", "-1"}) {
        INFO(bad);
        auto r = run_cli({"eval", "--time-limit", bad, "-e", "1"});
        CHECK(r.code == 2);
    }
}

TEST_CASE("a let that uses its own name is refused at the name", "[cli]") {
    auto r = run_cli({"eval", "-e", "let W = W + 1\nW at W=1"});
    CHECK(r.code == 2);
    CHECK(r.err.find("<expression>:1:9: error: 'W' is used in its own definition") != std::string::npos);
}

TEST_CASE("a power of numbers is bounded before it is computed", "[cli]") {
    // ((3^1000)^1000)^1000 has about 4.8e8 digits: refused at once instead of filling memory.
    auto r = run_cli({"eval", "-e", "eval 1\neval ((3^1000)^1000)^1000"});
    CHECK(r.code == 2);
    CHECK(r.err.find("<expression>:2:") != std::string::npos);
    CHECK(r.err.find("digits (at most 10000)") != std::string::npos);
    // Within the bound the value is exact: 2^1000 has 302 digits (common practice, no source).
    auto ok = run_cli({"eval", "-e", "2^1000"});
    CHECK(ok.code == 0);
    CHECK(ok.out.substr(0, ok.out.find(' ')).size() == 302);
}

TEST_CASE("a chain of lets deeper than the bound is refused, not a stack overflow", "[cli]") {
    // Each let nests the last one level deeper: (W+1)*y.
    std::string text = "let W0 = 6j{a, b, c; d, e, f}\n";
    for (int i = 1; i <= 1200; ++i) text += "let W" + std::to_string(i) + " = (W" + std::to_string(i - 1) + "+1)*y\n";
    text += "W1200\n";
    auto r = run_cli({"simplify", "--no-verify", "-e", text});
    CHECK(r.code == 2);
    CHECK(r.err.find("levels deep") != std::string::npos);
    // A shorter chain is fine.
    std::string shorter = "let W0 = 6j{a, b, c; d, e, f}\nlet W1 = (W0+1)*y\nlet W2 = (W1+1)*y\nW2\n";
    CHECK(run_cli({"simplify", "--no-verify", "-e", shorter}).code == 0);
}

TEST_CASE("a name that cancels still takes a value in eval ... at", "[cli]") {
    // 0*x is 0 and (2j+1)/(2j+1) is 1 (common practice, no source); the names were written.
    CHECK(run_cli({"eval", "-e", "eval 0*x at x=1"}).out == "0  ~ 0\n");
    CHECK(run_cli({"eval", "-e", "eval (2*j+1)/(2*j+1) at j=1"}).code == 0);
    CHECK(run_cli({"eval", "-e", "let W = 0*x\neval W at x=1"}).code == 0);
    // A name that was never written is still a mistake worth a message.
    auto r = run_cli({"eval", "-e", "eval 6j{1, 1, 1; 1, 1, 1} at q=1"});
    CHECK(r.code == 2);
    CHECK(r.err.find("'q' does not occur") != std::string::npos);
}

TEST_CASE("messages say what was found and what to write instead", "[cli]") {
    // A constant phase that is not real has no example point and no parity to declare.
    auto phase = run_cli({"simplify", "-e", "(-1)^(1/2)"});
    CHECK(phase.code == 2);
    CHECK(phase.err.find("for example at )") == std::string::npos);
    CHECK(phase.err.find("not an integer, so the phase is not real") != std::string::npos);
    // A decimal number.
    auto decimal = run_cli({"eval", "-e", "6j{1.5, 1, 1; 1, 1, 1}"});
    CHECK(decimal.code == 2);
    CHECK(decimal.err.find("write 3/2 for 1.5") != std::string::npos);
    // A NUL byte is named, and never echoed raw (it would cut the message).
    auto nul = run_cli({"eval", "-e", std::string("eval 1\0 + 2", 11)});
    CHECK(nul.code == 2);
    CHECK(nul.err.find("a control character (byte 0x00)") != std::string::npos);
    CHECK(nul.err.find('\0') == std::string::npos);
    // A byte-order mark before the first line is not part of the input.
    auto marked = run_cli({"eval", "-"},
                          "\xEF\xBB\xBF"
                          "eval 1/2");
    CHECK(marked.code == 0);
    CHECK(marked.out.substr(0, 3) == "1/2");
}

TEST_CASE("a printed result with a projection only in a delta reads back in", "[cli]") {
    // simplify prints CG orthogonality as delta(c, d)*delta(m3, m4)*tri(a, b, c) (DLMF 34.1.1
    // with 34.3.16); m3 and m4 survive only in the delta and may be negative.
    auto r = run_cli({"eval", "-e", "delta(c, d)*delta(m3, m4)*tri(a, b, c) at a=1, b=1, c=1, d=1, m3=-1, m4=-1"});
    CHECK(r.code == 0);
    CHECK(r.out.substr(0, 2) == "1 ");
    // A name in a j slot is still never negative.
    CHECK(run_cli({"eval", "-e", "6j{a, 1, 1; 1, 1, 1} at a=-1"}).code == 2);
}

TEST_CASE("names that LaTeX would print alike are refused", "[cli]") {
    // x_ and x, j_1 and j1 both print as one symbol: a failing check would read "x = x".
    auto r = run_cli({"check", "-e", "x_ == x"});
    CHECK(r.code == 2);
    CHECK(r.err.find("print alike in LaTeX") != std::string::npos);
    CHECK(run_cli({"eval", "-e", "j_1 + j1 at j1=1, j_1=1"}).code == 2);
    CHECK(run_cli({"eval", "-e", "j1 + j2 at j1=1, j2=1"}).code == 0);
}

TEST_CASE("statements that cannot be read are reported in their places and the others run", "[cli]") {
    const std::string text =
        "eval 1\n"
        "let W = 6j{1.5, 1, 1; 1, 1, 1}\n"  // a syntax error in a let
        "eval W\n"                          // its name has no value
        "eval 2 +\n"                        // a syntax error
        "eval 3\n";
    auto r = run_cli({"eval", "-e", text});
    CHECK(r.code == 2);
    CHECK(r.out == "1  ~ 1.0000000000000000000\n3  ~ 3.0000000000000000000\n");
    CHECK(r.err.find("<expression>:2:13: error:") != std::string::npos);
    CHECK(r.err.find("<expression>:3:6: error: 'W' has no value: its definition at 2:5 could not be read") !=
          std::string::npos);
    CHECK(r.err.find("<expression>:4:9: error:") != std::string::npos);
    // In JSON the errors stand in their places among the results.
    auto j = run_cli({"eval", "--format", "json", "-e", text});
    std::istringstream lines(j.out);
    std::vector<int> order;
    for (std::string line; std::getline(lines, line);) order.push_back(nlohmann::json::parse(line).at("line"));
    CHECK(order == std::vector<int>{1, 2, 3, 4, 5});
}

TEST_CASE("the library reads strictly or statement by statement", "[api]") {
    CHECK_THROWS_AS(couplet::parse("eval 1\neval 2 +\neval 3"), couplet::input_error);
    couplet::program p = couplet::parse_each("eval 1\neval 2 +\neval 3");
    CHECK(p.size() == 2);
    REQUIRE(p.errors().size() == 1);
    CHECK(p.errors().front().line() == 2);
    // Without an error handler, run_all refuses a program with errors before running anything.
    int ran = 0;
    CHECK_THROWS_AS(couplet::run_all(p, {}, [&](const couplet::result&) { ++ran; }), couplet::input_error);
    CHECK(ran == 0);
}
