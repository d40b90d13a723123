#include "verify/arrangement_fit.hpp"

#include <algorithm>
#include <array>
#include <set>

#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "verify/repaired_side.hpp"

namespace couplet::verify {

namespace {

using GiNaC::ex;

void sixjs_in(const ex& e, std::vector<ex>& out) {
    if (kind_of(e) == symbol_kind::sixj) out.push_back(e);
    for (std::size_t k = 0; k < e.nops(); ++k) sixjs_in(e.op(k), out);
}

// The value of a 6j depends on its order only through the four triads it makes: entries
// (0 1 2), (0 4 5), (3 1 5), (3 4 2).  Orders with the same set of triads are one class.
using triad = std::multiset<ex, GiNaC::ex_is_less>;
struct triad_less {
    bool operator()(const triad& a, const triad& b) const {
        return std::lexicographical_compare(a.begin(), a.end(), b.begin(), b.end(), GiNaC::ex_is_less());
    }
};
using triad_set = std::multiset<triad, triad_less>;
struct triad_set_less {
    bool operator()(const triad_set& a, const triad_set& b) const {
        return std::lexicographical_compare(a.begin(), a.end(), b.begin(), b.end(), triad_less());
    }
};

triad_set triads_of(const std::array<ex, 6>& x) {
    static const int t[4][3] = {{0, 1, 2}, {0, 4, 5}, {3, 1, 5}, {3, 4, 2}};
    triad_set out;
    for (const auto& r : t) out.insert(triad{x[r[0]], x[r[1]], x[r[2]]});
    return out;
}

}  // namespace

std::string describe(const arrangement& a) {
    return "it holds with " + to_text(a.needed) + " in place of " + to_text(a.written) + " on the " +
           (a.on_left ? "left" : "right") + " side";
}

std::optional<arrangement> find_arrangement(const ex& lhs, const ex& rhs, const quantum_numbers& numbers,
                                            const sampling_domain& d, const std::vector<point>& points,
                                            const std::vector<exact::number>& lhs_values,
                                            const std::vector<exact::number>& rhs_values,
                                            const sampling_options& options) {
    for (int side : {1, 0}) {  // the right side first: it is usually the one quoted from a table
        const ex& whole = side == 0 ? lhs : rhs;
        const repaired_side_test test(side == 0 ? rhs : lhs, numbers, d, points, side == 0 ? rhs_values : lhs_values,
                                      options);
        std::vector<ex> symbols;
        sixjs_in(whole, symbols);
        for (const ex& s : symbols) {
            std::array<ex, 6> entries;
            for (std::size_t k = 0; k < 6; ++k) entries[k] = s.op(k);
            std::set<triad_set, triad_set_less> tried{triads_of(entries)};
            std::array<int, 6> order{0, 1, 2, 3, 4, 5};
            while (std::next_permutation(order.begin(), order.end())) {
                std::array<ex, 6> x;
                for (std::size_t k = 0; k < 6; ++k) x[k] = entries[order[k]];
                if (!tried.insert(triads_of(x)).second) continue;  // an order of a class already tried
                ex other = held_sixj(x[0], x[1], x[2], x[3], x[4], x[5]);
                if (test.holds(replaced(whole, s, other))) return arrangement{s, other, side == 0};
            }
        }
    }
    return std::nullopt;
}

}  // namespace couplet::verify
