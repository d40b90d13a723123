#include "parse/lower.hpp"

#include <algorithm>
#include <boost/variant/apply_visitor.hpp>
#include <boost/variant/get.hpp>
#include <cctype>
#include <functional>
#include <map>
#include <optional>
#include <regex>
#include <set>
#include <sstream>

#include "model/composite_operator.hpp"
#include "model/coupled_element.hpp"
#include "model/coupling_tree.hpp"
#include "model/rewrite.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"
#include "model/tensor_operator.hpp"
#include "print/print.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

std::size_t offset_of(const ast::operand& o);

struct offset_visitor : boost::static_visitor<std::size_t> {
    std::size_t operator()(const ast::nil&) const { return 0; }
    template <typename Node>
    std::size_t operator()(const Node& n) const {
        return static_cast<const ast::located&>(n).offset;
    }
};

std::size_t offset_of(const ast::operand& o) { return boost::apply_visitor(offset_visitor{}, o); }

// A factor of the operator between coupled states (ast::operator_factor): its component
// and where it starts.
const boost::optional<ast::operand>& component_of(const ast::operator_factor& f) {
    if (const auto* a = boost::get<ast::acted_operator>(&f.get())) return a->component;
    return boost::get<ast::x3::forward_ast<ast::operator_product>>(f.get()).get().component;
}

std::size_t offset_of(const ast::operator_factor& f) {
    if (const auto* a = boost::get<ast::acted_operator>(&f.get())) return a->offset;
    return boost::get<ast::x3::forward_ast<ast::operator_product>>(f.get()).get().offset;
}

std::set<symbol, ex_is_less> symbols_in(const ex& e) {
    std::set<symbol, ex_is_less> out;
    for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
        if (is_a<symbol>(*it)) out.insert(ex_to<symbol>(*it));
    return out;
}

class lowering {
public:
    lowering(const source_file& src, lowered_program& out) : src_(src), out_(out) {}

    void collect_definitions(const std::vector<parsed_statement>& parsed) {
        for (const auto& p : parsed)
            if (const auto* d = boost::get<ast::definition>(&p.tree))
                later_definitions_.emplace(d->name.name, d->name.offset);
    }

    // A let that could not be read: its name has no value, and a use says why.
    void failed_definition(const std::string& name, std::size_t offset) {
        failed_definitions_.emplace(name, offset);
        later_definitions_.erase(name);
        defining_.clear();
    }

    lowered_statement statement(const parsed_statement& p) {
        lowered_statement s;
        s.span = p.span;
        s.text = src_.text().substr(p.span.begin, p.span.end - p.span.begin);
        while (!s.text.empty() && std::isspace(static_cast<unsigned char>(s.text.back()))) s.text.pop_back();
        projections_of_statement_.clear();
        boost::apply_visitor([&](const auto& node) { this->fill(s, node); }, p.tree);
        s.written = s.value;
        s.written_rhs = s.rhs;
        if (s.kind != request_kind::declaration) {
            s.value = with_definitions(s.value, p.span.begin);
            s.rhs = with_definitions(s.rhs, p.span.begin);
        }
        return s;
    }

private:
    // ---- statements ----------------------------------------------------------------------

    void fill(lowered_statement& s, const ast::declaration& d) {
        s.kind = request_kind::declaration;
        for (const ast::identifier& n : d.names) {
            if (definitions_.count(n.name) || later_definitions_.count(n.name))
                throw user_error(n.offset, "'" + n.name +
                                               "' is defined by 'let'; it cannot be "
                                               "declared '" +
                                               d.parity + "'");
            out_.numbers.declare_parity(n.name, d.parity == "int" ? qn_parity::integer : qn_parity::half_odd, n.offset);
        }
    }

    void fill(lowered_statement& s, const ast::definition& d) {
        s.kind = request_kind::definition;
        if (definitions_.count(d.name.name))
            throw user_error(d.name.offset, "'" + d.name.name + "' is already defined");
        if (const quantum_number* q = out_.numbers.find(d.name.name))
            throw user_error(d.name.offset, "'" + d.name.name +
                                                "' is already used as a quantum "
                                                "number (first at " +
                                                where(q->first_offset) + ")");
        s.name = d.name.name;
        defining_ = d.name.name;
        written_.clear();
        s.value = expression(d.value);
        defining_.clear();
        names_written_in_[d.name.name] = written_;
        // The parser bounds the nesting of one statement; a chain of lets, each built on the
        // last, is bounded here, before the stages' recursion would overflow the stack.
        if (nesting_depth(s.value, max_definition_depth + 1) > max_definition_depth)
            throw user_error(d.name.offset, "'" + d.name.name + "' is nested more than " +
                                                std::to_string(max_definition_depth) +
                                                " levels deep through the lets it uses");
        later_definitions_.erase(d.name.name);
        definitions_.emplace(d.name.name, s.value);
    }

