// Each textbook result of the corpus, written as a user writes it, must come out of `couplet
// simplify` in the form its source prints (textbook_form.hpp), verified by the command line's
// own exact check; and the source's form itself must equal the input exactly at sampled points,
// which checks the transcription of the source as well as the answer.
#include <catch2/catch.hpp>

#include "corpus/textbook_corpus.hpp"
#include "corpus/textbook_form.hpp"
#include "rules/cli_simplify.hpp"

using namespace couplet;
using namespace couplet::testing;

TEST_CASE("textbook results come out in the form their sources print", "[corpus][cli]") {
    REQUIRE(textbook::corpus().size() >= 25);
    for (const textbook::entry& e : textbook::corpus()) {
        const std::string declarations = e.declarations[0] ? std::string(e.declarations) + "\n" : "";
        INFO(e.label << " (" << e.source << ")\ninput: " << e.input << "\nsource's form: " << e.closed_form);
        auto r = run_cli({"simplify", "--format", "json", "-e", declarations + e.input});
        INFO("stderr: " << r.err);
        REQUIRE(r.code == 0);
        auto json = nlohmann::json::parse(r.out);
        CHECK(json["verified"] == true);
        const std::string answer = json["result"];
        INFO("answer: " << answer);
        auto program = lower_text(declarations + e.input + "\n" + answer + "\n" + e.closed_form);
        const auto& st = program.statements;
        REQUIRE(st.size() >= 3);
        const GiNaC::ex &input = st[st.size() - 3].value, &result = st[st.size() - 2].value,
                        &source = st.back().value;
        form_comparison form = compare_forms(result, source, program.numbers);
        INFO(form.why);
        CHECK(form.same);
        // The source's form against the input, by the command line's own check at admissible points.
        auto check = run_cli({"check", "-e", declarations + e.input + " == " + e.closed_form});
        INFO("check of the source's form: " << check.out << check.err);
        CHECK(check.code == 0);
    }
}

TEST_CASE("the form comparison tells a wrong phase, a missing factor and an extra term", "[corpus]") {
    // Edmonds (1957) eq. 6.1.5 against three wrong spellings of it.
    auto program = lower_text(
        "(-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23}\n"
        "(-1)^(j1+j2+j3) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23}\n"
        "(-1)^(j1+j2+j3+J) * sqrt(2*j12+1) * 6j{j1, j2, j12; j3, J, j23}\n"
        "(-1)^(j1+j2+j3+J) * sqrt((2*j12+1)*(2*j23+1)) * 6j{j1, j2, j12; j3, J, j23} + 6j{j1, j2, j12; j3, J, j23}\n"
        "(-1)^(j1+j2+j3+J+2*j12+2*J+2*j3) * sqrt(2*j23+1) * 6j{j12, j2, j1; j23, J, j3} * sqrt(2*j12+1)\n");
    const auto& st = program.statements;
    CHECK_FALSE(compare_forms(st[1].value, st[0].value, program.numbers).same);
    CHECK_FALSE(compare_forms(st[2].value, st[0].value, program.numbers).same);
    CHECK_FALSE(compare_forms(st[3].value, st[0].value, program.numbers).same);
    // The same form: the 6j's first and third columns exchanged (free, DLMF 34.5.8), the root
    // split, and (-1)^(2j12+2J+2j3) = 1 by the 6j's triad (j3 J j12).
    CHECK(compare_forms(st[4].value, st[0].value, program.numbers).same);
}
