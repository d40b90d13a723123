#include "model/symbols.hpp"

#include "model/structure.hpp"

#include "model/readable_order.hpp"

#include <cln/rational.h>
#include <algorithm>

namespace couplet {

using namespace GiNaC;

namespace {

bool is_num(const ex& e) { return is_a<numeric>(e); }
numeric num(const ex& e) { return ex_to<numeric>(e); }

// Known-false numeric selection rules make the symbol 0; anything symbolic is kept.
// Not one of 0, 1/2, 1, ...: no angular momentum.
bool numeric_angular_fails(const numeric& v) { return v.is_negative() || !(2 * v).is_integer(); }

bool numeric_triangle_fails(const ex& a, const ex& b, const ex& c) {
    if (!is_num(a) || !is_num(b) || !is_num(c)) return false;
    numeric x = num(a), y = num(b), z = num(c);
    if (!(x + y + z).is_integer()) return true;
    for (const numeric& v : {x, y, z})
        if (numeric_angular_fails(v)) return true;
    return z < abs(x - y) || z > x + y;
}

bool numeric_projection_fails(const ex& j, const ex& m) {
    if (!is_num(j) || !is_num(m)) return false;
    numeric jj = num(j), mm = num(m);
    return !(jj - mm).is_integer() || abs(mm) > jj;
}

// A symbol (held, so that building it does not recurse into eval) is 0 when any of its
// selection rules already fails with numbers; coupling_structure lists the rules.
ex zero_or_held(const ex& held) {
    coupling_structure rules;
    add_structure(held, rules);
    for (const auto& t : rules.triads)
        if (numeric_triangle_fails(t[0], t[1], t[2])) return 0;
    for (const auto& [j, m] : rules.projections)
        if (numeric_projection_fails(j, m)) return 0;
    for (const ex& z : rules.zeros) {
        ex v = z.expand();
        if (is_num(v) && !v.is_zero()) return 0;
    }
    return held;
}

ex wigner3j_eval(const ex& j1, const ex& j2, const ex& j3, const ex& m1, const ex& m2, const ex& m3) {
    return zero_or_held(wigner3j(j1, j2, j3, m1, m2, m3).hold());
}

ex clebsch_eval(const ex& j1, const ex& m1, const ex& j2, const ex& m2, const ex& j, const ex& m) {
    return zero_or_held(clebsch(j1, m1, j2, m2, j, m).hold());
}

ex wigner6j_eval(const ex& a, const ex& b, const ex& c, const ex& d, const ex& e, const ex& f) {
    return zero_or_held(wigner6j(a, b, c, d, e, f).hold());
}

ex wigner9j_eval(const ex& a, const ex& b, const ex& c, const ex& d, const ex& e, const ex& f, const ex& g, const ex& h,
                 const ex& i) {
    return zero_or_held(wigner9j(a, b, c, d, e, f, g, h, i).hold());
}

ex kdelta_eval(const ex& x, const ex& y) {
    ex diff = (x - y).expand();
    if (diff.is_zero()) return 1;
    if (is_num(diff)) return 0;
    // delta is symmetric: one argument order, chosen by the printed forms (never by GiNaC's
    // hash order), so equal deltas print and collect alike.
    if (readable_less(y, x)) return kdelta(y, x).hold();
    return kdelta(x, y).hold();
}

ex triangle_eval(const ex& a, const ex& b, const ex& c) {
    if (is_num(a) && is_num(b) && is_num(c)) return numeric_triangle_fails(a, b, c) ? 0 : 1;
    // (x, y, 0) is a triad exactly when x = y, for angular momenta x, y >= 0 (then x + y = 2x is
    // an integer).  Only bare names: an entry such as j - 1 may be negative.
    const ex* entries[] = {&a, &b, &c};
    for (int z = 0; z < 3; ++z) {
        if (!entries[z]->is_zero()) continue;
        const ex &x = *entries[(z + 1) % 3], &y = *entries[(z + 2) % 3];
        if (is_a<symbol>(x) && is_a<symbol>(y)) return kdelta(x, y);
    }
    return triangle(a, b, c).hold();
}

ex projection_of_eval(const ex& j, const ex& m) {
    if (is_num(j) && is_num(m)) return numeric_projection_fails(j, m) || numeric_angular_fails(num(j)) ? 0 : 1;
    return projection_of(j, m).hold();
}

}  // namespace

REGISTER_FUNCTION(wigner3j, eval_func(wigner3j_eval))
REGISTER_FUNCTION(wigner6j, eval_func(wigner6j_eval))
REGISTER_FUNCTION(wigner9j, eval_func(wigner9j_eval))
REGISTER_FUNCTION(clebsch, eval_func(clebsch_eval))
REGISTER_FUNCTION(kdelta, eval_func(kdelta_eval))
REGISTER_FUNCTION(triangle, eval_func(triangle_eval))
REGISTER_FUNCTION(projection_of, eval_func(projection_of_eval))

symbol_kind kind_of(const ex& e) {
    if (!is_a<function>(e)) return symbol_kind::none;
    unsigned s = ex_to<function>(e).get_serial();
    if (s == wigner3j_SERIAL::serial) return symbol_kind::threej;
    if (s == wigner6j_SERIAL::serial) return symbol_kind::sixj;
    if (s == wigner9j_SERIAL::serial) return symbol_kind::ninej;
    if (s == clebsch_SERIAL::serial) return symbol_kind::clebsch_gordan;
    if (s == kdelta_SERIAL::serial) return symbol_kind::delta;
    if (s == triangle_SERIAL::serial) return symbol_kind::triangle;
    if (s == projection_of_SERIAL::serial) return symbol_kind::projection;
    return symbol_kind::none;
}

// ---- phase ---------------------------------------------------------------------------------

GINAC_IMPLEMENT_REGISTERED_CLASS_OPT(phase_factor, basic, print_func<print_context>(&phase_factor::do_print))

phase_factor::phase_factor() {}
phase_factor::phase_factor(const ex& exponent) : x_(exponent) {}

int phase_factor::compare_same_type(const basic& other) const {
    return x_.compare(static_cast<const phase_factor&>(other).x_);
}

ex& phase_factor::let_op(size_t) {
    ensure_if_modifiable();
    return x_;
}

ex phase_factor::eval() const {
    ex x = x_.expand();
    if (is_num(x)) {
        numeric n = num(x);
        if (n.is_integer()) return n.is_even() ? 1 : -1;
        return this->hold();  // (-1)^(1/2) is not a phase of this domain; evaluation reports it
    }
    // Reduce the constant term into (-1, 1]: (-1)^(j+3) == (-1)^(j+1), (-1)^(s+3/2) == (-1)^(s-1/2).
    if (is_a<add>(x)) {
        ex constant = 0, rest = 0;
        for (const ex& t : x) (is_num(t) ? constant : rest) += t;
        numeric c = num(constant);
        // c - 2*ceil((c-1)/2) lies in (-1, 1].
        numeric reduced = c - 2 * numeric(cln::ceiling1(cln::the<cln::cl_RA>(((c - 1) / 2).to_cl_N())));
        if (reduced != c) return dynallocate<phase_factor>(rest + reduced);
    }
    return this->hold();
}

void phase_factor::do_print(const print_context& c, unsigned) const {
    c.s << "(-1)^(";
    x_.print(c);
    c.s << ")";
}

ex make_phase(const ex& exponent) { return phase_factor(exponent).eval(); }

// ---- index_sum -----------------------------------------------------------------------------

GINAC_IMPLEMENT_REGISTERED_CLASS_OPT(index_sum, basic, print_func<print_context>(&index_sum::do_print))

index_sum::index_sum() {}
index_sum::index_sum(const ex& body, const lst& indices) : body_(body), indices_(indices) {}

int index_sum::compare_same_type(const basic& other) const {
    const auto& o = static_cast<const index_sum&>(other);
    int c = indices_.compare(o.indices_);
    return c != 0 ? c : body_.compare(o.body_);
}

ex& index_sum::let_op(size_t) {
    ensure_if_modifiable();
    return body_;
}

ex index_sum::subs(const exmap& m, unsigned options) const {
    exmap free_part;
    for (const auto& entry : m) {
        const ex& from = entry.first;
        bool bound = std::any_of(indices_.begin(), indices_.end(), [&](const ex& i) { return from.is_equal(i); });
        if (!bound) free_part.insert(entry);
    }
    ex b = body_.subs(free_part, options);
    if (b.is_equal(body_)) return *this;
    return make_sum(b, indices_);
}

ex index_sum::eval() const {
    if (body_.is_zero()) return 0;
    return this->hold();
}

void index_sum::do_print(const print_context& c, unsigned) const {
    c.s << "sum(";
    for (size_t i = 0; i < indices_.nops(); ++i) {
        if (i) c.s << ", ";
        indices_.op(i).print(c);
    }
    c.s << " : ";
    body_.print(c);
    c.s << ")";
}

ex make_sum(const ex& body, const lst& indices) { return index_sum(body, indices).eval(); }

}  // namespace couplet
