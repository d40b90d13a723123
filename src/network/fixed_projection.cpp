#include "network/fixed_projection.hpp"

#include "model/symbols.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

bool has_any(const ex& e, const lst& indices) {
    for (const ex& i : indices)
        if (e.has(i)) return true;
    return false;
}

}  // namespace

std::optional<ex> fix_projection_by_vertex(const msum_term& term) {
    for (const line& l : term.lines) {
        if (l.ends[0] == l.ends[1]) continue;  // a loop: the vertex does not fix it
        for (int end : l.ends) {
            const ex& s = term.threejs[end];
            int slot = -1;
            bool others_free = true;
            for (int c = 3; c < 6; ++c) {
                if (s.op(c).has(l.projection))
                    slot = c;
                else if (has_any(s.op(c), term.summed))
                    others_free = false;
            }
            if (slot < 0 || !others_free) continue;
            ex others = s.op(3) + s.op(4) + s.op(5) - s.op(slot);
            ex sign = s.op(slot).coeff(l.projection, 1);  // +-1
            ex value = (-others / sign).expand();
            lst kept;
            for (const ex& i : term.summed)
                if (!i.is_equal(l.projection)) kept.append(i);
            ex body = summand_of(term).subs(l.projection == value);
            if (kept.nops() == 0) return body;
            return make_sum(body, kept);
        }
    }
    return std::nullopt;
}

}  // namespace couplet::network
