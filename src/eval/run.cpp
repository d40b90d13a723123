// Running a compiled expression: exact arithmetic, with summation indices enumerated over
// exactly the values their selection rules admit.  This file holds the plain interval
// enumeration with rational values; compiled_expression::at takes the propagating one
// (propagate.cpp) wherever it applies.
#include <cln/integer.h>
#include <cln/rational.h>
#include <cln/rational_io.h>

#include <algorithm>
#include <optional>
#include <sstream>

#include "eval/compile.hpp"
#include "eval/node_runner.hpp"
#include "eval/propagate.hpp"
#include "limits/run_limits.hpp"

namespace couplet {

using eval_detail::linear;
using eval_detail::node;
using eval_detail::node_kind;
using eval_detail::rule_kind;
using eval_detail::selection_rule;
using eval_detail::summand;

namespace {

bool is_integer(const cln::cl_RA& q) { return cln::denominator(q) == 1; }

std::string show(const cln::cl_RA& q) {
    std::ostringstream os;
    os << q;
    return os.str();
}

// The interval enumeration (sum_enumeration::intervals) with rational values.
class machine : public eval_detail::node_runner<machine> {
public:
    machine(const eval_detail::program& p, const evaluation_limits& limits)
        : node_runner(nullptr, limits.max_sum_terms),
          p_(p),
          limits_(limits),
          value_(p.slot_names.size()),
          known_(p.slot_names.size(), false) {}

    void assign(int slot, const cln::cl_RA& v) {
        value_[slot] = v;
        known_[slot] = true;
    }

    exact::number variable(int slot) const { return exact::number(value_[slot]); }

    bool phase_is_odd(const linear& f) const {
        cln::cl_RA x = value(f);
        if (!is_integer(x))
            throw evaluation_error("the exponent of (-1)^(" + f.text + ") is " + show(x) + " here, not an integer");
        return cln::oddp(cln::the<cln::cl_I>(x));
    }

    bool equal(const linear& a, const linear& b) const { return value(a) == value(b); }

    cln::cl_RA value(const linear& f) const {
        cln::cl_RA v = f.constant;
        for (const auto& [s, c] : f.terms) v = v + c * value_[s];
        return v;
    }

    // 2*value as a long, or nothing when the value is not a multiple of 1/2.
    std::optional<long> twice(const linear& f) const {
        cln::cl_RA t = 2 * value(f);
        if (!is_integer(t)) return std::nullopt;
        cln::cl_I i = cln::the<cln::cl_I>(t);
        if (cln::abs(i) > limits_.max_twice_j)
            throw evaluation_error("'" + f.text + "' = " + show(value(f)) + " is too large (2j may be at most " +
                                   std::to_string(limits_.max_twice_j) + ")");
        return cln::cl_I_to_long(i);
    }

    exact::number sum(const node& n) {
        // An index may share its name with a free quantum number used outside the sum.
        std::vector<std::pair<cln::cl_RA, bool>> saved;
        for (int i : n.indices) {
            saved.emplace_back(value_[i], known_[i]);
            known_[i] = false;
        }
        exact::number total;
        for (const summand& s : n.terms) {
            std::vector<int> open = n.indices;
            total += enumerate(s, open);
        }
        for (std::size_t k = 0; k < n.indices.size(); ++k) {
            value_[n.indices[k]] = saved[k].first;
            known_[n.indices[k]] = saved[k].second;
        }
        return total;
    }

    bool evaluable(const linear& f, int except = -1) const {
        for (const auto& [s, c] : f.terms)
            if (s != except && !known_[s]) return false;
        return true;
    }

    bool rule_holds(const selection_rule& r) const {
        cln::cl_RA v = value(r.form);
        switch (r.kind) {
            case rule_kind::nonnegative:
                return !cln::minusp(v);
            case rule_kind::zero:
                return cln::zerop(v);
            default:
                return is_integer(v);
        }
    }

    struct range {
        std::optional<cln::cl_RA> low, high;
    };

    // Bounds on `slot` from the rules whose other quantum numbers are all known.
    range bounds(const summand& s, int slot) const {
        range r;
        for (const selection_rule& rule : s.rules) {
            if (rule.kind == rule_kind::integral || !evaluable(rule.form, slot)) continue;
            cln::cl_RA c = 0;
            for (const auto& [k, coeff] : rule.form.terms)
                if (k == slot) c = c + coeff;
            if (cln::zerop(c)) continue;
            cln::cl_RA rest = rule.form.constant;
            for (const auto& [k, coeff] : rule.form.terms)
                if (k != slot) rest = rest + coeff * value_[k];
            cln::cl_RA root = -rest / c;  // c*x + rest >= 0 (or = 0)
            bool is_lower = rule.kind == rule_kind::zero || cln::plusp(c);
            bool is_upper = rule.kind == rule_kind::zero || cln::minusp(c);
            if (is_lower && (!r.low || root > *r.low)) r.low = root;
            if (is_upper && (!r.high || root < *r.high)) r.high = root;
        }
        return r;
    }