    void fill(lowered_statement& s, const ast::simplify_request& r) {
        s.kind = request_kind::simplify;
        s.bare = !starts_with_keyword(s.text, "simplify");
        s.value = expression(r.value);
    }

    void fill(lowered_statement& s, const ast::check_request& r) {
        s.kind = request_kind::check;
        s.bare = !starts_with_keyword(s.text, "check");
        s.value = expression(r.lhs);
        s.rhs = expression(r.rhs);
    }

    void fill(lowered_statement& s, const ast::eval_request& r) {
        s.kind = request_kind::eval;
        written_.clear();
        s.value = expression(r.value);
        for (const ast::assignment& a : r.at) {
            const quantum_number* q = out_.numbers.find(a.name.name);
            // Every name of the value was written (here or in a let it uses); one that was
            // written counts even where it cancelled (0*x).
            if (!q || !written_.count(a.name.name))
                throw user_error(a.name.offset, "'" + a.name.name + "' does not occur in the expression to evaluate");
            // A copy: lowering the value can add names to the table and move its entries.
            const symbol assigned = q->symbol;
            for (const value_assignment& earlier : s.at)
                if (earlier.name.is_equal(assigned))
                    throw user_error(a.name.offset, "'" + a.name.name + "' is assigned twice");
            ex v = expression(a.value);
            if (!is_a<numeric>(v) || !ex_to<numeric>(v).is_rational())
                throw user_error(a.value.offset,
                                 "the value of '" + a.name.name + "' must be a number like 1, -2 or 3/2");
            s.at.push_back({assigned, ex_to<numeric>(v), a.value.offset});
        }
        for (const value_assignment& a : s.at) check_admissible(a, s.at, s.value);
    }

    // j >= 0 in (1/2)N, parity as declared, and j - m integer in the value's own columns.
    void check_admissible(const value_assignment& a, const std::vector<value_assignment>& all, const ex& value) {
        const quantum_number& q = out_.numbers.at(a.name);
        const std::string shown = q.name + "=" + to_text(a.value);
        if (!(2 * a.value).is_integer())
            throw user_error(a.offset, shown + " is not admissible: quantum numbers are multiples of 1/2");
        bool integral = a.value.is_integer();
        if (q.parity == qn_parity::integer && !integral)
            throw user_error(a.offset, shown + " is not admissible: '" + q.name + "' is declared 'int'");
        if (q.parity == qn_parity::half_odd && integral)
            throw user_error(a.offset, shown + " is not admissible: '" + q.name + "' is declared 'half'");
        // Only a name that fills a j slot is an angular momentum; one seen only in deltas or as a
        // plain variable (a projection that survived only in delta(m3, m4)) may be negative.
        if (q.role == qn_role::angular && a.value.is_negative())
            throw user_error(a.offset, shown + " is not admissible: an angular momentum is never negative");
        check_columns(a, shown, all, value);
    }

    // The columns (j, m) of this value that hold the name, not the program's first pairing of
    // it: another statement may put the same m under a j of the other parity.  A compound entry
    // is judged by its value (m-1/2 at m=1 is 1/2).  Refused only when no such column admits
    // the value; where one does, the others' selection rules make the symbol 0.
    void check_columns(const value_assignment& a, const std::string& shown, const std::vector<value_assignment>& all,
                       const ex& value) {
        exmap values;
        for (const value_assignment& b : all) values[b.name] = b.value;
        coupling_structure columns;
        for (const_preorder_iterator it = value.preorder_begin(); it != value.preorder_end(); ++it)
            add_structure(*it, columns);
        std::optional<std::string> refusal;
        for (const auto& [j_form, m_form] : columns.projections) {
            if (!m_form.has(a.name)) continue;
            const ex j = j_form.subs(values), m = m_form.subs(values);
            if (!is_a<numeric>(j) || !is_a<numeric>(m)) continue;
            if ((ex_to<numeric>(j) - ex_to<numeric>(m)).is_integer()) return;
            if (refusal) continue;
            refusal = m_form.is_equal(a.name)
                          ? "its angular momentum is " + to_text(ex_to<numeric>(j))
                          : "its entry " + couplet::to_text(m_form) + " = " + to_text(ex_to<numeric>(m)) +
                                " stands under the angular momentum " + to_text(ex_to<numeric>(j));
        }
        if (refusal)
            throw user_error(a.offset, shown + " is not admissible: " + *refusal + ", and j - m must be an integer");
    }

    // ---- expressions ---------------------------------------------------------------------

