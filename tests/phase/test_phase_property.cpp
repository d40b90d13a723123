// Property test of the phase group against exhaustive evaluation.  Random coupling schemes (3j,
// 6j and bare triads over a few quantum numbers, slots with small offsets, projections with
// m-sums) are enumerated over every admissible assignment with every variable j <= 3 (triangles,
// |m| <= j, j - m integer, m-sums exactly zero); the verdicts, witnesses and canonical forms of
// the phase group must agree with what the enumeration sees.
#include <catch2/catch.hpp>

#include "phase/context.hpp"

#include <cln/integer.h>
#include <cln/rational_io.h>

#include <algorithm>
#include <array>
#include <cstdint>
#include <cstdlib>
#include <optional>
#include <random>
#include <sstream>
#include <string>
#include <vector>

using namespace couplet::phase;

namespace {

const cln::cl_RA half = cln::cl_RA(1) / 2;

// 4 f(v) = coefficients . u + constant with u = 2v: exact integer evaluation for forms whose
// coefficients are halves and whose constant is a quarter-integer.
struct quad_form {
    std::vector<int> coefficients;
    int constant = 0;
    int at(const std::vector<int>& u) const {
        int s = constant;
        for (std::size_t i = 0; i < coefficients.size(); ++i) s += coefficients[i] * u[i];
        return s;
    }
};

struct scheme {
    std::vector<std::string> names;   // angular momenta first, then projections
    std::vector<parity> parities;     // of the angular momenta
    std::vector<linear_form> owners;  // of the projections
    std::vector<std::array<linear_form, 3>> triads, msums;
    std::vector<std::pair<linear_form, linear_form>> columns;  // (top, bottom) of a 3j column
    std::size_t angular = 0;

    quad_form quad(const linear_form& f) const {
        quad_form q;
        q.coefficients.assign(names.size(), 0);
        for (const auto& [name, c] : f.coefficients()) {
            std::size_t i = 0;
            while (names[i] != name) ++i;
            const cln::cl_RA twice = 2 * c;
            REQUIRE(cln::denominator(twice) == 1);
            q.coefficients[i] = static_cast<int>(cln::cl_I_to_long(cln::numerator(twice)));
        }
        const cln::cl_RA four = 4 * f.constant();
        REQUIRE(cln::denominator(four) == 1);
        q.constant = static_cast<int>(cln::cl_I_to_long(cln::numerator(four)));
        return q;
    }

    context make_context() const {
        context ctx;
        for (std::size_t i = 0; i < angular; ++i) ctx.declare_angular(names[i], parities[i]);
        for (std::size_t i = angular; i < names.size(); ++i) ctx.declare_projection(names[i], owners[i - angular]);
        for (const auto& t : triads) ctx.add_triad(t[0], t[1], t[2]);
        for (const auto& z : msums) ctx.add_zero_sum(z[0], z[1], z[2]);
        for (const auto& [top, bottom] : columns) ctx.add_integer(top - bottom);
        return ctx;
    }

    std::string describe() const {
        std::ostringstream out;
        for (std::size_t i = 0; i < angular; ++i)
            out << names[i]
                << (parities[i] == parity::integer    ? ":int "
                    : parities[i] == parity::half_odd ? ":half "
                                                      : " ");
        for (std::size_t i = angular; i < names.size(); ++i) out << names[i] << " of " << owners[i - angular] << "; ";
        for (const auto& t : triads) out << "triad(" << t[0] << "," << t[1] << "," << t[2] << ") ";
        for (const auto& z : msums) out << "zero(" << z[0] << "," << z[1] << "," << z[2] << ") ";
        return out.str();
    }
};

int mod(int x, int q) { return ((x % q) + q) % q; }

// The congruences and equations alone, evaluated independently of the phase module.
struct congruence_checker {
    std::vector<quad_form> integer, zero;
    std::vector<std::pair<std::size_t, int>> parity_of;  // (variable, 0 int / 1 half)

