#include "couplet/couplet.hpp"
#include "print/print.hpp"

namespace couplet {

namespace {

// As comments, so that text output stays valid input.
std::string derivation_comments(const std::vector<step>& steps) {
    const char* comment = "#   ";
    std::string out;
    if (steps.empty()) out += std::string(comment) + "(no move or rule applied)\n";
    for (const step& s : steps)
        for (const std::string& line : trace_step_lines(s.rule, s.reference, to_text(s.before), to_text(s.after)))
            out += comment + line + "\n";
    return out;
}

}  // namespace

std::string to_text(const result& r) {
    switch (r.done) {
        case statement_kind::eval:
            return r.value->exact + "  ~ " + r.value->decimal;
        case statement_kind::check:
            return r.check ? r.check->summary : "internal check failed (see the message on standard error)";
        case statement_kind::simplify: {
            std::string out = to_text(r.answer);
            if (r.steps) out += "\n" + derivation_comments(*r.steps);
            if (!out.empty() && out.back() == '\n') out.pop_back();
            return out;
        }
        default:
            return "";
    }
}

std::string to_latex(const result& r) {
    switch (r.done) {
        case statement_kind::eval:
            return r.value->latex;
        case statement_kind::check: {
            const char* relation = !r.check                                ? " = "
                                   : r.check->result == verdict::holds     ? " = "
                                   : r.check->result == verdict::undecided ? " \\overset{?}{=} "
                                                                           : " \\neq ";
            return to_latex(r.source.written) + relation + to_latex(r.source.written_rhs);
        }
        case statement_kind::simplify:
            return to_latex(r.answer);
        default:
            return "";
    }
}

}  // namespace couplet