    ex expression(const ast::expression& e) {
        // A chain of one operator class; '^' chains group to the right.
        if (!e.rest.empty() && e.rest.front().op == '^') {
            std::vector<std::pair<ex, std::size_t>> parts{{operand(e.first), offset_of(e.first)}};
            for (const ast::operation& op : e.rest) parts.emplace_back(operand(op.rhs), offset_of(op.rhs));
            ex value = parts.back().first;
            for (std::size_t i = parts.size() - 1; i-- > 0;)
                value = power_of(parts[i].first, value, parts[i + 1].second);
            return value;
        }
        ex value = operand(e.first);
        for (const ast::operation& op : e.rest) {
            ex rhs = operand(op.rhs);
            switch (op.op) {
                case '+':
                    value = value + rhs;
                    break;
                case '-':
                    value = value - rhs;
                    break;
                case '*':
                    value = value * rhs;
                    break;
                case '/':
                    if (rhs.is_zero()) throw user_error(offset_of(op.rhs), "division by zero");
                    value = value / rhs;
                    break;
            }
        }
        return value;
    }

    ex power_of(const ex& base, const ex& exponent, std::size_t exponent_offset) {
        if (base.is_equal(-1)) {
            if (!is_linear_form(exponent))
                throw user_error(exponent_offset,
                                 "the exponent of (-1) must be linear in the quantum "
                                 "numbers, like j1+j2-m or 2*j");
            return make_phase(exponent);
        }
        if (!is_a<numeric>(exponent) || !ex_to<numeric>(exponent).is_rational())
            throw user_error(exponent_offset,
                             "only (-1) may be raised to a symbolic power; for a "
                             "phase write (-1)^(...) with the parentheses");
        numeric n = ex_to<numeric>(exponent);
        if (abs(n) > max_integer_exponent)
            throw user_error(exponent_offset,
                             "exponent too large (at most " + std::to_string(max_integer_exponent) + " in size)");
        if (base.is_zero() && !n.is_pos_integer()) throw user_error(exponent_offset, "division by zero");
        if (is_a<numeric>(base) && ex_to<numeric>(base).is_negative() && !n.is_integer())
            throw user_error(exponent_offset, "a fractional power of a negative number is not real");
        // Estimated before it is built: chained powers such as ((3^1000)^1000)^1000 would
        // otherwise take memory and time without bound.
        if (is_a<numeric>(base)) {
            const double digits = static_cast<double>(digits_of(ex_to<numeric>(base))) * abs(n).to_double();
            if (digits > max_computed_digits)
                throw user_error(exponent_offset, "this power would be a number of about " +
                                                      std::to_string(static_cast<long long>(digits)) +
                                                      " digits (at most " + std::to_string(max_computed_digits) + ")");
        }
        return pow(base, exponent);
    }

    // The depth of e's tree, each shared subexpression measured once, and no deeper than
    // `limit` (a deeper tree reports limit).
    static std::size_t nesting_depth(const ex& e, std::size_t limit) {
        std::map<const basic*, std::size_t> measured;
        std::function<std::size_t(const ex&, std::size_t)> depth = [&](const ex& x, std::size_t level) {
            if (x.nops() == 0 || level >= limit) return level;
            const basic* key = &ex_to<basic>(x);
            if (auto it = measured.find(key); it != measured.end()) return level + it->second;
            std::size_t deepest = level;
            for (std::size_t i = 0; i < x.nops() && deepest < limit; ++i)
                deepest = std::max(deepest, depth(x.op(i), level + 1));
            if (deepest < limit) measured[key] = deepest - level;
            return deepest;
        };
        return depth(e, 0);
    }

    // Decimal digits of the larger of numerator and denominator.
    static std::size_t digits_of(const numeric& q) {
        auto length = [](const numeric& z) {
            std::ostringstream os;
            os << abs(z);
            return os.str().size();
        };
        return std::max(length(q.numer()), length(q.denom()));
    }

    ex operand(const ast::operand& o) {
        return boost::apply_visitor([&](const auto& node) { return this->node(node); }, o);
    }

    ex node(const ast::nil&) { return 0; }
    ex node(const ast::expression& e) { return expression(e); }
    ex node(const ast::negated& n) { return -operand(n.value); }

    ex node(const ast::number& n) {
        if (n.digits.size() > max_number_digits)
            throw user_error(n.offset, "number too long (at most " + std::to_string(max_number_digits) + " digits)");
        return numeric(n.digits.c_str());
    }

    ex node(const ast::identifier& id) {
        if (auto it = failed_definitions_.find(id.name); it != failed_definitions_.end())
            throw user_error(id.offset, "'" + id.name + "' has no value: its definition at " + where(it->second) +
                                            " could not be read");
        if (id.name == defining_)
            throw user_error(id.offset,
                             "'" + id.name + "' is used in its own definition; a let cannot refer to itself");
        if (auto it = definitions_.find(id.name); it != definitions_.end()) {
            const auto& inside = names_written_in_[id.name];
            written_.insert(inside.begin(), inside.end());
            return it->second;
        }
        written_.insert(id.name);
        if (auto it = later_definitions_.find(id.name); it != later_definitions_.end())
            throw user_error(id.offset, "'" + id.name + "' is used before its definition at " + where(it->second));
        return out_.numbers.symbol_for(id.name, id.offset);
    }

