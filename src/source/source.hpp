// A source text with a name, and the user errors that point into it.
#pragma once

#include <cstddef>
#include <stdexcept>
#include <string>

namespace couplet {

class source_file {
public:
    source_file(std::string name, std::string text) : name_(std::move(name)), text_(std::move(text)) {}

    const std::string& name() const { return name_; }
    const std::string& text() const { return text_; }

    struct position {
        std::size_t line = 1, column = 1;  // 1-based; columns count bytes
    };
    position locate(std::size_t offset) const;
    std::string line_text(std::size_t line) const;

private:
    std::string name_, text_;
};

// An error the user made (or a request couplet refuses): printed as
// FILE:LINE:COLUMN: error: MESSAGE with the source line and a caret; exit code 2.
class user_error : public std::runtime_error {
public:
    user_error(std::size_t offset, const std::string& message) : std::runtime_error(message), offset_(offset) {}
    std::size_t offset() const { return offset_; }

private:
    std::size_t offset_;
};

// FILE:L:C: error: MESSAGE, then the offending line and a caret under the column.
std::string format_diagnostic(const source_file& src, const user_error& err);

}  // namespace couplet
