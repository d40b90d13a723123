#include "model/quantum.hpp"

#include <algorithm>
#include <map>
#include <stdexcept>

#include "model/same_value.hpp"
#include "model/structure.hpp"
#include "source/source.hpp"

namespace couplet {

const char* describe(qn_role role) {
    switch (role) {
        case qn_role::angular:
            return "an angular momentum";
        case qn_role::projection:
            return "a projection";
        default:
            return "a plain variable";
    }
}

GiNaC::symbol quantum_numbers::symbol_for(const std::string& name, std::size_t offset) {
    auto it = by_name_.find(name);
    if (it != by_name_.end()) return numbers_[it->second].symbol;
    quantum_number q;
    q.name = name;
    q.symbol = GiNaC::symbol(name);
    q.first_offset = offset;
    by_name_.emplace(name, numbers_.size());
    numbers_.push_back(q);
    return q.symbol;
}

const quantum_number* quantum_numbers::find(const std::string& name) const {
    auto it = by_name_.find(name);
    return it == by_name_.end() ? nullptr : &numbers_[it->second];
}

const quantum_number* quantum_numbers::find(const GiNaC::symbol& s) const { return find(s.get_name()); }

const quantum_number& quantum_numbers::at(const GiNaC::symbol& s) const {
    if (const quantum_number* q = find(s)) return *q;
    throw std::logic_error("unknown quantum number " + s.get_name());
}

quantum_number& quantum_numbers::entry(const GiNaC::symbol& s) { return numbers_[by_name_.at(s.get_name())]; }

void quantum_numbers::assign_role(const GiNaC::symbol& s, qn_role role, std::size_t offset) {
    quantum_number& q = entry(s);
    if (q.role == qn_role::unknown) {
        q.role = role;
        q.role_offset = offset;
        return;
    }
    if (q.role != role)
        throw user_error(offset, "'" + q.name + "' is used here as " + describe(role) + ", but it is " +
                                     describe(q.role) + " elsewhere");
}

void quantum_numbers::set_owner_if_unset(const GiNaC::symbol& s, const GiNaC::ex& owner) {
    quantum_number& q = entry(s);
    if (!q.owner) q.owner = owner;
}

void quantum_numbers::declare_parity(const std::string& name, qn_parity parity, std::size_t offset) {
    quantum_number& q = entry(symbol_for(name, offset));
    if (q.parity != qn_parity::any && q.parity != parity)
        throw user_error(offset, "'" + name + "' is declared both 'int' and 'half'");
    q.parity = parity;
}

quantum_numbers quantum_numbers::for_statement(const GiNaC::ex& statement) const {
    std::map<std::string, std::vector<GiNaC::ex>> owners;  // by the name of m, in walk order
    for (const projection_column& c : free_projection_columns(statement)) owners[c.name.get_name()].push_back(c.j);
    quantum_numbers out = *this;
    for (quantum_number& q : out.numbers_) {
        if (q.role != qn_role::projection) continue;
        auto it = owners.find(q.name);
        if (it == owners.end()) {
            q.owner.reset();
            continue;
        }
        const bool program_owner_here =
            q.owner && std::any_of(it->second.begin(), it->second.end(),
                                   [&](const GiNaC::ex& j) { return same_value(j, *q.owner); });
        if (!program_owner_here) q.owner = it->second.front();
    }
    return out;
}

}  // namespace couplet
