// Random pairs of coupling trees over the same leaves, written as a user writes a recoupling
// coefficient: leaves j1..jn in random order, random binary shapes, the left side's couplings
// labelled a1, a2, ... and the right side's b1, b2, ..., both coupled to J.  Shared by the
// property tests and bench/bench_recoupling.cpp.
#pragma once

#include <algorithm>
#include <random>
#include <string>
#include <vector>

namespace couplet::testing {

inline std::string random_tree_text(std::vector<std::string> leaves, char prefix, int& count, std::mt19937& rng) {
    if (leaves.size() == 1) return leaves[0];
    std::uniform_int_distribution<std::size_t> cut(1, leaves.size() - 1);
    const std::size_t k = cut(rng);
    const std::string left =
        random_tree_text({leaves.begin(), leaves.begin() + static_cast<long>(k)}, prefix, count, rng);
    const std::string right =
        random_tree_text({leaves.begin() + static_cast<long>(k), leaves.end()}, prefix, count, rng);
    return "(" + left + ", " + right + ") " + prefix + std::to_string(++count);
}

inline std::string random_side_text(int n, char prefix, std::mt19937& rng) {
    std::vector<std::string> leaves;
    for (int i = 1; i <= n; ++i) leaves.push_back("j" + std::to_string(i));
    std::shuffle(leaves.begin(), leaves.end(), rng);
    std::uniform_int_distribution<int> cut(1, n - 1);
    const int k = cut(rng);
    int count = 0;
    const std::string left = random_tree_text({leaves.begin(), leaves.begin() + k}, prefix, count, rng);
    const std::string right = random_tree_text({leaves.begin() + k, leaves.end()}, prefix, count, rng);
    return left + ", " + right + "; J";
}

// <T1; J | T2; J> with n leaves.
inline std::string random_recoupling_text(int n, std::mt19937& rng) {
    const std::string bra = random_side_text(n, 'a', rng);
    return "<" + bra + " | " + random_side_text(n, 'b', rng) + ">";
}

}  // namespace couplet::testing
