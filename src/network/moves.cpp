#include "network/move.hpp"

#include "model/symbols.hpp"

namespace couplet::network {

using namespace GiNaC;

namespace {

// All moves share one table of pattern symbols (j1 is the same name in every move).
struct pattern_symbols {
    quantum_numbers numbers;
    pattern_table table{numbers};
    symbol j(const std::string& name) { return table.angular(name); }
    symbol m(const std::string& name, const symbol& owner) { return table.projection(name, owner); }
};

pattern_symbols& symbols() {
    static pattern_symbols p;
    return p;
}

// A move with its instance: its own two sides, in the pattern symbols declared so far.
move make_move(const std::string& name, const std::string& reference, std::vector<ex> threejs, const ex& phase,
               const lst& summed, const ex& result, const lst& introduced_angular = {},
               const lst& introduced_projections = {}) {
    move m;
    m.name = name;
    m.reference = reference;
    m.threejs = std::move(threejs);
    m.phase = phase;
    m.summed = summed;
    m.result = result;
    m.introduced_angular = introduced_angular;
    m.introduced_projections = introduced_projections;
    m.left = left_side(m);
    m.right = right_side(m);
    m.numbers = symbols().numbers;
    return m;
}

std::vector<move> build() {
    auto& p = symbols();
    symbol j1 = p.j("j1"), j2 = p.j("j2"), j3 = p.j("j3"), k3 = p.j("k3");
    symbol l1 = p.j("l1"), l2 = p.j("l2"), l3 = p.j("l3"), c = p.j("c");
    symbol m1 = p.m("m1", j1), m2 = p.m("m2", j2), m3 = p.m("m3", j3), n3 = p.m("n3", k3);
    symbol u1 = p.m("u1", l1), u2 = p.m("u2", l2), u3 = p.m("u3", l3), g = p.m("g", c);
    std::vector<move> out;

    // The 9j as a closed network of six 3j: its rows and columns, each m in one row and one
    // column.  Listed so that each 3j shares a line with an earlier one, which the search uses.
    {
        std::vector<std::vector<symbol>> j(3), m(3);
        for (int r = 0; r < 3; ++r)
            for (int c = 0; c < 3; ++c) {
                std::string rc = std::to_string(r + 1) + std::to_string(c + 1);
                j[r].push_back(p.j("a" + rc));
                m[r].push_back(p.m("x" + rc, j[r][c]));
            }
        auto row = [&](int r) { return wigner3j(j[r][0], j[r][1], j[r][2], m[r][0], m[r][1], m[r][2]); };
        auto column = [&](int c) { return wigner3j(j[0][c], j[1][c], j[2][c], m[0][c], m[1][c], m[2][c]); };
        ex ninej = wigner9j(j[0][0], j[0][1], j[0][2], j[1][0], j[1][1], j[1][2], j[2][0], j[2][1], j[2][2]);
        lst all, first_two_columns;
        for (int r = 0; r < 3; ++r)
            for (int c = 0; c < 3; ++c) {
                all.append(m[r][c]);
                if (c < 2) first_two_columns.append(m[r][c]);
            }
        out.push_back(make_move("six 3j to a 9j", "DLMF 34.6.1",
                                {row(0), column(0), row(1), column(1), row(2), column(2)}, 0, all, ninej));
        // One column left open: by the Wigner-Eckart theorem the 3j of that column times the 9j.
        out.push_back(make_move("five 3j to 3j times 9j", "DLMF 34.6.1 with 34.3.16",
                                {row(0), column(0), row(1), column(1), row(2)}, 0, first_two_columns,
                                column(2) * ninej));
    }

    // The 6j as a closed network of four 3j.
    out.push_back(make_move("four 3j to a 6j", "DLMF 34.4.1",
                            {wigner3j(j1, j2, j3, m1, m2, m3), wigner3j(j1, l2, l3, m1, u2, -u3),
                             wigner3j(l1, j2, l3, -u1, m2, u3), wigner3j(l1, l2, j3, u1, -u2, m3)},
                            l1 + l2 + l3 + u1 + u2 + u3, lst{m1, m2, m3, u1, u2, u3},
                            wigner6j(j1, j2, j3, l1, l2, l3)));

    // A triangle with one free line at each corner: the Wigner-Eckart form 3j x 6j.
    out.push_back(make_move(
        "triangle to 3j times 6j", "DLMF 34.5.23",
        {wigner3j(j1, l2, l3, m1, u2, -u3), wigner3j(l1, j2, l3, -u1, m2, u3), wigner3j(l1, l2, j3, u1, -u2, m3)},
        l1 + l2 + l3 + u1 + u2 + u3, lst{u1, u2, u3},
        wigner3j(j1, j2, j3, m1, m2, m3) * wigner6j(j1, j2, j3, l1, l2, l3)));

    // Two vertices joined by two lines: 3j orthogonality.
    out.push_back(make_move("bubble to a delta", "DLMF 34.3.16",
                            {wigner3j(j1, j2, j3, m1, m2, m3), wigner3j(j1, j2, k3, m1, m2, n3)}, 0, lst{m1, m2},
                            kdelta(j3, k3) * kdelta(m3, n3) * triangle(j1, j2, j3) / (2 * j3 + 1)));

    // A line from a vertex back to itself: the metric is sqrt(2j+1) times the 3j with a zero
    // entry, and orthogonality closes the loop (DLMF 34.3.16 with 34.3.1's (j j 0) value).
    out.push_back(make_move("loop to a delta", "DLMF 34.3.16 with 34.3.1", {wigner3j(j1, j1, c, m1, -m1, g)}, j1 - m1,
                            lst{m1},
                            // tri(j1, j1, c) is 1 where c = 0, but it keeps the consumed triad for the
                            // phase group: (-1)^c is an integer power because 2 j1 + c is an integer.
                            sqrt(2 * j1 + 1) * kdelta(c, 0) * kdelta(g, 0) * triangle(j1, j1, c)));
    return out;
}

move build_interchange() {
    auto& p = symbols();
    symbol a = p.j("j1"), b = p.j("j2"), e = p.j("j3"), c = p.j("l1"), d = p.j("l2"), x = p.j("x");
    symbol al = p.m("m1", a), be = p.m("m2", b), ep = p.m("m3", e), ga = p.m("u1", c), de = p.m("u2", d);
    symbol xi = p.m("xi", x);
    // The four-leg tensor coupled as (a b) e (c d) expanded in the one coupled as (a c) x (b d):
    // the coefficient is 3j orthogonality (DLMF 34.3.17) applied to the closed four-3j network,
    // a 6j by DLMF 34.4.1 (equivalently DLMF 34.5.23 with 34.3.17).
    return make_move("recoupling interchange", "DLMF 34.5.23 with 34.3.17",
                     {wigner3j(a, b, e, al, be, ep), wigner3j(e, c, d, -ep, ga, de)}, e - ep, lst{ep},
                     make_phase(b + c + e + x + x - xi) * (2 * x + 1) * wigner6j(a, b, e, d, c, x) *
                         wigner3j(a, c, x, al, ga, xi) * wigner3j(x, b, d, -xi, be, de),
                     lst{x}, lst{xi});
}

}  // namespace

const std::vector<move>& network_moves() {
    static const std::vector<move> moves = build();
    return moves;
}

const move& interchange_move() {
    static const move m = build_interchange();
    return m;
}

ex left_side(const move& m) {
    ex body = make_phase(m.phase);
    for (const ex& s : m.threejs) body *= s;
    return make_sum(body, m.summed);
}

ex right_side(const move& m) {
    ex r = m.result;
    if (m.introduced_projections.nops() > 0) r = make_sum(r, m.introduced_projections);
    if (m.introduced_angular.nops() > 0) r = make_sum(r, m.introduced_angular);
    return r;
}

}  // namespace couplet::network
