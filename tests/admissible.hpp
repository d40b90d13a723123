// Random admissible argument sets (doubled, as 2j and 2m) for 3j, 6j and 9j symbols, built so
// that every triad holds: points where the symbols are nonzero are the ones that test anything.
#pragma once

#include "exact/admissibility.hpp"

#include <optional>
#include <random>
#include <vector>

namespace couplet::testing {

class admissible_points {
public:
    admissible_points(unsigned seed, int twice_max) : rng_(seed), max_(twice_max) {}

    int any() { return uniform(0, max_); }

    // A third side for the doubled pair (a, b), or nothing if none fits below the maximum.
    std::optional<int> third(int a, int b) {
        int low = std::abs(a - b), high = std::min(a + b, max_);
        if (low > high) return std::nullopt;
        return low + 2 * uniform(0, (high - low) / 2);
    }

    // A doubled value c with triads (a, b, c) and (d, e, c) both admissible.
    std::optional<int> common_third(int a, int b, int d, int e) {
        std::vector<int> options;
        for (int c = 0; c <= max_; ++c)
            if (fits(a, b, c) && fits(d, e, c)) options.push_back(c);
        if (options.empty()) return std::nullopt;
        return options[uniform(0, static_cast<int>(options.size()) - 1)];
    }

    // A projection of the doubled j: -j, -j+2, ..., j.
    int projection(int j) { return -j + 2 * uniform(0, j); }

    std::vector<int> threej() {
        while (true) {
            int a = any(), b = any();
            auto c = third(a, b);
            if (!c) continue;
            int ma = projection(a), mb = projection(b), mc = -ma - mb;
            if (std::abs(mc) > *c || (*c - mc) % 2 != 0) continue;
            return {a, b, *c, ma, mb, mc};
        }
    }

    // {a b c; d e f} with triads (abc) (aef) (dbf) (dec).
    std::vector<int> sixj() {
        while (true) {
            int a = any(), b = any(), e = any();
            auto c = third(a, b);
            auto f = third(a, e);
            if (!c || !f) continue;
            auto d = common_third(b, *f, e, *c);
            if (!d) continue;
            return {a, b, *c, *d, e, *f};
        }
    }

    // Rows and columns of the 9j are triads.
    std::vector<int> ninej() {
        while (true) {
            int a = any(), b = any(), d = any(), e = any();
            auto c = third(a, b), f = third(d, e), g = third(a, d), h = third(b, e);
            if (!c || !f || !g || !h) continue;
            auto i = common_third(*g, *h, *c, *f);
            if (!i) continue;
            return {a, b, *c, d, e, *f, *g, *h, *i};
        }
    }

private:
    int uniform(int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng_); }
    // Doubled arguments, as exact::triangle takes them.
    static bool fits(int a, int b, int c) { return exact::triangle(a, b, c); }

    std::mt19937 rng_;
    int max_;
};

}  // namespace couplet::testing
