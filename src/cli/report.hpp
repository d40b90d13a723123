// Printing statement results as text, LaTeX (latex_report.hpp) or JSON lines, and errors in the
// same format.
#pragma once

#include <nlohmann/json.hpp>
#include <ostream>
#include <string>

#include "cli/latex_report.hpp"
#include "source/source.hpp"

namespace couplet::cli {

// One JSON record as one line, valid whatever bytes the input held.
std::string json_line(const nlohmann::json& record);

class reporter {
public:
    // format: "text", "latex" or "json"; document: wrap LaTeX in a complete document.
    reporter(std::string format, bool document, std::ostream& out, std::ostream& err)
        : format_(std::move(format)), out_(out), err_(err), latex_(document, out) {}

    void begin();
    void statement(const source_file& src, const lowered_statement& s, const outcome& o);
    void end(const source_file& src);
    void error(const source_file& src, const user_error& e);

private:
    void steps(const nlohmann::json& record, const char* comment);
    std::string format_;
    std::ostream& out_;
    std::ostream& err_;
    latex_report latex_;
};

}  // namespace couplet::cli
