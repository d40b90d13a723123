#include "phase/phase_lattice.hpp"

#include "phase/phase_level.hpp"

#include <cstdint>

namespace couplet::phase::detail {

namespace {

std::int64_t mod(__int128 x, std::int64_t q) {
    // 128-bit division is slow; most sums fit in 64 bits.
    const bool small = x >= INT64_MIN && x <= INT64_MAX;
    const auto r = small ? static_cast<std::int64_t>(x) % q : static_cast<std::int64_t>(x % q);
    return r < 0 ? r + q : r;
}

}  // namespace

phase_lattice::phase_lattice(std::size_t n, std::vector<integer_constraint> constraints, witness_geometry geometry)
    : n_(n), constraints_(std::move(constraints)), geometry_(std::move(geometry)) {
    points_ = solve_affine_lattice(n_, constraints_);
    for (const auto& c : constraints_) {
        std::vector<std::pair<std::size_t, std::int64_t>> row;
        for (std::size_t i = 0; i < n_; ++i)
            if (!cln::zerop(c.row[i])) row.emplace_back(i, to_int64(c.row[i]));
        sparse_rows_.push_back(std::move(row));
        small_moduli_.push_back(to_int64(c.modulus));
    }
    if (points_.empty) return;
    evaluation_.assign(n_ + 1, int_vector(rank() + 1, 0));
    for (std::size_t i = 0; i < n_; ++i) {
        evaluation_[i][0] = points_.origin[i];
        for (std::size_t k = 0; k < rank(); ++k) evaluation_[i][k + 1] = points_.basis[k][i];
    }
    evaluation_[n_][0] = 1;
}

phase_lattice::~phase_lattice() = default;

int_vector phase_lattice::signature(const int_vector& w, std::int64_t q) const {
    std::vector<__int128> sum(rank() + 1, 0);
    for (std::size_t i = 0; i <= n_; ++i) {
        if (w[i] == 0) continue;
        for (std::size_t k = 0; k <= rank(); ++k) sum[k] += static_cast<__int128>(w[i]) * evaluation_[i][k];
    }
    int_vector out(rank() + 1);
    for (std::size_t k = 0; k <= rank(); ++k) out[k] = mod(sum[k], q);
    return out;
}

bool phase_lattice::is_direction(const int_vector& z) const {
    for (std::size_t c = 0; c < sparse_rows_.size(); ++c) {
        __int128 s = 0;
        for (const auto& [i, r] : sparse_rows_[c]) s += static_cast<__int128>(r) * z[i];
        const std::int64_t m = small_moduli_[c];
        if (m == 0 ? s != 0 : mod(s, m) != 0) return false;
    }
    return true;
}

const phase_level& phase_lattice::level(std::int64_t level) const {
    auto& slot = levels_[level];
    if (!slot) slot = std::make_unique<phase_level>(*this, level);
    return *slot;
}

}  // namespace couplet::phase::detail
