#include "eval/compile.hpp"

#include <cln/integer.h>
#include <algorithm>
#include <set>

#include "eval/plan.hpp"

#include "model/rewrite.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"
#include "model/tensor_operator.hpp"
#include "parse/lower.hpp"
#include "print/print.hpp"

namespace couplet::eval_detail {

using namespace GiNaC;

namespace {

cln::cl_RA rational_of(const numeric& n) { return cln::the<cln::cl_RA>(n.to_cl_N()); }

void add_slots(std::vector<int>& into, const std::vector<int>& more) {
    std::vector<int> merged;
    std::set_union(into.begin(), into.end(), more.begin(), more.end(), std::back_inserter(merged));
    into.swap(merged);
}

std::vector<int> slots_of(const linear& f) {
    std::vector<int> out;
    for (const auto& term : f.terms) out.push_back(term.first);
    std::sort(out.begin(), out.end());
    out.erase(std::unique(out.begin(), out.end()), out.end());
    return out;
}

bool mentions(const linear& f, const std::vector<int>& slots) {
    for (const auto& term : f.terms)
        if (std::find(slots.begin(), slots.end(), term.first) != slots.end()) return true;
    return false;
}

class compiler {
public:
    compiler(program& p, const quantum_numbers& numbers) : p_(p), numbers_(numbers) {}

    node_ptr build(const ex& e) {
        auto n = std::make_unique<node>();
        n->text = to_text(e);
        if (is_a<numeric>(e)) {
            const numeric& v = ex_to<numeric>(e);
            if (!v.is_rational()) throw evaluation_error("the number " + n->text + " is not rational");
            n->kind = node_kind::constant;
            n->value = exact::number(rational_of(v));
        } else if (is_a<symbol>(e)) {
            n->kind = node_kind::variable;
            n->slot = slot(ex_to<symbol>(e));
        } else if (is_a<add>(e) || is_a<mul>(e)) {
            n->kind = is_a<add>(e) ? node_kind::add : node_kind::mul;
            for (const ex& c : e) n->children.push_back(build(c));
        } else if (is_a<GiNaC::power>(e)) {
            build_power(*n, e);
        } else if (is_a<phase_factor>(e)) {
            n->kind = node_kind::phase;
            n->forms.push_back(form(e.op(0)));
        } else if (is_a<index_sum>(e)) {
            build_sum(*n, ex_to<index_sum>(e));
        } else {
            build_symbol(*n, e);
        }
        note_slots(*n);
        return n;
    }

    bool doubled_forms_fit() const { return doubled_fit_; }

private:
    void note_slots(node& n) {
        if (n.kind == node_kind::variable) n.slots = {n.slot};
        for (const auto& c : n.children) add_slots(n.slots, c->slots);
        for (const auto& f : n.forms) add_slots(n.slots, slots_of(f));
        if (n.kind == node_kind::sum) {
            for (const auto& t : n.terms) add_slots(n.slots, t.body->slots);
            std::vector<int> outside;
            for (int k : n.slots)
                if (std::find(n.indices.begin(), n.indices.end(), k) == n.indices.end()) outside.push_back(k);
            n.slots = outside;
        }
    }

    int slot(const symbol& s) {
        int k = ensure_slot(s);
        note_free(k);
        return k;
    }

    int ensure_slot(const symbol& s) {
        auto it = p_.slot_of.find(s.get_name());
        if (it != p_.slot_of.end()) return it->second;
        int k = static_cast<int>(p_.slot_names.size());
        p_.slot_of.emplace(s.get_name(), k);
        p_.slot_names.push_back(s.get_name());
        const quantum_number* q = numbers_.find(s);
        p_.declared_parity.push_back(!q                                 ? 0
                                     : q->parity == qn_parity::integer  ? 1
                                     : q->parity == qn_parity::half_odd ? 2
                                                                        : 0);
        return k;
    }

    void note_free(int k) {
        if (std::find(bound_.begin(), bound_.end(), k) != bound_.end()) return;
        if (std::find(p_.free_slots.begin(), p_.free_slots.end(), k) == p_.free_slots.end()) p_.free_slots.push_back(k);
    }

