#include "phase/phase_level.hpp"

#include "phase/phase_lattice.hpp"
#include "phase/representative_search.hpp"

#include <numeric>
#include <set>
#include <stdexcept>

namespace couplet::phase::detail {

namespace {

std::int64_t mod(std::int64_t x, std::int64_t q) {
    const std::int64_t r = x % q;
    return r < 0 ? r + q : r;
}

std::int64_t mod_big(const cln::cl_I& x, std::int64_t q) { return to_int64(cln::mod(x, cln::cl_I(q))); }

bool is_zero(const int_vector& v) {
    for (auto x : v)
        if (x != 0) return false;
    return true;
}

}  // namespace

phase_level::phase_level(const phase_lattice& lattice, std::int64_t level)
    : n_(lattice.variables()),
      level_(level),
      q_(4 * level),
      image_(4 * level, lattice.rank() + 1, lattice.variables() + 1),
      null_(4 * level, lattice.variables() + 1) {
    const std::size_t width = lattice.rank() + 1;
    for (const auto& row : lattice.evaluation_matrix()) {
        int_vector reduced(width);
        for (std::size_t k = 0; k < width; ++k) reduced[k] = mod(row[k], q_);
        rows_.push_back(std::move(reduced));
    }
    // Echelonizing (M_i | e_i) yields both the reachable signatures and, from the rows whose
    // signature part cancels, the null module.
    for (std::size_t i = 0; i <= n_; ++i) {
        int_vector row = rows_[i];
        row.resize(width + n_ + 1, 0);
        row[width + i] = 1;
        image_.insert(std::move(row));
    }
    for (std::size_t c = 0; c < n_; ++c) column_order_.push_back(n_ - 1 - c);
    column_order_.push_back(n_);
    auto permuted = [&](const int_vector& w) {
        int_vector p(n_ + 1);
        for (std::size_t c = 0; c <= n_; ++c) p[c] = w[column_order_[c]];
        return p;
    };
    for (const auto& generator : image_.kernel()) null_.insert(permuted(generator));

    std::set<int_vector> moves;
    auto add_move = [&](int_vector w) {
        for (auto& x : w) x = mod(x, q_);
        if (!is_zero(w)) moves.insert(std::move(w));
    };
    for (const auto& c : lattice.constraints()) {
        if (!cln::zerop(c.modulus)) {
            // row . (u, 1) is a multiple of p, so (q / gcd(p, q)) row is 0 mod q everywhere.
            const std::int64_t p = to_int64(c.modulus);
            const std::int64_t k = q_ / std::gcd(p, q_);
            int_vector w;
            for (const auto& x : c.row) w.push_back(mod(k * mod_big(x, q_), q_));
            add_move(std::move(w));
        } else {
            // An exact equation may be scaled by any rational; its primitive integer multiple
            // and that vector's multiples cover everything of this level.
            cln::cl_I g = 0;
            for (const auto& x : c.row) g = cln::gcd(g, x);
            if (cln::zerop(g)) continue;
            for (std::int64_t t = 1; t < q_; ++t) {
                int_vector w;
                for (const auto& x : c.row) w.push_back(mod(t * mod_big(cln::exquo(x, g), q_), q_));
                add_move(std::move(w));
            }
        }
    }
    for (const auto& row : null_.rows()) {
        int_vector w(n_ + 1);
        for (std::size_t c = 0; c <= n_; ++c) w[column_order_[c]] = row[c];
        for (std::int64_t t = 1; t < q_; ++t) {
            int_vector multiple(w);
            for (auto& x : multiple) x = mod(x * t, q_);
            add_move(std::move(multiple));
        }
    }
    moves_.assign(moves.begin(), moves.end());
    for (const auto& m : moves_)
        if (!is_zero(signature(m))) throw std::logic_error("phase: a null move changes the phase");
}

phase_level::~phase_level() = default;

int_vector phase_level::signature(const int_vector& w) const {
    const std::size_t width = rows_.empty() ? 0 : rows_[0].size();
    int_vector s(width, 0);
    for (std::size_t i = 0; i <= n_; ++i) {
        if (w[i] == 0) continue;
        for (std::size_t k = 0; k < width; ++k) s[k] = mod(s[k] + mod(w[i], q_) * rows_[i][k], q_);
    }
    return s;
}

std::optional<int_vector> phase_level::preimage(const int_vector& signature) const {
    return image_.preimage(signature);
}

int_vector phase_level::reduce(const int_vector& w) const {
    int_vector p(n_ + 1);
    for (std::size_t c = 0; c <= n_; ++c) p[c] = w[column_order_[c]];
    p = null_.reduce(std::move(p));
    int_vector out(n_ + 1);
    for (std::size_t c = 0; c <= n_; ++c) out[column_order_[c]] = p[c];
    return out;
}

small_term_tables& phase_level::tables() const {
    if (!tables_) tables_ = build_small_term_tables(*this);
    return *tables_;
}

}  // namespace couplet::phase::detail
