// One identity the simplifier applies, whatever applies it: a sum rule or a local rule that
// the matcher finds, a network move, or a rewrite written as code (a delta eliminated, a
// network separated on a cut).  Each has a name, where it is published, and an instance: two
// sides in the identity's own pattern symbols, equal at every admissible assignment, which the
// shared self-test (verify/identity_self_test.hpp) compares by exact evaluation.  Every step of
// a derivation is recorded through the identity that made it, so the trace cannot name a rule
// that has no self-test.
#pragma once

#include <ginac/ginac.h>

#include <array>
#include <cstddef>
#include <string>
#include <utility>

#include "model/quantum.hpp"

namespace couplet {

struct identity {
    std::string name;
    std::string reference;    // a DLMF equation, a handbook section, or "common practice, no source"
    GiNaC::ex left, right;    // the instance
    quantum_numbers numbers;  // the roles, owners and parities of the pattern symbols
};

// Builds an identity's pattern symbols with their roles.
class pattern_table {
public:
    explicit pattern_table(quantum_numbers& numbers) : numbers_(numbers) {}
    GiNaC::symbol angular(const std::string& name, qn_parity parity = qn_parity::any);
    GiNaC::symbol projection(const std::string& name, const GiNaC::symbol& owner);
    // Several angular momenta at once: auto [a, b, c] = table.angulars({"a", "b", "c"}).
    template <std::size_t N>
    std::array<GiNaC::symbol, N> angulars(const char* const (&names)[N]) {
        std::array<GiNaC::symbol, N> out;
        for (std::size_t k = 0; k < N; ++k) out[k] = angular(names[k]);
        return out;
    }

private:
    quantum_numbers& numbers_;
};

// An identity with its name and reference, its instance still to be written.
inline identity named_identity(std::string name, std::string reference) {
    identity id;
    id.name = std::move(name);
    id.reference = std::move(reference);
    return id;
}

// An identity whose `write(table, left, right)` declares its pattern symbols in the table and
// writes the two sides of its instance.
template <class Write>
identity make_identity(std::string name, std::string reference, Write write) {
    identity id = named_identity(std::move(name), std::move(reference));
    pattern_table table(id.numbers);
    write(table, id.left, id.right);
    return id;
}

// One applied identity, for the derivation trace: the term it changed, before and after.
struct derivation_step {
    std::string rule;
    std::string reference;
    GiNaC::ex before, after;
    // Shown as recorded: a trace reduces the phases of every other step for reading, which
    // would hide what the phase reduction itself did.
    bool shown_as_recorded = false;
};

inline derivation_step step_by(const identity& used, const GiNaC::ex& before, const GiNaC::ex& after,
                               bool shown_as_recorded = false) {
    return {used.name, used.reference, before, after, shown_as_recorded};
}

}  // namespace couplet
