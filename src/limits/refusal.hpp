// A request couplet refuses for a reason the user can fix (a phase exponent that is not an
// integer everywhere, an expansion above --max-terms, ...).  The CLI reports it like a user
// error, at the statement, exit 2.
#pragma once

#include <stdexcept>

namespace couplet {

class refusal : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

}  // namespace couplet
