#include "verify/domain.hpp"

#include <cln/integer.h>
#include <cln/rational.h>

#include <algorithm>
#include <map>
#include <optional>
#include <set>
#include <tuple>

#include "model/rewrite.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"

namespace couplet::verify {

using namespace GiNaC;

long doubled_form::value(const std::vector<long>& t) const {
    long v = constant;
    for (const auto& [k, c] : terms) v += c * t[k];
    return v;
}

long doubled_form::coefficient_of(std::size_t variable) const {
    for (const auto& [k, c] : terms)
        if (k == variable) return c;
    return 0;
}

std::size_t doubled_form::last_variable() const {
    std::size_t last = 0;
    for (const auto& term : terms) last = std::max(last, term.first);
    return last;
}

bool rule::holds(const std::vector<long>& t) const {
    long v = form.value(t);
    switch (kind) {
        case rule_kind::nonnegative:
            return v >= 0;
        case rule_kind::zero:
            return v == 0;
        default:
            return v % modulus == 0;
    }
}

std::size_t sampling_domain::index_of(const std::string& name) const {
    for (std::size_t k = 0; k < numbers.size(); ++k)
        if (numbers[k].symbol.get_name() == name) return k;
    return numbers.size();
}

bool sampling_domain::preferred(const std::vector<long>& t) const {
    return std::all_of(selection.begin(), selection.end(), [&](const rule& r) { return r.holds(t); });
}

bool sampling_domain::admissible(const std::vector<long>& t) const {
    return std::all_of(hard.begin(), hard.end(), [&](const rule& r) { return r.holds(t); });
}

namespace {

enum class condition { integral, nonnegative, zero };

// A condition on a linear form of the free quantum numbers, kept symbolic until the walk has
// found every free name and so fixed the variable order.
struct pending {
    condition what;
    ex form;
    bool hard;
};

cln::cl_RA rational_of(const ex& e) { return cln::the<cln::cl_RA>(ex_to<numeric>(e).to_cl_N()); }

// Projection slots m + d (one name, coefficient +-1) outside every sum over m: how far their
// constants reach, and the j of the column that owns m (one where m stands plainly, if any).
// The program's table cannot say this: it has one entry per name, and a sum's index may share
// its name with a free projection of another j.
struct projection_reach {
    bool plain = false;
    std::optional<cln::cl_RA> smallest_shift;
    std::optional<ex> owner;
    bool owner_plain = false;
};

class collector {
public:
    explicit collector(const quantum_numbers& numbers) : numbers_(numbers) {}

    void walk(const ex& e) {
        if (is_a<index_sum>(e)) {
            const auto& s = ex_to<index_sum>(e);
            std::size_t depth = bound_.size();
            for (const ex& i : s.indices()) bound_.push_back(ex_to<symbol>(i).get_name());
            walk(s.body());
            bound_.resize(depth);
            return;
        }
        if (is_a<symbol>(e)) {
            const symbol& s = ex_to<symbol>(e);
            if (!is_bound(s.get_name())) free_.emplace(s.get_name(), s);
            return;
        }
        collect_rules(e);
        for (const ex& child : e) walk(child);
    }

    sampling_domain finish() const {
        sampling_domain d;
        order_numbers(d);
        std::map<std::string, std::size_t> index;
        for (std::size_t k = 0; k < d.numbers.size(); ++k) index[d.numbers[k].symbol.get_name()] = k;
        for (const pending& p : pending_) add_rule(d, p, index);
        add_variable_rules(d, index);
        drop_repeats(d.hard);
        drop_repeats(d.selection);
        return d;
    }

    // Where e pairs a projection with its own j (model/structure.hpp).
    void note_projection_columns(const ex& e) {
        for (const projection_column& c : free_projection_columns(e)) {
            if (!is_linear_form(c.j) || !is_linear_form(c.m)) continue;
            cln::cl_RA shift = cln::abs(rational_of(c.shift));
            projection_reach& r = reach_[c.name.get_name()];
            if (cln::zerop(shift)) r.plain = true;
            if (!r.smallest_shift || shift < *r.smallest_shift) r.smallest_shift = shift;
            if (!r.owner || (cln::zerop(shift) && !r.owner_plain)) {
                r.owner = c.j;
                r.owner_plain = cln::zerop(shift);
            }
        }
    }

private:
    bool is_bound(const std::string& name) const {
        return std::find(bound_.begin(), bound_.end(), name) != bound_.end();
    }

