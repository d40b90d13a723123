// The command-line front end as a library function, so tests can drive it in-process.
#pragma once

#include <iosfwd>
#include <string>
#include <vector>

namespace couplet::cli {

enum exit_code { ok = 0, check_false = 1, bad_input = 2, internal_failure = 3, check_undecided = 4 };

// argv[0] is the program name.
int run(const std::vector<std::string>& args, std::istream& in, std::ostream& out, std::ostream& err);

}  // namespace couplet::cli
