// The phase group of one problem: which exponents X make (-1)^X an integer power of -1 for every
// admissible assignment, when two exponents give the same sign everywhere, and the most readable
// exponent of each class.
//
// Quantum numbers take values in (1/2)Z.  Coupling symbols contribute congruences (a triad's sum
// is an integer, j - m is an integer, declared parities) and exact equations (a 3j's m-sum).
// Inequalities (triangles, |m| <= j, j >= 0) are ignored: every parity pattern allowed by the
// congruences and equations is realized by large enough values, so they cannot change a verdict.
//
// That premise fails where inequalities pin a value that cannot grow.  The bound of a projection
// of a constant (|m| <= J) is taken into account: its 2J+1 values are enumerated against the
// equations (bounded_projections.hpp), so an m-sum m4 + 2 m3 = 0 with m4 a projection of 1 does
// force m3 = 0 here.  Other pins are not seen: a triad (1/2, 1/2, b+1) forces b = 0.  "equal"
// and "integer" are always sound (the lattice contains every admissible point); in such schemes
// "not_equal" / "not_integer" may be answered where the pinned values would agree, and the
// witness then breaks an inequality.  A caller who knows the pinned value can state it with
// add_zero.
//
// Queries are const but fill caches (not thread-safe; GiNaC is single-threaded anyway).  Copies
// share the caches until one of them is changed.
#pragma once

#include "phase/linear_form.hpp"

#include <cstddef>
#include <map>
#include <memory>
#include <optional>
#include <stdexcept>
#include <string>
#include <vector>

namespace couplet::phase {

enum class parity { integer, half_odd, unknown };

enum class verdict { equal, not_equal, not_integer };

struct integrality {
    bool integer = true;
    // When not integer: an assignment of every declared variable that satisfies all congruences
    // and equations (and, where the search managed, j >= 0, |m| <= j and the triangles) at
    // which the exponent is not an integer.
    std::optional<assignment> witness;
};

struct comparison {
    verdict result = verdict::equal;
    // not_equal: a point where (-1)^X != (-1)^Y;  not_integer: a point where X or Y (the first
    // that fails, X before Y) is not an integer.  Same admissibility as for integrality.
    std::optional<assignment> witness;
};

// Thrown by queries that mention a name never declared (directly or through a constraint):
// an exponent in a variable the context knows nothing about is a bug of the caller.
class unknown_variable : public std::invalid_argument {
public:
    explicit unknown_variable(const std::string& name);
    const std::string& name() const { return name_; }

private:
    std::string name_;
};

namespace detail {
class phase_lattice;
}

class context {
public:
    context();
    ~context();
    context(const context&);
    context& operator=(const context&);
    context(context&&) noexcept;
    context& operator=(context&&) noexcept;

    // Declaration order is the symbol order of every printed exponent.  Declaring an angular
    // momentum again is allowed when the parity agrees, or to refine `unknown` (for instance for
    // a name first met in a triad); a conflicting parity, or a projection, throws
    // std::invalid_argument.
    void declare_angular(const std::string& name, parity p = parity::unknown);
    // m is a projection of the angular momentum `owner` (a linear form such as j or j+1/2):
    // owner - m is an integer, and for a constant owner J also |m| <= J.  Undeclared names inside
    // `owner` become angular momenta of unknown parity.  Throws std::invalid_argument when `name`
    // is already declared.
    void declare_projection(const std::string& name, const linear_form& owner);

    // The slots of a 3j top row, of each 6j/9j triad, or any other coupled triple: a+b+c is an
    // integer.  The slot forms are remembered for the triangle check of witnesses.  Names not
    // yet declared become angular momenta of unknown parity, in order of first mention.
    void add_triad(const linear_form& a, const linear_form& b, const linear_form& c);
    // A 3j bottom row: a+b+c == 0 exactly.  Undeclared names as for add_triad.
    void add_zero_sum(const linear_form& a, const linear_form& b, const linear_form& c);
    // General constraints for anything the three above do not cover (e.g. the j - m of a column
    // whose slots are both forms): x is an integer; x == 0 exactly.
    void add_integer(const linear_form& x);
    void add_zero(const linear_form& x);

    const std::vector<std::string>& variables() const { return names_; }
    bool is_declared(const std::string& name) const { return index_.count(name) != 0; }
    bool is_projection(const std::string& name) const;
    parity parity_of(const std::string& name) const;  // unknown for projections

    // False when the congruences and equations admit no assignment at all; then every exponent
    // counts as integer, all are equal, and every canonical form is 0.
    bool satisfiable() const;
    // Whether the values satisfy every congruence and equation (not the inequalities).
    // Throws std::out_of_range when a declared variable has no value.
    bool admits(const assignment& values) const;

    bool is_integer(const linear_form& x) const;
    integrality check_integer(const linear_form& x) const;
    // Verdict only: the fast path for matching.
    verdict equal(const linear_form& x, const linear_form& y) const;
    // Verdict with a witness point (slower: it searches for a small admissible point).
    comparison compare(const linear_form& x, const linear_form& y) const;

    // The readable representative of X's class: equal to X (as a phase) for every X, and
    // canonical(X) == canonical(Y) exactly when equal(X, Y) == verdict::equal for integer X, Y
    // (for classes that need coefficients with denominators above 8 the printed level may
    // follow the input).  Coefficients lie in (-2, 2], the constant in (-1, 1], so integer
    // constants fold to 0 or 1.  The order is in readability.hpp, the search in
    // representative_search.hpp.  Merge a product of phases by adding the exponents first.
    linear_form canonical(const linear_form& x) const;

    // x printed in declaration order.
    std::string to_string(const linear_form& x) const { return x.to_string(names_); }

private:
    struct variable_info {
        bool projection = false;
        parity par = parity::unknown;
        linear_form owner;
    };

    std::size_t declare_if_new(const std::string& name);
    void declare_names_in(const linear_form& f);
    void invalidate();
    const detail::phase_lattice& lattice() const;

    std::vector<std::string> names_;
    std::map<std::string, std::size_t> index_;
    std::vector<variable_info> info_;
    std::vector<linear_form> integer_forms_;
    std::vector<linear_form> zero_forms_;
    std::vector<std::vector<linear_form>> triads_;
    // Built on the first query after a change; queries are const and reuse it.
    mutable std::shared_ptr<detail::phase_lattice> lattice_;
};

}  // namespace couplet::phase
