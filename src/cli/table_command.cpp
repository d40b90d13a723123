#include "cli/table_command.hpp"

#include <unistd.h>

#include <CLI/CLI.hpp>
#include <cstdio>
#include <iostream>
#include <optional>
#include <sstream>

#include "cli/ordered_workers.hpp"
#include "cli/run.hpp"
#include "cli/terminal_progress.hpp"
#include "couplet/couplet.hpp"

namespace couplet::cli {

namespace {

// Rows per block: what one worker computes and hands over at a time.
constexpr std::size_t rows_per_block = 4096;

std::optional<std::pair<std::size_t, std::size_t>> read_shard(const std::string& s) {
    std::size_t i = 0, n = 0;
    char slash = 0, rest = 0;
    std::istringstream in(s);
    if (!(in >> i >> slash >> n) || slash != '/' || (in >> rest) || n == 0 || i < 1 || i > n) return std::nullopt;
    return std::make_pair(i, n);
}

const char* const table_help =
    R"(Table (couplet table):
  The columns are the free quantum numbers (those with --for first, in the order given, then
  each other one once the columns before it bound it), then value (exact, as eval writes it)
  and decimal (the nearest double, shortest form).  Rows run in lexicographic order of the
  columns; quantum numbers are written as decimals (1.5).  A row keeps the admissible values
  only: declared parities, integral triad sums and j - m, |m| <= j; --allowed-only also drops
  rows that a triangle inequality or m1 + m2 + m3 = 0 makes 0 in every term.  Where the
  expression divides by 0 the value is 'undefined' (JSON null).  The expression is read and
  prepared once; each row is one exact evaluation.
  Exit status: 0 done, 2 a request that cannot be carried out (with line and column).
)";

}  // namespace

void add_table_command(CLI::App& app, table_request& t, std::string& file, std::string& text, std::string& command) {
    CLI::App* sub = app.add_subcommand(
        "table", "Write an expression's exact values over ranges of its quantum numbers as CSV or JSON lines");
    sub->add_option("FILE", file, "Input file, or - for standard input");
    sub->add_option("-e,--expr", text, "Take the input from TEXT instead of a file");
    sub->add_option("--of", t.of, "Tabulate the let NAME of the input (default: its last expression)")
        ->type_name("NAME");
    sub->add_option("--for", t.ranges,
                    "Values of quantum numbers: 'j1, j2 = 0..5', 'J = 1/2..9/2 step 1', 'm = -1' (repeatable); "
                    "steps of 1/2 unless given, values the kind or parity excludes skipped; a name without "
                    "--for takes every value its symbols allow given the names before it")
        ->type_name("RANGE");
    sub->add_flag("--allowed-only", t.allowed_only,
                  "Leave out rows that a selection rule makes 0 in every term (a triangle, m1+m2+m3 = 0, |m| <= j)");
    sub->add_flag("--nonzero", t.nonzero_only, "Leave out every row whose value is 0");
    sub->add_option("--format", t.format, "csv (a header row, then one row per line; default) or jsonl")
        ->check(CLI::IsMember({"csv", "jsonl"}));
    sub->add_option("--jobs", t.jobs, "Compute the rows in N worker processes; the output is the same as with 1")
        ->type_name("N")
        ->check(CLI::Range(std::size_t{1}, std::size_t{256}));
    sub->add_option("--shard", t.shard,
                    "Compute only the I-th of N consecutive parts (I/N); the parts joined in order with cat "
                    "are the whole table")
        ->type_name("I/N");
    sub->add_option("--max-rows", t.max_rows, "Refuse a table (or shard) above N rows (default 10000000)")
        ->type_name("N")
        ->check(CLI::Range(std::size_t{1}, std::size_t{1'000'000'000}));
    sub->add_flag("--progress", t.progress,
                  "Report progress on stderr even when it is not a terminal (a terminal gets it for tables "
                  "that take more than 2 s)");
    sub->footer(table_help);
    sub->callback([&command] { command = "table"; });
}

int run_table(const table_request& t, const std::string& name, const std::string& text, std::ostream& out,
              std::ostream& err) {
    auto shard = read_shard(t.shard);
    if (!shard) {
        err << "couplet: --shard takes I/N with 1 <= I <= N, such as 3/8; '" << t.shard << "' is not\n";
        return bad_input;
    }
    table_options o;
    o.of = t.of;
    o.ranges = t.ranges;
    o.allowed_only = t.allowed_only;
    o.nonzero_only = t.nonzero_only;
    o.max_rows = t.max_rows;
    o.shard = shard->first;
    o.shards = shard->second;
    o.format = t.format == "jsonl" ? table_format::json_lines : table_format::csv;
    try {
        const table rows(parse(text, name), o);
        out << rows.header();
        const std::size_t blocks = (rows.size() + rows_per_block - 1) / rows_per_block;
        const bool terminal = &err == &std::cerr && isatty(fileno(stderr));
        std::optional<terminal_progress> meter;
        if (terminal || t.progress)
            meter.emplace(err, progress_style{"table", "rows", true, std::chrono::seconds(2), terminal});
        if (meter) (*meter)(0, rows.size());
        run_ordered(
            blocks, t.jobs,
            [&](std::size_t b, std::string& into) {
                try {
                    rows.append(b * rows_per_block, (b + 1) * rows_per_block, into);
                } catch (const input_error& e) {
                    throw std::runtime_error(e.diagnostic());  // crosses the worker's pipe as text
                }
            },
            [&](std::size_t b, const std::string& lines) {
                out << lines;
                if (meter) (*meter)(std::min((b + 1) * rows_per_block, rows.size()), rows.size());
                return static_cast<bool>(out);
            });
        out.flush();
        if (!out) {
            err << "couplet: the output could not be written (standard output closed, or the disk full)\n";
            return bad_input;
        }
        return ok;
    } catch (const input_error& e) {
        err << e.diagnostic();
        return bad_input;
    } catch (const worker_failure& e) {
        const std::string m = e.what();
        err << (!m.empty() && m.back() == '\n' ? m : "couplet: " + m + "\n");
        return bad_input;
    }
}

}  // namespace couplet::cli
