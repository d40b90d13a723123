#include "cli/report.hpp"

#include "print/print.hpp"

namespace couplet::cli {

// Input text is echoed in the records (statements, messages); a byte that is not UTF-8 becomes
// U+FFFD instead of stopping the JSON library.
std::string json_line(const nlohmann::json& record) {
    return record.dump(-1, ' ', false, nlohmann::json::error_handler_t::replace);
}

void reporter::begin() {
    if (format_ == "latex") latex_.begin();
}

void reporter::statement(const source_file& src, const lowered_statement& s, const outcome& o) {
    if (format_ == "latex") {
        latex_.statement(src, s, o);
        return;
    }
    const nlohmann::json& r = o.record;
    if (r.is_null()) return;
    if (format_ == "json") {
        out_ << json_line(r) << "\n";
        return;
    }
    out_ << r.at("result").get<std::string>();
    if (r.at("kind") == "eval") out_ << "  ~ " << r.at("decimal").get<std::string>();
    out_ << "\n";
    steps(r, "#   ");
}

// As comments, so that text output stays valid input.
void reporter::steps(const nlohmann::json& r, const char* comment) {
    if (!r.contains("steps")) return;
    if (r.at("steps").empty()) out_ << comment << "(no move or rule applied)\n";
    for (const auto& step : r.at("steps"))
        for (const std::string& line : trace_step_lines(step.at("rule"), step.at("reference"), step.at("before"),
                                                        step.at("after")))
            out_ << comment << line << "\n";
}

void reporter::end(const source_file& src) {
    if (format_ == "latex") latex_.end(src);
}

void reporter::error(const source_file& src, const user_error& e) {
    err_ << format_diagnostic(src, e);
    if (format_ == "json") {
        auto pos = src.locate(e.offset());
        out_ << json_line(nlohmann::json{{"error", e.what()}, {"line", pos.line}, {"column", pos.column}})
             << "\n";
    }
}

}  // namespace couplet::cli
