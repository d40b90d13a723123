// Everything about exponents of one level D (forms with coefficients in (1/D)Z), computed mod
// q = 4D: which w realize a given signature, the null module (exponents equal to 0), its Howell
// form for a unique representative per class, and the null moves the readability search uses.
#pragma once

#include "phase/modular_echelon.hpp"

#include <cstddef>
#include <cstdint>
#include <memory>
#include <optional>
#include <string>
#include <unordered_map>
#include <vector>

namespace couplet::phase::detail {

class phase_lattice;
struct small_term_tables;

class phase_level {
public:
    phase_level(const phase_lattice& lattice, std::int64_t level);
    ~phase_level();
    phase_level(const phase_level&) = delete;
    phase_level& operator=(const phase_level&) = delete;

    std::int64_t level() const { return level_; }
    std::int64_t modulus() const { return q_; }
    std::size_t variables() const { return n_; }

    // Row i of the evaluation matrix mod q (row n belongs to the constant).
    const std::vector<int_vector>& rows() const { return rows_; }
    int_vector signature(const int_vector& w) const;

    // Some w of this level with the given signature, if there is one.
    std::optional<int_vector> preimage(const int_vector& signature) const;
    // The unique representative of w's class in Howell-reduced form (entries in [0, q)).
    int_vector reduce(const int_vector& w) const;
    // Nonzero null vectors: the constraints' own generators (2(a+b+c), 2(j-m), multiples of an
    // m-sum, ...) and the Howell rows with their multiples; together they generate the null
    // module.  Deterministic order.
    const std::vector<int_vector>& null_moves() const { return moves_; }

    // Caches of the representative search, owned here so they live as long as the level.
    small_term_tables& tables() const;
    std::unordered_map<std::string, int_vector>& memo() const { return memo_; }

private:
    std::size_t n_;
    std::int64_t level_, q_;
    std::vector<int_vector> rows_;
    modular_echelon image_;
    modular_echelon null_;
    // The Howell form reduces columns left to right; variables enter last-declared first, so
    // the unique representative keeps the early (usually the main) quantum numbers.
    std::vector<std::size_t> column_order_;
    std::vector<int_vector> moves_;
    mutable std::unique_ptr<small_term_tables> tables_;
    mutable std::unordered_map<std::string, int_vector> memo_;
};

}  // namespace couplet::phase::detail