    linear form(const ex& e) {
        if (!is_linear_form(e)) throw evaluation_error("'" + to_text(e) + "' is not linear in the quantum numbers");
        linear f;
        f.text = to_text(e);
        ex x = e.expand();
        auto take = [&](const ex& t) {
            if (is_a<numeric>(t)) {
                f.constant += rational_of(ex_to<numeric>(t));
            } else if (is_a<symbol>(t)) {
                f.terms.emplace_back(slot(ex_to<symbol>(t)), 1);
            } else {  // c * symbol
                const ex& a = t.op(0);
                const ex& b = t.op(1);
                const ex& s = is_a<symbol>(a) ? a : b;
                const ex& c = is_a<symbol>(a) ? b : a;
                f.terms.emplace_back(slot(ex_to<symbol>(s)), rational_of(ex_to<numeric>(c)));
            }
        };
        if (is_a<add>(x))
            for (const ex& t : x) take(t);
        else
            take(x);
        fill_doubled(f);
        doubled_fit_ = doubled_fit_ && f.doubled.fits;
        return f;
    }

    void build_power(node& n, const ex& e) {
        if (!is_a<numeric>(e.op(1)) || !ex_to<numeric>(e.op(1)).is_rational())
            throw evaluation_error("cannot evaluate " + n.text + " exactly");
        numeric k = ex_to<numeric>(e.op(1));
        // The parser bounds a written exponent; products of lets (W*W, doubled again and again)
        // build larger ones, whose exact value would outgrow memory.
        if (abs(k) > max_integer_exponent)
            throw evaluation_error("the exponent " + to_text(k) + " in " + n.text + " is above the bound of " +
                                   std::to_string(max_integer_exponent) + " for an integer power");
        n.children.push_back(build(e.op(0)));
        if (k.is_integer()) {
            n.kind = node_kind::power;
            n.exponent = k.to_long();
        } else if ((2 * k).is_integer()) {
            n.kind = node_kind::root_power;
            n.exponent = (2 * k).to_long();
        } else {
            throw evaluation_error("cannot evaluate " + n.text +
                                   " exactly: only integer powers and "
                                   "square roots are supported");
        }
    }

    void build_symbol(node& n, const ex& e) {
        if (is_reduced_element(e)) {
            n.kind = node_kind::reduced_element;
            n.text = operator_of(e);  // the value's seed
            for (std::size_t k = 1; k < 4; ++k) n.forms.push_back(form(e.op(k)));
            return;
        }
        switch (kind_of(e)) {
            case symbol_kind::threej:
                n.kind = node_kind::threej;
                break;
            case symbol_kind::clebsch_gordan:
                n.kind = node_kind::clebsch;
                break;
            case symbol_kind::sixj:
                n.kind = node_kind::sixj;
                break;
            case symbol_kind::ninej:
                n.kind = node_kind::ninej;
                break;
            case symbol_kind::delta:
                n.kind = node_kind::delta;
                break;
            case symbol_kind::triangle:
                n.kind = node_kind::triangle;
                break;
            case symbol_kind::projection:
                n.kind = node_kind::projection;
                break;
            default:
                throw evaluation_error("cannot evaluate " + n.text);
        }
        n.source = e;
        for (const ex& a : e) n.forms.push_back(form(a));
    }

    void build_sum(node& n, const index_sum& s) {
        n.kind = node_kind::sum;
        std::vector<int> outer_bound = bound_;
        for (const ex& i : s.indices()) {
            int k = ensure_slot(ex_to<symbol>(i));
            n.indices.push_back(k);
            bound_.push_back(k);
        }
        ex body = s.body();
        std::vector<ex> parts;
        if (is_a<add>(body))
            for (const ex& t : body) parts.push_back(t);
        else
            parts.push_back(body);
        for (const ex& t : parts) {
            summand piece;
            piece.body = build(t);
            collect_rules(*piece.body, piece.rules);
            for (const auto& r : piece.rules) doubled_fit_ = doubled_fit_ && r.form.doubled.fits;
            if (piece.body->kind == node_kind::mul)
                for (const auto& c : piece.body->children) piece.factors.push_back(c.get());
            else
                piece.factors.push_back(piece.body.get());
            piece.plan = make_plan(piece.rules, piece.factors, n.indices, p_.slot_names);
            n.terms.push_back(std::move(piece));
        }
        bound_ = outer_bound;
    }

