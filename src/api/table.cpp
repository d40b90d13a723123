#include <algorithm>
#include <charconv>
#include <cstdint>
#include <limits>
#include <ostream>
#include <set>

#include "api/program_parts.hpp"
#include "eval/evaluate.hpp"
#include "model/symbols.hpp"
#include "table/ranges.hpp"
#include "table/rows.hpp"
#include "table/vanishing.hpp"
#include "verify/domain.hpp"

namespace couplet {

using GiNaC::ex;

namespace {

// Whether a coupling symbol's value can recur between the rows of a table over `free`: one in a
// sum does, and one that leaves out a free name; one whose entries take every free name has a
// new value on every row, and remembering those values would only cost time and memory.
bool symbols_recur(const ex& e, const std::vector<GiNaC::symbol>& free) {
    for (GiNaC::const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
        if (GiNaC::is_a<index_sum>(*it)) return true;
        if (kind_of(*it) == symbol_kind::none) continue;
        for (const GiNaC::symbol& name : free)
            if (!it->has(name)) return true;
    }
    return false;
}

// A request that no place in any input explains (a shard outside its count).
input_error request_error(const std::string& message) {
    return input_error(message, "couplet: error: " + message + "\n", 0, 0);
}

// The statement a table tabulates: the `let` named `of`, or the last expression.
const lowered_statement& tabulated(const program::parts& p, const table_options& o) {
    const lowered_statement* found = nullptr;
    for (const lowered_statement& s : p.lowered.statements) {
        if (!o.of.empty()) {
            if (s.kind == request_kind::definition && s.name == o.of) found = &s;
        } else if (s.kind != request_kind::declaration && s.kind != request_kind::definition) {
            found = &s;
        }
    }
    if (found && found->kind == request_kind::check)
        throw as_input_error(
            p.source, user_error(found->span.begin, "a table needs an expression, and the last statement is a check"));
    if (found && !found->at.empty())
        throw as_input_error(p.source, user_error(found->at.front().offset,
                                                  "a table takes its values from --for, not from 'at': write --for '" +
                                                      found->at.front().name.get_name() + " = ...' instead"));
    if (found) return *found;
    throw request_error(o.of.empty() ? "the input has no expression to tabulate (write one, or name a let with --of)"
                                     : "the input has no let named '" + o.of + "'");
}

// 2x as x in decimal notation: 3 -> "1.5", -1 -> "-0.5".
void write_doubled(std::string& out, long twice) {
    if (twice < 0) out += '-';
    const long a = twice < 0 ? -twice : twice;
    out += std::to_string(a / 2);
    if (a % 2) out += ".5";
}

void write_double(std::string& out, double v) {
    char buffer[64];
    auto r = std::to_chars(buffer, buffer + sizeof buffer, v);
    out.append(buffer, r.ptr);
}

}  // namespace

struct table::state {
    state(const program& p, const table_options& o) : source(p), options(o) {}
    program source;
    table_options options;
    std::size_t offset = 0;  // the tabulated statement, for messages
    quantum_numbers numbers;
    std::unique_ptr<compiled_expression> compiled;
    std::vector<std::string> columns;
    std::vector<std::int32_t> rows;           // this shard's rows, columns().size() values each, doubled
    std::size_t total = 0, stored = 0;        // rows of the whole table, of this shard
    std::vector<std::size_t> column_of_free;  // for each of compiled->free_names(), its column

