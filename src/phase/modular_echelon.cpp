#include "phase/modular_echelon.hpp"

#include <numeric>
#include <stdexcept>
#include <tuple>

namespace couplet::phase::detail {

namespace {

// s*a + t*b == g == gcd(a, b), for a, b >= 0.
std::tuple<std::int64_t, std::int64_t, std::int64_t> extended_gcd(std::int64_t a, std::int64_t b) {
    std::int64_t s0 = 1, s1 = 0, t0 = 0, t1 = 1;
    while (b != 0) {
        const std::int64_t quotient = a / b;
        std::tie(a, b) = std::make_tuple(b, a - quotient * b);
        std::tie(s0, s1) = std::make_tuple(s1, s0 - quotient * s1);
        std::tie(t0, t1) = std::make_tuple(t1, t0 - quotient * t1);
    }
    return {a, s0, t0};
}

std::int64_t mod(std::int64_t x, std::int64_t q) {
    const std::int64_t r = x % q;
    return r < 0 ? r + q : r;
}

// A unit u of Z/q with u*a == gcd(a, q) (mod q): it scales a pivot to a divisor of q without
// changing the module the row generates.
std::int64_t normalizing_unit(std::int64_t a, std::int64_t q) {
    const std::int64_t g = std::gcd(a, q);
    const std::int64_t reduced_q = q / g;
    const std::int64_t inverse = mod(std::get<1>(extended_gcd(mod(a / g, reduced_q), reduced_q)), reduced_q);
    for (std::int64_t u = inverse; u < q + reduced_q; u += reduced_q)
        if (u != 0 && std::gcd(u, q) == 1) return mod(u, q);
    throw std::logic_error("phase: no normalizing unit");
}

void add_multiple(int_vector& target, std::int64_t factor, const int_vector& source, std::int64_t q) {
    if (factor == 0) return;
    for (std::size_t i = 0; i < target.size(); ++i) target[i] = mod(target[i] + factor * source[i], q);
}

}  // namespace

modular_echelon::modular_echelon(std::int64_t modulus, std::size_t width, std::size_t tracked)
    : q_(modulus), width_(width), tracked_(tracked), pivots_(width) {
    if (modulus < 2 || modulus > (std::int64_t{1} << 20))
        throw std::invalid_argument("phase: echelon modulus out of range");
}

void modular_echelon::normalize(int_vector& row) const {
    for (auto& x : row) x = mod(x, q_);
}

void modular_echelon::insert(int_vector row) {
    if (row.size() != width_ + tracked_) throw std::invalid_argument("phase: echelon row has wrong size");
    std::vector<int_vector> pending{std::move(row)};
    while (!pending.empty()) {
        int_vector next = std::move(pending.back());
        pending.pop_back();
        insert_one(std::move(next), pending);
    }
}

void modular_echelon::insert_one(int_vector x, std::vector<int_vector>& pending) {
    normalize(x);
    // Every new or changed pivot also sends its annihilator multiple (q/g) * pivot down the
    // columns; that is what makes the echelon form a Howell form.
    auto push_annihilator = [&](const int_vector& pivot, std::int64_t g) {
        if (g == 1) return;
        int_vector multiple = pivot;
        for (auto& e : multiple) e = mod(e * (q_ / g), q_);
        pending.push_back(std::move(multiple));
    };
    for (std::size_t c = 0; c < width_; ++c) {
        if (x[c] == 0) continue;
        if (!pivots_[c]) {
            const std::int64_t unit = normalizing_unit(x[c], q_);
            for (auto& e : x) e = mod(e * unit, q_);
            push_annihilator(x, x[c]);
            pivots_[c] = std::move(x);
            return;
        }
        int_vector& pivot = *pivots_[c];
        const std::int64_t d = pivot[c];
        if (x[c] % d == 0) {
            add_multiple(x, -(x[c] / d), pivot, q_);
            continue;
        }
        // Unimodular 2x2 step: the pivot becomes gcd(d, x[c]) and x loses its entry at c.
        const auto [g, s, t] = extended_gcd(d, x[c]);
        int_vector combined(x.size());
        for (std::size_t i = 0; i < x.size(); ++i) combined[i] = mod(s * pivot[i] + t * x[i], q_);
        int_vector rest(x.size());
        for (std::size_t i = 0; i < x.size(); ++i) rest[i] = mod((x[c] / g) * pivot[i] - (d / g) * x[i], q_);
        pivot = std::move(combined);
        push_annihilator(pivot, g);
        x = std::move(rest);
    }
    bool passenger_nonzero = false;
    for (std::size_t i = width_; i < x.size(); ++i) passenger_nonzero = passenger_nonzero || x[i] != 0;
    if (passenger_nonzero) kernel_.emplace_back(x.begin() + static_cast<std::ptrdiff_t>(width_), x.end());
}

int_vector modular_echelon::reduce(int_vector row) const {
    if (row.size() != width_ + tracked_) throw std::invalid_argument("phase: echelon row has wrong size");
    normalize(row);
    for (std::size_t c = 0; c < width_; ++c) {
        if (!pivots_[c] || row[c] == 0) continue;
        const int_vector& pivot = *pivots_[c];
        add_multiple(row, -(row[c] / pivot[c]), pivot, q_);
    }
    return row;
}

std::optional<int_vector> modular_echelon::preimage(const int_vector& target) const {
    if (target.size() != width_) throw std::invalid_argument("phase: preimage target has wrong size");
    int_vector x(target);
    x.resize(width_ + tracked_, 0);
    normalize(x);
    for (std::size_t c = 0; c < width_; ++c) {
        if (x[c] == 0) continue;
        if (!pivots_[c]) return std::nullopt;
        const int_vector& pivot = *pivots_[c];
        if (x[c] % pivot[c] != 0) return std::nullopt;
        add_multiple(x, -(x[c] / pivot[c]), pivot, q_);
    }
    // x = target - combination, with a vanished echelonized part: the combination's passengers
    // are the negated remainder.
    int_vector passengers(x.begin() + static_cast<std::ptrdiff_t>(width_), x.end());
    for (auto& e : passengers) e = mod(-e, q_);
    return passengers;
}

std::vector<int_vector> modular_echelon::rows() const {
    std::vector<int_vector> out;
    for (const auto& p : pivots_)
        if (p) out.push_back(*p);
    return out;
}

}  // namespace couplet::phase::detail
