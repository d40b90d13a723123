#include "canonical/phase_reduction.hpp"

#include <cln/rational_io.h>

#include <map>
#include <set>
#include <sstream>

#include <algorithm>
#include "model/normalize.hpp"
#include "model/readable_order.hpp"
#include "model/rewrite.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"
#include "phase/context.hpp"
#include "print/print.hpp"

namespace couplet {

using namespace GiNaC;

namespace {
cln::cl_RA rational_of(const ex& n) {
    if (!is_a<numeric>(n) || !ex_to<numeric>(n).is_rational()) throw std::invalid_argument("not rational");
    return cln::the<cln::cl_RA>(ex_to<numeric>(n).to_cl_N());
}
}  // namespace

phase::linear_form linear_form_of(const ex& e) {
    phase::linear_form f;
    ex x = e.expand();
    auto take = [&](const ex& t) {
        if (is_a<numeric>(t)) {
            f += phase::linear_form(rational_of(t));
        } else if (is_a<symbol>(t)) {
            f += phase::linear_form::variable(ex_to<symbol>(t).get_name());
        } else if (is_a<mul>(t) && t.nops() == 2 && (is_a<symbol>(t.op(0)) || is_a<symbol>(t.op(1)))) {
            const ex& s = is_a<symbol>(t.op(0)) ? t.op(0) : t.op(1);
            const ex& c = is_a<symbol>(t.op(0)) ? t.op(1) : t.op(0);
            f += phase::linear_form::variable(ex_to<symbol>(s).get_name(), rational_of(c));
        } else {
            throw std::invalid_argument("'" + to_text(e) + "' is not a linear form");
        }
    };
    if (is_a<add>(x))
        for (const ex& t : x) take(t);
    else
        take(x);
    return f;
}

void declare_in(phase::context& ctx, const quantum_number& q) {
    if (q.role == qn_role::projection) {
        // Projections take any sign, so they enter as unconstrained half-integers.
        ctx.declare_angular(q.name, phase::parity::unknown);
        const phase::linear_form v = phase::linear_form::variable(q.name);
        if (q.parity == qn_parity::integer) ctx.add_integer(v);
        if (q.parity == qn_parity::half_odd) ctx.add_integer(v + phase::linear_form(cln::cl_RA(1) / 2));
        return;
    }
    ctx.declare_angular(q.name, q.parity == qn_parity::integer    ? phase::parity::integer
                                : q.parity == qn_parity::half_odd ? phase::parity::half_odd
                                                                  : phase::parity::unknown);
}

namespace {

// Names back to symbols: the program's, else the expression's own.  A summation index that a
// stage made (x1, ...) is in no table, and a new symbol of the same name would not be bound by
// its sum.
ex to_ex(const phase::linear_form& f, const quantum_numbers& numbers, const std::map<std::string, symbol>& own) {
    ex out = numeric(cln::cl_N(f.constant()));
    for (const auto& [name, c] : f.coefficients()) {
        const quantum_number* q = numbers.find(name);
        auto it = own.find(name);
        out += numeric(cln::cl_N(c)) * (q ? ex(q->symbol) : it != own.end() ? ex(it->second) : ex(symbol(name)));
    }
    return out;
}

// What a product's multiplicative factors imply, nested sums' bodies included.
struct constraints : coupling_structure {
    void add_factor(const ex& f) {
        if (is_a<mul>(f)) {
            for (const ex& g : f) add_factor(g);
        } else if (is_a<power>(f) && is_a<numeric>(f.op(1)) && ex_to<numeric>(f.op(1)).is_pos_integer()) {
            add_factor(f.op(0));
        } else if (is_a<index_sum>(f)) {
            const ex& body = ex_to<index_sum>(f).body();
            if (!is_a<add>(body)) add_factor(body);
        } else {
            add_structure(f, *this);
        }
    }
};

std::set<std::string> names_in(const ex& e) {
    std::set<std::string> out;
    for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
        if (is_a<symbol>(*it)) out.insert(ex_to<symbol>(*it).get_name());
    return out;
}

std::string show(const phase::assignment& a) {
    std::ostringstream os;
    bool first = true;
    for (const auto& [name, v] : a) {
        os << (first ? "" : ", ") << name << "=" << v;
        first = false;
    }
    return os.str();
}

class reducer {
public:
    // `rewrite` false: only prove each exponent integral and keep it as written (the readable
    // representative search is most of the cost, and a proof needs none of it).
    reducer(const ex& whole, const quantum_numbers& numbers, bool rewrite = true)
        : numbers_(numbers), rewrite_(rewrite) {
        for (const_preorder_iterator it = whole.preorder_begin(); it != whole.preorder_end(); ++it) {
            if (is_a<index_sum>(*it))
                for (const ex& i : ex_to<index_sum>(*it).indices()) bound_names_.insert(ex_to<symbol>(i).get_name());
            // Only a rewrite writes names back; the proof-only walk runs per candidate move.
            if (rewrite_ && is_a<symbol>(*it)) own_symbols_.emplace(ex_to<symbol>(*it).get_name(), ex_to<symbol>(*it));
        }
    }

