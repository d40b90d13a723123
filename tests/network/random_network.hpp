// Random coupling networks as couplet input text: n vertices, each a 3j (or a CG carrying the
// factors that make it equal to that 3j, DLMF 34.1.1); every summed projection fills exactly
// two slots; some slots are open ends with free j and m.  Most lines carry a metric phase
// (-1)^(j -+ m) (the proper Yutsis line); some do not, so that the unreducible path is tested.
#pragma once

#include <random>
#include <string>
#include <vector>

namespace couplet::testing {

struct random_network {
    std::string text;
    int vertices = 0, lines = 0, open = 0;
};

inline random_network make_random_network(std::mt19937& rng, int min_vertices, int max_vertices, int max_open) {
    auto uniform = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng); };
    random_network out;
    int n = uniform(min_vertices, max_vertices);
    int open = uniform(0, max_open);
    if ((3 * n - open) % 2 != 0) open = open > 0 ? open - 1 : 1;
    std::vector<int> slots(3 * n);
    for (int k = 0; k < 3 * n; ++k) slots[k] = k;
    std::shuffle(slots.begin(), slots.end(), rng);
    std::vector<std::string> top(3 * n), bottom(3 * n);
    std::vector<std::string> phases, indices;
    for (int k = 0; k < open; ++k) {
        top[slots[k]] = "J" + std::to_string(k);
        bottom[slots[k]] = (uniform(0, 1) ? "" : "-") + std::string("M") + std::to_string(k);
    }
    int lines = 0;
    for (int k = open; k + 1 < 3 * n; k += 2, ++lines) {
        std::string j = "j" + std::to_string(lines), m = "m" + std::to_string(lines);
        indices.push_back(m);
        for (int end = 0; end < 2; ++end) {
            top[slots[k + end]] = j;
            bottom[slots[k + end]] = (uniform(0, 1) ? "" : "-") + m;
        }
        int kind = uniform(0, 9);
        if (kind < 8) phases.push_back(j + (kind % 2 ? "-" : "+") + m);  // the metric
        else if (kind == 8) phases.push_back("2*" + m);                  // no metric, m-free class
    }
    std::string body;
    for (int v = 0; v < n; ++v) {
        const std::string *a = &top[3 * v], *m = &bottom[3 * v];
        if (!body.empty()) body += " * ";
        if (uniform(0, 3) == 0) {
            body += "(-1)^(" + a[1] + "-" + a[0] + "+(" + m[2] + ")) / sqrt(2*" + a[2] + "+1) * <" + a[0] + " (" +
                    m[0] + "), " + a[1] + " (" + m[1] + ") | " + a[2] + " (-(" + m[2] + "))>";
        } else {
            body += "3j(" + a[0] + ", " + a[1] + ", " + a[2] + "; " + m[0] + ", " + m[1] + ", " + m[2] + ")";
        }
        if (uniform(0, 4) == 0) phases.push_back(a[0] + "+" + a[1] + "+" + a[2]);  // m-free vertex phase
    }
    for (const auto& p : phases) body += " * (-1)^(" + p + ")";
    std::string list;
    for (const auto& i : indices) list += (list.empty() ? "" : ", ") + i;
    out.text = indices.empty() ? body : "sum(" + list + " : " + body + ")";
    out.vertices = n;
    out.lines = lines;
    out.open = open;
    return out;
}

}  // namespace couplet::testing
