// What a couplet::program holds: the source, its lowered statements, and their public view
// (one per lowered statement, same index).
#pragma once

#include <vector>

#include "couplet/couplet.hpp"
#include "parse/lower.hpp"
#include "source/source.hpp"

namespace couplet {

struct program::parts {
    source_file source;
    lowered_program lowered;
    std::vector<statement> statements;
    std::vector<input_error> errors;  // lowered.errors as the public type, same order
};

// A user_error of `src` as the public input_error, its diagnostic formatted against `src`.
input_error as_input_error(const source_file& src, const user_error& e);

}  // namespace couplet
