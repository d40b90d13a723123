#include "source/source.hpp"

#include <algorithm>

namespace couplet {

source_file::position source_file::locate(std::size_t offset) const {
    offset = std::min(offset, text_.size());
    position p;
    for (std::size_t i = 0; i < offset; ++i) {
        if (text_[i] == '\n') {
            ++p.line;
            p.column = 1;
        } else {
            ++p.column;
        }
    }
    return p;
}

std::string source_file::line_text(std::size_t line) const {
    std::size_t begin = 0;
    for (std::size_t l = 1; l < line && begin != std::string::npos; ++l) {
        begin = text_.find('\n', begin);
        if (begin != std::string::npos) ++begin;
    }
    if (begin == std::string::npos || begin > text_.size()) return {};
    std::size_t end = text_.find('\n', begin);
    return text_.substr(begin, end == std::string::npos ? std::string::npos : end - begin);
}

std::string format_diagnostic(const source_file& src, const user_error& err) {
    auto pos = src.locate(err.offset());
    std::string line = src.line_text(pos.line);
    // Long lines (a 10 000-bracket input) are cut around the caret so the message stays readable.
    std::size_t col = pos.column - 1, start = 0;
    const std::size_t window = 100;
    if (line.size() > window) {
        start = col > window / 2 ? col - window / 2 : 0;
        line = line.substr(start, window);
    }
    // Control bytes are not echoed (a NUL would cut the message): one '?' keeps the caret's column.
    for (char& c : line) {
        if (c == '\t')
            c = ' ';
        else if ((static_cast<unsigned char>(c) < 0x20) || c == 0x7F)
            c = '?';
    }
    std::string out = src.name() + ":" + std::to_string(pos.line) + ":" + std::to_string(pos.column) +
                      ": error: " + err.what() + "\n  " + line + "\n  " + std::string(col - start, ' ') + "^\n";
    return out;
}

}  // namespace couplet