    // Selection rules of the multiplicative factors: where one fails, that factor (and with
    // it the whole summand) vanishes, so the rules may bound the enumeration exactly.
    void collect_rules(const node& n, std::vector<selection_rule>& rules) {
        switch (n.kind) {
            case node_kind::mul:
                for (const auto& c : n.children) collect_rules(*c, rules);
                return;
            case node_kind::power:
                if (n.exponent > 0) collect_rules(*n.children[0], rules);
                return;
            case node_kind::sum:
                // Rules on the inner indices are the inner sum's business; the others vanish
                // the whole inner sum, so they also bound the outer enumeration.
                if (n.terms.size() == 1)
                    for (const auto& r : n.terms[0].rules)
                        if (!mentions(r.form, n.indices)) rules.push_back(r);
                return;
            case node_kind::threej:
            case node_kind::clebsch:
            case node_kind::sixj:
            case node_kind::ninej:
            case node_kind::triangle:
            case node_kind::projection:
            case node_kind::delta: {
                coupling_structure st;
                add_structure(n.source, st);
                for (const auto& t : st.triads) triad(rules, form(t[0]), form(t[1]), form(t[2]));
                for (const auto& [j, m] : st.projections) projection(rules, form(j), form(m));
                for (const ex& z : st.zeros) rules.push_back({rule_kind::zero, form(z)});
                return;
            }
            default:
                return;
        }
    }

    static linear combine(std::initializer_list<std::pair<int, const linear*>> parts) {
        linear out;
        std::map<int, cln::cl_RA> acc;
        for (const auto& [c, f] : parts) {
            out.constant += c * f->constant;
            for (const auto& [s, k] : f->terms) acc[s] += c * k;
        }
        for (const auto& [s, k] : acc)
            if (!cln::zerop(k)) out.terms.emplace_back(s, k);
        fill_doubled(out);
        return out;
    }

    static void half_integral(std::vector<selection_rule>& rules, const linear& f) {
        rules.push_back({rule_kind::integral, combine({{2, &f}})});
    }

    static void triad(std::vector<selection_rule>& rules, const linear& a, const linear& b, const linear& c) {
        for (const linear* f : {&a, &b, &c}) {
            rules.push_back({rule_kind::nonnegative, *f});
            half_integral(rules, *f);
        }
        rules.push_back({rule_kind::nonnegative, combine({{1, &a}, {1, &b}, {-1, &c}})});
        rules.push_back({rule_kind::nonnegative, combine({{1, &a}, {-1, &b}, {1, &c}})});
        rules.push_back({rule_kind::nonnegative, combine({{-1, &a}, {1, &b}, {1, &c}})});
        rules.push_back({rule_kind::integral, combine({{1, &a}, {1, &b}, {1, &c}})});
    }

    static void projection(std::vector<selection_rule>& rules, const linear& j, const linear& m) {
        half_integral(rules, m);
        rules.push_back({rule_kind::nonnegative, combine({{1, &j}, {-1, &m}})});
        rules.push_back({rule_kind::nonnegative, combine({{1, &j}, {1, &m}})});
        rules.push_back({rule_kind::integral, combine({{1, &j}, {-1, &m}})});
    }

    program& p_;
    const quantum_numbers& numbers_;
    std::vector<int> bound_;
    bool doubled_fit_ = true;
};

}  // namespace

void fill_doubled(linear& f) {
    std::map<int, cln::cl_RA> merged;
    for (const auto& [s, c] : f.terms) merged[s] += c;
    // 2 * value = 2 * constant + sum c * t; scaled by the common denominator.
    cln::cl_I scale = cln::denominator(2 * f.constant);
    for (const auto& [s, c] : merged) scale = cln::lcm(scale, cln::denominator(c));
    const cln::cl_I limit = cln::cl_I(1) << 40;
    auto to_long = [&](const cln::cl_RA& q, long& out) {
        cln::cl_I i = cln::the<cln::cl_I>(q);
        if (cln::abs(i) >= limit) return false;
        out = cln::cl_I_to_long(i);
        return true;
    };
    linear::doubled_form d;
    d.fits = to_long(scale, d.scale) && to_long(2 * f.constant * scale, d.constant);
    for (const auto& [s, c] : merged) {
        if (cln::zerop(c)) continue;
        long k = 0;
        d.fits = to_long(c * scale, k) && d.fits;
        d.terms.emplace_back(s, k);
    }
    f.doubled = d;
}

program compile(const ex& e, const quantum_numbers& numbers) {
    program p;
    compiler c(p, numbers);
    p.root = c.build(e);
    p.doubled_forms_fit = c.doubled_forms_fit();
    return p;
}

}  // namespace couplet::eval_detail
