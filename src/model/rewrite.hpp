// Small tools the stages share for taking expressions apart and rewriting them.
#pragma once

#include <ginac/ginac.h>

#include <functional>
#include <optional>
#include <vector>

namespace couplet {

// Terms of a sum (a single term is a sum of one); factors of a product (likewise).
std::vector<GiNaC::ex> terms_of(const GiNaC::ex& e);
std::vector<GiNaC::ex> factors_of(const GiNaC::ex& term);

// A polynomial in names: numbers, names, sums and products of them, positive integer powers.
// Such a factor is a weight like (2x+1) or a coefficient, never a coupling structure.
bool is_polynomial(const GiNaC::ex& e);

// A linear form in names with rational coefficients: j1+j2-m, 2*j, 1/2.  Phase exponents and
// the entries of coupling symbols must be such forms.
bool is_linear_form(const GiNaC::ex& e);

// e with every part for which `at` gives a value replaced by it, looking through sums,
// products and powers (also inside sums over indices); other parts are kept whole.
GiNaC::ex rewritten(const GiNaC::ex& e, const std::function<std::optional<GiNaC::ex>(const GiNaC::ex&)>& at);

// e with every occurrence of `target` as a whole replaced by `by`, also inside sums (whose own
// subs does not look at the sum itself).
GiNaC::ex replaced(const GiNaC::ex& e, const GiNaC::ex& target, const GiNaC::ex& by);

}  // namespace couplet
