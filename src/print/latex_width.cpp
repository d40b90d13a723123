#include "print/latex_width.hpp"

#include <algorithm>
#include <cctype>
#include <map>
#include <vector>

namespace couplet::print_detail {

namespace {

// Widths in em of Computer Modern at 10 pt, rounded up a little.
constexpr double letter = 0.55, digit = 0.5, binary_op = 1.3, relation = 1.45, comma = 0.45, bracket = 0.45;
constexpr double script = 0.72;  // sub- and superscripts set smaller

class reader {
public:
    explicit reader(const std::string& s) : s_(s) {}

    // Up to the end of the text or an unmatched closing brace.
    double run(const std::string& stop_at_end = "") {
        double w = 0;
        while (i_ < s_.size()) {
            if (!stop_at_end.empty() && s_.compare(i_, stop_at_end.size(), stop_at_end) == 0) break;
            char c = s_[i_];
            if (c == '}') break;
            w += item();
        }
        return w;
    }

    // The widest of the rows, each cell the widest entry of its column.
    double matrix(const std::string& env) {
        const std::string end = "\\end{" + env + "}";
        std::vector<double> columns;
        std::size_t column = 0;
        while (i_ < s_.size() && s_.compare(i_, end.size(), end) != 0) {
            double cell = 0;
            while (i_ < s_.size() && s_[i_] != '&' && s_.compare(i_, 2, "\\\\") != 0 &&
                   s_.compare(i_, end.size(), end) != 0)
                cell += item();
            if (columns.size() <= column) columns.resize(column + 1, 0);
            columns[column] = std::max(columns[column], cell);
            if (s_.compare(i_, 2, "\\\\") == 0) {
                i_ += 2;
                column = 0;
            } else if (i_ < s_.size() && s_[i_] == '&') {
                ++i_;
                ++column;
            }
        }
        i_ = std::min(s_.size(), i_ + end.size());
        double w = 2 * 0.6;  // the two delimiters
        for (double c : columns) w += c;
        return w + 1.0 * (columns.empty() ? 0 : columns.size() - 1);  // column separation
    }

private:
    double group() {
        if (i_ < s_.size() && s_[i_] == '{') {
            ++i_;
            double w = run();
            if (i_ < s_.size() && s_[i_] == '}') ++i_;
            return w;
        }
        return i_ < s_.size() ? item() : 0;
    }

    std::string command() {
        std::size_t start = ++i_;
        if (i_ < s_.size() && !std::isalpha(static_cast<unsigned char>(s_[i_]))) return s_.substr(start, ++i_ - start);
        while (i_ < s_.size() && std::isalpha(static_cast<unsigned char>(s_[i_]))) ++i_;
        return s_.substr(start, i_ - start);
    }

    double item() {
        char c = s_[i_];
        if (c == ' ') {
            ++i_;
            return 0;
        }
        if (c == '{') return group();
        if (c == '^' || c == '_') {
            ++i_;
            return script * group();
        }
        if (c == '+' || c == '-') {
            ++i_;
            return binary_op;
        }
        if (c == '=' || c == '<' || c == '>') {
            ++i_;
            return relation;
        }
        if (c == ',' || c == ';') {
            ++i_;
            return comma;
        }
        if (c == '(' || c == ')' || c == '[' || c == ']' || c == '|') {
            ++i_;
            return bracket;
        }
        if (c == '\'') {
            ++i_;
            return 0.3;
        }
        if (c != '\\') {
            ++i_;
            return std::isdigit(static_cast<unsigned char>(c)) ? digit : letter;
        }
        const std::string name = command();
        if (name == "frac" || name == "tfrac") {
            double top = group(), bottom = group();
            return std::max(top, bottom) * (name == "tfrac" ? script : 1.0) + 0.3;
        }
        if (name == "sqrt") return group() + 1.0;
        if (name == "sum") return 1.5;
        if (name == "substack") return group();
        if (name == "begin") {
            std::size_t open = s_.find('{', i_), close = s_.find('}', i_);
            std::string env = s_.substr(open + 1, close - open - 1);
            i_ = close + 1;
            return matrix(env);
        }
        if (name == "mathit" || name == "mathrm" || name == "text" || name == "textstyle") return group();
        if (name == "left" || name == "right") {
            if (i_ < s_.size() && s_[i_] == '\\')
                command();
            else
                ++i_;
            return bracket;
        }
        if (name == "langle" || name == "rangle") return 0.4;
        if (name == "mid") return 0.9;
        if (name == "neq" || name == "approx") return relation;
        if (name == "times" || name == "cdot") return binary_op;
        if (name == ",") return 0.17;
        if (name == ";" || name == ":") return 0.28;
        if (name == "quad") return 1.0;
        if (name == "qquad") return 2.0;
        if (name == "\\") return 0;
        return letter;  // a Greek letter, \delta, or anything else
    }

    const std::string& s_;
    std::size_t i_ = 0;
};

}  // namespace

double latex_width(const std::string& tex) {
    reader r(tex);
    return r.run();
}

}  // namespace couplet::print_detail
