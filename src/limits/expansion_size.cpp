#include <algorithm>
#include <limits>

#include "limits/run_limits.hpp"
#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

constexpr std::size_t saturated = std::numeric_limits<std::size_t>::max();

std::size_t saturating_product(std::size_t a, std::size_t b) {
    if (a == 0 || b == 0) return 0;
    return a > saturated / b ? saturated : a * b;
}

std::size_t saturating_sum(std::size_t a, std::size_t b) { return a > saturated - b ? saturated : a + b; }

}  // namespace

// An upper bound that is exact for products of sums of distinct monomials; powers of a sum
// count k^n (the multinomial count is smaller, but the bound is what protects memory).
std::size_t expanded_term_count(const ex& e) {
    if (is_a<add>(e)) {
        std::size_t n = 0;
        for (const ex& t : e) n = saturating_sum(n, expanded_term_count(t));
        return n;
    }
    if (is_a<mul>(e)) {
        std::size_t n = 1;
        for (const ex& f : e) n = saturating_product(n, expanded_term_count(f));
        return n;
    }
    if (is_a<power>(e) && is_a<numeric>(e.op(1)) && ex_to<numeric>(e.op(1)).is_pos_integer()) {
        const numeric& k = ex_to<numeric>(e.op(1));
        std::size_t base = expanded_term_count(e.op(0));
        if (base <= 1) return base;
        if (k > 64) return saturated;
        std::size_t n = 1;
        for (long i = 0; i < k.to_long(); ++i) n = saturating_product(n, base);
        return n;
    }
    return 1;
}

// A sum's body is expanded on its own (the sum stays one term outside), and so is the base of a
// root or any other non-integer power (sqrt((a+b)^10) is expanded inside): each counts against
// the limit separately.
void check_expansion(const ex& e) {
    std::size_t limit = current_run_limits().max_terms;
    std::size_t n = expanded_term_count(e);
    for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end() && n <= limit; ++it) {
        if (is_a<index_sum>(*it)) n = std::max(n, expanded_term_count(ex_to<index_sum>(*it).body()));
        if (is_a<power>(*it)) n = std::max(n, expanded_term_count(it->op(0)));
    }
    if (n > limit)
        throw term_limit_reached("expanding this expression would produce " +
                                 (n == saturated ? std::string("more than 10^19") : std::to_string(n)) +
                                 " terms, more than the limit of " + std::to_string(limit) +
                                 " (raise it with --max-terms, or factor the input)");
}

}  // namespace couplet
