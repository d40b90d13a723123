// libFuzzer target: the exact Wigner routines on arbitrary doubled arguments, including
// negative and inadmissible ones.  Checks the bound every 3j/6j obeys: |value| <= 1
// (common practice, no source: they are entries of orthogonal matrices up to sqrt(2j+1)).
#include <cstddef>
#include <cstdint>
#include <cstdlib>

#include "exact/wigner.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    if (size < 9) return 0;
    long a[9];
    for (int k = 0; k < 9; ++k) a[k] = static_cast<std::int8_t>(data[k]) / 2;  // 2j in [-64, 63]
    using couplet::exact::number;
    number values[] = {couplet::exact::threej(a[0], a[1], a[2], a[3], a[4], a[5]),
                       couplet::exact::sixj(a[0], a[1], a[2], a[3], a[4], a[5]),
                       couplet::exact::clebsch_gordan(a[0], a[3], a[1], a[4], a[2], a[5])};
    for (int k = 0; k < 2; ++k)
        if (values[k] > number(1L) || values[k] < number(-1L)) std::abort();
    if (size >= 10 && data[9] % 8 == 0) {
        for (long& x : a) x = x < 0 ? -x % 16 : x % 16;  // 9j sums grow fast; keep them small
        (void)couplet::exact::ninej(a[0], a[1], a[2], a[3], a[4], a[5], a[6], a[7], a[8]);
    }
    return 0;
}
