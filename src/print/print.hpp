// Printing expressions.  The order of terms and factors is fixed by couplet, never by GiNaC's
// hash order, so output is identical across runs and machines.  Text output is valid input.
#pragma once

#include <ginac/ginac.h>

#include "exact/number.hpp"

#include <string>
#include <vector>

namespace couplet {

std::string to_text(const GiNaC::ex& e);
// amsmath math-mode LaTeX (no surrounding $...$).
std::string to_latex(const GiNaC::ex& e);
// Where a long LaTeX formula may break: the terms of a sum (a piece that starts a term carries
// its sign), and inside a term wider than `width_em` its factors.  Concatenated with spaces the
// pieces are to_latex(e).
struct latex_piece {
    std::string text;
    bool starts_term = false;
    // A parenthesized sum too wide for a line is broken inside its \left( ... \right): its first
    // piece opens one, its last closes one, and a line break between them closes the line with
    // \right. and opens the next with \left.
    int opens = 0, closes = 0;
};
std::vector<latex_piece> latex_pieces(const GiNaC::ex& e, double width_em);

// An exact value (a sum of rationals times square roots) as LaTeX: \frac{\sqrt{6}}{3}.
std::string exact_to_latex(const exact::number& value);

// A quantum-number name as TeX: j12 -> j_{12}, J' -> J', lambda -> \lambda.  Only letters,
// digits, primes and a fixed set of commands can appear in the result.
std::string latex_identifier(const std::string& name);

// One step of a derivation trace as lines of plain text: the rule with its reference, then the
// printed term before and after.  The one layout of `simplify --steps`, in text and in LaTeX.
std::vector<std::string> trace_step_lines(const std::string& rule, const std::string& reference,
                                          const std::string& before, const std::string& after);

}  // namespace couplet
