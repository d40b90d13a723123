// Sums enumerated by their plans (eval/plan.hpp): each step binds one index, by a loop over the
// range its bounding rules leave or by solving a zero rule, then checks the rules and
// multiplies in the factors that have just become decidable, so a failing triangle or a
// vanishing 3j cuts the whole subtree below it.
#include "eval/propagate.hpp"

#include <cln/integer.h>
#include <cln/rational_io.h>

#include <algorithm>
#include <exception>
#include <sstream>
#include <stdexcept>

#include "eval/node_runner.hpp"
#include "limits/run_limits.hpp"

namespace couplet::eval_detail {

namespace {

constexpr long largest_doubled = 1L << 24;  // free values beyond this go the rational way
constexpr long largest_form = 1L << 61;

long floor_div(long a, long b) {  // b > 0
    return a >= 0 ? a / b : -((-a + b - 1) / b);
}
long ceil_div(long a, long b) { return -floor_div(-a, b); }

std::string rational_text(long numerator, long denominator) {
    std::ostringstream os;
    os << cln::cl_RA(numerator) / cln::cl_RA(denominator);
    return os.str();
}

class propagating : public node_runner<propagating> {
public:
    propagating(program& p, const evaluation_limits& limits)
        : node_runner(limits.remember_symbols ? &p.memo : nullptr, limits.max_sum_terms),
          p_(p),
          limits_(limits),
          t_(p.slot_names.size(), 0) {}

    void assign(int slot, long doubled) { t_[slot] = doubled; }

    // 2 * scale * value of f.
    long doubled(const linear& f) const {
        __int128 v = f.doubled.constant;
        for (const auto& [s, c] : f.doubled.terms) v += static_cast<__int128>(c) * t_[s];
        if (v > largest_form || v < -largest_form) throw evaluation_error("'" + f.text + "' is too large to evaluate");
        return static_cast<long>(v);
    }

    std::optional<long> twice(const linear& f) const {
        long t = doubled(f);
        if (f.doubled.scale != 1) {
            if (t % f.doubled.scale != 0) return std::nullopt;
            t /= f.doubled.scale;
        }
        if (t > limits_.max_twice_j || t < -limits_.max_twice_j)
            throw evaluation_error("'" + f.text + "' = " + rational_text(t, 2) + " is too large (2j may be at most " +
                                   std::to_string(limits_.max_twice_j) + ")");
        return t;
    }

    bool phase_is_odd(const linear& f) const {
        long n = doubled(f), d = 2 * f.doubled.scale;
        if (n % d != 0)
            throw evaluation_error("the exponent of (-1)^(" + f.text + ") is " + rational_text(n, d) +
                                   " here, not an integer");
        return (n / d) % 2 != 0;
    }

    bool equal(const linear& a, const linear& b) const {
        return static_cast<__int128>(doubled(a)) * b.doubled.scale ==
               static_cast<__int128>(doubled(b)) * a.doubled.scale;
    }

    exact::number variable(int slot) const { return exact::number(cln::cl_RA(t_[slot]) / 2); }

    exact::number sum(const node& n) {
        // An index may share its name with a free quantum number used outside the sum.
        std::vector<long> saved;
        for (int i : n.indices) saved.push_back(t_[i]);
        exact::number total;
        for (const summand& s : n.terms) total += run_summand(s);
        for (std::size_t k = 0; k < n.indices.size(); ++k) t_[n.indices[k]] = saved[k];
        return total;
    }

private:
    bool holds(const selection_rule& r) const {
        long n = doubled(r.form);
        switch (r.kind) {
            case rule_kind::nonnegative:
                return n >= 0;
            case rule_kind::zero:
                return n == 0;
            default:
                return n % (2 * r.form.doubled.scale) == 0;
        }
    }

    bool all_hold(const summand& s, const std::vector<int>& rules) const {
        for (int r : rules)
            if (!holds(s.rules[r])) return false;
        return true;
    }

    // f = a * t[slot] + rest: returns a, sets rest (t[slot] is overwritten).
    long split(const linear& f, int slot, long& rest) {
        t_[slot] = 0;
        rest = doubled(f);
        for (const auto& [s, c] : f.doubled.terms)
            if (s == slot) return c;
        return 0;
    }

    bool parity_allows(int slot, long t) const {
        int parity = p_.declared_parity[slot];
        return !((parity == 1 && t % 2 != 0) || (parity == 2 && t % 2 == 0));
    }

    exact::number run_summand(const summand& s) {
        if (!all_hold(s, s.plan.entry_checks)) return exact::number();
        if (!s.plan.unbounded.empty())
            throw evaluation_error("nothing bounds the summation index " + s.plan.unbounded +
                                   ": an index must fill a slot of a coupling symbol, a delta or a tri() "
                                   "that multiplies the whole summand");
        // Phases only flip a sign: the terms go to one of two totals instead of being
        // multiplied by -1.
        totals sum;
        exact::number one(1L);
        apply_factors(s, s.plan.entry_factors, one, false, nullptr,
                      [&](const exact::number& partial, bool negative, const std::exception_ptr& undefined) {
                          descend(s, 0, partial, negative, undefined, sum);
                      });
        return sum.positive - sum.negative;
    }

