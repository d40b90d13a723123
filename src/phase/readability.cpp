#include "phase/readability.hpp"

#include "phase/scaled_form.hpp"

namespace couplet::phase::detail {

namespace {

// Preference rank of a coefficient s / level with s in (-2 level, 2 level].
std::int64_t coefficient_rank(std::int64_t s, std::int64_t level) {
    if (s == level) return 0;
    if (s == 2 * level) return 1;
    if (s == -level) return 2;
    if (s > 0) return 3 + s;
    if (s < 0) return 3 + 2 * level - s;
    return 6 * level + 4;  // absent terms last: forms using earlier variables win ties
}

}  // namespace

std::array<std::int64_t, 4> readability_counts(const std::vector<std::int64_t>& w, std::int64_t level) {
    std::array<std::int64_t, 4> counts{0, 0, 0, 0};
    const std::int64_t q = 4 * level;
    for (std::size_t i = 0; i + 1 < w.size(); ++i) {
        const std::int64_t r = w[i] % q;  // entries of level vectors are kept in [0, q)
        if (r == 0) continue;
        const std::int64_t s = r > 2 * level ? r - q : r;
        ++counts[0];
        counts[1] += s % level != 0;
        counts[2] += s < 0;
        counts[3] += s != level && s != -level;
    }
    return counts;
}

readability_key readability(const std::vector<std::int64_t>& w, std::int64_t level) {
    const std::size_t n = w.size() - 1;
    readability_key key(5 + n + 1, 0);
    for (std::size_t i = 0; i < n; ++i) {
        const std::int64_t s = signed_coefficient(w[i], level);
        key[5 + i] = coefficient_rank(s, level);
        if (s == 0) continue;
        ++key[0];
        if (s % level != 0) ++key[1];
        if (s < 0) ++key[2];
        if (s != level && s != -level) ++key[3];
    }
    const std::int64_t constant = signed_constant(w[n], level);
    key[4] = constant != 0;
    key[5 + n] = constant >= 0 ? constant : 2 * level - constant;  // 0, 1/2, 1, then -1/2
    return key;
}

}  // namespace couplet::phase::detail
