#include <boost/spirit/home/x3.hpp>
#include <cctype>
#include <cstdio>
#include <string>

#include "parse/grammar.hpp"
#include "parse/parse.hpp"

namespace couplet {
namespace {

namespace x3 = boost::spirit::x3;
using parser::iterator_type;

// What stands at `at`, for "found ..." in messages: one UTF-8 character, or the end.
// A control byte is named, not echoed; a decimal point after a digit says what to write instead.
std::string describe_found(const std::string& text, std::size_t at, std::size_t end) {
    if (at >= end) return "the end of the statement";
    const unsigned char c = static_cast<unsigned char>(text[at]);
    if (c < 0x20 || c == 0x7F) {
        char code[8];
        std::snprintf(code, sizeof code, "0x%02X", c);
        return std::string("a control character (byte ") + code + ")";
    }
    if (text.compare(at, 3, "\xEF\xBB\xBF") == 0) return "a byte-order mark";
    if (c == '.' && at > 0 && std::isdigit(static_cast<unsigned char>(text[at - 1])))
        return "'.' (decimals are not numbers here: write 3/2 for 1.5)";
    std::size_t n = 1;
    while (at + n < end && (static_cast<unsigned char>(text[at + n]) & 0xC0) == 0x80) ++n;
    return "'" + text.substr(at, n) + "'";
}

std::size_t skip_blanks(const std::string& text, std::size_t at, std::size_t end) {
    iterator_type first = text.begin() + at, last = text.begin() + end;
    x3::skip_over(first, last, x3::make_context<x3::skipper_tag>(parser::skipper));
    return static_cast<std::size_t>(first - text.begin());
}

std::string expected_phrase(std::string which) {
    if (which.size() >= 2 && which.front() == '"' && which.back() == '"')
        which = "'" + which.substr(1, which.size() - 2) + "'";
    if (which == "end of statement") return "an operator or the end of the statement";
    return which;
}

ast::statement parse_one(const source_file& src, statement_span span) {
    const std::string& text = src.text();
    const iterator_type begin = text.begin();
    iterator_type first = begin + span.begin, last = begin + span.end;
    ast::statement tree;
    try {
        auto const grammar = x3::with<parser::source_begin_tag>(begin)[parser::statement()];
        if (!x3::phrase_parse(first, last, grammar, parser::skipper, tree)) {
            std::size_t at = skip_blanks(text, span.begin, span.end);
            throw user_error(
                at, "unexpected " + describe_found(text, at, span.end) + "; expected a statement or an expression");
        }
    } catch (const x3::expectation_failure<iterator_type>& e) {
        std::size_t at = skip_blanks(text, static_cast<std::size_t>(e.where() - begin), span.end);
        throw user_error(at,
                         "expected " + expected_phrase(e.which()) + ", found " + describe_found(text, at, span.end));
    }
    return tree;
}

}  // namespace

std::vector<parsed_statement> parse_program(const source_file& src, std::vector<unparsed_statement>* errors) {
    std::vector<parsed_statement> out;
    for (const statement_span& span : split_statements(src)) {
        try {
            out.push_back({parse_one(src, span), span});
        } catch (const user_error& e) {
            if (!errors) throw;
            errors->push_back({span, e});
        }
    }
    return out;
}

}  // namespace couplet
