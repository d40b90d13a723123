// `couplet table`: one expression's values over ranges of its quantum numbers, as CSV or JSON
// lines, optionally over several worker processes or one shard of a cluster job.
#pragma once

#include <cstddef>
#include <iosfwd>
#include <string>
#include <vector>

namespace CLI {
class App;
}

namespace couplet::cli {

struct table_request {
    std::string of, format = "csv", shard = "1/1";
    std::vector<std::string> ranges;
    bool allowed_only = false, nonzero_only = false, progress = false;
    std::size_t jobs = 1, max_rows = 10'000'000;
};

// Adds the subcommand; FILE and -e go to `file` and `text`, and choosing it sets `command`.
void add_table_command(CLI::App& app, table_request& t, std::string& file, std::string& text, std::string& command);

// The exit status: 0, or 2 for a request that cannot be carried out (with its message on err).
int run_table(const table_request& t, const std::string& name, const std::string& text, std::ostream& out,
              std::ostream& err);

}  // namespace couplet::cli