    exact::number enumerate(const summand& s, std::vector<int>& open) {
        for (const selection_rule& rule : s.rules)
            if (evaluable(rule.form) && !rule_holds(rule)) return exact::number();
        if (open.empty()) {
            count_terms(1, "the sums");
            return run(*s.body);
        }
        // Enumerate next the index with the narrowest finite range.
        std::size_t best = open.size();
        cln::cl_RA best_width;
        range best_range;
        for (std::size_t k = 0; k < open.size(); ++k) {
            range r = bounds(s, open[k]);
            if (!r.low || !r.high) continue;
            cln::cl_RA width = *r.high - *r.low;
            if (best == open.size() || width < best_width) {
                best = k;
                best_width = width;
                best_range = r;
            }
        }
        if (best == open.size()) {
            std::string names;
            for (int k : open) names += (names.empty() ? "'" : ", '") + p_.slot_names[k] + "'";
            throw evaluation_error("nothing bounds the summation index " + names +
                                   ": an index must fill a slot of a coupling symbol, a delta or a tri() "
                                   "that multiplies the whole summand");
        }
        int slot = open[best];
        open.erase(open.begin() + static_cast<long>(best));
        exact::number total;
        // Values in steps of 1/2 from the lower bound rounded up.
        cln::cl_I first = cln::ceiling1(2 * *best_range.low);
        cln::cl_I last = cln::floor1(2 * *best_range.high);
        for (cln::cl_I t = first; t <= last; t = t + 1) {
            int parity = p_.declared_parity[slot];
            if ((parity == 1 && cln::oddp(t)) || (parity == 2 && cln::evenp(t))) continue;
            assign(slot, cln::cl_RA(t) / 2);
            total += enumerate(s, open);
        }
        known_[slot] = false;
        open.insert(open.begin() + static_cast<long>(best), slot);
        return total;
    }

    const eval_detail::program& p_;
    const evaluation_limits& limits_;
    std::vector<cln::cl_RA> value_;
    std::vector<bool> known_;
};

}  // namespace

namespace {

// Every free slot has its value: the propagating enumeration where it applies, else the
// rational one.
exact::number value_given(eval_detail::program& p, const evaluation_limits& limits,
                          const std::vector<std::pair<int, cln::cl_RA>>& given) {
    if (limits.enumeration == sum_enumeration::propagating)
        if (auto v = eval_detail::run_propagating(p, limits, given)) return *v;
    machine m(p, limits);
    for (const auto& [slot, v] : given) m.assign(slot, v);
    return m.run(*p.root);
}

}  // namespace

compiled_expression::compiled_expression(const GiNaC::ex& e, const quantum_numbers& numbers, evaluation_limits limits)
    : program_(std::make_unique<eval_detail::program>(eval_detail::compile(e, numbers))), limits_(limits) {}
compiled_expression::~compiled_expression() = default;
compiled_expression::compiled_expression(compiled_expression&&) noexcept = default;
compiled_expression& compiled_expression::operator=(compiled_expression&&) noexcept = default;

exact::number compiled_expression::at(const assignment& values) const {
    std::vector<std::pair<int, cln::cl_RA>> given;
    std::vector<std::string> missing;
    for (int slot : program_->free_slots) {
        const std::string& name = program_->slot_names[slot];
        auto it =
            std::find_if(values.begin(), values.end(), [&](const auto& kv) { return kv.first.get_name() == name; });
        if (it == values.end()) {
            missing.push_back(name);
            continue;
        }
        given.emplace_back(slot, cln::the<cln::cl_RA>(it->second.to_cl_N()));
    }
    if (!missing.empty()) {
        std::string list;
        for (const auto& n : missing) list += (list.empty() ? "" : ", ") + n;
        throw evaluation_error("no value given for " + list + " (write: eval EXPR at " + missing.front() + "=...)");
    }
    return value_given(*program_, limits_, given);
}

std::vector<std::string> compiled_expression::free_names() const {
    std::vector<std::string> out;
    for (int slot : program_->free_slots) out.push_back(program_->slot_names[slot]);
    return out;
}

exact::number compiled_expression::at_twice(const std::vector<long>& twice) const {
    if (twice.size() != program_->free_slots.size())
        throw evaluation_error("at_twice: " + std::to_string(twice.size()) + " values for " +
                               std::to_string(program_->free_slots.size()) + " free quantum numbers");
    std::vector<std::pair<int, cln::cl_RA>> given;
    given.reserve(twice.size());
    for (std::size_t k = 0; k < twice.size(); ++k)
        given.emplace_back(program_->free_slots[k], cln::cl_RA(twice[k]) / 2);
    return value_given(*program_, limits_, given);
}

std::string describe(const assignment& at) {
    std::string out;
    for (const auto& [s, v] : at) {
        std::ostringstream os;
        os << s.get_name() << "=" << v;
        out += (out.empty() ? "" : ", ") + os.str();
    }
    return out;
}

GiNaC::ex to_ex(const exact::number& value) {
    GiNaC::ex out = 0;
    for (const auto& [radicand, coefficient] : value.terms()) {
        GiNaC::numeric q{cln::cl_N(coefficient)};
        GiNaC::numeric r{cln::cl_N(radicand)};
        out += r == 1 ? GiNaC::ex(q) : q * GiNaC::sqrt(r);
    }
    return out;
}

}  // namespace couplet