    ex node(const ast::call& c) {
        const std::string& f = c.function.name;
        auto need = [&](std::size_t n) {
            if (c.args.size() != n)
                throw user_error(c.function.offset, f + " takes " + std::to_string(n) + " argument" +
                                                        (n == 1 ? "" : "s") + ", found " +
                                                        std::to_string(c.args.size()));
        };
        if (f == "sqrt") {
            need(1);
            ex x = expression(c.args[0]);
            if (is_a<numeric>(x) && ex_to<numeric>(x).is_negative())
                throw user_error(c.args[0].offset, "sqrt of a negative number");
            return sqrt(x);
        }
        if (f == "delta") {
            need(2);
            return kdelta(slot(c.args[0], qn_role::unknown), slot(c.args[1], qn_role::unknown));
        }
        if (f == "tri") {
            need(3);
            return triangle(slot(c.args[0], qn_role::angular), slot(c.args[1], qn_role::angular),
                            slot(c.args[2], qn_role::angular));
        }
        if (f == "proj") {
            need(2);
            const ex j = slot(c.args[0], qn_role::angular);
            return projection_of(j, projection_slot(c.args[1], j));
        }
        throw user_error(c.function.offset,
                         "unknown function '" + f + "'; the functions are sqrt, delta, tri and proj");
    }

