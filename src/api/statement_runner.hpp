// Carrying out one statement of a program: simplify (verified before it is returned), check,
// eval.  The results are typed; the writers turn them into text, LaTeX or JSON.
#pragma once

#include "api/program_parts.hpp"
#include "verify/identity_check.hpp"

namespace couplet {

// Throws user_error (pointing at the statement) when the request cannot be carried out.
// `simplifier` replaces simplify_expression (tests give a broken one to see the self-check).
result execute_statement(const program::parts& p, std::size_t k, const options& o, bare_meaning bare,
                         const verify::simplifier_function& simplifier = {});

}  // namespace couplet
