// The quantum numbers of a program: one GiNaC symbol per name, with what the name stands for.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <map>
#include <optional>
#include <string>
#include <vector>

namespace couplet {

// Inferred from the slots a name fills: top rows of 3j/CG and every 6j/9j entry hold angular
// momenta, bottom rows hold projections.  A name seen in no slot stays `unknown`.
enum class qn_role { unknown, angular, projection };
// From `int` / `half` declarations.
enum class qn_parity { any, integer, half_odd };

struct quantum_number {
    std::string name;
    GiNaC::symbol symbol;
    qn_role role = qn_role::unknown;
    qn_parity parity = qn_parity::any;
    std::size_t first_offset = 0;  // first appearance, for messages
    std::size_t role_offset = 0;   // where the role was fixed
    // For a projection: the angular-momentum slot it first filled (j - m is an integer).
    std::optional<GiNaC::ex> owner;
};

class quantum_numbers {
public:
    // The symbol for `name`, created on first use.
    GiNaC::symbol symbol_for(const std::string& name, std::size_t offset);
    const quantum_number* find(const std::string& name) const;
    const quantum_number* find(const GiNaC::symbol& s) const;
    const quantum_number& at(const GiNaC::symbol& s) const;

    // Throws user_error when the name already has the other role.
    void assign_role(const GiNaC::symbol& s, qn_role role, std::size_t offset);
    void set_owner_if_unset(const GiNaC::symbol& s, const GiNaC::ex& owner);
    // Throws user_error when the name was declared with the other parity.
    void declare_parity(const std::string& name, qn_parity parity, std::size_t offset);

    // In order of first appearance: the order printers and the phase algebra use.
    const std::vector<quantum_number>& all() const { return numbers_; }

    // The table as one statement sees it.  Names, symbols, roles and parities belong to the
    // program; which j a projection belongs to does not: statements are independent, and
    // 3j(c, c, 0; M, -M, 0) on one line says nothing about M on the next.  Each projection's
    // owner is therefore taken from the statement's own columns (j, +-m + constant, both outside
    // every sum over their names): the program's owner when the statement pairs m with it too,
    // else the first such column, and none when the statement has no such column.
    quantum_numbers for_statement(const GiNaC::ex& statement) const;

private:
    quantum_number& entry(const GiNaC::symbol& s);
    std::vector<quantum_number> numbers_;
    std::map<std::string, std::size_t> by_name_;
};

const char* describe(qn_role role);

}  // namespace couplet
