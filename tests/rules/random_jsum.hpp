// Random sums over one index x of products of 6j (and 9j) symbols, with random weights and
// phases: half are a sum rule's left side under random symmetries and renamings (so the rules
// fire), half are arbitrary.  Shared by the property test and the soak in bench/.
#pragma once

#include <ginac/ginac.h>

#include <random>
#include <string>
#include <vector>

#include "model/quantum.hpp"
#include "model/symbols.hpp"
#include "rules/rule.hpp"
#include "rules/structure.hpp"

namespace couplet::testing {

struct random_jsum_case {
    std::mt19937 rng;
    quantum_numbers numbers;
    std::vector<GiNaC::symbol> pool;
    GiNaC::symbol x;

    explicit random_jsum_case(unsigned seed) : rng(seed) {
        for (const char* n : {"a", "b", "c", "d", "e", "f", "g", "h", "p", "q"}) pool.push_back(angular(n));
        x = angular("x");
    }
    GiNaC::symbol angular(const std::string& name) {
        GiNaC::symbol s = numbers.symbol_for(name, 0);
        numbers.assign_role(s, qn_role::angular, 0);
        return s;
    }
    int pick(int n) { return std::uniform_int_distribution<int>(0, n - 1)(rng); }
    GiNaC::ex any_symbol() { return pool[pick(static_cast<int>(pool.size()))]; }

    // A random arrangement of the symbol (value unchanged: the orbit's phase goes with it).
    GiNaC::ex scramble(const GiNaC::ex& s) {
        auto images = rules::arrangements(s);
        const auto& image = images[pick(static_cast<int>(images.size()))];
        return make_phase(image.phase) * image.symbol;
    }

    GiNaC::ex from_rule() {
        // The single sums (their factors are 6j or tri): the double sums are rules on 9j.
        std::vector<const rules::sum_rule*> sixj_rules;
        for (const rules::sum_rule& r : rules::sum_rules())
            if (!r.second_index) sixj_rules.push_back(&r);
        const rules::sum_rule& r = *sixj_rules[pick(static_cast<int>(sixj_rules.size()))];
        GiNaC::exmap rename;
        for (const quantum_number& q : r.numbers.all())
            rename[q.symbol] = q.symbol.is_equal(r.index) ? GiNaC::ex(x) : any_symbol();
        GiNaC::ex body = GiNaC::pow(2 * x + 1, r.weight) * make_phase(r.phase.subs(rename) + 4 * x * pick(2));
        for (const GiNaC::ex& f : r.factors) body *= scramble(f.subs(rename));
        return make_sum(body, GiNaC::lst{x});
    }

    GiNaC::ex arbitrary() {
        int count = 1 + pick(3);
        GiNaC::ex body = GiNaC::pow(2 * x + 1, pick(2));
        if (pick(2)) body *= make_phase(x + any_symbol() + any_symbol());
        for (int k = 0; k < count; ++k) {
            GiNaC::exvector entries{x, any_symbol(), any_symbol(), any_symbol(), any_symbol(), any_symbol()};
            body *= scramble(wigner6j(entries[0], entries[1], entries[2], entries[3], entries[4], entries[5]).hold());
        }
        return make_sum(body, GiNaC::lst{x});
    }

    // As arbitrary(), with one 9j holding x among the factors.
    GiNaC::ex arbitrary_with_ninej() {
        GiNaC::exvector e{x};
        for (int k = 0; k < 8; ++k) e.push_back(any_symbol());
        GiNaC::ex ninej = wigner9j(e[0], e[1], e[2], e[3], e[4], e[5], e[6], e[7], e[8]).hold();
        GiNaC::ex sixjs = arbitrary();
        const auto& s = GiNaC::ex_to<index_sum>(sixjs);
        return make_sum(s.body() * scramble(ninej), s.indices());
    }
};

}  // namespace couplet::testing
