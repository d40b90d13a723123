// A display formula laid out to fit the text width: a chain side0 rel side1 rel ... on one line
// when it fits, else one side after the other, each broken into lines at its pieces (terms,
// then factors; print.hpp's latex_pieces) with continuation lines indented and a product's
// continuation marked with \times.
#pragma once

#include <string>
#include <vector>

#include "print/print.hpp"

namespace couplet {

struct display_formula {
    std::vector<std::vector<latex_piece>> sides;
    std::vector<std::string> relations;  // between consecutive sides: "=", "\\neq", "\\approx"
    std::string tag;                     // set at the side (\tag*), in a document only; plain text
    // Math-mode material after the formula, e.g. \text{...}: each note on the formula's last line
    // where it fits, else on a line of its own.
    std::vector<std::string> notes;
};

// document: equation* or align*, with the tag; fragment: the bare formula, or an aligned block.
enum class display_style { document, fragment };

// The text width the layout aims at, in em of a 10 pt article (its \textwidth is 34.5 em; the
// rest is margin for the width estimate).
constexpr double display_width_em = 29.0;

std::string layout_display(const display_formula& f, display_style style, double width_em = display_width_em);

// Text for \text{...} or a paragraph: TeX's special characters made printable, control bytes
// dropped, so that no input can emit a command.
std::string latex_escaped_text(const std::string& s);

}  // namespace couplet