    ex node(const ast::bracket_symbol& b) {
        const std::size_t want_rows = b.kind == "9j" ? 3 : 2;
        const char* layout = b.kind == "3j"   ? "3j(j1, j2, j3; m1, m2, m3)"
                             : b.kind == "6j" ? "6j{a, b, c; d, e, f}"
                                              : "9j{a, b, c; d, e, f; g, h, i}";
        if (b.rows.size() != want_rows)
            throw user_error(b.offset, "a " + b.kind + " symbol has " + std::to_string(want_rows) +
                                           " rows of 3 entries separated by ';', like " + layout + "; found " +
                                           std::to_string(b.rows.size()) + " row" + (b.rows.size() == 1 ? "" : "s"));
        for (std::size_t r = 0; r < b.rows.size(); ++r)
            if (b.rows[r].size() != 3)
                throw user_error(b.rows[r].front().offset, "row " + std::to_string(r + 1) + " of this " + b.kind +
                                                               " has " + std::to_string(b.rows[r].size()) +
                                                               " entries; every row has 3, like " + layout);
        if (b.kind == "3j") {
            exvector j, m;
            for (const auto& e : b.rows[0]) j.push_back(slot(e, qn_role::angular));
            for (std::size_t k = 0; k < 3; ++k) m.push_back(projection_slot(b.rows[1][k], j[k]));
            return wigner3j(j[0], j[1], j[2], m[0], m[1], m[2]);
        }
        exvector a;
        for (const auto& row : b.rows)
            for (const auto& e : row) a.push_back(slot(e, qn_role::angular));
        if (b.kind == "6j") return wigner6j(a[0], a[1], a[2], a[3], a[4], a[5]);
        return wigner9j(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8]);
    }

    ex node(const ast::clebsch_gordan& c) {
        ex j1 = slot(c.j1, qn_role::angular), j2 = slot(c.j2, qn_role::angular), j = slot(c.j, qn_role::angular);
        ex m1 = projection_slot(c.m1, j1), m2 = projection_slot(c.m2, j2), m = projection_slot(c.m, j);
        return clebsch(j1, m1, j2, m2, j, m);
    }

    // ---- recoupling coefficients ---------------------------------------------------------

    // <bra; J | ket; J> is held whole (the simplifier reduces it by its trees); every other
    // use takes its definition, with_definitions below.
    ex node(const ast::recoupling& r) {
        coupling_tree bra = side(r.bra), ket = side(r.ket);
        if (!bra.label.is_equal(ket.label))
            throw user_error(offset_of(r.ket.total),
                             "both sides of a recoupling coefficient couple to the same total; found " +
                                 couplet::to_text(bra.label) + " on the left and " + couplet::to_text(ket.label) +
                                 " on the right");
        const auto [bra_leaves, ket_leaves] = checked_leaves(bra, ket, r.offset, "a recoupling coefficient",
                                                             "on this side of the recoupling coefficient");
        refuse_unmatched_leaves(bra_leaves, ket_leaves, "left");
        refuse_unmatched_leaves(ket_leaves, bra_leaves, "right");
        return recoupling(as_held_tree(bra), as_held_tree(ket));
    }

    // ---- tensor operators -----------------------------------------------------------------

    ex node(const ast::reduced_element& r) {
        return make_reduced_element(r.op.name.name, rank(r.op), slot(r.bra, qn_role::angular),
                                    slot(r.ket, qn_role::angular));
    }

    // An operator's rank; the angular momentum J (model/tensor_operator.hpp) is a vector.
    ex rank(const ast::tensor_operator& op) {
        const ex k = slot(op.rank, qn_role::angular);
        if (is_angular_momentum(op.name.name) && k != 1)
            throw user_error(op.rank.offset, "J is the angular momentum, a tensor of rank 1: J^(1)");
        if (is_racah_harmonic(op.name.name))
            integer_rank(k, op.rank.offset, "C^(k) is a spherical harmonic, of integer rank");
        return k;
    }

    // Held whole like a recoupling coefficient; every other use takes the Wigner-Eckart form.
    ex node(const ast::matrix_element& e) {
        const ex j = slot(e.j, qn_role::angular), k = rank(e.op), j_ket = slot(e.j_ket, qn_role::angular);
        const ex m = projection_slot(e.m, j), q = projection_slot(e.component, k),
                 m_ket = projection_slot(e.m_ket, j_ket);
        return make_matrix_element(e.op.name.name, k, q, j, m, j_ket, m_ket);
    }

    // Held with their expansions (model/coupled_element.hpp), whose new projections are
    // named like a recoupling coefficient's.
    ex node(const ast::coupled_matrix_element& e) {
        const auto [bra, ket] = coupled_states(e.bra, e.ket);
        const auto [op, q] = element_operator(e.op, leaves_of(bra).size(), true);
        const ex m_bra = projection_slot(e.m, bra.label), m_ket = projection_slot(e.m_ket, ket.label);
        return make_coupled_element(op, q, bra, m_bra, ket, m_ket, projections_for(e.offset),
                                    intermediates_for(e.offset));
    }

    ex node(const ast::coupled_reduced_element& e) {
        const auto [bra, ket] = coupled_states(e.bra, e.ket);
        const ex op = element_operator(e.op, leaves_of(bra).size(), false).first;
        return make_coupled_reduced_element(op, bra, ket, projections_for(e.offset), intermediates_for(e.offset));
    }

    std::pair<coupling_tree, coupling_tree> coupled_states(const ast::coupled_pair& b, const ast::coupled_pair& k) {
        coupling_tree bra = tree(b), ket = tree(k);
        if (!same_shape(bra, ket))
            throw user_error(k.offset,
                             "the two states of a matrix element are coupled in the same order, leaf for "
                             "leaf, so that an operator on one part is the identity on the others");
        checked_leaves(bra, ket, b.offset, "a coupled state", "in this coupled state");
        return {bra, ket};
    }

    // The operator of an element between coupled states (model/composite_operator.hpp) and,
    // for a matrix element, its component: written on the whole operator, never on a factor of
    // a product, and absent from a scalar product, whose one component is 0.
    std::pair<ex, ex> element_operator(const std::vector<ast::operator_factor>& factors, std::size_t leaves,
                                       bool matrix) {
        if (factors.size() > 2)
            throw user_error(offset_of(factors[2]),
                             "a scalar product joins two operators; couple more first, as in "
                             "[T^(k1)(1) x U^(k2)(2)]^(k) . V^(k)(3)");
        if (factors.size() == 2) {
            for (const ast::operator_factor& f : factors)
                if (component_of(f))
                    throw user_error(offset_of(*component_of(f)),
                                     "a scalar product has the one component 0 and is written without one");
            const ex a = operator_expression(factors[0], leaves), b = operator_expression(factors[1], leaves);
            if (!(rank_of(a) - rank_of(b)).expand().is_zero())
                throw user_error(offset_of(factors[1]), "a scalar product joins two operators of one rank; found " +
                                                            couplet::to_text(rank_of(a)) + " and " +
                                                            couplet::to_text(rank_of(b)));
            integer_rank(rank_of(a), offset_of(factors[0]), "a scalar product joins operators of integer rank");
            return {make_scalar_product(a, b), 0};
        }
        const ast::operator_factor& f = factors[0];
        const ex op = operator_expression(f, leaves);
        const auto& component = component_of(f);
        if (matrix && !component)
            throw user_error(offset_of(f),
                             "a matrix element names the operator's component, as in T^(k)_q(1) "
                             "or [T^(k1)(1) x U^(k2)(2)]^(k)_q");
        if (!matrix && component)
            throw user_error(offset_of(*component),
                             "a reduced matrix element has no component: "
                             "<(j1, j2) J || T^(k)(1) || (j1', j2') J'>");
        return {op, matrix ? projection_slot(*component, rank_of(op)) : ex(0)};
    }

    // Some ranks are integers by definition: a scalar product's, A . B = sum_q (-1)^q A_q B_-q
    // (Edmonds 1957, sec. 5.1), and C^(k)'s.  A rank that is a name is then an integer from
    // here on, as if declared 'int'.
    void integer_rank(const ex& rank, std::size_t offset, const std::string& why) {
        const bool half = is_a<numeric>(rank)  ? !ex_to<numeric>(rank).is_integer()
                          : is_a<symbol>(rank) ? out_.numbers.at(ex_to<symbol>(rank)).parity == qn_parity::half_odd
                                               : false;
        if (half) throw user_error(offset, why + "; " + couplet::to_text(rank) + " is half-odd");
        if (is_a<symbol>(rank)) out_.numbers.declare_parity(ex_to<symbol>(rank).get_name(), qn_parity::integer, offset);
    }

    // The factors below the whole operator carry no component of their own.
    ex operator_expression(const ast::operator_factor& f, std::size_t leaves, bool whole = true) {
        if (!whole && component_of(f))
            throw user_error(offset_of(*component_of(f)),
                             "the component goes on the whole operator, as in [T^(k1)(1) x U^(k2)(2)]^(k)_q");
        if (const auto* a = boost::get<ast::acted_operator>(&f.get()))
            return make_acting_on(a->op.name.name, rank(a->op), part_number(a->part, leaves));
        const ast::operator_product& p = boost::get<ast::x3::forward_ast<ast::operator_product>>(f.get()).get();
        return make_tensor_product(operator_expression(p.left, leaves, false),
                                   operator_expression(p.right, leaves, false), slot(p.rank, qn_role::angular));
    }

    static std::size_t part_number(const ast::number& part, std::size_t leaves) {
        // At most two digits: max_coupled_leaves bounds the leaves, and stoul is not handed an overflow.
        const std::size_t p = part.digits.size() <= 2 ? std::stoul(part.digits) : 0;
        if (p < 1 || p > leaves)
            throw user_error(part.offset, "the operator acts on one part of the state: a number from 1 to " +
                                              std::to_string(leaves) + ", its leaves counted from the left");
        return p;
    }

    // The j'' of the states between two operators on one part, named after that part's j.
    angular_source intermediates_for(std::size_t offset) {
        return [this, offset](const ex& like) {
            std::string name = (is_a<symbol>(like) ? ex_to<symbol>(like).get_name() : std::string("j")) + "''";
            while (words_of_input().count(name) || projections_of_statement_.count(name) || out_.numbers.find(name))
                name += "'";
            projections_of_statement_.insert(name);
            const symbol j = out_.numbers.symbol_for(name, offset);
            out_.numbers.assign_role(j, qn_role::angular, offset);
            return ex(j);
        };
    }

    projection_source projections_for(std::size_t offset) {
        return [this, offset](const ex& label, bool ket_side) {
            return new_projection(label, ket_side ? "'" : "", offset);
        };
    }

    // Each recoupling coefficient replaced by its definition (model/coupling_tree.hpp), over
    // projections named after what they project: m + the leaf's or label's name (mj1, mJ),
    // primed on the right side and until the name is new to the input and to the statement.
    ex with_definitions(const ex& e, std::size_t offset) {
        return rewritten(e, [&](const ex& part) -> std::optional<ex> {
            if (is_recoupling(part)) return definition_of(part, offset);
            if (is_matrix_element(part)) return wigner_eckart_form(part);
            if (is_coupled_element(part) || is_coupled_reduced_element(part))
                return with_definitions(expansion_of(part), offset);
            return std::nullopt;
        });
    }

    ex definition_of(const ex& held, std::size_t offset) {
        return recoupling_definition(tree_from_held(held.op(0)), tree_from_held(held.op(1)), projections_for(offset));
    }

    coupling_tree side(const ast::coupling_side& s) {
        coupling_tree out;
        out.offset = s.offset;
        out.parts = {tree(s.left), tree(s.right)};
        out.label = slot(s.total, qn_role::angular);
        return out;
    }

    coupling_tree tree(const ast::coupling_tree& t) {
        coupling_tree out;
        if (const auto* leaf = boost::get<ast::identifier>(&t.get())) {
            out.offset = leaf->offset;
            out.label = slot(ast::operand(*leaf), qn_role::angular);
            return out;
        }
        return tree(boost::get<ast::x3::forward_ast<ast::coupled_pair>>(t.get()).get());
    }

    coupling_tree tree(const ast::coupled_pair& pair) {
        coupling_tree out;
        out.offset = pair.offset;
        out.parts = {tree(pair.left), tree(pair.right)};
        out.label = slot(pair.label, qn_role::angular);
        return out;
    }

    using leaf_list = std::vector<const coupling_tree*>;

    // The leaves of both sides: at most max_coupled_leaves, none coupled twice on one side.
    static std::pair<leaf_list, leaf_list> checked_leaves(const coupling_tree& bra, const coupling_tree& ket,
                                                          std::size_t offset, const std::string& what,
                                                          const std::string& where) {
        std::pair<leaf_list, leaf_list> out{leaves_of(bra), leaves_of(ket)};
        if (out.first.size() > max_coupled_leaves)
            throw user_error(offset, what + " couples at most " + std::to_string(max_coupled_leaves) +
                                         " angular momenta; this one couples " + std::to_string(out.first.size()));
        refuse_repeated_leaves(out.first, where);
        refuse_repeated_leaves(out.second, where);
        return out;
    }

    static void refuse_repeated_leaves(const leaf_list& leaves, const std::string& where) {
        std::set<std::string> seen;
        for (const coupling_tree* leaf : leaves)
            if (!seen.insert(couplet::to_text(leaf->label)).second)
                throw user_error(leaf->offset, "'" + couplet::to_text(leaf->label) + "' is coupled twice " + where);
    }

    static void refuse_unmatched_leaves(const std::vector<const coupling_tree*>& these,
                                        const std::vector<const coupling_tree*>& others, const char* side_name) {
        for (const coupling_tree* leaf : these) {
            const bool matched = std::any_of(others.begin(), others.end(), [&](const coupling_tree* other) {
                return other->label.is_equal(leaf->label);
            });
            if (!matched)
                throw user_error(leaf->offset, "'" + couplet::to_text(leaf->label) + "' is coupled on the " +
                                                   side_name +
                                                   " side only; both sides of a recoupling coefficient couple "
                                                   "the same angular momenta");
        }
    }

    // A name generated for an earlier statement is reused: the projections are summed over.
    ex new_projection(const ex& label, const std::string& mark, std::size_t offset) {
        std::string name = "m" + (is_a<symbol>(label) ? ex_to<symbol>(label).get_name() : std::string("u")) + mark;
        while (words_of_input().count(name) || projections_of_statement_.count(name) ||
               (out_.numbers.find(name) && !generated_projections_.count(name)))
            name += "'";
        projections_of_statement_.insert(name);
        generated_projections_.insert(name);
        const symbol m = out_.numbers.symbol_for(name, offset);
        out_.numbers.assign_role(m, qn_role::projection, offset);
        out_.numbers.set_owner_if_unset(m, label);
        return m;
    }

    const std::set<std::string>& words_of_input() {
        if (!input_words_) {
            input_words_.emplace();
            static const std::regex word("[A-Za-z_][A-Za-z0-9_]*'*");
            const std::string& text = src_.text();
            for (auto it = std::sregex_iterator(text.begin(), text.end(), word); it != std::sregex_iterator(); ++it)
                input_words_->insert(it->str());
        }
        return *input_words_;
    }

    ex node(const ast::sum& s) {
        lst indices;
        for (const ast::identifier& i : s.indices) {
            if (definitions_.count(i.name) || later_definitions_.count(i.name))
                throw user_error(i.offset, "'" + i.name +
                                               "' is defined by 'let' and cannot be a "
                                               "summation index");
            symbol sym = out_.numbers.symbol_for(i.name, i.offset);
            for (const ex& earlier : indices)
                if (earlier.is_equal(sym))
                    throw user_error(i.offset, "'" + i.name + "' is listed twice as a summation index");
            indices.append(sym);
        }
        ex body = expression(s.body);
        for (std::size_t k = 0; k < indices.nops(); ++k)
            if (!body.has(indices.op(k)))
                throw user_error(s.indices[k].offset,
                                 "summation index '" + s.indices[k].name + "' does not occur in the body of the sum");
        return make_sum(body, indices);
    }

    // ---- slots of coupling symbols -------------------------------------------------------

    template <typename Node>
    ex slot(const Node& node, qn_role role) {
        ex value = lower_any(node);
        std::size_t at = offset_of_node(node);
        if (!is_linear_form(value))
            throw user_error(at,
                             "entries of coupling symbols must be linear in the quantum numbers, "
                             "like j1+1/2, -m or J-1");
        if (role != qn_role::unknown)
            for (const symbol& s : symbols_in(value)) out_.numbers.assign_role(s, role, at);
        return value;
    }

    template <typename Node>
    ex projection_slot(const Node& node, const ex& owner) {
        ex value = slot(node, qn_role::projection);
        auto syms = symbols_in(value);
        if (syms.size() == 1) out_.numbers.set_owner_if_unset(*syms.begin(), owner);
        return value;
    }

    ex lower_any(const ast::expression& e) { return expression(e); }
    ex lower_any(const ast::operand& o) { return operand(o); }
    static std::size_t offset_of_node(const ast::expression& e) { return e.offset; }
    static std::size_t offset_of_node(const ast::operand& o) { return offset_of(o); }

    std::string where(std::size_t offset) const {
        auto p = src_.locate(offset);
        return std::to_string(p.line) + ":" + std::to_string(p.column);
    }

    static bool starts_with_keyword(const std::string& text, const std::string& keyword) {
        return text.compare(0, keyword.size(), keyword) == 0 &&
               (text.size() == keyword.size() || !(std::isalnum(static_cast<unsigned char>(text[keyword.size()])) ||
                                                   text[keyword.size()] == '_' || text[keyword.size()] == '\''));
    }

    static std::string to_text(const numeric& n) {
        std::ostringstream os;
        os << n;
        return os.str();
    }

    const source_file& src_;
    lowered_program& out_;
    std::map<std::string, ex> definitions_;
    std::map<std::string, std::size_t> later_definitions_;
    std::string defining_;                                   // the name of the let being lowered
    std::map<std::string, std::size_t> failed_definitions_;  // lets that could not be read
    // The names written in the expression being lowered (through the lets it uses), and in
    // each let's definition.
    std::set<std::string> written_;
    std::map<std::string, std::set<std::string>> names_written_in_;
    std::optional<std::set<std::string>> input_words_;  // every name-like word of the source
    std::set<std::string> generated_projections_, projections_of_statement_;
};

}  // namespace