    explicit congruence_checker(const scheme& s) {
        for (const auto& t : s.triads) integer.push_back(s.quad(t[0] + t[1] + t[2]));
        for (const auto& [top, bottom] : s.columns) integer.push_back(s.quad(top - bottom));
        for (std::size_t i = 0; i < s.owners.size(); ++i)
            integer.push_back(s.quad(s.owners[i] - var(s.names[s.angular + i])));
        for (const auto& z : s.msums) zero.push_back(s.quad(z[0] + z[1] + z[2]));
        for (std::size_t i = 0; i < s.angular; ++i) {
            if (s.parities[i] == parity::integer) parity_of.emplace_back(i, 0);
            if (s.parities[i] == parity::half_odd) parity_of.emplace_back(i, 1);
        }
    }
    bool holds(const std::vector<int>& u) const {
        for (const auto& f : integer)
            if (mod(f.at(u), 4) != 0) return false;
        for (const auto& f : zero)
            if (f.at(u) != 0) return false;
        for (const auto& [i, p] : parity_of)
            if (mod(u[i], 2) != p) return false;
        return true;
    }
};

// Inequalities: slots non-negative, triangles, |m| <= owner.  Values in doubled units.
struct inequality_checker {
    std::vector<std::array<quad_form, 3>> triads;
    std::vector<std::pair<quad_form, quad_form>> columns;
    explicit inequality_checker(const scheme& s) {
        for (const auto& t : s.triads) triads.push_back({s.quad(t[0]), s.quad(t[1]), s.quad(t[2])});
        for (const auto& [top, bottom] : s.columns) columns.emplace_back(s.quad(top), s.quad(bottom));
        for (std::size_t i = 0; i < s.owners.size(); ++i)
            columns.emplace_back(s.quad(s.owners[i]), s.quad(var(s.names[s.angular + i])));
    }
    bool holds(const std::vector<int>& u) const {
        for (const auto& t : triads) {
            const int x = t[0].at(u), y = t[1].at(u), z = t[2].at(u);
            if (x < 0 || y < 0 || z < 0 || z > x + y || std::abs(x - y) > z) return false;
        }
        for (const auto& [top, bottom] : columns) {
            const int j = top.at(u), m = bottom.at(u);
            if (j < 0 || std::abs(m) > j) return false;
        }
        return true;
    }
};

// One condition of admissibility, checked as soon as its last variable has a value.
struct condition {
    enum kind_t { integer, zero, triangle, within } kind;
    std::vector<quad_form> forms;  // integer/zero: 1; triangle: 3 slots; within: (m, j)
    std::size_t last = 0;
    bool holds(const std::vector<int>& u) const {
        switch (kind) {
            case integer:
                return mod(forms[0].at(u), 4) == 0;
            case zero:
                return forms[0].at(u) == 0;
            case triangle: {
                const int x = forms[0].at(u), y = forms[1].at(u), z = forms[2].at(u);
                return x >= 0 && y >= 0 && z >= 0 && z <= x + y && std::abs(x - y) <= z;
            }
            case within:
                return forms[1].at(u) >= std::abs(forms[0].at(u));
        }
        return false;
    }
};

std::vector<condition> conditions_of(const scheme& s) {
    std::vector<condition> out;
    auto add = [&](condition::kind_t kind, std::vector<linear_form> forms) {
        condition c{kind, {}, 0};
        for (const auto& f : forms) {
            c.forms.push_back(s.quad(f));
            for (std::size_t i = 0; i < s.names.size(); ++i)
                if (c.forms.back().coefficients[i] != 0) c.last = std::max(c.last, i);
        }
        out.push_back(std::move(c));
    };
    for (const auto& t : s.triads) {
        add(condition::integer, {t[0] + t[1] + t[2]});
        add(condition::triangle, {t[0], t[1], t[2]});
    }
    for (const auto& [top, bottom] : s.columns) {
        add(condition::integer, {top - bottom});
        add(condition::within, {bottom, top});
    }
    for (std::size_t i = 0; i < s.owners.size(); ++i) {
        const linear_form m = var(s.names[s.angular + i]);
        add(condition::integer, {s.owners[i] - m});
        add(condition::within, {m, s.owners[i]});
    }
    for (const auto& z : s.msums) add(condition::zero, {z[0] + z[1] + z[2]});
    for (std::size_t i = 0; i < s.angular; ++i) {
        if (s.parities[i] == parity::integer) add(condition::integer, {var(s.names[i])});
        if (s.parities[i] == parity::half_odd) add(condition::integer, {var(s.names[i]) - half});
    }
    return out;
}

// Every admissible assignment with angular momenta in {0, 1/2, ..., jmax}, in doubled units, by
// backtracking (projections range over |m| <= jmax + 1, the largest owner in these schemes).
// Stops once more than `limit` points are found.
std::vector<std::vector<int>> admissible_points(const scheme& s, std::size_t limit, int twice_jmax) {
    const std::vector<condition> conditions = conditions_of(s);
    std::vector<std::vector<const condition*>> ready(s.names.size());
    for (const auto& c : conditions) ready[c.last].push_back(&c);
    std::vector<std::vector<int>> points;
    std::vector<int> u(s.names.size(), 0);
    auto assign = [&](auto&& self, std::size_t i) -> void {
        if (points.size() > limit) return;
        if (i == u.size()) {
            points.push_back(u);
            return;
        }
        const int lo = i < s.angular ? 0 : -twice_jmax - 2, hi = i < s.angular ? twice_jmax : twice_jmax + 2;
        for (int value = lo; value <= hi; ++value) {
            u[i] = value;
            bool ok = true;
            for (const condition* c : ready[i]) ok = ok && c->holds(u);
            if (ok) self(self, i + 1);
        }
        u[i] = 0;
    };
    assign(assign, 0);
    return points;
}

// ---- random schemes --------------------------------------------------------------------

struct generator {
    std::mt19937 rng;
    explicit generator(unsigned seed) : rng(seed) {}
    int below(int n) { return static_cast<int>(rng() % static_cast<unsigned>(n)); }
    bool chance(int percent) { return below(100) < percent; }
};

linear_form random_slot(generator& g, const scheme& s) {
    if (g.chance(10)) {
        // Nonzero constants only: a constant 0 slot forces a = b through the triangle, which
        // the parity argument (values large enough) deliberately does not see.
        static const cln::cl_RA constants[3] = {half, cln::cl_RA(1), cln::cl_RA(3) / 2};
        return constants[g.below(3)];
    }
    linear_form slot = var(s.names[static_cast<std::size_t>(g.below(static_cast<int>(s.angular)))]);
    const int r = g.below(20);
    if (r == 0) slot += half;
    if (r == 1) slot -= half;
    if (r == 2) slot += 1;
    return slot;
}

// A triad with two constant slots bounds the third; an offset there can pin its variable to
// one value (1/2, 1/2, b+1 forces b = 0), which inequalities see and parity reasoning, by
// design, does not.  Such slots lose their offset.
void unpin(std::array<linear_form*, 3> triad) {
    int constants = 0;
    for (const linear_form* slot : triad) constants += slot->is_constant();
    if (constants < 2) return;
    for (linear_form* slot : triad)
        if (!slot->is_constant()) *slot = var(slot->coefficients().begin()->first);
}

scheme random_scheme(generator& g) {
    scheme s;
    s.angular = 2 + static_cast<std::size_t>(g.below(4));
    const char* letters[5] = {"a", "b", "c", "d", "e"};
    for (std::size_t i = 0; i < s.angular; ++i) {
        s.names.emplace_back(letters[i]);
        const int r = g.below(4);
        s.parities.push_back(r < 2 ? parity::unknown : r == 2 ? parity::integer : parity::half_odd);
    }
    const int symbols = 1 + g.below(4);
    for (int k = 0; k < symbols; ++k) {
        const int kind = g.below(4);
        if (kind <= 1) {  // a 3j
            std::array<linear_form, 3> top, bottom;
            for (auto& t : top) t = random_slot(g, s);
            unpin({&top[0], &top[1], &top[2]});
            std::vector<bool> used_in_row(4, false);
            for (int col = 0; col < 3; ++col) {
                // A fresh projection, an earlier one of the same top slot (not yet in this row:
                // m-sums such as m4 + 2 m3 = 0 with |m4| <= 1 pin m3 too), or a constant.
                std::size_t reuse = s.owners.size();
                for (std::size_t p = 0; p < s.owners.size(); ++p)
                    if (s.owners[p] == top[col] && !used_in_row[p]) reuse = p;
                if (s.owners.size() < 4 && (reuse == s.owners.size() || g.chance(60))) {
                    const std::string name = "m" + std::to_string(s.owners.size() + 1);
                    s.names.push_back(name);
                    s.owners.push_back(top[col]);
                    used_in_row[s.owners.size() - 1] = true;
                    bottom[col] = var(name);
                } else if (reuse < s.owners.size()) {
                    used_in_row[reuse] = true;
                    bottom[col] = (g.chance(50) ? 1 : -1) * var(s.names[s.angular + reuse]);
                    if (g.chance(15)) bottom[col] += g.chance(50) ? 1 : -1;
                } else {
                    static const cln::cl_RA constants[4] = {cln::cl_RA(0), half, -half, cln::cl_RA(1)};
                    bottom[col] = constants[g.below(4)];
                }
                s.columns.emplace_back(top[col], bottom[col]);
            }
            s.triads.push_back(top);
            s.msums.push_back(bottom);
        } else if (kind == 2) {  // a 6j {s1 s2 s3; s4 s5 s6}
            std::array<linear_form, 6> x;
            for (auto& slot : x) slot = random_slot(g, s);
            for (int pass = 0; pass < 2; ++pass) {
                unpin({&x[0], &x[1], &x[2]});
                unpin({&x[0], &x[4], &x[5]});
                unpin({&x[3], &x[1], &x[5]});
                unpin({&x[3], &x[4], &x[2]});
            }
            s.triads.push_back({x[0], x[1], x[2]});
            s.triads.push_back({x[0], x[4], x[5]});
            s.triads.push_back({x[3], x[1], x[5]});
            s.triads.push_back({x[3], x[4], x[2]});
        } else {
            std::array<linear_form, 3> t{random_slot(g, s), random_slot(g, s), random_slot(g, s)};
            unpin({&t[0], &t[1], &t[2]});
            s.triads.push_back(t);
        }
    }
    return s;
}

// Exponents that are often integers: sums of the scheme's own integer pieces, plus noise.
linear_form random_exponent(generator& g, const scheme& s) {
    std::vector<linear_form> pieces;
    for (const auto& t : s.triads) pieces.push_back(t[0] + t[1] + t[2]);
    for (const auto& [top, bottom] : s.columns) pieces.push_back(top - bottom);
    for (std::size_t i = 0; i < s.names.size(); ++i) pieces.push_back(2 * var(s.names[i]));
    for (std::size_t i = 0; i < s.angular; ++i) {
        if (s.parities[i] == parity::integer) pieces.push_back(var(s.names[i]));
        if (s.parities[i] == parity::half_odd) pieces.push_back(var(s.names[i]) - half);
    }
    pieces.push_back(linear_form(1));
    linear_form x;
    const int count = 1 + g.below(3);
    for (int k = 0; k < count; ++k) {
        // One draw per statement: the operands of * are evaluated in an unspecified order, and
        // g++ and clang would otherwise draw different schemes from the same seed.
        const int coefficient = g.below(5) - 2;
        const auto piece = static_cast<std::size_t>(g.below(static_cast<int>(pieces.size())));
        x += cln::cl_RA(coefficient) * pieces[piece];
    }
    if (g.chance(30)) {
        static const cln::cl_RA noise[6] = {half,         -half, cln::cl_RA(1), cln::cl_RA(-1), cln::cl_RA(3) / 2,
                                            cln::cl_RA(2)};
        const cln::cl_RA& amount = noise[g.below(6)];
        const auto name = static_cast<std::size_t>(g.below(static_cast<int>(s.names.size())));
        x += amount * var(s.names[name]);
    }
    if (g.chance(10)) x += half;
    return x;
}

// Exponents that should not change the phase: the null generators of the theory.  Whether they
// really do not is for the enumeration to judge.
linear_form random_null(generator& g, const scheme& s) {
    std::vector<linear_form> nulls;
    for (const auto& t : s.triads) nulls.push_back(2 * (t[0] + t[1] + t[2]));
    for (const auto& [top, bottom] : s.columns) nulls.push_back(2 * (top - bottom));
    for (const auto& z : s.msums) nulls.push_back(half * (z[0] + z[1] + z[2]));
    for (std::size_t i = 0; i < s.names.size(); ++i) nulls.push_back(4 * var(s.names[i]));
    for (std::size_t i = 0; i < s.angular; ++i) {
        if (s.parities[i] == parity::integer) nulls.push_back(2 * var(s.names[i]));
        if (s.parities[i] == parity::half_odd) nulls.push_back(2 * var(s.names[i]) - 1);
    }
    nulls.push_back(linear_form(2));
    linear_form x;
    const int count = 1 + g.below(4);
    for (int k = 0; k < count; ++k) {
        const int coefficient = g.below(5) - 2;  // sequenced, as in random_exponent
        const auto null = static_cast<std::size_t>(g.below(static_cast<int>(nulls.size())));
        x += cln::cl_RA(coefficient) * nulls[null];
    }
    return x;
}

std::vector<int> doubled(const assignment& values, const scheme& s) {
    std::vector<int> u;
    for (const auto& name : s.names) {
        const cln::cl_RA twice = 2 * values.at(name);
        REQUIRE(cln::denominator(twice) == 1);
        u.push_back(static_cast<int>(cln::cl_I_to_long(cln::numerator(twice))));
    }
    return u;
}

bool coefficients_in_range(const linear_form& f) {
    for (const auto& term : f.coefficients())
        if (term.second <= -2 || term.second > 2) return false;
    return f.constant() > -1 && f.constant() <= 1;
}

struct exhaustive_judgement {
    bool x_integer = true, y_integer = true;
    verdict result = verdict::equal;
};

exhaustive_judgement judge(const std::vector<std::vector<int>>& points, const quad_form& qx, const quad_form& qy) {
    exhaustive_judgement j;
    bool same_sign = true;
    for (const auto& u : points) {
        const int vx = qx.at(u), vy = qy.at(u);
        j.x_integer = j.x_integer && mod(vx, 4) == 0;
        j.y_integer = j.y_integer && mod(vy, 4) == 0;
        same_sign = same_sign && mod(vx - vy, 8) == 0;
    }
    j.result = !(j.x_integer && j.y_integer) ? verdict::not_integer : same_sign ? verdict::equal : verdict::not_equal;
    return j;
}

}  // namespace

