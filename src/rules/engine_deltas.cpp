#include "rules/engine_class.hpp"

#include <cln/rational.h>

#include <algorithm>
#include <map>
#include <set>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "limits/run_limits.hpp"
#include "model/fresh_index.hpp"
#include "model/normalize.hpp"
#include "model/readable_order.hpp"
#include "model/result_shape.hpp"
#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "rules/matcher.hpp"
#include "rules/rewrites.hpp"
#include "rules/roots.hpp"
#include "rules/structure.hpp"

namespace couplet::rules {

using namespace GiNaC;

std::optional<ex> engine::vanishing_by_parity(const ex& term) {
    phase::context ctx = context_for(term, numbers_);
    for (const_preorder_iterator it = term.preorder_begin(); it != term.preorder_end(); ++it) {
        symbol_kind kind = kind_of(*it);
        std::vector<symmetry::transformed> images;
        if (kind == symbol_kind::threej) images = symmetry::threej_orbit(*it);
        if (kind == symbol_kind::ninej) images = symmetry::ninej_orbit(*it);
        for (const auto& image : images) {
            if (!image.symbol.is_equal(*it) || image.phase.is_zero()) continue;
            if (same_phase(ctx, image.phase, 1)) {
                record(odd_symbol_identity(), term, 0);
                return ex(0);
            }
        }
    }
    return std::nullopt;
}

std::optional<ex> engine::eliminate_delta(const ex& term) {
    std::vector<ex> factors = factors_of(term);
    for (size_t k = 0; k < factors.size(); ++k) {
        const ex& f = factors[k];
        if (!is_a<power>(f) || kind_of(f.op(0)) != symbol_kind::delta || !is_a<numeric>(f.op(1)) ||
            !ex_to<numeric>(f.op(1)).is_pos_integer())
            continue;
        std::vector<ex> others = factors;
        others[k] = f.op(0);
        ex after = product_of(others);
        record(repeated_delta_identity(), term, after);
        return after;
    }
    for (size_t k = 0; k < factors.size(); ++k) {
        if (kind_of(factors[k]) != symbol_kind::delta) continue;
        const ex &u = factors[k].op(0), &v = factors[k].op(1);
        if (u.is_equal(v)) continue;
        const bool both_names = is_a<symbol>(u) && is_a<symbol>(v);
        bool u_stays;
        if (both_names)
            u_stays = readable_name_less(ex_to<symbol>(u).get_name(), ex_to<symbol>(v).get_name());
        else if (is_a<symbol>(v) && !u.has(v))
            u_stays = true;
        else if (is_a<symbol>(u) && !v.has(u))
            u_stays = false;
        else
            continue;
        const ex& keep = u_stays ? u : v;
        const ex& drop = u_stays ? v : u;
        std::vector<ex> others = factors;
        others.erase(others.begin() + static_cast<long>(k));
        ex rest = product_of(others);
        if (!rest.has(drop)) continue;
        ex after = factors[k] * rest.subs(exmap{{drop, keep}});
        record(delta_elimination_identity(), term, after);
        return after;
    }
    return std::nullopt;
}

std::optional<ex> engine::collapse_delta(const ex& term, const symbol& x, const std::vector<ex>& with_x) {
    for (size_t k = 0; k < with_x.size(); ++k) {
        const ex& f = with_x[k];
        if (kind_of(f) != symbol_kind::delta) continue;
        ex d = (f.op(0) - f.op(1)).expand();
        if (d.degree(x) != 1) continue;
        ex c = d.coeff(x, 1);
        if (!c.is_equal(1) && !c.is_equal(-1)) continue;
        ex value = (-(d - c * x) / c).expand();
        phase::linear_form form;
        try {
            form = linear_form_of(value);
        } catch (const std::invalid_argument&) {
            continue;
        }
        bool half_integral = cln::denominator(2 * form.constant()) == 1;
        for (const auto& [name, coefficient] : form.coefficients())
            half_integral = half_integral && cln::denominator(coefficient) == 1;
        if (!half_integral) continue;
        const quantum_number* q = numbers_.find(x);
        if (q && q->parity != qn_parity::any) {
            phase::context ctx = context_for(term, numbers_, x);
            phase::linear_form want = form;
            if (q->parity == qn_parity::half_odd) want += phase::linear_form(cln::cl_RA(1) / 2);
            if (!ctx.is_integer(want)) continue;
        }
        std::vector<ex> rest = with_x;
        rest.erase(rest.begin() + static_cast<long>(k));
        return product_of(rest).subs(exmap{{x, value}});
    }
    return std::nullopt;
}

}  // namespace couplet::rules