    // `in_scope`: the summation indices of the sums around e.
    ex term(const ex& e, const constraints& inherited, const std::set<std::string>& in_scope = {}) {
        if (is_a<add>(e)) {
            ex out = 0;
            for (const ex& t : e) out += term(t, inherited, in_scope);
            return out;
        }
        constraints here = inherited;
        here.add_factor(e);
        phase::context ctx = context_for(e, here);
        auto factor = [&](const ex& f) -> ex {
            if (is_a<phase_factor>(f)) return reduce(f.op(0), ctx, in_scope);
            if (is_a<index_sum>(f)) {
                const auto& s = ex_to<index_sum>(f);
                std::set<std::string> inner = in_scope;
                for (const ex& i : s.indices()) inner.insert(ex_to<symbol>(i).get_name());
                return make_sum(term(s.body(), here, inner), s.indices());
            }
            return f;
        };
        if (is_a<mul>(e)) {
            ex out = 1;
            for (const ex& f : e) out *= factor(f);
            return out;
        }
        return factor(e);
    }

private:
    phase::context context_for(const ex& e, const constraints& c) {
        phase::context ctx;
        std::set<std::string> present = names_in(e);
        for (const auto& t : c.triads)
            for (const ex& x : t)
                for (const auto& n : names_in(x)) present.insert(n);
        // The readable order of the symmetries: angular momenta, then projections, by name.
        std::vector<const quantum_number*> ordered;
        std::vector<ex> owner_links;
        for (const quantum_number& q : numbers_.all())
            if (present.count(q.name)) ordered.push_back(&q);
        std::sort(ordered.begin(), ordered.end(), [](const quantum_number* a, const quantum_number* b) {
            bool pa = a->role == qn_role::projection, pb = b->role == qn_role::projection;
            return pa != pb ? pb : readable_name_less(a->name, b->name);
        });
        for (const quantum_number* qp : ordered) {
            const quantum_number& q = *qp;
            declare_in(ctx, q);
            // Admissibility ties a projection to its angular momentum even after the symbol
            // that paired them has been reduced away.  Not for a name that is also a summation
            // index: the table has one owner per name, and a bound index may belong to another j.
            if (q.role == qn_role::projection && q.owner && !bound_names_.count(q.name)) {
                bool owner_present = true;
                for (const auto& n : names_in(*q.owner)) owner_present = owner_present && present.count(n);
                if (owner_present) owner_links.push_back(*q.owner - q.symbol);
            }
        }
        for (const ex& link : owner_links) ctx.add_integer(linear_form_of(link));
        for (const auto& t : c.triads) ctx.add_triad(linear_form_of(t[0]), linear_form_of(t[1]), linear_form_of(t[2]));
        for (const auto& [j, m] : c.projections) ctx.add_integer(linear_form_of(j - m));
        for (const ex& z : c.zeros) ctx.add_zero(linear_form_of(z));
        return ctx;
    }

    ex reduce(const ex& exponent, const phase::context& ctx, const std::set<std::string>& in_scope) {
        phase::linear_form x = linear_form_of(exponent);
        phase::integrality i = ctx.check_integer(x);
        if (!i.integer && is_a<numeric>(exponent))
            throw phase_not_integer("the exponent of (-1)^(" + to_text(exponent) +
                                    ") is not an integer, so the phase is not real; fix the phase");
        if (!i.integer) {
            const std::string example = i.witness ? show(*i.witness) : std::string();
            throw phase_not_integer("the exponent of (-1)^(" + to_text(exponent) +
                                    ") is not an integer for every admissible value" +
                                    (example.empty() ? std::string() : " (for example at " + example + ")") +
                                    "; declare the parities with 'int' or 'half', or fix the phase");
        }
        if (!rewrite_) return make_phase(exponent);
        const ex shortest = to_ex(ctx.canonical(x), numbers_, own_symbols_);
        // The relations of a sum's symbols hold inside it: a phase outside the sum may be
        // proved with them, but not rewritten into its indices (m3 = -m1-m2 of a summed 3j
        // would put the bound m3 where it means nothing).
        const std::set<std::string> written = names_in(exponent);
        for (const std::string& n : names_in(shortest))
            if (bound_names_.count(n) && !in_scope.count(n) && !written.count(n)) return make_phase(exponent);
        return make_phase(shortest);
    }

    const quantum_numbers& numbers_;
    bool rewrite_;
    std::set<std::string> bound_names_;
    std::map<std::string, symbol> own_symbols_;
};

}  // namespace

ex reduce_phases(const ex& e, const quantum_numbers& numbers) {
    reducer r(e, numbers);
    return r.term(e, constraints{});
}

void prove_phases_integral(const ex& e, const quantum_numbers& numbers) {
    reducer r(e, numbers, false);
    r.term(e, constraints{});
}

ex phases_reduced_for_reading(const ex& e, const quantum_numbers& numbers) {
    try {
        return merge_phases(reduce_phases(merge_phases(e), numbers));
    } catch (const phase_not_integer&) {
        return e;  // a term whose sum bounds what the proof needs: shown as the move left it
    } catch (const std::invalid_argument&) {
        return e;  // an exponent that is not linear
    }
}

}  // namespace couplet
