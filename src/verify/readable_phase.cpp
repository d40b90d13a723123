#include "verify/readable_phase.hpp"

#include <algorithm>
#include <cstdint>
#include <optional>

namespace couplet::verify::detail {

namespace {

constexpr long candidate_budget = 1'500'000;

int coefficient_rank(int c) { return c == 1 ? 0 : c == 2 ? 1 : 2; }  // 1 before 2 before -1
int constant_rank(int twice) { return twice == 0 ? 0 : twice == 1 ? 1 : twice == 2 ? 2 : 3; }

std::vector<int> readability_key(const phase_exponent& e) {
    int terms = 0, negative = 0, twos = 0;
    for (int c : e.coefficients) {
        terms += c != 0;
        negative += c == -1;
        twos += c == 2;
    }
    std::vector<int> key{terms, negative, twos, e.twice_constant != 0};
    for (int c : e.coefficients) key.push_back(c == 0 ? 3 : coefficient_rank(c));
    key.push_back(constant_rank(e.twice_constant));
    return key;
}

}  // namespace

bool fits(const phase_exponent& e, const std::vector<phase_class>& classes) {
    for (const phase_class& k : classes) {
        int w = e.twice_constant;
        for (std::size_t i = 0; i < k.residues.size(); ++i) w += e.coefficients[i] * k.residues[i];
        w = ((w % 4) + 4) % 4;
        if (w % 2 != 0) return false;  // not an integer exponent there
        if (k.need != sign_need::any && (w / 2) != static_cast<int>(k.need)) return false;
    }
    return true;
}

phase_exponent readable_phase(const std::vector<phase_class>& classes, const phase_exponent& fallback) {
    const std::size_t n = fallback.coefficients.size();
    const int fallback_terms = static_cast<int>(
        std::count_if(fallback.coefficients.begin(), fallback.coefficients.end(), [](int c) { return c != 0; }));
    static const int coefficient_values[3] = {1, 2, -1};
    static const int constant_values[4] = {0, 1, 2, -1};
    long tried = 0;
    for (int k = 0; k <= fallback_terms; ++k) {
        std::optional<phase_exponent> best;
        std::vector<int> best_key;
        // Positions: every k-subset of the variables, as a selection mask.
        std::vector<bool> chosen(n, false);
        std::fill(chosen.begin(), chosen.begin() + k, true);
        do {
            std::vector<std::size_t> at;
            for (std::size_t i = 0; i < n; ++i)
                if (chosen[i]) at.push_back(i);
            std::vector<int> digit(static_cast<std::size_t>(k), 0);  // base-3 counter over coefficients
            while (true) {
                phase_exponent e{std::vector<int>(n, 0), 0};
                for (std::size_t j = 0; j < at.size(); ++j) e.coefficients[at[j]] = coefficient_values[digit[j]];
                for (int c : constant_values) {
                    e.twice_constant = c;
                    if (++tried > candidate_budget) return best ? *best : fallback;
                    if (!fits(e, classes)) continue;
                    std::vector<int> key = readability_key(e);
                    if (!best || key < best_key) {
                        best = e;
                        best_key = key;
                    }
                }
                std::size_t j = 0;
                while (j < digit.size() && digit[j] == 2) digit[j++] = 0;
                if (j == digit.size()) break;
                ++digit[j];
            }
        } while (std::prev_permutation(chosen.begin(), chosen.end()));
        if (best) return *best;
    }
    return fallback;
}

}  // namespace couplet::verify::detail
