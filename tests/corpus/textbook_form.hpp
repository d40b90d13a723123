// Whether an answer is in a source's printed form, not only of its value: after both are put in
// canonical arrangement (canonical_form) and their roots split into roots of factors, they must
// have the same number of terms, and each answer term one source term with the same factors
// and a phase equal to it in the phase group (so (-1)^(2a+2b) next to tri(a, b, c) is
// (-1)^(2c)).  Deltas and triangle conditions are compared as unordered.
#pragma once

#include <algorithm>
#include <string>
#include <vector>

#include "canonical/phase_reduction.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "rules/roots.hpp"
#include "rules/structure.hpp"
#include "simplify/simplify.hpp"

namespace couplet::testing {

struct form_comparison {
    bool same = false;
    int answer_terms = 0, source_terms = 0;
    std::string why;
};

namespace detail {

struct unordered_arguments : GiNaC::map_function {
    GiNaC::ex operator()(const GiNaC::ex& e) override {
        const symbol_kind k = kind_of(e);
        if (k != symbol_kind::delta && k != symbol_kind::triangle) return e.map(*this);
        std::vector<GiNaC::ex> args(e.begin(), e.end());
        std::sort(args.begin(), args.end(),
                  [](const GiNaC::ex& a, const GiNaC::ex& b) { return to_text(a) < to_text(b); });
        if (k == symbol_kind::delta) return kdelta(args[0], args[1]).hold();
        return triangle(args[0], args[1], args[2]).hold();
    }
};

inline GiNaC::ex prepared(const GiNaC::ex& e, const quantum_numbers& numbers) {
    unordered_arguments u;
    return u(rules::split_roots(canonical_form(e, numbers), numbers));
}

// The term's phase group: the rules' one (triads, declared parities) with each (j, m) column's
// j - m integral and each 3j's projections summing to zero.
inline bool same_phase_in(const GiNaC::ex& term, const GiNaC::ex& x, const GiNaC::ex& y,
                          const quantum_numbers& numbers) {
    if ((x - y).expand().is_zero()) return true;
    phase::context ctx = rules::context_for(term, numbers);
    coupling_structure s;
    for (GiNaC::const_preorder_iterator it = term.preorder_begin(); it != term.preorder_end(); ++it)
        add_structure(*it, s);
    try {
        for (const auto& [j, m] : s.projections) ctx.add_integer(linear_form_of(j) - linear_form_of(m));
        for (const GiNaC::ex& z : s.zeros) ctx.add_zero(linear_form_of(z));
    } catch (const std::invalid_argument&) {
        return false;
    }
    return rules::same_phase(ctx, x, y);
}

inline GiNaC::ex phase_exponent(const GiNaC::ex& term) {
    for (const GiNaC::ex& f : rules::factors_of(term))
        if (GiNaC::is_a<phase_factor>(f)) return f.op(0);
    return 0;
}

}  // namespace detail

inline form_comparison compare_forms(const GiNaC::ex& answer, const GiNaC::ex& source, const quantum_numbers& numbers) {
    form_comparison out;
    const std::vector<GiNaC::ex> a = rules::terms_of(detail::prepared(answer, numbers));
    std::vector<GiNaC::ex> s = rules::terms_of(detail::prepared(source, numbers));
    out.answer_terms = static_cast<int>(a.size());
    out.source_terms = static_cast<int>(s.size());
    if (a.size() != s.size()) {
        out.why = "different numbers of terms";
        return out;
    }
    for (const GiNaC::ex& t : a) {
        auto match = std::find_if(s.begin(), s.end(), [&](const GiNaC::ex& u) {
            if (!rules::without_phases(t).is_equal(rules::without_phases(u))) return false;
            return detail::same_phase_in(t, detail::phase_exponent(t), detail::phase_exponent(u), numbers);
        });
        if (match == s.end()) {
            out.why = "no term of the source's form has the factors and phase of " + to_text(t) +
                      " (source, canonical: " + to_text(detail::prepared(source, numbers)) + ")";
            return out;
        }
        s.erase(match);
    }
    out.same = true;
    return out;
}

}  // namespace couplet::testing