namespace {

// Two names that LaTeX would print alike (j_1 and j1, x_ and x) would make a derivation or a
// counterexample unreadable ("x = x"); the second one is refused where it first appears.
void refuse_look_alikes(const quantum_numbers& numbers) {
    std::map<std::string, const quantum_number*> printed;
    std::vector<const quantum_number*> in_order;
    for (const quantum_number& q : numbers.all()) in_order.push_back(&q);
    std::sort(in_order.begin(), in_order.end(),
              [](const quantum_number* a, const quantum_number* b) { return a->first_offset < b->first_offset; });
    for (const quantum_number* q : in_order) {
        auto [it, fresh] = printed.emplace(latex_identifier(q->name), q);
        if (!fresh)
            throw user_error(q->first_offset, "'" + q->name + "' and '" + it->second->name +
                                                  "' print alike in LaTeX (" + it->first + "); rename one of them");
    }
}

}  // namespace

// The name a statement that could not be parsed would have defined, if it reads `let NAME`.
std::optional<std::pair<std::string, std::size_t>> let_name_of(const source_file& src, std::size_t offset) {
    static const std::regex let(R"(^\s*let\s+([A-Za-z_][A-Za-z0-9_']*))");
    const std::string& text = src.text();
    const std::size_t end = std::min(text.size(), text.find('\n', offset));
    std::smatch m;
    const std::string line = text.substr(offset, end - offset);
    if (!std::regex_search(line, m, let)) return std::nullopt;
    return std::make_pair(m[1].str(), offset + static_cast<std::size_t>(m.position(1)));
}

