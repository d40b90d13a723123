#include "print/writer.hpp"

#include <algorithm>
#include <sstream>
#include <tuple>

#include "model/composite_operator.hpp"
#include "model/coupled_element.hpp"
#include "model/coupling_tree.hpp"
#include "model/readable_order.hpp"
#include "model/symbols.hpp"
#include "model/tensor_operator.hpp"
#include "print/print.hpp"

namespace couplet::print_detail {

using namespace GiNaC;

namespace {

// Reading order of factors in a product: phase, plain factors and radicals, deltas, then the
// coupling symbols by size, sums last (a sum's body runs to the end of the product).
int factor_rank(const ex& f) {
    if (is_a<phase_factor>(f)) return 0;
    if (is_a<index_sum>(f)) return 8;
    switch (kind_of(f)) {
        case symbol_kind::delta:
        case symbol_kind::triangle:
        case symbol_kind::projection:
            return 2;
        case symbol_kind::clebsch_gordan:
            return 3;
        case symbol_kind::threej:
            return 4;
        case symbol_kind::sixj:
            return 5;
        case symbol_kind::ninej:
            return 6;
        default:
            return 1;
    }
}

void sort_factors(std::vector<ex>& fs) {
    std::vector<std::pair<std::pair<int, std::string>, ex>> keyed;
    for (const ex& f : fs) keyed.push_back({{factor_rank(f), to_text(f)}, f});
    std::stable_sort(keyed.begin(), keyed.end(), [](const auto& a, const auto& b) { return a.first < b.first; });
    fs.clear();
    for (auto& k : keyed) fs.push_back(k.second);
}

ex without_coefficient(const ex& term) {
    if (is_a<numeric>(term)) return 1;
    if (!is_a<mul>(term)) return term;
    ex rest = 1;
    for (const ex& f : term)
        if (!is_a<numeric>(f)) rest *= f;
    return rest;
}

}  // namespace

product_parts split_product(const ex& e) {
    product_parts p;
    numeric coefficient = 1;
    auto take = [&](const ex& f) {
        if (is_a<numeric>(f)) {
            coefficient *= ex_to<numeric>(f);
        } else if (is_a<GiNaC::power>(f) && is_a<numeric>(f.op(1)) && ex_to<numeric>(f.op(1)).is_negative()) {
            p.bottom.push_back(pow(f.op(0), -f.op(1)));
        } else {
            p.top.push_back(f);
        }
    };
    if (is_a<mul>(e)) {
        for (const ex& f : e) take(f);
    } else {
        take(e);
    }
    p.negative = coefficient.is_negative();
    coefficient = abs(coefficient);
    p.numerator = coefficient.numer();
    p.denominator = coefficient.denom();
    sort_factors(p.top);
    sort_factors(p.bottom);
    return p;
}

// The heaviest factor of a term decides its place: plain terms first, then terms with
// coupling symbols by size, then sums; constants last.
int term_rank(const ex& t) {
    if (is_a<numeric>(t)) return 100;
    int rank = 0;
    if (is_a<mul>(t)) {
        for (const ex& f : t)
            if (!is_a<numeric>(f)) rank = std::max(rank, factor_rank(f));
    } else {
        rank = factor_rank(t);
    }
    return rank;
}

std::vector<ex> ordered_terms(const ex& s) {
    struct keyed_term {
        int rank;
        ex rest;
        std::string rest_text, text;
        ex term;
    };
    std::vector<keyed_term> keyed;
    for (const ex& t : s) {
        ex rest = without_coefficient(t);
        keyed.push_back({term_rank(t), rest, to_text(rest), to_text(t), t});
    }
    std::stable_sort(keyed.begin(), keyed.end(), [](const keyed_term& a, const keyed_term& b) {
        if (a.rank != b.rank) return a.rank < b.rank;
        if (is_a<symbol>(a.rest) && is_a<symbol>(b.rest) && a.rest_text != b.rest_text)
            return readable_name_less(a.rest_text, b.rest_text);
        return std::tie(a.rest_text, a.text) < std::tie(b.rest_text, b.text);
    });
    std::vector<ex> out;
    for (auto& k : keyed) out.push_back(k.term);
    return out;
}

bool prints_compactly(const ex& s) {
    for (const ex& t : s) {
        ex rest = without_coefficient(t);
        if (!is_a<numeric>(rest) && !is_a<symbol>(rest)) return false;
    }
    return true;
}

printed writer::write(const ex& e) {
    if (is_a<numeric>(e)) return number(ex_to<numeric>(e));
    if (is_a<symbol>(e)) return name(ex_to<symbol>(e).get_name());
    if (is_a<add>(e)) return sum(e);
    if (is_a<mul>(e)) return product(e);
    if (is_a<GiNaC::power>(e) && is_a<numeric>(e.op(1))) {
        numeric n = ex_to<numeric>(e.op(1));
        if (n.is_negative()) return product(e);
        if (n == numeric(1, 2)) return root(e.op(0));
        return power(e.op(0), n);
    }
    if (is_a<phase_factor>(e)) return phase(e.op(0));
    if (is_a<index_sum>(e)) return sum_over(e);
    if (kind_of(e) != symbol_kind::none) return function(e);
    if (is_recoupling(e)) return recoupling(e);
    if (is_reduced_element(e) || is_matrix_element(e) || is_coupled_element(e) || is_coupled_reduced_element(e))
        return tensor_element(e);
    std::ostringstream os;  // not produced by couplet's own lowering; shown as GiNaC has it
    os << e;
    return {os.str(), level::atom};
}

printed writer::recoupling(const ex& e) {
    const recoupling_layout layout = recoupling_brackets();
    auto side = [&](const ex& held) {
        return coupled(held.op(0), layout) + ", " + coupled(held.op(1), layout) + "; " + write(held.op(2)).text;
    };
    return {layout.open + side(e.op(0)) + layout.bar + side(e.op(1)) + layout.close, level::atom};
}

printed writer::tensor_element(const ex& e) {
    const element_layout l = element_brackets();
    auto entry = [&](size_t i) { return element_entry(e.op(i)); };
    auto state = [&](size_t tree) { return coupled(e.op(tree), recoupling_brackets()); };
    std::string text;
    if (is_reduced_element(e))
        text = entry(2) + l.double_bar + operator_symbol(operator_of(e), e.op(1), nullptr) + l.double_bar + entry(3);
    else if (is_matrix_element(e)) {
        const ex component = e.op(2);
        text = entry(3) + l.gap + entry(4) + l.bar + operator_symbol(operator_of(e), e.op(1), &component) + l.bar +
               entry(5) + l.gap + entry(6);
    } else if (is_coupled_reduced_element(e))
        text = state(1) + l.double_bar + operator_expression(e.op(0), nullptr) + l.double_bar + state(2);
    else {
        const ex component = e.op(1);
        text = state(2) + l.gap + entry(3) + l.bar + operator_expression(e.op(0), &component) + l.bar + state(4) +
               l.gap + entry(5);
    }
    return {l.open + text + l.close, level::atom};
}

// T^(k)_q(1), [T^(k1)(1) x U^(k2)(2)]^(k)_q, T^(k)(1) . U^(k)(2): the component on the whole
// operator only; a scalar's, 0, is not written.
std::string writer::operator_expression(const ex& op, const ex* component) {
    if (is_acting_on(op)) return operator_symbol(name_of(op), op.op(1), component) + "(" + write(op.op(2)).text + ")";
    const product_layout p = product_signs();
    if (is_scalar_product(op))
        return operator_expression(op.op(0), nullptr) + p.dot + operator_expression(op.op(1), nullptr);
    return p.open + operator_expression(op.op(0), nullptr) + p.times + operator_expression(op.op(1), nullptr) +
           p.close + rank_marks(op.op(2), component);
}

std::string writer::coupled(const ex& held, const recoupling_layout& layout) {
    if (!is_a<lst>(held)) return write(held).text;
    return "(" + coupled(held.op(0), layout) + ", " + coupled(held.op(1), layout) + ")" + layout.label_gap +
           at_least(held.op(2), level::atom);
}

std::string writer::at_least(const ex& e, level needed) {
    printed p = write(e);
    return p.binding >= needed ? p.text : parenthesize(p.text);
}

printed writer::sum(const ex& e) {
    const bool compact = prints_compactly(e);
    std::string out;
    bool first = true;
    for (const ex& t : ordered_terms(e)) {
        bool negative = split_product(t).negative;
        std::string body = at_least(negative ? ex(-t) : t, level::product);
        if (first) {
            out = negative ? "-" + body : body;
        } else {
            const char* sign = negative ? "-" : "+";
            out += compact ? std::string(sign) : std::string(" ") + sign + " ";
            out += body;
        }
        first = false;
    }
    return {out, level::sum};
}

std::string writer::join_factors(const std::vector<ex>& factors, const numeric& coefficient) {
    std::string out;
    auto append = [&](const std::string& s) {
        if (!out.empty()) out += times();
        out += s;
    };
    if (coefficient != 1) append(number(coefficient).text);
    for (const ex& f : factors) append(at_least(f, level::product));
    return out;
}

printed writer::product(const ex& e) {
    product_parts p = split_product(e);
    printed result;
    if (p.bottom.empty() && p.denominator == 1) {
        if (p.top.size() == 1 && p.numerator == 1) {
            result = write(p.top.front());
        } else {
            result = {join_factors(p.top, p.numerator), level::product};
            if (result.text.empty()) result = number(p.numerator);
        }
    } else {
        std::string top = join_factors(p.top, p.numerator);
        if (top.empty()) top = "1";
        printed bottom;
        if (p.bottom.size() == 1 && p.denominator == 1)
            bottom = write(p.bottom.front());
        else if (p.bottom.empty())
            bottom = number(p.denominator);  // a bare integer needs no parentheses: b/2, not b/(2)
        else
            bottom = {join_factors(p.bottom, p.denominator), level::product};
        result = fraction(top, bottom, bottom.binding);
    }
    if (p.negative)
        result = {"-" + (result.binding >= level::product ? result.text : parenthesize(result.text)), level::sum};
    return result;
}

}  // namespace couplet::print_detail
