// Progress of a long verification: points done out of the total.
#pragma once

#include <cstddef>
#include <functional>

namespace couplet::verify {

using progress_callback = std::function<void(std::size_t done, std::size_t total)>;

}  // namespace couplet::verify
