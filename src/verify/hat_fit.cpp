#include "verify/hat_fit.hpp"

#include <cln/integer.h>
#include <cln/rational.h>

#include <algorithm>
#include <cstdlib>
#include <set>

#include "eval/evaluate.hpp"

namespace couplet::verify {

namespace {

using cln::cl_I;
using cln::cl_RA;

long valuation(cl_I n, long p) {  // n != 0
    long v = 0;
    const cl_I prime = p;
    while (cln::zerop(cln::mod(n, prime))) {
        n = cln::exquo(n, prime);
        ++v;
    }
    return v;
}

long valuation(const cl_RA& q, long p) { return valuation(cln::numerator(q), p) - valuation(cln::denominator(q), p); }

std::vector<long> primes_of(long n) {
    std::vector<long> out;
    for (long p = 2; p * p <= n; ++p)
        if (n % p == 0) {
            out.push_back(p);
            while (n % p == 0) n /= p;
        }
    if (n > 1) out.push_back(n);
    return out;
}

// Rows reduced against an echelon basis, one at a time: the rank stays at most the number of
// unknowns however many points there are.
class rational_system {
public:
    explicit rational_system(std::size_t unknowns) : n_(unknowns) {}

    // False when the row contradicts the rows before it.
    bool add(std::vector<cl_RA> row, cl_RA rhs) {
        for (const auto& [pivot, basis] : rows_) {
            const cl_RA f = row[pivot];
            if (cln::zerop(f)) continue;
            for (std::size_t k = 0; k < n_; ++k) row[k] = row[k] - f * basis.first[k];
            rhs = rhs - f * basis.second;
        }
        std::size_t pivot = 0;
        while (pivot < n_ && cln::zerop(row[pivot])) ++pivot;
        if (pivot == n_) return cln::zerop(rhs);
        const cl_RA lead = row[pivot];
        for (auto& x : row) x = x / lead;
        rhs = rhs / lead;
        // Keep the basis reduced: the new pivot leaves every older row.
        for (auto& [p, basis] : rows_) {
            const cl_RA f = basis.first[pivot];
            if (cln::zerop(f)) continue;
            for (std::size_t k = 0; k < n_; ++k) basis.first[k] = basis.first[k] - f * row[k];
            basis.second = basis.second - f * rhs;
        }
        rows_.emplace_back(pivot, std::make_pair(std::move(row), rhs));
        return true;
    }

    // A solution with the unknowns that no row fixes at 0.
    std::vector<cl_RA> solution() const {
        std::vector<cl_RA> x(n_, 0);
        for (const auto& [pivot, basis] : rows_) x[pivot] = basis.second;
        return x;
    }

private:
    std::size_t n_;
    std::vector<std::pair<std::size_t, std::pair<std::vector<cl_RA>, cl_RA>>> rows_;
};

// The square of a single term q*sqrt(r); nothing for a sum of several radicals.
std::optional<cl_RA> square_of(const exact::number& x) {
    if (x.terms().size() != 1) return std::nullopt;
    const auto& [radicand, coefficient] = *x.terms().begin();
    return coefficient * coefficient * radicand;
}

cl_RA hat_power(const point& t, const std::vector<std::size_t>& js, const std::vector<long>& e) {
    cl_RA product = 1;
    for (std::size_t a = 0; a < js.size(); ++a) product = product * cln::expt(cl_RA(t[js[a]] + 1), e[a]);
    return product;
}

}  // namespace

// Hats kept whole as a formula writes them: sqrt((2a+1)(2b+1)), 1/sqrt(2c+1), (2d+1).
GiNaC::ex hat_factor::factor(const sampling_domain& d) const {
    GiNaC::ex whole = 1, over = 1, under = 1;
    for (std::size_t k = 0; k < exponents.size(); ++k) {
        const int e = exponents[k];
        if (e == 0) continue;
        const GiNaC::ex hat2 = 2 * d.numbers[k].symbol + 1;
        whole *= GiNaC::pow(hat2, e / 2);  // truncated: the odd remainder goes under a root
        if (e % 2 > 0) over *= hat2;
        if (e % 2 < 0) under *= hat2;
    }
    return to_ex(constant) * whole * GiNaC::sqrt(over) / GiNaC::sqrt(under);
}

std::optional<hat_factor> fit_hat_factor(const sampling_domain& d, const std::vector<point>& points,
                                         const std::vector<std::optional<exact::number>>& ratios) {
    std::vector<std::size_t> js;
    for (std::size_t k = 0; k < d.numbers.size(); ++k)
        if (d.numbers[k].role == qn_role::angular) js.push_back(k);
    std::vector<cl_RA> squares;
    std::vector<std::size_t> used;
    std::set<long> primes;
    for (std::size_t i = 0; i < points.size(); ++i) {
        if (!ratios[i]) continue;
        auto q = square_of(*ratios[i]);
        if (!q) return std::nullopt;
        squares.push_back(*q);
        used.push_back(i);
        for (std::size_t k : js)
            for (long p : primes_of(points[i][k] + 1)) primes.insert(p);
    }
    if (used.size() < 2 || js.empty()) return std::nullopt;

    rational_system system(js.size());
    const point& first = points[used.front()];
    for (std::size_t u = 1; u < used.size(); ++u) {
        const point& t = points[used[u]];
        for (long p : primes) {
            std::vector<cl_RA> row(js.size());
            for (std::size_t a = 0; a < js.size(); ++a)
                row[a] = valuation(cl_I(t[js[a]] + 1), p) - valuation(cl_I(first[js[a]] + 1), p);
            if (!system.add(row, valuation(squares[u], p) - valuation(squares.front(), p))) return std::nullopt;
        }
    }
    std::vector<long> e;
    for (const cl_RA& x : system.solution()) {
        if (cln::denominator(x) != 1) return std::nullopt;
        const cl_I whole = cln::numerator(x);
        long v = cln::cl_I_to_long(whole);
        if (std::labs(v) > 4) return std::nullopt;  // beyond any hat a formula writes
        e.push_back(v);
    }
    if (std::all_of(e.begin(), e.end(), [](long v) { return v == 0; }))
        return std::nullopt;  // a constant: the simple fit's

    // c^2 is the same at every point, or the primes of no hat were not constant.
    const cl_RA c2 = squares.front() / hat_power(first, js, e);
    for (std::size_t u = 1; u < used.size(); ++u)
        if (squares[u] / hat_power(points[used[u]], js, e) != c2) return std::nullopt;

    hat_factor out;
    out.constant = exact::number::sqrt_of(c2);
    out.exponents.assign(d.numbers.size(), 0);
    for (std::size_t a = 0; a < js.size(); ++a) out.exponents[js[a]] = static_cast<int>(e[a]);
    for (std::size_t i = 0; i < points.size(); ++i)
        out.needs.push_back(!ratios[i] ? sign_need::any : ratios[i]->sign() < 0 ? sign_need::flip : sign_need::keep);
    return out;
}

}  // namespace couplet::verify
