#include "couplet/network/term.hpp"

#include "couplet/model/symbols.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

bool is_phase(const ex& f) { return is_a<phase_factor>(f); }

bool has_any(const ex& e, const lst& indices) {
    for (const ex& i : indices)
        if (e.has(i)) return true;
    return false;
}

// +-index for an entry that is exactly an index or its negative.
std::optional<std::pair<symbol, int>> signed_index(const ex& entry, const lst& indices) {
    for (const ex& i : indices) {
        if ((entry - i).expand().is_zero()) return std::make_pair(ex_to<symbol>(i), 1);
        if ((entry + i).expand().is_zero()) return std::make_pair(ex_to<symbol>(i), -1);
    }
    return std::nullopt;
}

}  // namespace

term_analysis analyze_term(const ex& body, const lst& indices, const quantum_numbers& numbers) {
    term_analysis out;
    msum_term t;
    t.summed = indices;
    for (const ex& i : indices) {
        if (!is_a<symbol>(i)) return {std::nullopt, "an index is not a name"};
        const quantum_number* q = numbers.find(ex_to<symbol>(i));
        if (!q || q->role != qn_role::projection) return {std::nullopt, "an index is not a projection"};
    }
    exvector factors;
    if (is_a<mul>(body))
        for (const ex& f : body) factors.push_back(f);
    else
        factors.push_back(body);
    for (const ex& f : factors) {
        if (is_a<power>(f) && kind_of(f.op(0)) == symbol_kind::threej && is_a<numeric>(f.op(1)) &&
            ex_to<numeric>(f.op(1)).is_pos_integer() && ex_to<numeric>(f.op(1)) <= 8) {
            for (int k = 0; k < ex_to<numeric>(f.op(1)).to_int(); ++k) t.threejs.push_back(f.op(0));
        } else if (kind_of(f) == symbol_kind::threej) {
            t.threejs.push_back(f);
        } else if (is_phase(f)) {
            t.exponent += f.op(0);
        } else if (is_a<power>(f) && is_phase(f.op(0)) && is_a<numeric>(f.op(1)) &&
                   ex_to<numeric>(f.op(1)).is_integer()) {
            t.exponent += f.op(0).op(0) * f.op(1);
        } else if (has_any(f, indices)) {
            return {std::nullopt, "a factor other than a 3j or a phase involves a summed projection"};
        } else {
            t.rest *= f;
        }
    }
    for (const ex& i : indices) {
        line l{ex_to<symbol>(i)};
        t.lines.push_back(l);
    }
    for (std::size_t v = 0; v < t.threejs.size(); ++v) {
        const ex& s = t.threejs[v];
        for (int c = 0; c < 3; ++c) {
            const ex& entry = s.op(3 + c);
            if (has_any(s.op(c), indices)) return {std::nullopt, "a summed projection in a top row"};
            if (!has_any(entry, indices)) {
                t.open_ends.push_back(entry);
                continue;
            }
            auto si = signed_index(entry, indices);
            if (!si) return {std::nullopt, "a bottom-row entry mixes a summed projection with more"};
            for (auto& l : t.lines) {
                if (!l.projection.is_equal(si->first)) continue;
                if (l.ends[0] < 0) {
                    l.ends[0] = static_cast<int>(v);
                    l.angular = s.op(c);
                } else if (l.ends[1] < 0) {
                    l.ends[1] = static_cast<int>(v);
                } else {
                    return {std::nullopt, "a summed projection in more than two slots"};
                }
            }
        }
    }
    for (const auto& l : t.lines)
        if (l.ends[1] < 0) return {std::nullopt, "a summed projection in fewer than two slots"};
    out.term = t;
    return out;
}

ex summand_of(const msum_term& t) {
    ex p = t.rest * make_phase(t.exponent);
    for (const ex& s : t.threejs) p *= s;
    return p;
}

}  // namespace couplet::network
