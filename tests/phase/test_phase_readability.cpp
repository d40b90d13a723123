// canonical() against brute force: every exponent with coefficients in {-1, 0, 1, 2} and a
// constant in {0, 1/2, 1, -1/2} is grouped into classes by its phase on every residue class of
// the admissible lattice, and each class must print as its most readable member (the order
// documented in readability.hpp, restated here), whenever that member has at most four terms.
#include <catch2/catch.hpp>

#include "phase/context.hpp"

#include <cln/integer.h>
#include <cln/rational_io.h>

#include <array>
#include <functional>
#include <map>
#include <string>
#include <tuple>
#include <vector>

using namespace couplet::phase;

namespace {

const cln::cl_RA half = cln::cl_RA(1) / 2;

// A level-1 form: coefficient codes 0, 1, 2, 3 (= -1) and a constant code c (constant c/2).
struct small_form {
    std::vector<int> codes;
    int constant = 0;
};

linear_form to_form(const small_form& f, const std::vector<std::string>& names) {
    linear_form x = cln::cl_RA(f.constant == 3 ? -1 : f.constant) / 2;
    for (std::size_t i = 0; i < names.size(); ++i)
        if (f.codes[i] != 0) x += (f.codes[i] == 3 ? -1 : f.codes[i]) * var(names[i]);
    return x;
}

small_form from_form(const linear_form& x, const std::vector<std::string>& names) {
    small_form f;
    for (const auto& name : names) {
        const cln::cl_RA c = x.coefficient(name);
        REQUIRE((c == 0 || c == 1 || c == 2 || c == -1));
        f.codes.push_back(c == -1 ? 3 : static_cast<int>(cln::cl_I_to_long(cln::numerator(c))));
    }
    const cln::cl_RA k = 2 * x.constant();
    REQUIRE((k == 0 || k == 1 || k == 2 || k == -1));
    f.constant = k == -1 ? 3 : static_cast<int>(cln::cl_I_to_long(cln::numerator(k)));
    return f;
}

// The documented order, restated: terms, negatives, coefficients 2, a constant at all, then
// variable by variable (1, 2, -1, absent), then the constant (0, 1/2, 1, -1/2).
std::vector<int> readability(const small_form& f) {
    int terms = 0, negatives = 0, twos = 0;
    std::vector<int> ranks;
    for (int c : f.codes) {
        terms += c != 0;
        negatives += c == 3;
        twos += c == 2;
        ranks.push_back(c == 1 ? 0 : c == 2 ? 1 : c == 3 ? 2 : 3);
    }
    std::vector<int> key{terms, negatives, twos, f.constant != 0};
    key.insert(key.end(), ranks.begin(), ranks.end());
    key.push_back(f.constant);
    return key;
}

// 2X mod 4 at doubled points u: the phase i^(2X) of each form, point by point.
std::vector<int> phases(const small_form& f, const std::vector<std::vector<int>>& points) {
    std::vector<int> out;
    out.reserve(points.size());
    for (const auto& u : points) {
        int s = f.constant;
        for (std::size_t i = 0; i < u.size(); ++i) s += (f.codes[i] == 3 ? -1 : f.codes[i]) * u[i];
        out.push_back(((s % 4) + 4) % 4);
    }
    return out;
}

void check_all_classes(const context& ctx, const std::vector<std::vector<int>>& points) {
    const std::vector<std::string>& names = ctx.variables();
    const std::size_t n = names.size();
    // Phases of level-1 forms depend on u mod 4 only, and `points` meets every residue class
    // of the lattice, so equal phase vectors mean equal classes.
    std::map<std::vector<int>, std::vector<small_form>> classes;
    small_form f;
    f.codes.assign(n, 0);
    std::function<void(std::size_t)> enumerate = [&](std::size_t i) {
        if (i == n) {
            for (int c = 0; c < 4; ++c) {
                f.constant = c;
                classes[phases(f, points)].push_back(f);
            }
            return;
        }
        for (int code = 0; code < 4; ++code) {
            f.codes[i] = code;
            enumerate(i + 1);
        }
    };
    enumerate(0);
    int exact_classes = 0, long_classes = 0;
    for (const auto& [signature, members] : classes) {
        const small_form* best = &members.front();
        for (const auto& m : members)
            if (readability(m) < readability(*best)) best = &m;
        const linear_form expected = to_form(*best, names);
        const linear_form printed = ctx.canonical(to_form(members.front(), names));
        INFO("class of " << ctx.to_string(to_form(members.front(), names)) << " (" << members.size()
                         << " members), most readable " << ctx.to_string(expected));
        int terms = 0;
        for (int c : best->codes) terms += c != 0;
        CHECK(phases(from_form(printed, names), points) == signature);
        if (terms <= 4) {
            CHECK(printed == expected);
            ++exact_classes;
        } else {
            ++long_classes;
        }
        // Every member prints alike (a sample of them; all of them for the small classes).
        const std::size_t step = members.size() > 16 ? members.size() / 16 : 1;
        for (std::size_t k = 0; k < members.size(); k += step)
            CHECK(ctx.canonical(to_form(members[k], names)) == printed);
    }
    CHECK(exact_classes > 0);
    INFO("classes: " << exact_classes << " exact, " << long_classes << " beyond four terms");
}

// All u in the box with each coordinate in [lo, hi), filtered.
std::vector<std::vector<int>> box(std::size_t n, int lo, int hi,
                                  const std::function<bool(const std::vector<int>&)>& keep) {
    std::vector<std::vector<int>> out;
    std::vector<int> u(n, lo);
    for (;;) {
        if (keep(u)) out.push_back(u);
        std::size_t i = 0;
        while (i < n && ++u[i] == hi) u[i++] = lo;
        if (i == n) return out;
    }
}

}  // namespace

