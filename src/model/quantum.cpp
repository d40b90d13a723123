#include "couplet/model/quantum.hpp"

#include <algorithm>
#include <stdexcept>

#include "couplet/model/structure.hpp"
#include "couplet/model/symbols.hpp"
#include "couplet/source.hpp"

namespace couplet {

const char* describe(qn_role role) {
    switch (role) {
        case qn_role::angular: return "an angular momentum";
        case qn_role::projection: return "a projection";
        default: return "a plain variable";
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

const quantum_number* quantum_numbers::find(const GiNaC::symbol& s) const {
    return find(s.get_name());
}

const quantum_number& quantum_numbers::at(const GiNaC::symbol& s) const {
    if (const quantum_number* q = find(s)) return *q;
    throw std::logic_error("unknown quantum number " + s.get_name());
}

quantum_number& quantum_numbers::entry(const GiNaC::symbol& s) {
    return numbers_[by_name_.at(s.get_name())];
}

void quantum_numbers::assign_role(const GiNaC::symbol& s, qn_role role, std::size_t offset) {
    quantum_number& q = entry(s);
    if (q.role == qn_role::unknown) {
        q.role = role;
        q.role_offset = offset;
        return;
    }
    if (q.role != role)
        throw user_error(offset, "'" + q.name + "' is used here as " + describe(role) +
                                     ", but it is " + describe(q.role) + " elsewhere");
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

namespace {

using GiNaC::ex;

// The columns (j, +-m + constant) of a statement whose names are all free where they stand,
// by the name of m, in walk order.
class column_walk {
public:
    std::map<std::string, std::vector<ex>> owners;

    void walk(const ex& e) {
        if (GiNaC::is_a<index_sum>(e)) {
            const auto& s = GiNaC::ex_to<index_sum>(e);
            const std::size_t depth = bound_.size();
            for (const ex& i : s.indices()) bound_.push_back(GiNaC::ex_to<GiNaC::symbol>(i).get_name());
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
        for (auto it = form.preorder_begin(); it != form.preorder_end(); ++it)
            if (GiNaC::is_a<GiNaC::symbol>(*it) &&
                std::find(bound_.begin(), bound_.end(), GiNaC::ex_to<GiNaC::symbol>(*it).get_name()) != bound_.end())
                return false;
        return true;
    }

    void note(const ex& j, const ex& m) {
        if (!free_here(j) || !free_here(m)) return;
        const ex x = m.expand();
        std::vector<GiNaC::symbol> names;
        for (auto it = x.preorder_begin(); it != x.preorder_end(); ++it)
            if (GiNaC::is_a<GiNaC::symbol>(*it)) names.push_back(GiNaC::ex_to<GiNaC::symbol>(*it));
        if (names.empty()) return;
        for (const auto& n : names)
            if (!n.is_equal(names.front())) return;
        // j - m is an integer only when m enters with coefficient +-1 (a slot 2m says j - 2m).
        const ex rest = x - x.coeff(names.front(), 1) * names.front();
        const ex c = x.coeff(names.front(), 1);
        if (!GiNaC::is_a<GiNaC::numeric>(rest) || !(c.is_equal(1) || c.is_equal(-1))) return;
        owners[names.front().get_name()].push_back(j);
    }

    std::vector<std::string> bound_;
};

}  // namespace

quantum_numbers quantum_numbers::for_statement(const GiNaC::ex& statement) const {
    column_walk columns;
    columns.walk(statement);
    quantum_numbers out = *this;
    for (quantum_number& q : out.numbers_) {
        if (q.role != qn_role::projection) continue;
        auto it = columns.owners.find(q.name);
        if (it == columns.owners.end()) {
            q.owner.reset();
            continue;
        }
        const bool program_owner_here =
            q.owner && std::any_of(it->second.begin(), it->second.end(),
                                   [&](const ex& j) { return (j - *q.owner).expand().is_zero(); });
        if (!program_owner_here) q.owner = it->second.front();
    }
    return out;
}

}  // namespace couplet
