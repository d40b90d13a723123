// LaTeX output: safe identifiers, the amsmath forms, and a generated document that compiles.
#include <catch2/catch.hpp>

#include <unistd.h>
#include <cstdlib>
#include <filesystem>
#include <fstream>

#include "print/print.hpp"
#include "print/random_source.hpp"
#include "support.hpp"

using namespace couplet;

TEST_CASE("identifiers map to safe TeX", "[print][latex]") {
    CHECK(latex_identifier("j12") == "j_{12}");
    CHECK(latex_identifier("J'") == "J'");
    CHECK(latex_identifier("lambda") == "\\lambda");
    CHECK(latex_identifier("lambda1") == "\\lambda_{1}");
    CHECK(latex_identifier("m_a") == "m_{a}");
    CHECK(latex_identifier("ma") == "\\mathit{ma}");
    CHECK(latex_identifier("j1'") == "j_{1}'");
    CHECK(latex_identifier("Omega") == "\\Omega");
}

TEST_CASE("no identifier can emit an arbitrary TeX command", "[print][latex]") {
    // Names that spell TeX primitives or dangerous commands stay inert text.
    for (const char* name : {"input", "def", "write", "immediate", "catcode", "end", "x_input", "begin1"}) {
        std::string tex = latex_identifier(name);
        INFO(name << " -> " << tex);
        CHECK(tex.find("\\input") == std::string::npos);
        CHECK(tex.find("\\def") == std::string::npos);
        CHECK(tex.find("\\write") == std::string::npos);
        // The only command a plain name can produce is \mathit.
        std::string rest = tex;
        for (std::size_t at; (at = rest.find("\\mathit{")) != std::string::npos;) rest.erase(at, 8);
        CHECK(rest.find('\\') == std::string::npos);
    }
}

TEST_CASE("LaTeX forms of the coupling symbols", "[print][latex]") {
    auto tex = [](const std::string& text) { return to_latex(testing::lower_last(text)); };
    CHECK(tex("3j(j1, j2, j3; m1, m2, m3)") ==
          "\\begin{pmatrix} j_{1} & j_{2} & j_{3} \\\\ m_{1} & m_{2} & m_{3} \\end{pmatrix}");
    CHECK(tex("6j{a, b, c; d, e, f}") == "\\begin{Bmatrix} a & b & c \\\\ d & e & f \\end{Bmatrix}");
    CHECK(tex("<j1 m1, j2 m2 | J M>") == "\\langle j_{1}\\, m_{1}, j_{2}\\, m_{2} \\mid J\\, M\\rangle");
    CHECK(tex("(-1)^(a+b)") == "(-1)^{a+b}");
    CHECK(tex("sum(m1, m2 : 3j(a, b, c; m1, m2, m3))") ==
          "\\sum_{m_{1}, m_{2}} \\begin{pmatrix} a & b & c \\\\ m_{1} & m_{2} & m_{3} \\end{pmatrix}");
    CHECK(tex("delta(p, q)/(2*p+1)") == "\\frac{\\delta_{p,q}}{2 p+1}");
}

namespace {

bool have_pdflatex() { return std::system("command -v pdflatex > /dev/null 2>&1") == 0; }

}  // namespace

// clang evaluates the operands of random_source's string '+' in another order than g++, so it
// generates another program; in clang's, one statement once met a projection paired by an
// earlier line (tests/model/test_statement_owners.cpp), which statements no longer share.
TEST_CASE("a generated LaTeX document compiles with pdflatex", "[print][latex][pdflatex]") {
    if (!have_pdflatex()) {
        WARN("pdflatex not installed; .ci/run installs texlive-latex-base and texlive-latex-recommended");
        return;
    }
    std::string program = "sum(m : (-1)^(j-m) * 3j(j, j, 0; m, -m, 0))\n";
    testing::random_source gen(7);
    // Keep the generated expressions that simplify (some carry phases that are not integral).
    int kept = 0;
    for (int i = 0; i < 80 && kept < 40; ++i) {
        std::string e = gen.expression(1 + i % 3);
        if (testing::run_cli({"simplify", "-e", e}).code == 0) {
            program += e + "\n";
            ++kept;
        }
    }
    CHECK(kept >= 20);
    auto r = testing::run_cli({"latex", "-"}, program);
    INFO(r.err);
    REQUIRE(r.code == 0);
    auto dir = std::filesystem::temp_directory_path() / ("couplet-latex-" + std::to_string(::getpid()));
    std::filesystem::create_directories(dir);
    {
        std::ofstream f(dir / "doc.tex");
        f << r.out;
    }
    std::string cmd =
        "cd '" + dir.string() + "' && pdflatex -interaction=nonstopmode -halt-on-error doc.tex > pdflatex.out 2>&1";
    int status = std::system(cmd.c_str());
    if (status != 0) {
        std::ifstream log(dir / "pdflatex.out");
        std::string text((std::istreambuf_iterator<char>(log)), std::istreambuf_iterator<char>());
        INFO(text.substr(text.size() > 3000 ? text.size() - 3000 : 0));
        CHECK(status == 0);
    }
    CHECK(std::filesystem::exists(dir / "doc.pdf"));
    std::filesystem::remove_all(dir);
}
