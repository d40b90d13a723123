// Exact comparison of an expression with its simplification at random points: two thirds of
// them where every triad outside the sums holds (where the values are not trivially zero),
// the rest anywhere.
#pragma once

#include <random>
#include <string>

#include "eval/evaluate.hpp"
#include "model/symbols.hpp"
#include "rules/structure.hpp"

namespace couplet::testing {

struct sample_report {
    int compared = 0;
    int nonzero = 0;
    int mismatches = 0;
    std::string first_mismatch;
};

inline std::vector<GiNaC::ex> bound_indices(const GiNaC::ex& e) {
    std::vector<GiNaC::ex> out;
    for (GiNaC::const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
        if (GiNaC::is_a<index_sum>(*it))
            for (const GiNaC::ex& i : GiNaC::ex_to<index_sum>(*it).indices()) out.push_back(i);
    return out;
}

inline sample_report compare_at_points(const GiNaC::ex& input, const GiNaC::ex& output, const quantum_numbers& numbers,
                                       unsigned seed, int points, int twice_max = 8) {
    std::vector<GiNaC::ex> bound = bound_indices(input);
    auto is_bound = [&](const GiNaC::ex& s) {
        for (const GiNaC::ex& b : bound)
            if (b.is_equal(s)) return true;
        return false;
    };
    std::vector<GiNaC::symbol> free;
    for (const quantum_number& q : numbers.all())
        if (!is_bound(q.symbol) && input.has(q.symbol)) free.push_back(q.symbol);
    std::vector<rules::triad> triads;
    for (const rules::triad& t : rules::all_triads(input)) {
        bool open = true;
        for (const GiNaC::ex& x : t)
            for (const GiNaC::ex& b : bound) open = open && !x.has(b);
        if (open) triads.push_back(t);
    }
    compiled_expression left(input, numbers), right(output, numbers);
    std::mt19937 rng(seed);
    sample_report report;
    for (long attempt = 0; report.compared < points && attempt < 2'000'000; ++attempt) {
        assignment at;
        for (const GiNaC::symbol& s : free) {
            const quantum_number& q = numbers.at(s);
            int lo = q.parity == qn_parity::half_odd ? 1 : 0;
            int step = q.parity == qn_parity::any ? 1 : 2;
            int v = lo + step * std::uniform_int_distribution<int>(0, (twice_max - lo) / step)(rng);
            at[s] = GiNaC::numeric(v, 2);
        }
        if (report.compared % 3 != 2) {
            bool holds = true;
            GiNaC::exmap values(at.begin(), at.end());
            for (const rules::triad& t : triads) {
                GiNaC::numeric a = GiNaC::ex_to<GiNaC::numeric>(t[0].subs(values));
                GiNaC::numeric b = GiNaC::ex_to<GiNaC::numeric>(t[1].subs(values));
                GiNaC::numeric c = GiNaC::ex_to<GiNaC::numeric>(t[2].subs(values));
                holds = holds && (a + b + c).is_integer() && a >= 0 && b >= 0 && c >= 0 && a <= b + c && b <= a + c &&
                        c <= a + b;
            }
            if (!holds) continue;
        }
        exact::number l;
        try {
            l = left.at(at);
        } catch (const evaluation_error&) {
            continue;  // the input itself is not defined there
        }
        exact::number r;
        try {
            r = right.at(at);
        } catch (const evaluation_error&) {
            // A phase with no integer exponent here is harmless only on a vanishing product.
            for (const GiNaC::ex& term : rules::terms_of(output))
                if (!compiled_expression(rules::without_phases(term), numbers).at(at).is_zero()) throw;
            r = exact::number();
        }
        ++report.compared;
        if (!l.is_zero()) ++report.nonzero;
        if (!(l == r)) {
            if (report.mismatches++ == 0)
                report.first_mismatch = describe(at) + ": " + l.to_string() + " != " + r.to_string();
        }
    }
    return report;
}

}  // namespace couplet::testing
