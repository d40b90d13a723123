#include "rules/rewrites.hpp"

#include "model/symbols.hpp"
#include "rules/rule.hpp"

namespace couplet::rules {

using namespace GiNaC;

namespace {

constexpr auto six = held_sixj;

}  // namespace

const identity& odd_symbol_identity() {
    static const identity id = make_identity(
        "symbol odd under its own symmetry", "common practice, no source", [](pattern_table& p, ex& left, ex& right) {
            // Negating the bottom row multiplies a 3j by (-1)^(a+b+c) (DLMF 34.3.10), which is -1
            // for the first 3j here (a and b integers): it is its own negative.  The second, even,
            // stays, so that the instance is nonzero where it can be.
            symbol a = p.angular("a", qn_parity::integer), b = p.angular("b", qn_parity::integer);
            const ex even = wigner3j(a, b, a + b, 0, 0, 0).hold();
            left = wigner3j(a, b, a + b - 1, 0, 0, 0).hold() + even;
            right = even;
        });
    return id;
}

const identity& repeated_delta_identity() {
    static const identity id = make_identity("a repeated delta counts once", "common practice, no source",
                                             [](pattern_table& p, ex& left, ex& right) {
                                                 auto [a, b] = p.angulars({"a", "b"});
                                                 left = pow(kdelta(a, b).hold(), 2);
                                                 right = kdelta(a, b).hold();
                                             });
    return id;
}

const identity& delta_elimination_identity() {
    static const identity id =
        make_identity("delta elimination", "common practice, no source", [](pattern_table& p, ex& left, ex& right) {
            auto [a, b, c, d, e, f] = p.angulars({"a", "b", "c", "d", "e", "f"});
            left = kdelta(a, b).hold() * six(a, c, d, e, f, b);
            right = kdelta(a, b).hold() * six(a, c, d, e, f, a);
        });
    return id;
}

const identity& delta_collapse_identity() {
    static const identity id =
        make_identity("delta collapses a sum", "common practice, no source", [](pattern_table& p, ex& left, ex& right) {
            auto [x, a, b, c, d, e, f] = p.angulars({"x", "a", "b", "c", "d", "e", "f"});
            left = make_sum(kdelta(x, a).hold() * six(x, b, c, d, e, f), lst{x});
            right = six(a, b, c, d, e, f);
        });
    return id;
}

const identity& sum_split_identity() {
    static const identity id = make_identity(
        "sum split over its terms", "common practice, no source", [](pattern_table& p, ex& left, ex& right) {
            auto [x, a, b, c, d, q] = p.angulars({"x", "a", "b", "c", "d", "q"});
            const ex first = six(a, b, x, c, d, q), second = (2 * x + 1) * pow(six(a, b, x, c, d, q), 2);
            left = make_sum(first + second, lst{x});
            right = make_sum(first, lst{x}) + make_sum(second, lst{x});
        });
    return id;
}

namespace {

identity merged_sums(const std::string& name, bool renamed) {
    identity i = named_identity(name, "common practice, no source");
    pattern_table p(i.numbers);
    auto [x, y, a, b, c, d, q] = p.angulars({"x", "y", "a", "b", "c", "d", "q"});
    const ex first = six(a, b, x, c, d, q), second = (2 * x + 1) * pow(six(a, b, x, c, d, q), 2);
    const ex written_second = renamed ? second.subs(x == y) : second;
    i.left = make_sum(first, lst{x}) + make_sum(written_second, lst{renamed ? y : x});
    i.right = make_sum(first + second, lst{x});
    return i;
}

// The sum rule that forms a 9j from three 6j (DLMF 34.6.2).
const sum_rule& ninej_rule() {
    for (const sum_rule& r : sum_rules())
        if (kind_of(r.result) == symbol_kind::ninej && r.indices().size() == 1) return r;
    throw std::logic_error("no sum rule forms a 9j from three 6j");
}

}  // namespace

const identity& sums_merged_identity() {
    static const identity id = merged_sums("sums over the same indices merged", false);
    return id;
}

const identity& sums_merged_renamed_identity() {
    static const identity id = merged_sums("sums merged after renaming their indices", true);
    return id;
}

const identity& ninej_expansion_identity() {
    static const identity id = [] {
        const sum_rule& r = ninej_rule();
        identity i = named_identity("9j expanded as a sum of three 6j", r.reference);
        i.left = r.right;
        i.right = r.left;
        i.numbers = r.numbers;
        return i;
    }();
    return id;
}

ex ninej_summand(const ex& ninej, const symbol& x) {
    const sum_rule& r = ninej_rule();
    exmap entries{{r.index, x}};
    for (std::size_t k = 0; k < 9; ++k) entries[r.result.op(k)] = ninej.op(k);
    return r.summand().subs(entries);
}

}  // namespace couplet::rules
