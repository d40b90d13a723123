#include "eval/plan.hpp"

#include <algorithm>
#include <set>

namespace couplet::eval_detail {

namespace {

long coefficient(const linear& f, int slot) {
    for (const auto& [s, c] : f.doubled.terms)
        if (s == slot) return c;
    return 0;
}

class planner {
public:
    planner(const std::vector<selection_rule>& rules, const std::vector<const node*>& factors,
            const std::vector<int>& indices)
        : rules_(rules),
          factors_(factors),
          open_(indices.begin(), indices.end()),
          rule_done_(rules.size(), false),
          factor_done_(factors.size(), false) {}

    summand_plan run(const std::vector<std::string>& slot_names) {
        summand_plan p;
        collect_ready(p.entry_checks, p.entry_factors);
        while (!open_.empty()) {
            plan_step step;
            int solver = solvable(open_, &step.slot);
            if (solver >= 0) {
                step.kind = plan_step::how::solve;
                step.solver = solver;
                rule_done_[solver] = true;
            } else if (!choose_loop(step)) {
                for (int s : open_) p.unbounded += (p.unbounded.empty() ? "'" : ", '") + slot_names[s] + "'";
                return p;
            }
            open_.erase(step.slot);
            collect_ready(step.checks, step.factors);
            if (step.kind == plan_step::how::loop) take_parity_rule(step);
            p.steps.push_back(std::move(step));
        }
        return p;
    }

private:
    int open_slots(const linear& f, const std::set<int>& open, int* which) const {
        int n = 0;
        for (const auto& [s, c] : f.doubled.terms)
            if (c != 0 && open.count(s)) {
                ++n;
                *which = s;
            }
        return n;
    }

    // A zero rule with a single open slot, or -1.
    int solvable(const std::set<int>& open, int* slot) const {
        for (std::size_t r = 0; r < rules_.size(); ++r)
            if (!rule_done_[r] && rules_[r].kind == rule_kind::zero && open_slots(rules_[r].form, open, slot) == 1)
                return static_cast<int>(r);
        return -1;
    }

    // How many further indices follow by solving once `open` is what is left.
    int cascade(std::set<int> open) const {
        int solved = 0, slot = -1;
        while (solvable(open, &slot) >= 0) {
            open.erase(slot);
            ++solved;
        }
        return solved;
    }

    bool choose_loop(plan_step& step) {
        int best_gain = -1;
        std::size_t best_bounds = 0;
        for (int candidate : open_) {
            std::vector<int> lower, upper;
            for (std::size_t r = 0; r < rules_.size(); ++r) {
                if (rules_[r].kind != rule_kind::nonnegative) continue;
                int which = -1;
                if (open_slots(rules_[r].form, open_, &which) != 1 || which != candidate) continue;
                (coefficient(rules_[r].form, candidate) > 0 ? lower : upper).push_back(static_cast<int>(r));
            }
            if (lower.empty() || upper.empty()) continue;
            std::set<int> rest = open_;
            rest.erase(candidate);
            int gain = cascade(rest);
            if (gain > best_gain || (gain == best_gain && lower.size() + upper.size() > best_bounds)) {
                best_gain = gain;
                best_bounds = lower.size() + upper.size();
                step.slot = candidate;
                step.lower = lower;
                step.upper = upper;
            }
        }
        if (best_gain < 0) return false;
        step.kind = plan_step::how::loop;
        // The bounds hold by construction of the loop's range.
        for (int r : step.lower) rule_done_[r] = true;
        for (int r : step.upper) rule_done_[r] = true;
        return true;
    }

    void collect_ready(std::vector<int>& checks, std::vector<int>& factors) {
        int unused = -1;
        for (std::size_t r = 0; r < rules_.size(); ++r)
            if (!rule_done_[r] && open_slots(rules_[r].form, open_, &unused) == 0) {
                rule_done_[r] = true;
                checks.push_back(static_cast<int>(r));
            }
        for (std::size_t f = 0; f < factors_.size(); ++f) {
            if (factor_done_[f]) continue;
            const auto& slots = factors_[f]->slots;
            if (std::none_of(slots.begin(), slots.end(), [&](int s) { return open_.count(s) > 0; })) {
                factor_done_[f] = true;
                factors.push_back(static_cast<int>(f));
            }
        }
    }

    // "j - m is an integer" with j known fixes the parity of 2m: the loop then steps by 2.
    void take_parity_rule(plan_step& step) const {
        for (auto it = step.checks.begin(); it != step.checks.end(); ++it) {
            const selection_rule& r = rules_[*it];
            if (r.kind == rule_kind::integral && r.form.doubled.scale == 1 && coefficient(r.form, step.slot) % 2 != 0) {
                step.parity_rule = *it;
                step.checks.erase(it);
                return;
            }
        }
    }

    const std::vector<selection_rule>& rules_;
    const std::vector<const node*>& factors_;
    std::set<int> open_;
    std::vector<bool> rule_done_, factor_done_;
};

}  // namespace

summand_plan make_plan(const std::vector<selection_rule>& rules, const std::vector<const node*>& factors,
                       const std::vector<int>& indices, const std::vector<std::string>& slot_names) {
    return planner(rules, factors, indices).run(slot_names);
}

}  // namespace couplet::eval_detail
