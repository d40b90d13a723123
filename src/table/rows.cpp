#include "table/rows.hpp"

#include <algorithm>
#include <limits>
#include <map>
#include <optional>
#include <set>
#include <tuple>

#include "source/source.hpp"

namespace couplet::table_detail {

using verify::rule;
using verify::rule_kind;

namespace {

long floor_div(long a, long b) {
    long q = a / b;
    return (a % b != 0 && ((a < 0) != (b < 0))) ? q - 1 : q;
}
long ceil_div(long a, long b) { return -floor_div(-a, b); }

// The rule over columns instead of the domain's own numbering; none when it names a number
// that is no column.
std::optional<rule> over_columns(const rule& r, const verify::sampling_domain& from,
                                 const std::map<std::string, std::size_t>& column_of) {
    rule out = r;
    out.form.terms.clear();
    for (const auto& [k, c] : r.form.terms) {
        auto at = column_of.find(from.numbers[k].symbol.get_name());
        if (at == column_of.end()) return std::nullopt;
        out.form.terms.emplace_back(at->second, c);
    }
    return out;
}

auto key_of(const rule& r) {
    auto terms = r.form.terms;
    std::sort(terms.begin(), terms.end());
    return std::make_tuple(static_cast<int>(r.kind), r.modulus, r.form.constant, terms);
}

// The value of c*t[k] + rest without column k, for a rule whose last column is k.
long rest_of(const rule& r, std::size_t k, const std::vector<long>& t) {
    long rest = r.form.constant;
    for (const auto& [v, c] : r.form.terms)
        if (v != k) rest += c * t[v];
    return rest;
}

bool all_hold(const std::vector<rule>& rules, const std::vector<long>& t) {
    return std::all_of(rules.begin(), rules.end(), [&](const rule& r) { return r.holds(t); });
}

// Where a nonnegative rule can bound number k of the domain once the numbers in `placed` have
// values: +1 a lower bound, -1 an upper bound, 0 neither.
int bound_side(const rule& r, std::size_t k, const std::vector<bool>& placed) {
    if (r.kind != rule_kind::nonnegative) return 0;
    long c = 0;
    for (const auto& [v, coefficient] : r.form.terms) {
        if (v == k)
            c = coefficient;
        else if (!placed[v])
            return 0;
    }
    return c > 0 ? 1 : c < 0 ? -1 : 0;
}

}  // namespace

row_plan::row_plan(const verify::sampling_domain& domain, const row_request& request, std::size_t offset) {
    const std::size_t n = domain.numbers.size();
    std::vector<bool> placed(n, false);
    std::vector<std::size_t> order;  // domain indices in column order
    std::map<std::string, const named_range*> range_of;
    for (const named_range& r : request.ranges) {
        const std::size_t k = domain.index_of(r.name);
        if (k == n) continue;  // the caller has said so
        range_of[r.name] = &r;
        order.push_back(k);
        placed[k] = true;
    }
    std::vector<rule> inequalities;
    for (const auto* rules : {&domain.hard, &domain.selection})
        for (const rule& r : *rules)
            if (r.kind == rule_kind::nonnegative) inequalities.push_back(r);
    auto bounded = [&](std::size_t k) {
        bool lower = domain.numbers[k].role == qn_role::angular, upper = false;
        for (const rule& r : inequalities) {
            const int side = bound_side(r, k, placed);
            lower = lower || side > 0;
            upper = upper || side < 0;
        }
        return lower && upper;
    };
    while (order.size() < n) {
        std::size_t next = n;
        for (std::size_t k = 0; k < n && next == n; ++k)
            if (!placed[k] && bounded(k)) next = k;
        if (next == n) {
            std::string names;
            for (std::size_t k = 0; k < n; ++k)
                if (!placed[k]) names += (names.empty() ? "" : ", ") + domain.numbers[k].symbol.get_name();
            const std::string first = names.substr(0, names.find(','));
            throw user_error(offset, "nothing bounds " + names + ": give the values with --for '" + first +
                                         " = FROM..TO' (the symbols bound a j by a triangle with the columns "
                                         "before it, and a projection m by its j)");
        }
        order.push_back(next);
        placed[next] = true;
    }

    std::map<std::string, std::size_t> column_of;
    values_.resize(n);
    for (std::size_t c = 0; c < n; ++c) {
        const verify::free_number& f = domain.numbers[order[c]];
        columns_.push_back(f.symbol);
        column_of[f.symbol.get_name()] = c;
        column_values& v = values_[c];
        v.nonnegative = f.role == qn_role::angular;
        if (auto r = range_of.find(f.symbol.get_name()); r != range_of.end())
            v.ranged = true, v.from = r->second->from, v.to = r->second->to, v.step = r->second->step;
    }
    auto last_column = [](const rule& r) { return r.form.last_variable(); };
    for (const rule& r : inequalities)
        if (auto mapped = over_columns(r, domain, column_of)) {
            const std::size_t k = last_column(*mapped);
            const long c = mapped->form.coefficient_of(k);
            (c > 0 ? values_[k].lower : values_[k].upper).push_back(*mapped);
        }
    for (const rule& r : domain.hard)
        if (auto mapped = over_columns(r, domain, column_of)) keep(*mapped);
    if (!request.allowed_only) return;

    // Rules that hold in every term prune as soon as their columns have values; the rest are
    // decided per term once the row is complete.
    std::map<decltype(key_of(rule{})), std::pair<rule, std::size_t>> seen;  // rule, terms holding it
    for (const verify::sampling_domain& term : request.term_rules) {
        std::vector<rule> mine;
        std::set<decltype(key_of(rule{}))> keys;
        for (const rule& r : term.selection)
            if (auto mapped = over_columns(r, term, column_of)) {
                mine.push_back(*mapped);
                if (keys.insert(key_of(*mapped)).second) {
                    auto [it, fresh] = seen.emplace(key_of(*mapped), std::make_pair(*mapped, 0));
                    ++it->second.second;
                }
            }
        term_checks_.push_back(mine);
    }
    for (const auto& [key, entry] : seen) {
        if (entry.second != request.term_rules.size()) continue;
        const rule& r = entry.first;
        keep(r);
        const std::size_t k = last_column(r);
        if (r.kind == rule_kind::zero && r.form.coefficient_of(k) != 0) values_[k].solved.push_back(r);
    }
    if (request.term_rules.size() < 2) term_checks_.clear();
}

void row_plan::keep(const rule& r) {
    const std::size_t k = r.form.last_variable();
    column_values& v = values_[k];
    v.checks.push_back(r);
    const long c = r.form.coefficient_of(k);
    if (r.kind == rule_kind::nonnegative && c != 0) (c > 0 ? v.kept_lower : v.kept_upper).push_back(r);
}

bool row_plan::kept_by_some_term(const std::vector<long>& t) const {
    if (term_checks_.empty()) return true;
    return std::any_of(term_checks_.begin(), term_checks_.end(),
                       [&](const std::vector<rule>& rules) { return all_hold(rules, t); });
}

void row_plan::visit_from(std::size_t k, std::vector<long>& t,
                          const std::function<bool(const std::vector<long>&)>& visit, bool& go_on) const {
    if (k == values_.size()) {
        if (kept_by_some_term(t)) go_on = visit(t);
        return;
    }
    const column_values& v = values_[k];
    long lo = v.ranged ? v.from : v.nonnegative ? 0 : std::numeric_limits<long>::min();
    long hi = v.ranged ? v.to : std::numeric_limits<long>::max();
    const long step = v.ranged ? v.step : 1;
    auto tighten = [&](const std::vector<rule>& lower, const std::vector<rule>& upper) {
        for (const rule& r : lower) lo = std::max(lo, ceil_div(-rest_of(r, k, t), r.form.coefficient_of(k)));
        for (const rule& r : upper) hi = std::min(hi, floor_div(rest_of(r, k, t), -r.form.coefficient_of(k)));
    };
    if (!v.ranged) tighten(v.lower, v.upper);
    // Inequalities every row keeps bound the loop instead of rejecting its values one by one.
    tighten(v.kept_lower, v.kept_upper);
    if (v.ranged && lo > v.from) lo = v.from + ceil_div(lo - v.from, step) * step;
    auto try_value = [&](long value) {
        t[k] = value;
        if (all_hold(v.checks, t)) visit_from(k + 1, t, visit, go_on);
    };
    if (!v.solved.empty()) {
        // m3 = -m1 - m2: one value, if it lies on the column's grid.
        const rule& r = v.solved.front();
        const long c = r.form.coefficient_of(k), rest = rest_of(r, k, t);
        if (rest % c != 0) return;
        const long value = -rest / c;
        if (value >= lo && value <= hi && (!v.ranged || (value - v.from) % step == 0)) try_value(value);
        return;
    }
    for (long value = lo; value <= hi && go_on; value += step) try_value(value);
}

void row_plan::for_each_row(const std::function<bool(const std::vector<long>&)>& visit) const {
    std::vector<long> t(values_.size(), 0);
    bool go_on = true;
    visit_from(0, t, visit, go_on);
}

}  // namespace couplet::table_detail
