#include <algorithm>
#include <cctype>
#include <string>
#include <vector>

#include "parse/parse.hpp"

namespace couplet {
namespace {

char closer_for(char opener) {
    switch (opener) {
        case '(':
            return ')';
        case '{':
            return '}';
        default:
            return '>';
    }
}

bool is_opener(char c) { return c == '(' || c == '{' || c == '<'; }
bool is_closer(char c) { return c == ')' || c == '}' || c == '>'; }

// A '-' is a prefix minus when nothing that could end an operand precedes it.
bool starts_operand_context(char previous) {
    return previous == 0 || std::string("(,;:|=+-*/^<{").find(previous) != std::string::npos;
}

class splitter {
public:
    explicit splitter(const source_file& src) : text_(src.text()) {}

    std::vector<statement_span> run() {
        for (std::size_t i = 0; i < text_.size(); ++i) {
            char c = text_[i];
            if (c == '#') {
                while (i + 1 < text_.size() && text_[i + 1] != '\n') ++i;
                continue;
            }
            if ((c == '\n' || c == ';') && open_.empty()) {
                finish(i);
                continue;
            }
            if (is_opener(c)) {
                open_.push_back(i);
                check_depth(i);
            } else if (is_closer(c)) {
                close(i, c);
            } else if (c == '^') {
                ++exponents_;
                check_depth(i);
            } else if (c == '-' && starts_operand_context(previous_)) {
                ++prefix_run_;
                check_depth(i);
            }
            if (!std::isspace(static_cast<unsigned char>(c))) {
                if (c != '-') prefix_run_ = 0;
                previous_ = c;
            }
        }
        if (!open_.empty()) {
            std::size_t at = open_.back();
            throw user_error(at, std::string("unclosed '") + text_[at] + "': expected '" + closer_for(text_[at]) +
                                     "' before the end of the input");
        }
        finish(text_.size());
        return spans_;
    }

private:
    void check_depth(std::size_t at) const {
        if (open_.size() + exponents_ + prefix_run_ > max_nesting)
            throw user_error(at,
                             "expression nested too deeply (brackets, '^' and prefix '-' "
                             "together may nest at most " +
                                 std::to_string(max_nesting) + " levels)");
    }

    void close(std::size_t at, char c) {
        if (open_.empty()) throw user_error(at, std::string("unmatched '") + c + "'");
        char opener = text_[open_.back()];
        if (closer_for(opener) != c)
            throw user_error(at, std::string("'") + c + "' does not match the '" + opener +
                                     "' opened before it; expected '" + closer_for(opener) + "'");
        open_.pop_back();
    }

    void finish(std::size_t end) {
        std::size_t first = start_;
        bool has_content = false;
        for (std::size_t k = start_; k < end; ++k) {
            char c = text_[k];
            if (c == '#') {
                while (k < end && text_[k] != '\n') ++k;
                continue;
            }
            if (!std::isspace(static_cast<unsigned char>(c))) {
                has_content = true;
                first = k;
                break;
            }
        }
        if (has_content) spans_.push_back({first, end});
        start_ = end + 1;
        exponents_ = 0;
        prefix_run_ = 0;
        previous_ = 0;
    }

    const std::string& text_;
    std::vector<std::size_t> open_;
    std::vector<statement_span> spans_;
    std::size_t start_ = 0, exponents_ = 0, prefix_run_ = 0;
    char previous_ = 0;
};

}  // namespace

std::vector<statement_span> split_statements(const source_file& src) { return splitter(src).run(); }

}  // namespace couplet
