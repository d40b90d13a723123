// The LaTeX document as a reader sees it: every corpus result and its derivation fit the text
// width of an article (pdflatex reports no overfull line over 5 pt), the appendix names the
// identities it used, eval keeps roots exact and says where it evaluated, a failed check is a
// \neq with its diagnosis, comments become paragraphs that cannot inject TeX, and let names are
// used by name.
#include <catch2/catch.hpp>

#include <unistd.h>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <regex>

#include "corpus/textbook_corpus.hpp"
#include "support.hpp"

using namespace couplet;
using testing::run_cli;

namespace {

struct typeset {
    int status = -1;
    double widest_overflow_pt = 0;  // the largest "Overfull \hbox (X pt too wide)"
    std::string log;
};

// pdflatex is a test dependency (.ci/run installs texlive-latex-base); without it the test fails.
typeset compile(const std::string& document, const std::string& name) {
    auto dir = std::filesystem::temp_directory_path() / ("couplet-" + name + "-" + std::to_string(::getpid()));
    std::filesystem::create_directories(dir);
    {
        std::ofstream f(dir / "doc.tex");
        f << document;
    }
    typeset t;
    const std::string cmd =
        "cd '" + dir.string() + "' && pdflatex -interaction=nonstopmode -halt-on-error doc.tex > pdflatex.out 2>&1";
    t.status = std::system(cmd.c_str());
    std::ifstream log(dir / "doc.log");
    t.log.assign(std::istreambuf_iterator<char>(log), std::istreambuf_iterator<char>());
    const std::regex overfull(R"(Overfull \\hbox \(([0-9.]+)pt too wide\))");
    for (std::sregex_iterator it(t.log.begin(), t.log.end(), overfull), end; it != end; ++it)
        t.widest_overflow_pt = std::max(t.widest_overflow_pt, std::stod((*it)[1]));
    std::filesystem::remove_all(dir);
    return t;
}

// Each corpus entry is its own program (the entries reuse names in different roles); their
// documents' bodies are joined into one document, one pdflatex run.
std::string corpus_document(bool steps) {
    std::string body;
    for (const auto& e : testing::textbook::corpus()) {
        std::string program = std::string("# ") + e.label + " (" + e.source + ")\n";
        if (e.declarations[0]) program += std::string(e.declarations) + "\n";
        program += std::string(e.input) + "\n";
        std::vector<std::string> args{"latex", "-"};
        if (steps) args.push_back("--steps");
        auto r = run_cli(args, program);
        INFO(e.label << ": " << r.err);
        REQUIRE(r.code == 0);
        const std::string open = "\\begin{document}\n", close = "\\end{document}";
        const std::size_t from = r.out.find(open) + open.size(), to = r.out.rfind(close);
        REQUIRE(to != std::string::npos);
        body += r.out.substr(from, to - from);
    }
    return "\\documentclass{article}\n\\usepackage{amsmath}\n\\allowdisplaybreaks\n\\begin{document}\n" + body +
           "\\end{document}\n";
}

}  // namespace

TEST_CASE("every corpus result and its derivation fit an article's text width", "[print][latex][pdflatex]") {
    for (const bool steps : {false, true}) {
        INFO((steps ? "with --steps" : "without --steps"));
        typeset t = compile(corpus_document(steps), steps ? "steps" : "plain");
        INFO(t.log.substr(t.log.size() > 4000 ? t.log.size() - 4000 : 0));
        REQUIRE(t.status == 0);
        CHECK(t.widest_overflow_pt <= 5.0);
    }
}

TEST_CASE("a long formula breaks into aligned lines, also as a fragment", "[print][latex]") {
    const std::string four_cg =
        "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M>"
        " * <j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)";
    auto doc = run_cli({"latex", "-e", four_cg});
    CHECK(doc.out.find("\\begin{align*}") != std::string::npos);
    CHECK(doc.out.find("\\times") != std::string::npos);  // a product continued on the next line
    auto fragment = run_cli({"latex", "--fragment", "-e", four_cg});
    CHECK(fragment.out.find("\\begin{aligned}") != std::string::npos);
    CHECK(fragment.out.find("\\documentclass") == std::string::npos);
    // Summation indices are separated by commas and stacked when there are more than three.
    CHECK(doc.out.find("\\substack{m_{1}, m_{2}, m_{3} \\\\ m_{12}, m_{23}}") != std::string::npos);
}