lowered_program lower_program(const source_file& src, const std::vector<parsed_statement>& parsed, bool lenient,
                              const std::vector<std::pair<std::string, std::size_t>>& lost_lets) {
    lowered_program out;
    lowering l(src, out);
    for (const auto& [name, offset] : lost_lets) l.failed_definition(name, offset);
    l.collect_definitions(parsed);
    // Lenient: an error ends its statement only; a let that fails leaves its name without a value.
    auto attempt = [&](const auto& step, const ast::definition* defining) {
        try {
            step();
        } catch (const user_error& e) {
            if (!lenient) throw;
            out.errors.push_back(e);
            if (defining) l.failed_definition(defining->name.name, defining->name.offset);
        }
    };
    for (const parsed_statement& p : parsed)
        attempt([&] { out.statements.push_back(l.statement(p)); }, boost::get<ast::definition>(&p.tree));
    attempt([&] { refuse_look_alikes(out.numbers); }, nullptr);
    return out;
}

lowered_program read_program(const source_file& src, bool lenient) {
    if (!lenient) return lower_program(src, parse_program(src));
    std::vector<unparsed_statement> unparsed;
    std::vector<parsed_statement> parsed = parse_program(src, &unparsed);
    // A let that did not parse still names something: later uses must not take it for a new
    // quantum number.  Found by its statement's first words.
    std::vector<std::pair<std::string, std::size_t>> lost_lets;
    for (const unparsed_statement& u : unparsed)
        if (auto name = let_name_of(src, u.span.begin)) lost_lets.push_back(*name);
    lowered_program out = lower_program(src, parsed, true, lost_lets);
    for (const unparsed_statement& u : unparsed) out.errors.push_back(u.error);
    std::stable_sort(out.errors.begin(), out.errors.end(),
                     [](const user_error& a, const user_error& b) { return a.offset() < b.offset(); });
    return out;
}

}  // namespace couplet
