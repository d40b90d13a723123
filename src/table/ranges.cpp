#include "table/ranges.hpp"

#include <cctype>
#include <limits>
#include <optional>

#include "source/source.hpp"

namespace couplet::table_detail {

namespace {

// A hand-written reader: the text is one short line, and the parser's X3 grammar is kept to
// its own two translation units (DEVELOPERS.md).
class reader {
public:
    explicit reader(const std::string& text) : text_(text) {}

    std::vector<named_range> ranges() {
        std::vector<named_range> out;
        do {
            skip_space();
            named_range r;
            r.offset = at_;
            r.name = name();
            out.push_back(r);
            skip_space();
        } while (take(','));
        expect('=', "'=' after the names");
        const std::size_t value_at = (skip_space(), at_);
        long from = doubled_value(), to = from, step = 1;
        skip_space();
        if (take_word("..")) {
            to = doubled_value();
            skip_space();
            if (take_word("step")) {
                const std::size_t step_at = (skip_space(), at_);
                step = doubled_value();
                if (step <= 0) throw user_error(step_at, "a step must be positive");
            }
        }
        skip_space();
        if (at_ != text_.size()) throw user_error(at_, "unexpected text after the range");
        if (to < from) throw user_error(value_at, "an empty range: its end is below its start");
        for (named_range& r : out) r.from = from, r.to = to, r.step = step;
        return out;
    }

private:
    void skip_space() {
        while (at_ < text_.size() && std::isspace(static_cast<unsigned char>(text_[at_]))) ++at_;
    }
    bool take(char c) {
        skip_space();
        if (at_ < text_.size() && text_[at_] == c) return ++at_, true;
        return false;
    }
    bool take_word(const std::string& w) {
        if (text_.compare(at_, w.size(), w) != 0) return false;
        at_ += w.size();
        return true;
    }
    void expect(char c, const char* what) {
        if (!take(c)) throw user_error(at_, std::string("expected ") + what);
    }
    std::string name() {
        const std::size_t start = at_;
        if (at_ >= text_.size() || !(std::isalpha(static_cast<unsigned char>(text_[at_])) || text_[at_] == '_'))
            throw user_error(at_, "expected a quantum number's name");
        while (at_ < text_.size() &&
               (std::isalnum(static_cast<unsigned char>(text_[at_])) || text_[at_] == '_' || text_[at_] == '\''))
            ++at_;
        return text_.substr(start, at_ - start);
    }
    std::optional<long> digits() {
        const std::size_t start = at_;
        long v = 0;
        while (at_ < text_.size() && std::isdigit(static_cast<unsigned char>(text_[at_]))) {
            v = v * 10 + (text_[at_++] - '0');
            if (v > 10 * max_twice_value) throw user_error(start, "a value too large for a table (|x| <= 10000)");
        }
        if (at_ == start) return std::nullopt;
        return v;
    }
    // An integer or p/q, as twice its value; it must be a multiple of 1/2.
    long doubled_value() {
        const std::size_t start = at_;
        const bool negative = take('-');
        skip_space();
        auto numerator = digits();
        if (!numerator) throw user_error(at_, "expected a number such as 2, 1/2 or -3/2");
        long twice = 2 * *numerator;
        if (at_ < text_.size() && text_[at_] == '/') {
            ++at_;
            const std::size_t denominator_at = at_;
            auto denominator = digits();
            if (!denominator) throw user_error(at_, "expected a denominator after '/'");
            if (*denominator == 0) throw user_error(denominator_at, "a denominator of 0");
            if (twice % *denominator != 0)
                throw user_error(start, "a quantum number is a multiple of 1/2; this value is not");
            twice /= *denominator;
        }
        if (twice > max_twice_value) throw user_error(start, "a value too large for a table (|x| <= 10000)");
        return negative ? -twice : twice;
    }

    const std::string& text_;
    std::size_t at_ = 0;
};

}  // namespace

std::vector<named_range> read_ranges(const std::string& text) { return reader(text).ranges(); }

}  // namespace couplet::table_detail
