// The named coupling networks of the acceptance cases and the benchmark, as graphs: vertices
// are 3j symbols, edges summed lines, `open` the vertices that carry a free line.  Common
// practice, no source: the tetrahedron is the 6j, K(3,3) the 9j, the Moebius ladder of eight
// vertices the 12j of the first kind, cubic graphs on ten vertices of girth 4 and more the 15j.
#pragma once

#include <string>
#include <utility>
#include <vector>

namespace couplet::testing {

struct network_graph {
    std::string name;
    int vertices = 0;
    std::vector<std::pair<int, int>> edges;
    std::vector<int> open;
};

inline std::vector<std::pair<int, int>> ring(int first, int n, int step = 1) {
    std::vector<std::pair<int, int>> out;
    for (int k = 0; k < n; ++k) out.push_back({first + k, first + (k + step) % n});
    return out;
}

inline std::vector<std::pair<int, int>> joined(std::vector<std::pair<int, int>> a,
                                               const std::vector<std::pair<int, int>>& b) {
    a.insert(a.end(), b.begin(), b.end());
    return a;
}

inline std::vector<std::pair<int, int>> rungs(int n, int offset) {
    std::vector<std::pair<int, int>> out;
    for (int k = 0; k < n; ++k) out.push_back({k, k + offset});
    return out;
}

inline const std::vector<network_graph>& network_corpus() {
    static const std::vector<network_graph> corpus = {
        {"bubble, two open lines (3j orthogonality)", 2, {{0, 1}, {0, 1}}, {0, 1}},
        {"triangle, three open lines (3j x 6j)", 3, ring(0, 3), {0, 1, 2}},
        {"tetrahedron (6j)", 4, joined(ring(0, 4), {{0, 2}, {1, 3}}), {}},
        {"square, four open lines", 4, ring(0, 4), {0, 1, 2, 3}},
        {"pentagon, five open lines", 5, ring(0, 5), {0, 1, 2, 3, 4}},
        {"triangular prism", 6, joined(joined(ring(0, 3), {{3, 4}, {4, 5}, {5, 3}}), rungs(3, 3)), {}},
        {"K(3,3) (9j)", 6, {{0, 3}, {0, 4}, {0, 5}, {1, 3}, {1, 4}, {1, 5}, {2, 3}, {2, 4}, {2, 5}}, {}},
        {"Moebius ladder of 8 vertices (12j, first kind)", 8, joined(ring(0, 8), rungs(4, 4)), {}},
        {"cube (12j, second kind)", 8, joined(joined(ring(0, 4), {{4, 5}, {5, 6}, {6, 7}, {7, 4}}), rungs(4, 4)), {}},
        {"pentagonal prism (15j)",
         10,
         joined(joined(ring(0, 5), {{5, 6}, {6, 7}, {7, 8}, {8, 9}, {9, 5}}), rungs(5, 5)),
         {}},
        {"Moebius ladder of 10 vertices (15j)", 10, joined(ring(0, 10), rungs(5, 5)), {}},
        {"Petersen graph (15j)",
         10,
         joined(joined(ring(0, 5), {{5, 7}, {7, 9}, {9, 6}, {6, 8}, {8, 5}}), rungs(5, 5)),
         {}},
    };
    return corpus;
}

}  // namespace couplet::testing
