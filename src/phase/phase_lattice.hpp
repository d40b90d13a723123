// The admissible doubled assignments of one context, u = origin + B t, and everything derived
// from them once: the evaluation matrix that turns an exponent into its signature, and the
// per-level data for canonical forms (built lazily, then kept).
#pragma once

#include "phase/affine_lattice.hpp"
#include "phase/scaled_form.hpp"

#include <array>
#include <cstddef>
#include <cstdint>
#include <map>
#include <memory>
#include <utility>
#include <vector>

namespace couplet::phase::detail {

class phase_level;

// Where a witness should preferably lie: j >= 0, |m| <= j, and the triangle of each triad.
struct witness_geometry {
    std::vector<std::size_t> angular;
    std::vector<std::pair<std::size_t, doubled_form>> projections;  // (m, owner)
    std::vector<std::array<doubled_form, 3>> triads;
};

class phase_lattice {
public:
    phase_lattice(std::size_t n, std::vector<integer_constraint> constraints, witness_geometry geometry);
    ~phase_lattice();

    bool empty() const { return points_.empty; }
    std::size_t variables() const { return n_; }
    std::size_t rank() const { return points_.basis.size(); }
    const affine_lattice& points() const { return points_; }
    const witness_geometry& geometry() const { return geometry_; }

    // Row i (i < n) is (origin_i, basis_1[i], ..., basis_r[i]); row n is (1, 0, ..., 0), so that
    // w . (origin + B t, 1) = (w^T M) . (1, t).
    const std::vector<int_vector>& evaluation_matrix() const { return evaluation_; }

    // w^T M mod q: entry 0 is 2D X at the origin, entry k the change along basis vector k.  X is
    // an integer everywhere iff every entry is 0 mod 2D; two exponents are equal iff their
    // difference has every entry 0 mod 4D.
    int_vector signature(const int_vector& w, std::int64_t q) const;

    // Whether z (n entries) is a difference of two admissible points.
    bool is_direction(const int_vector& z) const;

    // The congruences and equations in integer form, rows over (u, 1).
    const std::vector<integer_constraint>& constraints() const { return constraints_; }

    const phase_level& level(std::int64_t level) const;

private:
    std::size_t n_;
    std::vector<integer_constraint> constraints_;
    // constraints_ as sparse 64-bit rows without the constant, for is_direction.
    std::vector<std::vector<std::pair<std::size_t, std::int64_t>>> sparse_rows_;
    std::vector<std::int64_t> small_moduli_;  // 0 for an equation
    witness_geometry geometry_;
    affine_lattice points_;
    std::vector<int_vector> evaluation_;
    mutable std::map<std::int64_t, std::unique_ptr<phase_level>> levels_;
};

}  // namespace couplet::phase::detail
