// Random coupling networks as couplet input text: n vertices, each a 3j (or a CG carrying the
// factors that make it equal to that 3j, DLMF 34.1.1); every summed projection fills exactly
// two slots; some slots are open ends with free j and m.  Most lines carry a metric phase
// (-1)^(j -+ m) (the proper Yutsis line); some do not, so that the unreducible path is tested.
#pragma once

#include <ginac/ginac.h>

#include <random>
#include <string>
#include <vector>

#include "model/quantum.hpp"
#include "model/symbols.hpp"

namespace couplet::testing {

struct random_network {
    std::string text;
    int vertices = 0, lines = 0, open = 0;
};

// With `every_line_metric`, each line carries its metric: a proper Yutsis network, which the
// moves reduce completely.
inline random_network make_random_network(std::mt19937& rng, int min_vertices, int max_vertices, int max_open,
                                          bool every_line_metric = false) {
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
        bool plus_first = true;
        for (int end = 0; end < 2; ++end) {
            top[slots[k + end]] = j;
            bool plus = uniform(0, 1);
            if (every_line_metric && end == 1) plus = !plus_first;  // (..m..)(..-m..)
            plus_first = end == 0 ? plus : plus_first;
            bottom[slots[k + end]] = (plus ? "" : "-") + m;
        }
        int kind = every_line_metric ? uniform(0, 7) : uniform(0, 9);
        if (kind < 8)
            phases.push_back(j + (kind % 2 ? "-" : "+") + m);  // the metric
        else if (kind == 8)
            phases.push_back("2*" + m);  // no metric, m-free class
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

// A network of a given graph as input text, written away from any textbook arrangement: each
// vertex's columns in a random order, some vertices flipped (every m negated, times
// (-1)^(a+b+c), DLMF 34.3.10), some written as CG (DLMF 34.1.1), every line with its metric
// (-1)^(j-m) taken at one of its two ends at random.  Line k is (j<k>, m<k>); the open line at
// vertex `open[k]` is (J<k>, M<k>).
inline std::string graph_network_text(int vertices, const std::vector<std::pair<int, int>>& edges,
                                      const std::vector<int>& open, unsigned seed) {
    std::mt19937 rng(seed);
    auto uniform = [&](int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(rng); };
    std::vector<std::vector<std::pair<std::string, std::string>>> slots(vertices);
    std::vector<std::string> phases, indices;
    for (std::size_t k = 0; k < edges.size(); ++k) {
        std::string j = "j" + std::to_string(k), m = "m" + std::to_string(k);
        indices.push_back(m);
        bool first_plus = uniform(0, 1);
        slots[edges[k].first].push_back({j, first_plus ? m : "-" + m});
        slots[edges[k].second].push_back({j, first_plus ? "-" + m : m});
        phases.push_back(j + (first_plus ? "-" : "+") + m);
    }
    for (std::size_t k = 0; k < open.size(); ++k)
        slots[open[k]].push_back({"J" + std::to_string(k), "M" + std::to_string(k)});
    std::string body;
    for (int v = 0; v < vertices; ++v) {
        auto s = slots[v];
        std::shuffle(s.begin(), s.end(), rng);
        if (uniform(0, 2) == 0) {  // flipped
            for (auto& [j, m] : s) m = m[0] == '-' ? m.substr(1) : "-" + m;
            phases.push_back(s[0].first + "+" + s[1].first + "+" + s[2].first);
        }
        if (!body.empty()) body += " * ";
        if (uniform(0, 3) == 0) {
            body += "(-1)^(" + s[1].first + "-" + s[0].first + "+(" + s[2].second + ")) / sqrt(2*" + s[2].first +
                    "+1) * <" + s[0].first + " (" + s[0].second + "), " + s[1].first + " (" + s[1].second + ") | " +
                    s[2].first + " (-(" + s[2].second + "))>";
        } else {
            body += "3j(" + s[0].first + ", " + s[1].first + ", " + s[2].first + "; " + s[0].second + ", " +
                    s[1].second + ", " + s[2].second + ")";
        }
    }
    for (const auto& p : phases) body += " * (-1)^(" + p + ")";
    std::string list;
    for (const auto& i : indices) list += (list.empty() ? "" : ", ") + i;
    return "sum(" + list + " : " + body + ")";
}

// The number of summation indices over projections left in e (sums over an angular momentum,
// which the reduction introduces, are not counted).
inline int msum_indices_in(const GiNaC::ex& e) {
    int n = 0;
    for (GiNaC::const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
        if (!GiNaC::is_a<index_sum>(*it)) continue;
        const auto& s = GiNaC::ex_to<index_sum>(*it);
        for (const GiNaC::ex& i : s.indices()) {
            bool projection = false;  // an index in a 3j bottom row
            for (GiNaC::const_preorder_iterator f = s.body().preorder_begin(); f != s.body().preorder_end(); ++f)
                if (kind_of(*f) == symbol_kind::threej)
                    for (int c = 3; c < 6; ++c) projection = projection || f->op(c).has(i);
            n += projection;
        }
    }
    return n;
}

}  // namespace couplet::testing