    // Whether every name in `form` is free at this point of the walk.
    bool free_here(const ex& form) const {
        for (const_preorder_iterator it = form.preorder_begin(); it != form.preorder_end(); ++it)
            if (is_a<symbol>(*it) && is_bound(ex_to<symbol>(*it).get_name())) return false;
        return is_linear_form(form);
    }

    void require(condition what, const ex& form, bool hard) {
        if (free_here(form)) pending_.push_back({what, form, hard});
    }

    void triad(const ex& a, const ex& b, const ex& c) {
        require(condition::integral, a + b + c, true);
        for (const ex* f : {&a, &b, &c}) {
            require(condition::integral, 2 * *f, true);
            require(condition::nonnegative, *f, false);
        }
        require(condition::nonnegative, a + b - c, false);
        require(condition::nonnegative, a - b + c, false);
        require(condition::nonnegative, -a + b + c, false);
    }

    void column(const ex& j, const ex& m) {
        require(condition::integral, j - m, true);
        require(condition::integral, 2 * m, true);
        require(condition::nonnegative, j - m, false);
        require(condition::nonnegative, j + m, false);
    }

    void collect_rules(const ex& e) {
        // A delta that fails is information about the identity, not a point to avoid.
        if (kind_of(e) == symbol_kind::delta) return;
        coupling_structure s;
        add_structure(e, s);
        for (const auto& t : s.triads) triad(t[0], t[1], t[2]);
        for (const auto& [j, m] : s.projections) column(j, m);
        for (const ex& z : s.zeros) require(condition::zero, z, false);
    }

    void order_numbers(sampling_domain& d) const {
        std::vector<free_number> first, projections;
        std::set<std::string> placed;
        auto place = [&](const std::string& name, const symbol& s) {
            free_number f;
            f.symbol = s;
            if (const quantum_number* q = numbers_.find(name)) {
                f.role = q->role;
                f.parity = q->parity;
            }
            (f.role == qn_role::projection ? projections : first).push_back(f);
            placed.insert(name);
        };
        for (const quantum_number& q : numbers_.all())
            if (auto it = free_.find(q.name); it != free_.end()) place(q.name, it->second);
        for (const auto& [name, s] : free_)
            if (!placed.count(name)) place(name, s);
        d.numbers = first;
        d.numbers.insert(d.numbers.end(), projections.begin(), projections.end());
    }

    // form -> L * form with integer coefficients on the doubled values, and L.
    // Read term by term, each name looked up in `index` (the domain's numbers by name): a
    // product of 500 symbols has thousands of rules over thousands of numbers.
    static std::optional<std::pair<doubled_form, long>> doubled(const ex& form,
                                                                const std::map<std::string, std::size_t>& index) {
        const ex x = form.expand();
        std::vector<std::pair<std::size_t, cln::cl_RA>> halves;  // coefficient on t = 2x
        cln::cl_RA constant = 0;
        for (const ex& t : is_a<add>(x) ? std::vector<ex>(x.begin(), x.end()) : std::vector<ex>{x}) {
            if (is_a<numeric>(t)) {
                if (!ex_to<numeric>(t).is_rational()) return std::nullopt;
                constant = constant + rational_of(t);
                continue;
            }
            ex name = t, coefficient = 1;
            if (is_a<mul>(t) && t.nops() == 2 && is_a<numeric>(t.op(1))) name = t.op(0), coefficient = t.op(1);
            if (!is_a<symbol>(name) || !ex_to<numeric>(coefficient).is_rational()) return std::nullopt;
            auto k = index.find(ex_to<symbol>(name).get_name());
            if (k == index.end()) return std::nullopt;  // a name the domain does not sample
            halves.emplace_back(k->second, rational_of(coefficient) / 2);
        }
        cln::cl_I scale = cln::denominator(constant);
        for (const auto& h : halves) scale = cln::lcm(scale, cln::denominator(h.second));
        doubled_form f;
        for (const auto& [k, c] : halves) f.terms.emplace_back(k, cln::cl_I_to_long(cln::the<cln::cl_I>(c * scale)));
        f.constant = cln::cl_I_to_long(cln::the<cln::cl_I>(constant * scale));
        return std::make_pair(f, cln::cl_I_to_long(scale));
    }

