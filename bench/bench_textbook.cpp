// Figures for the shape of answers: for each textbook result of the corpus (tests/corpus), whether
// `simplify` gives the form its source prints (same terms and factors after canonical
// arrangement, phases equal in the phase group), the lengths of the answer and of the source's
// form as written, both printed as text, and the time to simplify.  Prints a table and the totals; asserts nothing.
// Usage: bench_textbook
#include <cstdio>
#include <ctime>
#include <string>

#include "cli/fixed_layout.hpp"
#include "corpus/textbook_corpus.hpp"
#include "corpus/textbook_form.hpp"
#include "parse/lower.hpp"
#include "print/print.hpp"
#include "simplify/simplify.hpp"

using namespace couplet;

int main(int, char** argv) {
    couplet::cli::run_with_fixed_address_layout(argv);  // the same printed forms on every run
    int textbook = 0, total = 0;
    double ratio_sum = 0;
    std::printf("%-78s %5s %6s %6s %7s %8s\n", "result", "form", "answer", "source", "ratio", "ms");
    for (const auto& e : testing::textbook::corpus()) {
        const std::string declarations = e.declarations[0] ? std::string(e.declarations) + "\n" : "";
        auto program = read_program(source_file("<bench>", declarations + e.input + "\n" + e.closed_form));
        const auto& st = program.statements;
        const GiNaC::ex input = st[st.size() - 2].value, source = st.back().value;
        // Processor time, not wall time: the machine is shared.
        const std::clock_t t0 = std::clock();
        GiNaC::ex answer;
        try {
            answer = simplify_expression(input, program.numbers);
        } catch (const std::exception& err) {
            std::printf("%-78s refused: %s\n", e.label, err.what());
            ++total;
            continue;
        }
        const double ms = 1000.0 * static_cast<double>(std::clock() - t0) / CLOCKS_PER_SEC;
        const bool same = testing::compare_forms(answer, source, program.numbers).same;
        // Both printed by the same printer; the source's form as written, not rearranged.
        const std::size_t a = to_text(answer).size(), s = to_text(source).size();
        const double ratio = static_cast<double>(a) / static_cast<double>(s);
        textbook += same;
        ++total;
        ratio_sum += ratio;
        std::printf("%-78s %5s %6zu %6zu %7.2f %8.1f\n", e.label, same ? "yes" : "no", a, s, ratio, ms);
    }
    std::printf("\nin the source's form: %d of %d; mean length of answer / source's form: %.2f\n", textbook, total,
                ratio_sum / total);
    return 0;
}
