#include "couplet/model/structure.hpp"

#include "couplet/model/symbols.hpp"

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
        case symbol_kind::triangle: out.triads.push_back({f.op(0), f.op(1), f.op(2)}); return;
        case symbol_kind::delta: out.zeros.push_back(f.op(0) - f.op(1)); return;
        default: return;
    }
}

}  // namespace couplet
