#include "api/program_parts.hpp"

namespace couplet {

namespace {

statement_kind public_kind(request_kind k) {
    switch (k) {
        case request_kind::declaration:
            return statement_kind::declaration;
        case request_kind::definition:
            return statement_kind::definition;
        case request_kind::check:
            return statement_kind::check;
        case request_kind::eval:
            return statement_kind::eval;
        default:
            return statement_kind::simplify;
    }
}

statement public_view(const source_file& src, const lowered_statement& s) {
    statement out;
    out.kind = public_kind(s.kind);
    out.text = s.text;
    out.name = s.name;
    out.value = s.value;
    out.rhs = s.rhs;
    out.written = s.written;
    out.written_rhs = s.written_rhs;
    for (const value_assignment& a : s.at) out.at.emplace_back(a.name.get_name(), a.value);
    out.offset = s.span.begin;
    out.end = s.span.end;
    const auto at = src.locate(s.span.begin);
    out.line = at.line;
    out.column = at.column;
    return out;
}

}  // namespace

input_error as_input_error(const source_file& src, const user_error& e) {
    auto pos = src.locate(e.offset());
    return input_error(e.what(), format_diagnostic(src, e), pos.line, pos.column);
}

namespace {

program read(const std::string& text, const std::string& name, bool lenient) {
    // A byte-order mark that an editor put before the first line is not part of the input.
    const bool marked = text.compare(0, 3, "\xEF\xBB\xBF") == 0;
    auto p =
        std::make_shared<program::parts>(program::parts{source_file(name, marked ? text.substr(3) : text), {}, {}, {}});
    try {
        p->lowered = read_program(p->source, lenient);
    } catch (const user_error& e) {
        throw as_input_error(p->source, e);
    }
    for (const lowered_statement& s : p->lowered.statements) p->statements.push_back(public_view(p->source, s));
    for (const user_error& e : p->lowered.errors) p->errors.push_back(as_input_error(p->source, e));
    return program(p);
}

}  // namespace

program parse(const std::string& text, const std::string& name) { return read(text, name, false); }
program parse_each(const std::string& text, const std::string& name) { return read(text, name, true); }

std::size_t program::size() const { return parts_->statements.size(); }
const statement& program::operator[](std::size_t k) const { return parts_->statements.at(k); }
const std::string& program::name() const { return parts_->source.name(); }
const std::string& program::text() const { return parts_->source.text(); }
const std::vector<input_error>& program::errors() const { return parts_->errors; }

}  // namespace couplet