    struct totals {
        exact::number positive, negative;
    };

    // Multiplies `partial` by the factors, then continues; nothing when one vanishes.  A factor
    // that cannot be evaluated (a half-integer phase exponent) is an error only for a term
    // that survives every rule and every other factor: it is carried down as `undefined`.
    template <typename Next>
    void apply_factors(const summand& s, const std::vector<int>& factors, const exact::number& partial, bool negative,
                       std::exception_ptr undefined, Next&& next) {
        const exact::number* value = &partial;
        exact::number product;
        for (int f : factors) {
            const node& factor = *s.factors[f];
            try {
                if (factor.kind == node_kind::phase) {
                    negative = negative != phase_is_odd(factor.forms[0]);
                    continue;
                }
                exact::number v = run(factor);
                if (v.is_zero()) return;
                product = *value * v;
                value = &product;
            } catch (const evaluation_error&) {
                if (!undefined) undefined = std::current_exception();
            } catch (const std::domain_error&) {
                if (!undefined) undefined = std::current_exception();
            }
        }
        next(*value, negative, undefined);
    }

    void descend(const summand& s, std::size_t k, const exact::number& partial, bool negative,
                 const std::exception_ptr& undefined, totals& sum) {
        if (k == s.plan.steps.size()) {
            if (undefined) std::rethrow_exception(undefined);
            count_terms(1, "the sums");
            (negative ? sum.negative : sum.positive) += partial;
            return;
        }
        const plan_step& step = s.plan.steps[k];
        long rest = 0;
        if (step.kind == plan_step::how::solve) {
            long a = split(s.rules[step.solver].form, step.slot, rest);
            if (rest % a != 0) return;
            long t = -rest / a;
            if (!parity_allows(step.slot, t) || t > largest_doubled || t < -largest_doubled) return;
            t_[step.slot] = t;
            bind(s, k, partial, negative, undefined, sum);
            return;
        }
        long low = -largest_form, high = largest_form;
        for (int r : step.lower) {
            long a = split(s.rules[r].form, step.slot, rest);
            low = std::max(low, ceil_div(-rest, a));
        }
        for (int r : step.upper) {
            long a = split(s.rules[r].form, step.slot, rest);
            high = std::min(high, floor_div(rest, -a));
        }
        if (low <= high && (low < -largest_doubled || high > largest_doubled))
            throw evaluation_error("the summation index '" + p_.slot_names[step.slot] + "' ranges too far");
        long stride = 1;
        int parity = p_.declared_parity[step.slot];
        if (step.parity_rule >= 0) {
            split(s.rules[step.parity_rule].form, step.slot, rest);  // a odd: t = rest (mod 2)
            int wanted = static_cast<int>(((rest % 2) + 2) % 2);
            if (parity != 0 && wanted != (parity == 1 ? 0 : 1)) return;
            parity = wanted == 0 ? 1 : 2;
        }
        if (parity != 0) {
            stride = 2;
            if (((low % 2) + 2) % 2 != (parity == 1 ? 0 : 1)) ++low;
        }
        for (long t = low; t <= high; t += stride) {
            t_[step.slot] = t;
            bind(s, k, partial, negative, undefined, sum);
        }
    }

    void bind(const summand& s, std::size_t k, const exact::number& partial, bool negative,
              const std::exception_ptr& undefined, totals& sum) {
        const plan_step& step = s.plan.steps[k];
        if (!all_hold(s, step.checks)) return;
        apply_factors(
            s, step.factors, partial, negative, undefined,
            [&](const exact::number& p, bool n, const std::exception_ptr& u) { descend(s, k + 1, p, n, u, sum); });
    }

    program& p_;
    const evaluation_limits& limits_;
    std::vector<long> t_;
};

}  // namespace

std::optional<exact::number> run_propagating(program& p, const evaluation_limits& limits,
                                             const std::vector<std::pair<int, cln::cl_RA>>& values) {
    if (!p.doubled_forms_fit) return std::nullopt;
    propagating m(p, limits);
    for (const auto& [slot, v] : values) {
        cln::cl_RA twice = 2 * v;
        if (cln::denominator(twice) != 1) return std::nullopt;
        cln::cl_I t = cln::the<cln::cl_I>(twice);
        if (cln::abs(t) > largest_doubled) return std::nullopt;
        m.assign(slot, cln::cl_I_to_long(t));
    }
    return m.run(*p.root);
}

}  // namespace couplet::eval_detail