TEST_CASE("the derivation appendix names each identity with its reference", "[print][latex]") {
    // Edmonds (1957) eq. 6.1.5 from its four Clebsch-Gordan coefficients.
    auto r = run_cli({"latex", "--steps", "-e",
                      "sum(m1, m2, m3, m12, m23 : <j1 m1, j2 m2 | j12 m12> * <j12 m12, j3 m3 | J M>"
                      " * <j2 m2, j3 m3 | j23 m23> * <j1 m1, j23 m23 | J M>)"});
    REQUIRE(r.code == 0);
    CHECK(r.out.find("Clebsch-Gordan coefficients as 3j symbols (DLMF 34.1.1)") != std::string::npos);
    CHECK(r.out.find("triangle to 3j times 6j (DLMF 34.5.23)") != std::string::npos);
    CHECK(r.out.find("bubble to a delta (DLMF 34.3.16)") != std::string::npos);
    CHECK(r.out.find("\\tag*{\\footnotesize input}") != std::string::npos);
    CHECK(r.out.find("\\tag*{\\footnotesize result}") != std::string::npos);
    typeset t = compile(r.out, "appendix");
    CHECK(t.status == 0);
    CHECK(t.widest_overflow_pt <= 5.0);
}

TEST_CASE("eval in LaTeX: the exact root, the decimal and the point", "[print][latex]") {
    // <1 1, 1/2 -1/2 | 1/2 1/2> = sqrt(2/3): the Condon-Shortley table for j2 = 1/2 (from memory).
    auto r = run_cli({"latex", "--fragment", "-e", "eval <1 1, 1/2 -1/2 | 1/2 1/2>"});
    CHECK(r.out.find("= \\frac{\\sqrt{6}}{3} \\approx 0.816496580927726") != std::string::npos);
    // {1 1 1; 1 1 1} = 1/6 (DLMF 34.5 tables, from memory): rational, so no decimal.
    auto at = run_cli({"latex", "--fragment", "-e", "eval 6j{a, 1, 1; 1, 1, 1} at a=1"});
    CHECK(at.out.find("\\frac{1}{6}") != std::string::npos);
    CHECK(at.out.find("\\text{at } a = 1") != std::string::npos);
    CHECK(at.out.find("\\approx") == std::string::npos);
}

TEST_CASE("checks in LaTeX: = with the evidence, neq with the diagnosis", "[print][latex]") {
    // Swapping two columns of a 3j costs (-1)^(a+b+c) (DLMF 34.3.9).
    auto fails = run_cli({"latex", "--fragment", "-e", "check 3j(a, b, c; ma, mb, mc) == 3j(b, a, c; mb, ma, mc)"});
    CHECK(fails.code == 1);
    CHECK(fails.out.find("\\neq") != std::string::npos);
    CHECK(fails.out.find("holds after multiplying the right side by } (-1)^{a+b+c}") != std::string::npos);
    auto holds = run_cli(
        {"latex", "--fragment", "-e", "check 3j(a, b, c; ma, mb, mc) == (-1)^(a+b+c) * 3j(b, a, c; mb, ma, mc)"});
    CHECK(holds.code == 0);
    CHECK(holds.out.find("\\neq") == std::string::npos);
    CHECK((holds.out.find("(proved; checked exactly at") != std::string::npos ||
           holds.out.find("(verified exactly at") != std::string::npos));
    // A plain failure shows where: 6j orthogonality without its triangles (DLMF 34.5.14 has them).
    auto counter = run_cli({"latex", "--fragment", "-e",
                            "check sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{c, d, x; a, b, q}) == "
                            "delta(p, q) / (2*p+1)"});
    CHECK(counter.out.find("the left side is }") != std::string::npos);
}

TEST_CASE("comments become paragraphs that cannot emit TeX commands", "[print][latex]") {
    auto r = run_cli({"latex", "-"}, "# a \\input{x} $y$ & 50% #z ^_~ {w}\n6j{a, b, c; d, e, f}\n# closing words\n");
    REQUIRE(r.code == 0);
    CHECK(r.out.find("\\input") == std::string::npos);
    CHECK(r.out.find("a \\textbackslash{}input\\{x\\} \\$y\\$ \\& 50\\% \\#z \\^{}\\_\\~{} \\{w\\}") !=
          std::string::npos);
    CHECK(r.out.find("closing words") < r.out.find("\\end{document}"));
    CHECK(compile(r.out, "comments").status == 0);
}

TEST_CASE("let names are typeset and used by name, and the triangle condition has one legend", "[print][latex]") {
    auto r = run_cli({"latex", "-"},
                     "let W = sum(m1, m2 : <a m1, b m2 | c m3> * <a m1, b m2 | d m4>)\nsimplify W\n"
                     "sum(m1, m2 : <a m1, b m2 | c m3>^2)\n");
    REQUIRE(r.code == 0);
    CHECK(r.out.find("W = \\sum_{m_{1}, m_{2}}") != std::string::npos);
    CHECK(r.out.find("W = \\delta_{c,d}") != std::string::npos);
    const std::string legend = "stands for the triangle condition";
    REQUIRE(r.out.find(legend) != std::string::npos);
    CHECK(r.out.find(legend) == r.out.rfind(legend));
    CHECK(r.out.find(legend) < r.out.find("W = \\delta_{c,d}"));
    CHECK(r.out.find("\\Delta") == std::string::npos);
}
