#include "model/identity.hpp"

namespace couplet {

GiNaC::symbol pattern_table::angular(const std::string& name, qn_parity parity) {
    GiNaC::symbol s = numbers_.symbol_for(name, 0);
    numbers_.assign_role(s, qn_role::angular, 0);
    if (parity != qn_parity::any) numbers_.declare_parity(name, parity, 0);
    return s;
}

GiNaC::symbol pattern_table::projection(const std::string& name, const GiNaC::symbol& owner) {
    GiNaC::symbol s = numbers_.symbol_for(name, 0);
    numbers_.assign_role(s, qn_role::projection, 0);
    numbers_.set_owner_if_unset(s, owner);
    return s;
}

}  // namespace couplet
