#include "exact/argument_limits.hpp"

#include "exact/wigner.hpp"

#include <stdexcept>
#include <string>

namespace couplet::exact::detail {

void check_doubled_arguments(const char* symbol, std::initializer_list<long> doubled) {
    for (long value : doubled) {
        if (value > max_doubled_argument || value < -max_doubled_argument)
            throw std::domain_error(std::string("couplet::exact::") + symbol + ": doubled argument " +
                                    std::to_string(value) + " is beyond the supported range +-" +
                                    std::to_string(max_doubled_argument));
    }
}

}  // namespace couplet::exact::detail
