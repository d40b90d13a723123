// The part of evaluating a compiled node that does not depend on how values are held: the
// arithmetic, and coupling symbols from their doubled arguments.  `Values` (CRTP) supplies a
// form's doubled value, phases, deltas, variables and sums.
#pragma once

#include <optional>
#include <string>

#include "eval/compiled.hpp"
#include "eval/evaluate.hpp"
#include "exact/admissibility.hpp"
#include "exact/wigner.hpp"
#include "limits/run_limits.hpp"
#include "model/tensor_operator.hpp"

namespace couplet::eval_detail {

template <typename Values>
class node_runner {
public:
    exact::number run(const node& n) {
        switch (n.kind) {
            case node_kind::constant:
                return n.value;
            case node_kind::variable:
                return self().variable(n.slot);
            case node_kind::add: {
                exact::number s;
                for (const auto& c : n.children) s += run(*c);
                return s;
            }
            case node_kind::mul: {
                // A vanishing factor ends the product, but a divisor of 0 still makes it
                // undefined: which one GiNaC lists first must not decide the value.
                exact::number s(1L);
                for (const auto& c : n.children)
                    if (!s.is_zero())
                        s *= run(*c);
                    else if (divides(*c))
                        run(*c);
                return s;
            }
            case node_kind::power: {
                exact::number base = run(*n.children[0]);
                if (n.exponent < 0 && base.is_zero()) throw zero_divisor(n);
                return exact::power(base, n.exponent);
            }
            case node_kind::root_power: {
                exact::number base = run(*n.children[0]);
                if (!base.is_rational() || cln::minusp(base.rational_value()))
                    throw evaluation_error("sqrt of " + base.to_string() + " (in " + n.text +
                                           ") is not a real square root of a rational");
                if (n.exponent < 0 && base.is_zero()) throw zero_divisor(n);
                exact::number root;
                try {
                    root = exact::number::sqrt_of(base.rational_value());
                } catch (const std::domain_error& e) {
                    throw evaluation_error("sqrt in " + n.text + " of a number too large to take apart: " + e.what());
                }
                return exact::power(root, n.exponent);
            }
            case node_kind::phase:
                return exact::number(self().phase_is_odd(n.forms[0]) ? -1L : 1L);
            case node_kind::delta:
                return exact::number(self().equal(n.forms[0], n.forms[1]) ? 1L : 0L);
            case node_kind::triangle: {
                auto a = self().twice(n.forms[0]), b = self().twice(n.forms[1]), c = self().twice(n.forms[2]);
                return a && b && c && exact::triangle(*a, *b, *c) ? exact::number(1L) : exact::number();
            }
            case node_kind::projection: {
                auto j = self().twice(n.forms[0]), m = self().twice(n.forms[1]);
                return j && m && exact::projection_ok(*j, *m) ? exact::number(1L) : exact::number();
            }
            case node_kind::reduced_element: {
                auto k = self().twice(n.forms[0]), a = self().twice(n.forms[1]), b = self().twice(n.forms[2]);
                if (!k || !a || !b) return exact::number();  // not quantum numbers: no such element
                return exact::number(cln::the<cln::cl_RA>(reduced_element_value(n.text, *k, *a, *b).to_cl_N()));
            }
            case node_kind::sum:
                return self().sum(n);
            default:
                return coupling_symbol(n);
        }
    }

protected:
    node_runner(symbol_memo* memo, long max_terms) : memo_(memo), max_terms_(max_terms) {}

    // One bound on the work of a call, --max-sum-terms in effect: every summand of the sums,
    // and every term of a 9j's series, which grows as the cube of its j's.
    void count_terms(long terms, const std::string& what) {
        const long before = terms_;
        terms_ += terms;
        if (terms_ > max_terms_)
            throw work_limit_exceeded(what + " need more than " + std::to_string(max_terms_) + " terms at this point");
        if (terms_ / 64 != before / 64) check_deadline();  // --time-limit reaches into long sums
    }

private:
    Values& self() { return static_cast<Values&>(*this); }

    static bool divides(const node& n) {
        return (n.kind == node_kind::power || n.kind == node_kind::root_power) && n.exponent < 0;
    }

    // Every division reaches here as a negative power, so this one error covers 1/x, x^-1,
    // 1/sum(...) and roots of them, whatever the divisor is: a symbol, a sum or a name.
    static division_by_zero zero_divisor(const node& n) { return division_by_zero(n.text); }

    exact::number coupling_symbol(const node& n) {
        symbol_memo::key t{};
        t[9] = static_cast<long>(n.kind);
        for (std::size_t k = 0; k < n.forms.size(); ++k) {
            auto v = self().twice(n.forms[k]);
            if (!v) return exact::number();  // not a quantum number: the symbol vanishes
            t[k] = *v;
        }
        if (memo_) {
            auto it = memo_->values.find(t);
            if (it != memo_->values.end()) return it->second;
        }
        if (n.kind == node_kind::ninej)
            count_terms(exact::ninej_series_terms(t[0], t[1], t[2], t[3], t[4], t[5], t[6], t[7], t[8]),
                        "the series of " + n.text);
        if (!memo_) return compute(n.kind, t);
        if (memo_->values.size() >= symbol_memo::capacity) memo_->values.clear();
        return memo_->values.emplace(t, compute(n.kind, t)).first->second;
    }

    static exact::number compute(node_kind kind, const symbol_memo::key& t) {
        switch (kind) {
            case node_kind::threej:
                return exact::threej(t[0], t[1], t[2], t[3], t[4], t[5]);
            case node_kind::clebsch:
                return exact::clebsch_gordan(t[0], t[1], t[2], t[3], t[4], t[5]);
            case node_kind::sixj:
                return exact::sixj(t[0], t[1], t[2], t[3], t[4], t[5]);
            default:
                return exact::ninej(t[0], t[1], t[2], t[3], t[4], t[5], t[6], t[7], t[8]);
        }
    }

    symbol_memo* memo_;
    long max_terms_;
    long terms_ = 0;
};

}  // namespace couplet::eval_detail
