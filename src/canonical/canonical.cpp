// Choosing one representative per symmetry class, and the pass that applies it.
#include <algorithm>

#include "canonical/entry_order.hpp"
#include "canonical/symmetries.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"

namespace couplet::symmetry {

using namespace GiNaC;

namespace {

std::vector<entry_order::key> key_of(const ex& s, std::size_t projection_start, const entry_order& order) {
    std::vector<entry_order::key> key;
    for (std::size_t k = 0; k < s.nops(); ++k) key.push_back(order.of(s.op(k), k >= projection_start));
    return key;
}

bool less(const std::vector<entry_order::key>& a, const std::vector<entry_order::key>& b) {
    return std::lexicographical_compare(a.begin(), a.end(), b.begin(), b.end(), key_less);
}

// Fewer phase terms is the tie-break between arrangements with the same entries.
std::size_t phase_weight(const ex& p) { return p.is_zero() ? 0 : is_a<add>(p) ? p.nops() : 1; }

transformed pick(const std::vector<transformed>& orbit, std::size_t projection_start, const entry_order& order) {
    const transformed* best = nullptr;
    std::vector<entry_order::key> best_key;
    for (const transformed& t : orbit) {
        if (!is_a<function>(t.symbol)) return {0, 0};  // a selection rule made it vanish
        auto key = key_of(t.symbol, projection_start, order);
        bool better =
            !best || less(key, best_key) || (!less(best_key, key) && phase_weight(t.phase) < phase_weight(best->phase));
        if (better) {
            best = &t;
            best_key = std::move(key);
        }
    }
    return *best;
}

struct canonicalizer : map_function {
    explicit canonicalizer(const quantum_numbers& numbers) : numbers(numbers) {}
    const quantum_numbers& numbers;

    ex operator()(const ex& e) override {
        if (is_a<index_sum>(e)) {
            const auto& s = ex_to<index_sum>(e);
            return make_sum((*this)(s.body()), s.indices());
        }
        ex mapped = e.map(*this);
        symbol_kind k = kind_of(mapped);
        if (k == symbol_kind::clebsch_gordan) mapped = (*this)(clebsch_as_threej(mapped));
        if (k == symbol_kind::threej || k == symbol_kind::sixj || k == symbol_kind::ninej) {
            transformed t = canonical(mapped, numbers);
            return make_phase(t.phase) * t.symbol;
        }
        return mapped;
    }
};

}  // namespace

transformed canonical(const ex& s, const quantum_numbers& numbers) {
    entry_order order(numbers);
    switch (kind_of(s)) {
        case symbol_kind::threej:
            return pick(threej_orbit(s), 3, order);
        case symbol_kind::sixj:
            return pick(sixj_orbit(s), 6, order);
        case symbol_kind::ninej:
            return pick(ninej_orbit(s), 9, order);
        default:
            return {s, 0};
    }
}

ex clebsch_as_threej(const ex& cg) {
    const ex &j1 = cg.op(0), &m1 = cg.op(1), &j2 = cg.op(2), &m2 = cg.op(3), &j = cg.op(4), &m = cg.op(5);
    return make_phase(j1 - j2 + m) * sqrt(2 * j + 1) * wigner3j(j1, j2, j, m1, m2, -m);
}

ex threej_as_clebsch(const ex& s) {
    const ex &a = s.op(0), &b = s.op(1), &c = s.op(2), &ma = s.op(3), &mb = s.op(4), &mc = s.op(5);
    return make_phase(a - b - mc) * clebsch(a, ma, b, mb, c, -mc) / sqrt(2 * c + 1);
}

ex prefer_clebsch(const ex& e) {
    struct rewrite : map_function {
        ex operator()(const ex& x) override {
            if (is_a<index_sum>(x)) {
                const auto& s = ex_to<index_sum>(x);
                return make_sum((*this)(s.body()), s.indices());
            }
            ex mapped = x.map(*this);
            return kind_of(mapped) == symbol_kind::threej ? threej_as_clebsch(mapped) : mapped;
        }
    } r;
    return r(e);
}

ex canonicalize_symbols(const ex& e, const quantum_numbers& numbers) {
    canonicalizer c(numbers);
    return c(e);
}

}  // namespace couplet::symmetry
