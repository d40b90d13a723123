#include "verify/gf2.hpp"

namespace couplet::verify::gf2 {

namespace {

// Reduced row echelon form in place over the first `columns` bits; returns the pivot column
// of each remaining row (rows without a pivot in those columns are moved to the end).
std::vector<std::size_t> reduce(std::vector<bits>& rows, std::size_t columns) {
    std::vector<std::size_t> pivots;
    std::size_t r = 0;
    for (std::size_t c = 0; c < columns && r < rows.size(); ++c) {
        std::size_t p = r;
        while (p < rows.size() && !rows[p].get(c)) ++p;
        if (p == rows.size()) continue;
        std::swap(rows[r], rows[p]);
        for (std::size_t k = 0; k < rows.size(); ++k)
            if (k != r && rows[k].get(c)) rows[k] ^= rows[r];
        pivots.push_back(c);
        ++r;
    }
    return pivots;
}

}  // namespace

std::optional<bits> solve(const std::vector<bits>& rows, const std::vector<bool>& rhs, std::size_t unknowns) {
    std::vector<bits> augmented;
    augmented.reserve(rows.size());
    for (std::size_t k = 0; k < rows.size(); ++k) {
        bits row(unknowns + 1);
        for (std::size_t c = 0; c < unknowns; ++c) row.set(c, rows[k].get(c));
        row.set(unknowns, rhs[k]);
        augmented.push_back(row);
    }
    std::vector<std::size_t> pivots = reduce(augmented, unknowns);
    for (std::size_t k = pivots.size(); k < augmented.size(); ++k)
        if (augmented[k].get(unknowns)) return std::nullopt;  // 0 = 1
    bits x(unknowns);
    for (std::size_t k = 0; k < pivots.size(); ++k) x.set(pivots[k], augmented[k].get(unknowns));
    return x;
}

std::vector<bits> null_space(const std::vector<bits>& rows, std::size_t unknowns) {
    std::vector<bits> reduced = rows;
    std::vector<std::size_t> pivots = reduce(reduced, unknowns);
    std::vector<bool> is_pivot(unknowns, false);
    for (std::size_t c : pivots) is_pivot[c] = true;
    std::vector<bits> basis;
    for (std::size_t f = 0; f < unknowns; ++f) {
        if (is_pivot[f]) continue;
        bits v(unknowns);
        v.set(f, true);
        for (std::size_t k = 0; k < pivots.size(); ++k)
            if (reduced[k].get(f)) v.set(pivots[k], true);
        basis.push_back(v);
    }
    return basis;
}

}  // namespace couplet::verify::gf2
