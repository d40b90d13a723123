// A summed projection whose 3j holds only free projections besides it takes a single value:
// 3j(a, b, c; x, y, m) vanishes unless m = -x-y (DLMF 34.2, the selection rule m1+m2+m3 = 0).
// The sum over m becomes that one term.  The other 3j holding m keep its range: outside it,
// or at the wrong parity, they vanish, as the sum would.
#pragma once

#include <ginac/ginac.h>

#include <optional>

#include "network/term.hpp"

namespace couplet::network {

// The term with one such projection substituted and its index dropped, or nothing.
std::optional<GiNaC::ex> fix_projection_by_vertex(const msum_term& term);

}  // namespace couplet::network
