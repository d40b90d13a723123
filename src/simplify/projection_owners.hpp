// A reduction can remove every column that held a free projection m while a phase (-1)^(...m...)
// stays behind: Σ 3j·3j → δ(c, d) δ(m_c, -m_d)/(2c+1) with (-1)^(m_d) in front.  The answer is
// still right, but read on its own it no longer says that m_d is a projection of d, so the phase
// cannot be shown to be an integer power and the printed answer cannot be read back.
#pragma once

#include <ginac/ginac.h>

#include "model/quantum.hpp"

namespace couplet {

// `answer` with proj(j, m) multiplied into each term whose phase holds a free projection m of
// the statement (owner j in `numbers`) that no column (j', +-m + const) or proj of that term
// pairs with an angular momentum any more.  Where the input gives m its owner, proj(j, m) is 1 at
// every admissible point, so the value is unchanged.
GiNaC::ex with_projection_owners(const GiNaC::ex& answer, const quantum_numbers& numbers);

}  // namespace couplet
