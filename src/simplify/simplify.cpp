#include "couplet/simplify.hpp"

#include "couplet/model/normalize.hpp"

namespace couplet {

GiNaC::ex simplify_expression(const GiNaC::ex& e, const quantum_numbers&) { return normalize(e); }

}  // namespace couplet