    std::string describe_row(const std::int32_t* t) const {
        std::string s;
        for (std::size_t c = 0; c < columns.size(); ++c) {
            s += (c ? ", " : "") + columns[c] + "=";
            write_doubled(s, t[c]);
        }
        return s;
    }
};

namespace {

std::vector<table_detail::named_range> ranges_of(const table_options& o, const verify::sampling_domain& domain) {
    std::vector<table_detail::named_range> out;
    std::set<std::string> named;
    for (const std::string& text : o.ranges) {
        const source_file where("--for", text);
        try {
            for (const table_detail::named_range& r : table_detail::read_ranges(text)) {
                if (domain.index_of(r.name) == domain.numbers.size()) {
                    std::string free;
                    for (const verify::free_number& f : domain.numbers)
                        free += (free.empty() ? "" : ", ") + f.symbol.get_name();
                    throw user_error(r.offset, "'" + r.name + "' is not a free quantum number of the expression" +
                                                   (free.empty() ? std::string(" (it has none)")
                                                                 : " (its free ones: " + free + ")"));
                }
                if (!named.insert(r.name).second) throw user_error(r.offset, "'" + r.name + "' has a range already");
                out.push_back(r);
            }
        } catch (const user_error& e) {
            throw as_input_error(where, e);
        }
    }
    return out;
}

}  // namespace

table::table(const program& p, const table_options& o) : state_(std::make_unique<state>(p, o)) {
    state& s = *state_;
    if (o.shards == 0 || o.shard < 1 || o.shard > o.shards)
        throw request_error("a shard is i/n with 1 <= i <= n; " + std::to_string(o.shard) + "/" +
                            std::to_string(o.shards) + " is not");
    const program::parts& parts = p.internals();
    const lowered_statement& st = tabulated(parts, o);
    s.offset = st.span.begin;
    auto fail = [&](const std::string& message) { return as_input_error(parts.source, user_error(s.offset, message)); };
    s.numbers = parts.lowered.numbers.for_statement(st.value);
    const verify::sampling_domain domain = verify::build_domain({st.value}, s.numbers);

    table_detail::row_request request;
    request.ranges = ranges_of(o, domain);
    request.allowed_only = o.allowed_only;
    if (o.allowed_only)
        for (const ex& part : table_detail::vanishing_parts(st.value))
            request.term_rules.push_back(verify::build_domain({part}, s.numbers));
    std::optional<table_detail::row_plan> plan;
    try {
        plan.emplace(domain, request, s.offset);
        evaluation_limits limits;
        limits.remember_symbols = symbols_recur(st.value, plan->columns());
        s.compiled = std::make_unique<compiled_expression>(st.value, s.numbers, limits);
    } catch (const user_error& e) {
        throw as_input_error(parts.source, e);
    } catch (const evaluation_error& e) {
        throw fail(std::string("cannot evaluate: ") + e.what());
    }
    for (const GiNaC::symbol& c : plan->columns()) s.columns.push_back(c.get_name());
    for (const std::string& name : s.compiled->free_names()) {
        const auto at = std::find(s.columns.begin(), s.columns.end(), name);
        if (at == s.columns.end()) throw fail("cannot evaluate: '" + name + "' has no column");  // not expected
        s.column_of_free.push_back(static_cast<std::size_t>(at - s.columns.begin()));
    }

    // Counted first, so that the shard's share is known and a table far too large is refused
    // before it is stored.
    const std::size_t cap = o.max_rows > std::numeric_limits<std::size_t>::max() / o.shards - 1
                                ? std::numeric_limits<std::size_t>::max()
                                : o.max_rows * o.shards + 1;
    // A whole table is stored as it is counted; a shard needs the count first.
    auto store = [&](const std::vector<long>& t) {
        s.rows.insert(s.rows.end(), t.begin(), t.end());
        ++s.stored;
    };
    plan->for_each_row([&](const std::vector<long>& t) {
        if (o.shards == 1) store(t);
        return ++s.total < cap;
    });
    const std::size_t begin = s.total * (o.shard - 1) / o.shards, end = s.total * o.shard / o.shards;
    // With at most max_rows * shards rows in all, no shard has more than max_rows.
    if (s.total >= cap)
        throw fail("the table has more than " + std::to_string(cap - 1) + " rows, above the limit of " +
                   std::to_string(o.max_rows) +
                   " per shard: narrow the ranges, split it with --shard, or raise --max-rows");
    if (o.shards == 1) return;
    s.rows.reserve((end - begin) * s.columns.size());
    std::size_t k = 0;
    plan->for_each_row([&](const std::vector<long>& t) {
        if (k >= begin && k < end) store(t);
        return ++k < end;
    });
}

table::~table() = default;
table::table(table&&) noexcept = default;
table& table::operator=(table&&) noexcept = default;

std::size_t table::size() const { return state_->stored; }
std::size_t table::total_size() const { return state_->total; }
const std::vector<std::string>& table::columns() const { return state_->columns; }

std::string table::header() const {
    const state& s = *state_;
    if (s.options.format != table_format::csv || s.options.shard != 1) return "";
    std::string h;
    for (const std::string& c : s.columns) h += c + ",";
    return h + "value,decimal\n";
}

std::size_t table::write(std::size_t from, std::size_t to, std::ostream& out) const {
    std::string lines;
    const std::size_t written = append(from, to, lines);
    out << lines;
    return written;
}

std::size_t table::append(std::size_t from, std::size_t to, std::string& out) const {
    const state& s = *state_;
    const std::size_t width = s.columns.size();
    const bool csv = s.options.format == table_format::csv;
    std::size_t written = 0;
    std::vector<long> twice(s.column_of_free.size());
    for (std::size_t r = from; r < std::min(to, size()); ++r) {
        const std::int32_t* t = s.rows.data() + r * width;
        for (std::size_t k = 0; k < twice.size(); ++k) twice[k] = t[s.column_of_free[k]];
        std::optional<exact::number> value;
        try {
            value = s.compiled->at_twice(twice);
        } catch (const division_by_zero&) {
        } catch (const evaluation_error& e) {
            throw as_input_error(s.source.internals().source,
                                 user_error(s.offset, "cannot evaluate at " + s.describe_row(t) + ": " + e.what()));
        }
        if (s.options.nonzero_only && value && value->is_zero()) continue;
        if (!csv) out += '{';
        for (std::size_t c = 0; c < width; ++c) {
            if (!csv)
                out += (c ? ",\"" : "\"") + s.columns[c] + "\":";
            else if (c)
                out += ',';
            write_doubled(out, t[c]);
        }
        if (csv) {
            out += width ? "," : "";
            out += value ? value->to_string() : "undefined";
            out += ',';
            if (value) write_double(out, value->to_double());
            out += '\n';
        } else {
            out += width ? ",\"value\":" : "\"value\":";
            out += value ? "\"" + value->to_string() + "\"" : "null";
            out += ",\"decimal\":";
            if (value)
                write_double(out, value->to_double());
            else
                out += "null";
            out += "}\n";
        }
        ++written;
    }
    return written;
}

}  // namespace couplet
