#pragma once

#include "eval/evaluate.hpp"
#include "eval/compiled.hpp"

namespace couplet::eval_detail {

program compile(const GiNaC::ex& e, const quantum_numbers& numbers);

}  // namespace couplet::eval_detail
