// The table of sum rules.  Each is written once in its own pattern symbols; self_test checks
// it exactly, so a misremembered phase or triangle cannot survive the test suite.
#include "model/symbols.hpp"
#include "rules/rule.hpp"

namespace couplet::rules {

using namespace GiNaC;

std::vector<symbol> sum_rule::indices() const {
    std::vector<symbol> out{index};
    if (second_index) out.push_back(*second_index);
    return out;
}

ex sum_rule::summand() const {
    ex body = make_phase(phase);
    for (const symbol& i : indices()) body *= pow(2 * i + 1, weight);
    for (const ex& f : factors) body *= f;
    return body;
}

ex sum_rule::left_side() const {
    lst bound;
    for (const symbol& i : indices()) bound.append(i);
    return make_sum(summand(), bound);
}

namespace {

// A rule under construction: names become angular momenta of the rule's own table.
struct builder {
    sum_rule r;
    symbol operator()(const std::string& name) {
        symbol s = r.numbers.symbol_for(name, 0);
        r.numbers.assign_role(s, qn_role::angular, 0);
        return s;
    }
};

constexpr auto six = held_sixj;
ex tri(const ex& a, const ex& b, const ex& c) { return triangle(a, b, c).hold(); }
ex hat2(const ex& j) { return 2 * j + 1; }

sum_rule orthogonality() {
    builder s;
    s.r.name = "6j orthogonality";
    s.r.reference = "DLMF 34.5.14";
    auto x = s("x"), a = s("a"), b = s("b"), c = s("c"), d = s("d"), p = s("p"), q = s("q");
    s.r.index = x;
    s.r.factors = {six(a, b, x, c, d, p), six(a, b, x, c, d, q)};
    // The triangles of p survive: nothing else on the right side enforces them.
    s.r.result = kdelta(p, q).hold() * tri(a, d, p) * tri(b, c, p) / hat2(p);
    return s.r;
}

sum_rule racah_sum() {
    builder s;
    s.r.name = "Racah sum rule";
    s.r.reference = "DLMF 34.5.15";
    auto x = s("x"), a = s("a"), b = s("b"), c = s("c"), d = s("d"), p = s("p"), q = s("q");
    s.r.index = x;
    s.r.phase = p + q + x;
    s.r.factors = {six(a, b, x, c, d, p), six(a, b, x, d, c, q)};
    s.r.result = six(a, c, q, b, d, p);
    return s.r;
}

sum_rule biedenharn_elliott() {
    builder s;
    s.r.name = "Biedenharn-Elliott identity";
    s.r.reference = "DLMF 34.5.16-34.5.17";
    auto x = s("x"), a = s("a"), b = s("b"), c = s("c"), d = s("d"), e = s("e"), f = s("f");
    auto p = s("p"), q = s("q"), r = s("r");
    s.r.index = x;
    s.r.phase = a + b + c + d + e + f + p + q + r + x;
    s.r.factors = {six(a, b, x, c, d, p), six(c, d, x, e, f, q), six(e, f, x, b, a, r)};
    s.r.result = six(p, q, r, e, a, d) * six(p, q, r, f, b, c);
    return s.r;
}

sum_rule ninej_from_three_sixj() {
    builder s;
    s.r.name = "9j as a sum of three 6j";
    s.r.reference = "DLMF 34.6.2";
    auto x = s("x"), a = s("a"), b = s("b"), c = s("c"), d = s("d"), e = s("e"), f = s("f");
    auto g = s("g"), h = s("h"), i = s("i");
    s.r.index = x;
    s.r.phase = 2 * x;
    s.r.factors = {six(a, b, c, f, i, x), six(d, e, f, b, x, h), six(g, h, i, x, a, d)};
    s.r.result = wigner9j(a, b, c, d, e, f, g, h, i).hold();
    return s.r;
}

sum_rule triangle_dimension() {
    builder s;
    s.r.name = "sum of (2x+1) over a triangle";
    s.r.reference = "common practice, no source";
    auto x = s("x"), a = s("a"), b = s("b");
    s.r.index = x;
    s.r.factors = {tri(a, b, x)};
    s.r.result = hat2(a) * hat2(b);
    return s.r;
}

// The one-6j sums: with the two rows alike and with them crossed.  Both hold exactly at every
// sampled point of the self-test; the handbook tabulates the family.
sum_rule weighted_sixj_sum() {
    builder s;
    s.r.name = "sum of (2x+1) times one 6j";
    s.r.reference = "Varshalovich et al. (1988) sec. 9.8 (section number from memory)";
    auto x = s("x"), a = s("a"), b = s("b"), c = s("c");
    s.r.index = x;
    s.r.factors = {six(a, b, x, a, b, c)};
    // Every triad of the 6j is (a b x) or (a b c): nothing on the right enforces the second.
    s.r.result = make_phase(2 * a + 2 * b) * tri(a, b, c);
    return s.r;
}

sum_rule signed_sixj_sum() {
    builder s;
    s.r.name = "sum of (-1)^(a+b+x) (2x+1) times one 6j";
    s.r.reference = "Varshalovich et al. (1988) sec. 9.8 (section number from memory)";
    auto x = s("x"), a = s("a"), b = s("b"), c = s("c");
    s.r.index = x;
    s.r.phase = a + b + x;
    s.r.factors = {six(a, b, x, b, a, c)};
    s.r.result = sqrt(hat2(a) * hat2(b)) * kdelta(c, 0).hold();
    return s.r;
}

sum_rule ninej_orthogonality() {
    builder s;
    s.r.name = "9j orthogonality";
    s.r.reference = "DLMF 34.7.2";
    auto x = s("x"), y = s("y"), a = s("a"), b = s("b"), c = s("c"), d = s("d"), e = s("e");
    auto p = s("p"), q = s("q"), pp = s("pp"), qq = s("qq");
    s.r.index = x;
    s.r.second_index = y;
    s.r.factors = {wigner9j(a, b, x, c, d, y, p, q, e).hold(), wigner9j(a, b, x, c, d, y, pp, qq, e).hold()};
    // The triads of p, q left without a symbol to enforce them are carried explicitly.
    s.r.result =
        kdelta(p, pp).hold() * kdelta(q, qq).hold() * tri(a, c, p) * tri(b, d, q) * tri(p, q, e) / (hat2(p) * hat2(q));
    return s.r;
}

sum_rule ninej_sum_rule() {
    builder s;
    s.r.name = "9j sum rule";
    s.r.reference = "DLMF 34.7.3";
    // DLMF's j1 j2 j12 j3 j4 j34 j13 j24 j j14 j23 as a b c e g d x y j h f.
    auto x = s("x"), y = s("y"), a = s("a"), b = s("b"), c = s("c"), d = s("d"), e = s("e");
    auto f = s("f"), g = s("g"), h = s("h"), j = s("j");
    s.r.index = x;
    s.r.second_index = y;
    s.r.phase = 2 * b + y + f - d;
    s.r.factors = {wigner9j(a, b, c, e, g, d, x, y, j).hold(), wigner9j(a, e, x, g, b, y, h, f, j).hold()};
    // Every triad of the left side that survives the sum is one of the result's.
    s.r.result = wigner9j(a, b, c, g, e, d, h, f, j).hold();
    return s.r;
}

// Each rule's instance is its own pattern: left side and result.
sum_rule with_instance(sum_rule r) {
    r.left = r.left_side();
    r.right = r.result;
    return r;
}

}  // namespace

const std::vector<sum_rule>& sum_rules() {
    static const std::vector<sum_rule> all = [] {
        std::vector<sum_rule> out;
        for (sum_rule r :
             {orthogonality(), racah_sum(), biedenharn_elliott(), ninej_from_three_sixj(), triangle_dimension(),
              ninej_orthogonality(), ninej_sum_rule(), weighted_sixj_sum(), signed_sixj_sum()})
            out.push_back(with_instance(r));
        return out;
    }();
    return all;
}

}  // namespace couplet::rules

