// How far an expression is reduced: its summation indices and its 3j, 6j and 9j symbols,
// counted everywhere (inside sums too).  The j-sum engine ranks look-aheads by it; the
// benchmarks and acceptance tests report it.
#pragma once

#include <ginac/ginac.h>

#include <tuple>

namespace couplet {

struct result_shape {
    int indices = 0, ninej = 0, sixj = 0, threej = 0;
    int symbols() const { return ninej + sixj + threej; }
};

result_shape shape_of(const GiNaC::ex& e);

// The terms of e at the top level (a product or a single symbol is one term).
inline int term_count(const GiNaC::ex& e) { return GiNaC::is_a<GiNaC::add>(e) ? static_cast<int>(e.nops()) : 1; }

// The leading part of the j-sum engine's termination order: indices, then 9j, then 6j.
inline bool fewer_sums_then_symbols(const result_shape& a, const result_shape& b) {
    return std::tie(a.indices, a.ninej, a.sixj) < std::tie(b.indices, b.ninej, b.sixj);
}

}  // namespace couplet
