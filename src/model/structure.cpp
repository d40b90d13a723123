#include "model/structure.hpp"

#include <algorithm>
#include <optional>
#include <string>

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

void add_structure(const ex& f, coupling_structure& out) {
    switch (kind_of(f)) {
        case symbol_kind::threej:
            out.triads.push_back({f.op(0), f.op(1), f.op(2)});
            for (int k = 0; k < 3; ++k) out.projections.emplace_back(f.op(k), f.op(3 + k));
            out.zeros.push_back(f.op(3) + f.op(4) + f.op(5));
            return;
        case symbol_kind::clebsch_gordan:  // <j1 m1, j2 m2 | J M>
            out.triads.push_back({f.op(0), f.op(2), f.op(4)});
            for (int k = 0; k < 3; ++k) out.projections.emplace_back(f.op(2 * k), f.op(2 * k + 1));
            out.zeros.push_back(f.op(1) + f.op(3) - f.op(5));
            return;
        case symbol_kind::sixj:  // {a b c; d e f}: (abc) (aef) (dbf) (dec)
            out.triads.push_back({f.op(0), f.op(1), f.op(2)});
            out.triads.push_back({f.op(0), f.op(4), f.op(5)});
            out.triads.push_back({f.op(3), f.op(1), f.op(5)});
            out.triads.push_back({f.op(3), f.op(4), f.op(2)});
            return;
        case symbol_kind::ninej:  // rows and columns
            for (int r = 0; r < 3; ++r) out.triads.push_back({f.op(3 * r), f.op(3 * r + 1), f.op(3 * r + 2)});
            for (int c = 0; c < 3; ++c) out.triads.push_back({f.op(c), f.op(3 + c), f.op(6 + c)});
            return;
        case symbol_kind::triangle:
            out.triads.push_back({f.op(0), f.op(1), f.op(2)});
            return;
        case symbol_kind::delta:
            out.zeros.push_back(f.op(0) - f.op(1));
            return;
        case symbol_kind::projection:
            out.projections.emplace_back(f.op(0), f.op(1));
            return;
        default:
            return;
    }
}

namespace {

class column_walk {
public:
    std::vector<projection_column> columns;

    void walk(const ex& e) {
        if (is_a<index_sum>(e)) {
            const auto& s = ex_to<index_sum>(e);
            const std::size_t depth = bound_.size();
            for (const ex& i : s.indices()) bound_.push_back(ex_to<symbol>(i).get_name());
            walk(s.body());
            bound_.resize(depth);
            return;
        }
        coupling_structure c;
        add_structure(e, c);
        for (const auto& [j, m] : c.projections) note(j, m);
        for (const ex& child : e) walk(child);
    }

private:
    bool free_here(const ex& form) const {
        for (const_preorder_iterator it = form.preorder_begin(); it != form.preorder_end(); ++it)
            if (is_a<symbol>(*it) &&
                std::find(bound_.begin(), bound_.end(), ex_to<symbol>(*it).get_name()) != bound_.end())
                return false;
        return true;
    }

    void note(const ex& j, const ex& m) {
        if (!free_here(j) || !free_here(m)) return;
        const ex x = m.expand();
        std::optional<symbol> only;
        for (const_preorder_iterator it = x.preorder_begin(); it != x.preorder_end(); ++it) {
            if (!is_a<symbol>(*it)) continue;
            if (only && !only->is_equal(ex_to<symbol>(*it))) return;
            only = ex_to<symbol>(*it);
        }
        if (!only) return;
        const ex c = x.coeff(*only, 1);
        const ex rest = (x - c * *only).expand();
        if (!is_a<numeric>(rest) || !(c.is_equal(1) || c.is_equal(-1))) return;
        columns.push_back({*only, j, m, ex_to<numeric>(rest)});
    }

    std::vector<std::string> bound_;
};

}  // namespace

std::vector<projection_column> free_projection_columns(const ex& e) {
    column_walk w;
    w.walk(e);
    return w.columns;
}

}  // namespace couplet
