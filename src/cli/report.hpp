// Printing statement results as text, LaTeX or JSON lines, and errors in the same format.
#pragma once

#include <nlohmann/json.hpp>
#include <ostream>
#include <string>

#include "couplet/source.hpp"

namespace couplet::cli {

class reporter {
public:
    // format: "text", "latex" or "json"; document: wrap LaTeX in a complete document.
    reporter(std::string format, bool document, std::ostream& out, std::ostream& err)
        : format_(std::move(format)), document_(document), out_(out), err_(err) {}

    void begin();
    void statement(const nlohmann::json& record);
    void end();
    void error(const source_file& src, const user_error& e);

private:
    void steps(const nlohmann::json& record, const char* comment);
    std::string format_;
    bool document_;
    std::ostream& out_;
    std::ostream& err_;
};

}  // namespace couplet::cli