TEST_CASE("phase: canonical is the most readable form, triad and a free j", "[phase]") {
    context ctx;
    for (const char* name : {"a", "b", "c", "d"}) ctx.declare_angular(name);
    ctx.add_triad(var("a"), var("b"), var("c"));
    check_all_classes(ctx, box(4, 0, 4, [](const std::vector<int>& u) { return (u[0] + u[1] + u[2]) % 2 == 0; }));
}

TEST_CASE("phase: canonical is the most readable form, parities and a projection", "[phase]") {
    context ctx;
    ctx.declare_angular("j");
    ctx.declare_projection("m", var("j"));
    ctx.declare_angular("l", parity::integer);
    ctx.declare_angular("s", parity::half_odd);
    check_all_classes(ctx, box(4, 0, 4, [](const std::vector<int>& u) {
                          return (u[0] - u[1]) % 2 == 0 && u[2] % 2 == 0 && u[3] % 2 == 1;
                      }));
}

TEST_CASE("phase: canonical is the most readable form, a 3j", "[phase]") {
    context ctx;
    for (const char* name : {"j1", "j2", "j3"}) ctx.declare_angular(name);
    for (int k = 1; k <= 3; ++k) ctx.declare_projection("m" + std::to_string(k), var("j" + std::to_string(k)));
    ctx.add_triad(var("j1"), var("j2"), var("j3"));
    ctx.add_zero_sum(var("m1"), var("m2"), var("m3"));
    // j's over one period, m1 and m2 over [-4, 4) (every residue mod 4), m3 = -m1 - m2 exactly.
    std::vector<std::vector<int>> points;
    for (auto u : box(5, -4, 4, [](const std::vector<int>& v) { return v[0] >= 0 && v[1] >= 0 && v[2] >= 0; })) {
        u.push_back(-u[3] - u[4]);
        const bool ok =
            (u[0] + u[1] + u[2]) % 2 == 0 && (u[0] - u[3]) % 2 == 0 && (u[1] - u[4]) % 2 == 0 && (u[2] - u[5]) % 2 == 0;
        if (ok) points.push_back(u);
    }
    check_all_classes(ctx, points);
}
