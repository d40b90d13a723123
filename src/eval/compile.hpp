#pragma once

#include "eval/compiled.hpp"
#include "eval/evaluate.hpp"

namespace couplet::eval_detail {

program compile(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet::eval_detail
