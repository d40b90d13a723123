// libFuzzer target: small inputs through the whole command line (parse, lower, simplify,
// evaluate, print).  Exit codes 0-2 are answers; 3 (an internal check failed) or a crash is a bug.
// The run-wide bounds are the ones a user would set for a quick answer: an input that would
// need longer is stopped by couplet itself (exit 2), not by the fuzzer's timeout.
#include <cstddef>
#include <cstdint>
#include <cstdlib>
#include <sstream>
#include <string>

#include "cli/run.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    if (size > 300) return 0;  // keep each run short; the parser target takes long inputs
    std::string text(reinterpret_cast<const char*>(data), size);
    for (const char* command : {"simplify", "eval"}) {
        std::istringstream in(text);
        std::ostringstream out, err;
        int code =
            couplet::cli::run({"couplet", command, "--time-limit", "5", "--max-terms", "5000", "-"}, in, out, err);
        if (code == couplet::cli::internal_failure) std::abort();
    }
    return 0;
}
