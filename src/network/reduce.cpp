#include "couplet/network/reduce.hpp"

#include "couplet/model/normalize.hpp"
#include "couplet/model/symbols.hpp"
#include "couplet/network/fixed_projection.hpp"
#include "couplet/network/match.hpp"
#include "couplet/network/term.hpp"
#include "couplet/symmetry/symmetries.hpp"
#include "simplify/phase_reduction.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

// Each move removes at least one summation index, so the loop ends; the cap only guards.
constexpr int max_moves_per_term = 64;

class reducer : public map_function {
public:
    reducer(const quantum_numbers& numbers, std::vector<reduction_step>* steps) : numbers_(numbers), steps_(steps) {
        phases_provable_ = [this](const ex& candidate) {
            try {
                reduce_phases(merge_phases(candidate), numbers_);
                return true;
            } catch (const phase_not_integer&) {
                return false;
            }
        };
    }

    ex operator()(const ex& e) override {
        if (!is_a<index_sum>(e)) return e.map(*this);
        const auto& s = ex_to<index_sum>(e);
        ex body = (*this)(s.body()).expand();
        if (!is_a<add>(body)) return reduce_term(body, s.indices());
        for (const ex& t : body)
            for (const ex& i : s.indices())
                if (!t.has(i)) return make_sum(body, s.indices());  // a term the sum does not bound
        ex out = 0;
        for (const ex& t : body) out += reduce_term(t, s.indices());
        return out;
    }

private:
    ex reduce_term(ex body, lst indices) {
        bool changed = false;
        for (int round = 0; round < max_moves_per_term; ++round) {
            term_analysis a = analyze_term(body, indices, numbers_);
            if (!a.term) break;
            std::optional<ex> next;
            for (const move& m : network_moves()) {
                next = apply_move(m, *a.term, phases_provable_);
                if (next) {
                    if (steps_) steps_->push_back({m.name, m.reference});
                    break;
                }
            }
            if (!next) {
                // Last resort, since it leaves entries the moves do not match.
                next = fix_projection_by_vertex(*a.term);
                if (next && !phases_provable_(*next)) next.reset();
                if (next && steps_) steps_->push_back({"fixed_projection", fixed_projection_reference});
            }
            if (!next) break;
            changed = true;
            ex n = merge_phases(*next);
            if (!is_a<index_sum>(n)) return tidy(n);
            body = ex_to<index_sum>(n).body();
            indices = ex_to<index_sum>(n).indices();
        }
        ex out = make_sum(body, indices);
        return changed ? tidy(out) : out;
    }

    ex tidy(const ex& e) const { return merge_phases(symmetry::canonicalize_symbols(e, numbers_)); }

    const quantum_numbers& numbers_;
    std::vector<reduction_step>* steps_;
    result_check phases_provable_;
};

}  // namespace

ex reduce_msums(const ex& e, const quantum_numbers& numbers, std::vector<reduction_step>* steps) {
    reducer r(numbers, steps);
    return r(e);
}

}  // namespace couplet::network
