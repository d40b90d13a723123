// libFuzzer target: any bytes through the parser and lowering.  Only user errors may come
// out; anything else (a crash, a sanitizer report, another exception) is a bug.
#include <cstddef>
#include <cstdint>
#include <string>

#include "parse/lower.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    couplet::source_file src("<fuzz>", std::string(reinterpret_cast<const char*>(data), size));
    try {
        (void)couplet::read_program(src);
    } catch (const couplet::user_error& e) {
        (void)couplet::format_diagnostic(src, e);
    }
    return 0;
}
