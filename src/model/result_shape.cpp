#include "model/result_shape.hpp"

#include "model/symbols.hpp"

namespace couplet {

result_shape shape_of(const GiNaC::ex& e) {
    result_shape s;
    for (GiNaC::const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
        if (GiNaC::is_a<index_sum>(*it)) s.indices += static_cast<int>(GiNaC::ex_to<index_sum>(*it).indices().nops());
        switch (kind_of(*it)) {
            case symbol_kind::ninej:
                ++s.ninej;
                break;
            case symbol_kind::sixj:
                ++s.sixj;
                break;
            case symbol_kind::threej:
                ++s.threej;
                break;
            default:
                break;
        }
    }
    return s;
}

}  // namespace couplet
