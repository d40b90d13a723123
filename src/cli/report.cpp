#include "cli/report.hpp"

#include "couplet/print/print.hpp"

namespace couplet::cli {

void reporter::begin() {
    if (format_ == "latex" && document_)
        out_ << "\\documentclass{article}\n\\usepackage{amsmath}\n\\begin{document}\n";
}

void reporter::statement(const nlohmann::json& r) {
    const std::string kind = r.at("kind");
    if (format_ == "json") {
        out_ << r.dump() << "\n";
        return;
    }
    if (format_ == "latex") {
        const std::string result = r.at("latex");
        std::string body = result;
        if (kind != "check" && r.at("input_latex") != result) body = r.at("input_latex").get<std::string>() + " = " + result;
        if (document_)
            out_ << "\\begin{equation*}\n" << body << "\n\\end{equation*}\n";
        else
            out_ << body << "\n";
        if (document_ && kind == "check")
            out_ << "% check: " << r.at("verdict").get<std::string>() << "\n";
        steps(r, "% ");
        return;
    }
    out_ << r.at("result").get<std::string>();
    if (kind == "eval") out_ << "  ~ " << r.at("decimal").get<std::string>();
    out_ << "\n";
    steps(r, "#   ");
}

// As comments, so that text output stays valid input and LaTeX still compiles.
void reporter::steps(const nlohmann::json& r, const char* comment) {
    if (!r.contains("steps")) return;
    if (r.at("steps").empty()) out_ << comment << "(no move or rule applied)\n";
    for (const auto& step : r.at("steps"))
        for (const std::string& line : trace_step_lines(step.at("rule"), step.at("reference"), step.at("before"),
                                                        step.at("after")))
            out_ << comment << line << "\n";
}

void reporter::end() {
    if (format_ == "latex" && document_) out_ << "\\end{document}\n";
}

void reporter::error(const source_file& src, const user_error& e) {
    err_ << format_diagnostic(src, e);
    if (format_ == "json") {
        auto pos = src.locate(e.offset());
        out_ << nlohmann::json{{"error", e.what()}, {"line", pos.line}, {"column", pos.column}}.dump()
             << "\n";
    }
}

}  // namespace couplet::cli
