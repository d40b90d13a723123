// Echelon form over Z/q with the Howell property, so that reduction modulo a submodule gives
// one representative per coset (q need not be prime: the phase algebra works mod 4D).
#pragma once

#include <cstddef>
#include <cstdint>
#include <optional>
#include <vector>

namespace couplet::phase::detail {

using int_vector = std::vector<std::int64_t>;

class modular_echelon {
public:
    // Rows have `width` echelonized entries followed by `tracked` passenger entries, which record
    // how each row was combined from the inserted ones.
    modular_echelon(std::int64_t modulus, std::size_t width, std::size_t tracked = 0);

    void insert(int_vector row);

    // The representative of row + span with every pivot entry in [0, pivot) and all entries in
    // [0, q); two rows in the same coset reduce to the same vector.
    int_vector reduce(int_vector row) const;

    // Some combination x of the inserted rows whose echelonized part equals `target`: returns
    // x's passenger part, or nothing when target is not in the span.
    std::optional<int_vector> preimage(const int_vector& target) const;

    // Passenger parts of combinations whose echelonized part vanished: together with q Z^k
    // they generate the kernel of the map inserted-row -> echelonized part.
    const std::vector<int_vector>& kernel() const { return kernel_; }

    // The pivot rows, in column order.
    std::vector<int_vector> rows() const;

    std::int64_t modulus() const { return q_; }

private:
    void normalize(int_vector& row) const;
    void insert_one(int_vector row, std::vector<int_vector>& pending);

    std::int64_t q_;
    std::size_t width_, tracked_;
    std::vector<std::optional<int_vector>> pivots_;
    std::vector<int_vector> kernel_;
};

}  // namespace couplet::phase::detail