    // The same triad often sits in several symbols; each rule is checked once.
    static void drop_repeats(std::vector<rule>& rules) {
        auto key = [](const rule& r) {
            auto terms = r.form.terms;
            std::sort(terms.begin(), terms.end());
            return std::make_tuple(static_cast<int>(r.kind), r.modulus, r.form.constant, terms);
        };
        std::set<decltype(key(rules.front()))> seen;
        std::vector<rule> kept;
        for (const rule& r : rules)
            if (seen.insert(key(r)).second) kept.push_back(r);
        rules = kept;
    }

    static void add_rule(sampling_domain& d, const pending& p, const std::map<std::string, std::size_t>& index) {
        auto converted = doubled(p.form, index);
        if (!converted || converted->first.terms.empty()) return;  // a closed condition constrains no point
        auto [form, scale] = *converted;
        rule r;
        r.form = form;
        switch (p.what) {
            case condition::integral:
                if (scale == 1) return;
                r.kind = rule_kind::divisible;
                r.modulus = scale;
                break;
            case condition::nonnegative:
                r.kind = rule_kind::nonnegative;
                break;
            case condition::zero:
                r.kind = rule_kind::zero;
                break;
        }
        (p.hard ? d.hard : d.selection).push_back(r);
    }

    void add_variable_rules(sampling_domain& d, const std::map<std::string, std::size_t>& index) const {
        for (std::size_t k = 0; k < d.numbers.size(); ++k) {
            free_number& f = d.numbers[k];
            if (f.parity != qn_parity::any) {
                rule r;
                r.kind = rule_kind::divisible;
                r.modulus = 2;
                r.form.terms.emplace_back(k, 1);
                r.form.constant = f.parity == qn_parity::half_odd ? 1 : 0;
                d.hard.push_back(r);
            }
            if (f.role == qn_role::projection) add_owner_rules(d, k, index);
        }
    }

    // j - m integral and |m| <= j + shift for a projection m of j.
    void add_owner_rules(sampling_domain& d, std::size_t k, const std::map<std::string, std::size_t>& index) const {
        free_number& f = d.numbers[k];
        auto reach = reach_.find(f.symbol.get_name());
        if (reach == reach_.end() || !reach->second.owner) return;
        const ex& owner = *reach->second.owner;
        for (const_preorder_iterator it = owner.preorder_begin(); it != owner.preorder_end(); ++it) {
            if (!is_a<symbol>(*it)) continue;
            auto at = index.find(ex_to<symbol>(*it).get_name());
            if (at == index.end() || at->second >= k) return;  // the owner is not sampled before m
        }
        cln::cl_RA shift = reach->second.plain ? cln::cl_RA(0) : *reach->second.smallest_shift;
        const ex m = f.symbol;
        const numeric s{cln::cl_N(shift)};
        add_rule(d, {condition::integral, owner - m, true}, index);
        add_rule(d, {condition::nonnegative, owner + s - m, true}, index);
        add_rule(d, {condition::nonnegative, owner + s + m, true}, index);
        f.owned = true;
        f.slack = cln::cl_I_to_long(cln::the<cln::cl_I>(cln::ceiling1(2 * shift)));
    }

    const quantum_numbers& numbers_;
    std::vector<std::string> bound_;
    std::map<std::string, symbol> free_;
    std::vector<pending> pending_;
    std::map<std::string, projection_reach> reach_;
};

}  // namespace

sampling_domain build_domain(const std::vector<ex>& expressions, const quantum_numbers& numbers) {
    collector c(numbers);
    for (const ex& e : expressions) {
        c.walk(e);
        c.note_projection_columns(e);
    }
    return c.finish();
}

}  // namespace couplet::verify
