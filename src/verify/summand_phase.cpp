#include "verify/summand_phase.hpp"

#include <algorithm>

#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "verify/repaired_side.hpp"

namespace couplet::verify {

namespace {

using GiNaC::ex;

constexpr std::size_t most_terms = 4;
void sums_in(const ex& e, std::vector<ex>& out) {
    if (GiNaC::is_a<index_sum>(e)) out.push_back(e);
    for (std::size_t k = 0; k < e.nops(); ++k) sums_in(e.op(k), out);
}

// Every subset of `names` with at most most_terms members, smallest first.
void subsets(const std::vector<ex>& names, std::size_t from, std::size_t left, ex sum, std::vector<ex>& out) {
    if (left == 0) return;
    for (std::size_t k = from; k < names.size(); ++k) {
        out.push_back(sum + names[k]);
        subsets(names, k + 1, left - 1, sum + names[k], out);
    }
}

std::vector<ex> exponents(const std::vector<ex>& names) {
    std::vector<ex> all;
    subsets(names, 0, most_terms, 0, all);
    std::stable_sort(all.begin(), all.end(), [](const ex& a, const ex& b) {
        auto size = [](const ex& x) { return GiNaC::is_a<GiNaC::add>(x) ? x.nops() : 1; };
        return size(a) < size(b);
    });
    std::vector<ex> out;
    for (const ex& e : all) {
        out.push_back(e);
        out.push_back(e + 1);
    }
    return out;
}

std::vector<ex> index_list(const index_sum& s) { return {s.indices().begin(), s.indices().end()}; }

}  // namespace

std::string describe(const summand_site& s) {
    std::string names;
    for (const ex& i : s.indices) names += (names.empty() ? "" : ", ") + GiNaC::ex_to<GiNaC::symbol>(i).get_name();
    return "the summand of the sum over " + names + " on the " + (s.on_left ? "left" : "right") + " side";
}

std::optional<summand_phase> find_summand_phase(const ex& lhs, const ex& rhs, const quantum_numbers& numbers,
                                                const sampling_domain& d, const std::vector<point>& points,
                                                const std::vector<exact::number>& lhs_values,
                                                const std::vector<exact::number>& rhs_values,
                                                const sampling_options& options) {
    for (int side = 0; side < 2; ++side) {
        const ex& whole = side == 0 ? lhs : rhs;
        const repaired_side_test test(side == 0 ? rhs : lhs, numbers, d, points, side == 0 ? rhs_values : lhs_values,
                                      options);
        std::vector<ex> sums;
        sums_in(whole, sums);
        for (const ex& s : sums) {
            const index_sum& sum = GiNaC::ex_to<index_sum>(s);
            std::vector<ex> names;
            for (const free_number& f : d.numbers)
                if (sum.body().has(f.symbol)) names.push_back(f.symbol);
            for (const ex& i : sum.indices()) names.push_back(i);
            for (const ex& exponent : exponents(names)) {
                ex repaired = replaced(whole, s, make_sum(sum.body() * make_phase(exponent), sum.indices()));
                if (test.holds(repaired)) return summand_phase{exponent, summand_site{index_list(sum), side == 0}};
            }
        }
    }
    return std::nullopt;
}

}  // namespace couplet::verify
