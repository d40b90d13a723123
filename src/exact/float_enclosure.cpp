#include "exact/float_enclosure.hpp"

#include <cln/lfloat.h>
#include <cln/real.h>

namespace couplet::exact::detail {

// Each of the n terms carries at most three roundings (q, sqrt r, their product) and each
// of the n-1 additions one, all of relative size <= 2^-bits of a partial sum bounded by
// sum|term|; (n + 4) * 2^(2-bits) * sum|term| covers them with room to spare, including the
// roundings made while computing the bound itself.
float_enclosure enclose(const number::term_map& terms, unsigned bits) {
    const auto format = static_cast<cln::float_format_t>(bits);
    cln::cl_F sum = cln::cl_float(0, format), magnitude = cln::cl_float(0, format);
    for (const auto& [radicand, coefficient] : terms) {
        cln::cl_F term = cln::cl_float(coefficient, format) * cln::sqrt(cln::cl_float(radicand, format));
        sum = sum + term;
        magnitude = magnitude + cln::abs(term);
    }
    cln::cl_F bound = magnitude * cln::cl_float(cln::cl_RA(long(terms.size()) + 4), format) *
                      cln::scale_float(cln::cl_float(1, format), 2 - long(bits));
    return {sum, bound};
}

}  // namespace couplet::exact::detail