// Scheme 1062 pins m4 = 0 through a projection of the constant 1 (see
// test_phase_bounded_projection.cpp); the context has to honour that bound.
TEST_CASE("phase: verdicts agree with exhaustive evaluation over j <= 3", "[phase][prop]") {
    constexpr int schemes = 2500;
    constexpr int pairs_per_scheme = 12;
    constexpr std::size_t point_limit = 60000;
    int skipped_unsatisfiable = 0, skipped_bounded = 0, skipped_large = 0, checked = 0;
    int seen_equal = 0, seen_not_equal = 0, seen_not_integer = 0, bound_artifacts = 0;
    int witnesses = 0, witnesses_inside_inequalities = 0;
    for (int k = 0; k < schemes; ++k) {
        generator g(1000u + static_cast<unsigned>(k));
        const scheme s = random_scheme(g);
        const std::vector<std::vector<int>> points = admissible_points(s, point_limit, 6);
        if (points.empty()) {
            // Either the congruences admit nothing at all, or only values beyond j = 3 do.
            ++(s.make_context().satisfiable() ? skipped_bounded : skipped_unsatisfiable);
            continue;
        }
        if (points.size() > point_limit) {
            ++skipped_large;
            continue;
        }
        std::optional<std::vector<std::vector<int>>> wider_points;
        const context ctx = s.make_context();
        const congruence_checker congruences(s);
        const inequality_checker inequalities(s);
        INFO("scheme " << k << ": " << s.describe() << "(" << points.size() << " points)");
        REQUIRE(ctx.satisfiable());
        for (int p = 0; p < pairs_per_scheme; ++p) {
            const linear_form x = random_exponent(g, s);
            const linear_form y = g.chance(50) ? x + random_null(g, s) : random_exponent(g, s);
            INFO("X = " << ctx.to_string(x) << ", Y = " << ctx.to_string(y));
            const quad_form qx = s.quad(x), qy = s.quad(y);
            exhaustive_judgement expected = judge(points, qx, qy);
            if (ctx.equal(x, y) != expected.result || ctx.is_integer(x) != expected.x_integer) {
                // Values up to 3 need not realize every parity pattern the congruences allow
                // (a forced m = -3/2 already needs j >= 3/2); the verdict must then hold up to 6.
                if (!wider_points) wider_points = admissible_points(s, 3000000, 12);
                REQUIRE(wider_points->size() <= 3000000);
                expected = judge(*wider_points, qx, qy);
                ++bound_artifacts;
            }
            ++checked;
            seen_equal += expected.result == verdict::equal;
            seen_not_equal += expected.result == verdict::not_equal;
            seen_not_integer += expected.result == verdict::not_integer;

            CHECK(ctx.is_integer(x) == expected.x_integer);
            CHECK(ctx.equal(x, y) == expected.result);
            const comparison cmp = ctx.compare(x, y);
            CHECK(cmp.result == expected.result);
            if (expected.result != verdict::equal) {
                REQUIRE(cmp.witness.has_value());
                const std::vector<int> w = doubled(*cmp.witness, s);
                CHECK(congruences.holds(w));
                CHECK(ctx.admits(*cmp.witness));
                if (expected.result == verdict::not_equal) {
                    CHECK(mod(qx.at(w) - qy.at(w), 8) == 4);
                } else {
                    CHECK((mod(qx.at(w), 4) != 0 || mod(qy.at(w), 4) != 0));
                }
                ++witnesses;
                witnesses_inside_inequalities += inequalities.holds(w);
            }

            const linear_form cx = ctx.canonical(x), cy = ctx.canonical(y);
            INFO("canonical X = " << ctx.to_string(cx) << ", canonical Y = " << ctx.to_string(cy));
            const quad_form qcx = s.quad(cx), qcy = s.quad(cy);
            bool cx_same = true, cy_same = true;
            for (const auto& u : points) {
                cx_same = cx_same && mod(qx.at(u) - qcx.at(u), 8) == 0;
                cy_same = cy_same && mod(qy.at(u) - qcy.at(u), 8) == 0;
            }
            CHECK(cx_same);
            CHECK(cy_same);
            CHECK(coefficients_in_range(cx));
            CHECK(ctx.canonical(cx) == cx);
            if (expected.result == verdict::equal) CHECK(cx == cy);
            if (expected.result == verdict::not_equal) CHECK(cx != cy);
        }
    }
    // The run must not be vacuous: most schemes evaluated, every verdict seen many times, the
    // j <= 3 box rarely too small, and the witness search usually inside the triangles.
    const int skipped = skipped_unsatisfiable + skipped_bounded + skipped_large;
    std::ostringstream summary;
    summary << "phase property: " << checked << " pairs over " << schemes - skipped << " schemes; skipped "
            << skipped_unsatisfiable << " unsatisfiable, " << skipped_bounded << " empty below j = 3, " << skipped_large
            << " oversized; equal " << seen_equal << ", not equal " << seen_not_equal << ", not integer "
            << seen_not_integer << "; judged up to j = 6 instead " << bound_artifacts
            << "; witnesses inside the inequalities " << witnesses_inside_inequalities << "/" << witnesses;
    INFO(summary.str());
    CHECK(schemes - skipped >= 600);
    CHECK(seen_equal > 2000);
    CHECK(seen_not_equal > 1000);
    CHECK(seen_not_integer > 1500);
    CHECK(bound_artifacts * 100 <= checked);
    CHECK(witnesses_inside_inequalities * 10 >= witnesses * 9);
    WARN(summary.str());
}
