#include "verify/phase_fit.hpp"

#include <map>
#include <set>

#include "model/symbols.hpp"
#include "print/print.hpp"
#include "verify/gf2.hpp"
#include "verify/readable_phase.hpp"

namespace couplet::verify {

namespace {

// An integer exponent (sum c_i t_i + d) / 2 of the lattice's generating set.
struct generator {
    std::vector<long> c;
    long d = 0;
    long doubled(const point& t) const {
        long w = d;
        for (std::size_t i = 0; i < t.size(); ++i) w += c[i] * t[i];
        return w;
    }
    bool bit(const point& t) const { return (doubled(t) / 2) % 2 != 0; }
};

// Generators of {E : E is an integer at every point}: lifts of the GF(2) null space of the
// parity patterns (t mod 2, 1), the exponents 2x_i, and the constant 1.
std::vector<generator> integer_exponents(const std::vector<point>& points, std::size_t n) {
    std::set<gf2::bits> patterns;
    for (const point& t : points) {
        gf2::bits row(n + 1);
        for (std::size_t i = 0; i < n; ++i) row.set(i, (t[i] % 2) != 0);
        row.set(n, true);
        patterns.insert(row);
    }
    std::vector<generator> out;
    for (const gf2::bits& v : gf2::null_space({patterns.begin(), patterns.end()}, n + 1)) {
        generator g{std::vector<long>(n, 0), v.get(n) ? 1 : 0};
        for (std::size_t i = 0; i < n; ++i) g.c[i] = v.get(i) ? 1 : 0;
        out.push_back(g);
    }
    for (std::size_t i = 0; i < n; ++i) {
        generator g{std::vector<long>(n, 0), 0};
        g.c[i] = 2;
        out.push_back(g);
    }
    out.push_back({std::vector<long>(n, 0), 2});
    return out;
}

int centred_mod4(long v) {  // into {-1, 0, 1, 2}
    int r = static_cast<int>(((v % 4) + 4) % 4);
    return r == 3 ? -1 : r;
}

}  // namespace

std::optional<phase_exponent> fit_phase(const std::vector<point>& points, const std::vector<sign_need>& needs) {
    if (points.empty()) return phase_exponent{};
    const std::size_t n = points.front().size();
    std::vector<generator> gens = integer_exponents(points, n);

    // One equation per distinct (features, needed bit).
    std::map<gf2::bits, bool> equations;
    for (std::size_t p = 0; p < points.size(); ++p) {
        if (needs[p] == sign_need::any) continue;
        gf2::bits row(gens.size());
        for (std::size_t g = 0; g < gens.size(); ++g) row.set(g, gens[g].bit(points[p]));
        bool flip = needs[p] == sign_need::flip;
        auto [it, inserted] = equations.emplace(row, flip);
        if (!inserted && it->second != flip) return std::nullopt;
    }
    std::vector<gf2::bits> rows;
    std::vector<bool> rhs;
    for (const auto& [row, flip] : equations) {
        rows.push_back(row);
        rhs.push_back(flip);
    }
    std::optional<gf2::bits> y = gf2::solve(rows, rhs, gens.size());
    if (!y) return std::nullopt;

    std::vector<long> c(n, 0);
    long d = 0;
    for (std::size_t g = 0; g < gens.size(); ++g) {
        if (!y->get(g)) continue;
        for (std::size_t i = 0; i < n; ++i) c[i] += gens[g].c[i];
        d += gens[g].d;
    }
    phase_exponent solved;
    for (long v : c) solved.coefficients.push_back(centred_mod4(v));
    solved.twice_constant = centred_mod4(d);

    std::map<std::vector<int>, sign_need> by_residue;
    for (std::size_t p = 0; p < points.size(); ++p) {
        std::vector<int> r;
        for (long v : points[p]) r.push_back(static_cast<int>(((v % 4) + 4) % 4));
        auto [it, inserted] = by_residue.emplace(r, needs[p]);
        if (!inserted && it->second == sign_need::any) it->second = needs[p];
    }
    std::vector<detail::phase_class> classes;
    for (const auto& [r, need] : by_residue) classes.push_back({r, need});
    return detail::readable_phase(classes, solved);
}

GiNaC::ex exponent_ex(const phase_exponent& e, const sampling_domain& domain) {
    GiNaC::ex x = GiNaC::numeric(e.twice_constant, 2);
    for (std::size_t i = 0; i < e.coefficients.size(); ++i) x += e.coefficients[i] * domain.numbers[i].symbol;
    return x;
}

std::string phase_text(const GiNaC::ex& exponent) { return to_text(make_phase(exponent)); }

}  // namespace couplet::verify
