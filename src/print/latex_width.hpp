// An estimate of how wide a formula in couplet's own LaTeX sets in display style at 10 pt, in
// em.  It reads only the commands couplet's printers emit; every other command counts as one
// letter.  The line breaker uses it with a safety margin; the LaTeX test measures the real
// width with pdflatex.
#pragma once

#include <string>

namespace couplet::print_detail {

double latex_width(const std::string& tex);

}  // namespace couplet::print_detail
