#include "phase/witness_search.hpp"

#include <algorithm>
#include <cmath>
#include <optional>
#include <set>
#include <utility>

namespace couplet::phase::detail {

namespace {

bool keeps_property(const int_vector& w, const int_vector& z, std::int64_t modulus) {
    __int128 s = 0;
    for (std::size_t i = 0; i < z.size(); ++i)
        if (z[i] != 0) s += static_cast<__int128>(w[i]) * z[i];
    return s % modulus == 0;
}

// One of each +-pair of directions that keep the witness; the walk tries both signs.
class move_set {
public:
    move_set(const phase_lattice& lattice, const int_vector& w, std::int64_t modulus)
        : lattice_(lattice), w_(w), modulus_(modulus) {}
    void offer(const int_vector& z) {
        bool nonzero = false;
        for (auto x : z) nonzero = nonzero || x != 0;
        if (!nonzero || !lattice_.is_direction(z) || !keeps_property(w_, z, modulus_)) return;
        int_vector negated(z);
        for (auto& x : negated) x = -x;
        moves_.insert(std::max(z, negated));
    }
    std::vector<int_vector> take() const { return {moves_.begin(), moves_.end()}; }

private:
    const phase_lattice& lattice_;
    const int_vector& w_;
    std::int64_t modulus_;
    std::set<int_vector> moves_;
};

// Short directions: multiples of basis vectors, and steps of one or two variables that share a
// constraint (a j with its m, two m of one m-sum, ...).
std::vector<int_vector> short_moves(const phase_lattice& lattice, const int_vector& w, std::int64_t modulus) {
    const std::size_t n = lattice.variables();
    move_set candidates(lattice, w, modulus);
    auto offer = [&](const int_vector& z) { candidates.offer(z); };
    const auto& basis = lattice.points().basis;
    for (std::size_t k = 0; k < basis.size(); ++k) {
        for (std::int64_t f : {1, 2, 4}) {
            int_vector z(basis[k]);
            for (auto& x : z) x *= f;
            offer(z);
        }
    }
    std::vector<std::vector<bool>> related(n, std::vector<bool>(n, false));
    for (const auto& c : lattice.constraints())
        for (std::size_t i = 0; i < n; ++i)
            for (std::size_t j = i + 1; j < n; ++j)
                if (!cln::zerop(c.row[i]) && !cln::zerop(c.row[j])) related[i][j] = true;
    for (std::size_t i = 0; i < n; ++i) {
        for (std::int64_t f : {1, 2, 4, 8}) {
            int_vector z(n, 0);
            z[i] = f;
            offer(z);
        }
        for (std::size_t j = i + 1; j < n; ++j) {
            if (!related[i][j]) continue;
            for (std::int64_t f : {1, 2, 4})
                for (int sign : {1, -1}) {
                    int_vector z(n, 0);
                    z[i] = f;
                    z[j] = sign * f;
                    offer(z);
                }
        }
    }
    return candidates.take();
}

// Sums and differences of two basis vectors, for when no short move helps any more.
std::vector<int_vector> combined_moves(const phase_lattice& lattice, const int_vector& w, std::int64_t modulus) {
    move_set candidates(lattice, w, modulus);
    const auto& basis = lattice.points().basis;
    for (std::size_t k = 0; k < basis.size(); ++k)
        for (std::size_t l = k + 1; l < basis.size(); ++l)
            for (int sign : {1, -1}) {
                int_vector z(basis[k]);
                for (std::size_t i = 0; i < z.size(); ++i) z[i] += sign * basis[l][i];
                candidates.offer(z);
            }
    return candidates.take();
}

std::pair<double, double> witness_cost(const witness_geometry& geometry, const int_vector& u) {
    double size = 0;
    for (auto x : u) size += std::abs(static_cast<double>(x));
    return {inequality_violation(geometry, u), size};
}

}  // namespace

double inequality_violation(const witness_geometry& geometry, const int_vector& u) {
    double violation = 0;
    for (std::size_t j : geometry.angular) violation += std::max(0.0, -static_cast<double>(u[j]));
    for (const auto& [m, owner] : geometry.projections) {
        const double j = owner.value(u);
        violation += std::max(0.0, std::abs(static_cast<double>(u[m])) - j);
    }
    for (const auto& triad : geometry.triads) {
        const double a = triad[0].value(u), b = triad[1].value(u), c = triad[2].value(u);
        violation += std::max(0.0, -a) + std::max(0.0, -b) + std::max(0.0, -c);
        violation += std::max(0.0, std::abs(a - b) - c) + std::max(0.0, c - a - b);
    }
    return violation;
}

int_vector polish_witness(const phase_lattice& lattice, int_vector start, const int_vector& w, std::int64_t modulus) {
    const witness_geometry& geometry = lattice.geometry();
    int_vector current = std::move(start);
    auto current_cost = witness_cost(geometry, current);
    // Steepest descent; the long moves are built (quadratic in the rank) only once the short
    // ones are exhausted, and then kept.
    const std::vector<int_vector> short_set = short_moves(lattice, w, modulus);
    std::optional<std::vector<int_vector>> long_set;
    for (int round = 0; round < 1000; ++round) {
        std::optional<int_vector> better;
        auto better_cost = current_cost;
        auto try_moves = [&](const std::vector<int_vector>& moves) {
            for (const auto& z : moves)
                for (int sign : {1, -1}) {
                    int_vector candidate(current);
                    for (std::size_t i = 0; i < candidate.size(); ++i) candidate[i] += sign * z[i];
                    const auto cost = witness_cost(geometry, candidate);
                    if (cost < better_cost) {
                        better_cost = cost;
                        better = std::move(candidate);
                    }
                }
        };
        try_moves(short_set);
        if (!better) {
            if (!long_set) long_set = combined_moves(lattice, w, modulus);
            try_moves(*long_set);
        }
        if (!better) break;
        current = std::move(*better);
        current_cost = better_cost;
    }
    return current;
}

}  // namespace couplet::phase::detail