namespace couplet::rules {

namespace {

using namespace GiNaC;

struct local_builder {
    local_rule r;
    symbol operator()(const std::string& name) {
        symbol s = r.numbers.symbol_for(name, 0);
        r.numbers.assign_role(s, qn_role::angular, 0);
        return s;
    }
};

local_rule sixj_zero() {
    local_builder s;
    s.r.name = "6j with a zero argument";
    s.r.reference = "DLMF 34.5.1";
    auto a = s("a"), b = s("b"), c = s("c"), e = s("e"), f = s("f");
    s.r.pattern = six(a, b, c, 0, e, f);
    // The triads (0 b f) and (0 e c) become deltas; (a b c) has no other symbol left to enforce it.
    s.r.result =
        kdelta(b, f).hold() * kdelta(c, e).hold() * tri(a, b, c) * make_phase(a + b + c) / sqrt(hat2(b) * hat2(c));
    return s.r;
}

local_rule ninej_zero() {
    local_builder s;
    s.r.name = "9j with a zero argument";
    s.r.reference = "DLMF 34.7.1";
    auto a = s("a"), b = s("b"), c = s("c"), d = s("d"), e = s("e"), f = s("f"), g = s("g"), h = s("h");
    s.r.pattern = wigner9j(a, b, c, d, e, f, g, h, 0).hold();
    s.r.result = kdelta(c, f).hold() * kdelta(g, h).hold() * make_phase(b + c + d + g) / sqrt(hat2(c) * hat2(g)) *
                 six(a, b, c, e, d, g);
    return s.r;
}

}  // namespace

const std::vector<local_rule>& local_rules() {
    static const std::vector<local_rule> all = [] {
        std::vector<local_rule> out;
        for (local_rule r : {sixj_zero(), ninej_zero()}) {
            r.left = r.pattern;
            r.right = r.result;
            out.push_back(r);
        }
        return out;
    }();
    return all;
}

}  // namespace couplet::rules
