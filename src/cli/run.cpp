#include "cli/run.hpp"

#include <unistd.h>

#include <CLI/CLI.hpp>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <iostream>
#include <optional>
#include <sstream>
#include <utility>

#include "cli/table_command.hpp"
#include "cli/terminal_progress.hpp"
#include "couplet/couplet.hpp"

namespace couplet::cli {
namespace {

const char* const exit_status_text =
    R"(A statement that cannot be read or carried out is reported with its line and column, and the
others still run (a let that cannot be read leaves its name without a value); only an unclosed
bracket or nesting beyond the bound stops the whole input.
Exit status: 0 done (every check holds), 1 a check fails, 2 bad input, a refused request or
output that could not be written, 3 an internal check failed (a simplification changed the
value; the input is printed as is), 4 a check undecided (no symbolic proof and fewer than 12
points with a nonzero side, or stopped by --time-limit); where several apply, the first of
3, 2, 1, 4.)";

std::string help_footer() { return couplet::conventions_text() + exit_status_text; }

struct request {
    std::string command, file, text, format = "text";
    bool has_text = false, fragment = false, no_verify = false, steps = false, as_written = false;
    int depth = 2, samples = 200;
    std::string prefer = "3j";
    std::size_t max_terms = options{}.max_terms;
    double time_limit = 0;  // seconds; 0: none
};

std::string read_all(std::istream& in) {
    std::ostringstream os;
    os << in.rdbuf();
    return os.str();
}

void add_common_options(CLI::App& sub, request& r) {
    sub.add_option("FILE", r.file, "Input file, or - for standard input");
    sub.add_option("-e,--expr", r.text, "Take the input from TEXT instead of a file");
    sub.add_option("--format", r.format, "Output format")->check(CLI::IsMember({"text", "latex", "json"}));
    sub.add_option("--depth", r.depth, "Check exactly at every admissible point with all free j <= DEPTH (default 2)")
        ->check(CLI::Range(0, 6));
    sub.add_option("--samples", r.samples, "Also check at N random points with j <= DEPTH + 4 (default 200)")
        ->check(CLI::Range(0, 100000));
    sub.add_flag("--no-verify", r.no_verify, "Print simplifications without checking them against the input");
    sub.add_option("--prefer", r.prefer, "Write results with 3j symbols (default) or Clebsch-Gordan coefficients")
        ->check(CLI::IsMember({"3j", "cg"}));
    sub.add_flag("--as-written", r.as_written,
                 "Keep each 6j and 9j of the input in the input's arrangement (default: the canonical one, the "
                 "same in every file)");
    sub.add_option("--max-terms", r.max_terms, "Refuse to expand an expression into more than N terms (default 100000)")
        ->check(CLI::Range(std::size_t{1}, std::size_t{1000000000}));
    sub.add_option("--time-limit", r.time_limit,
                   "Stop after SECONDS of wall-clock time; statements finished by then are printed (default: none)")
        ->check(CLI::Validator(
            [](const std::string& s) {
                // Range lets NaN through (every comparison with it is false).
                const double v = std::strtod(s.c_str(), nullptr);
                return std::isfinite(v) ? std::string() : std::string("not a number of seconds: " + s);
            },
            "FINITE"))
        ->check(CLI::Range(0.001, 1e6));
}

void add_commands(CLI::App& app, request& r) {
    struct command_info {
        const char* name;
        const char* help;
    };
    const command_info commands[] = {
        {"simplify", "Reduce each expression (m-sums, then sums over j) and check the result exactly"},
        {"check", "Decide each 'A == B' and diagnose a missing phase or factor"},
        {"eval", "Evaluate each expression exactly ('at' gives values)"},
        {"latex", "Print the statements as a LaTeX document (amsmath) whose displays fit the page"},
    };
    for (const auto& c : commands) {
        CLI::App* sub = app.add_subcommand(c.name, c.help);
        add_common_options(*sub, r);
        if (std::string(c.name) == "simplify")
            sub->add_flag("--steps", r.steps,
                          "After each result, list the network moves and sum rules applied, with their references "
                          "and the term each one changed, before and after");
        if (std::string(c.name) == "latex")
            sub->add_flag("--steps", r.steps,
                          "Typeset each simplification as a derivation: the input, then each step as the factors "
                          "it changed with the identity and its reference at the side, then the result");
        if (std::string(c.name) == "latex")
            sub->add_flag("--fragment", r.fragment, "Print only the formulas, without the document around them");
        sub->callback([&r, name = c.name] { r.command = name; });
    }
}

// The input named by the options, with the name messages give it; a message on `err` and
// nothing where there is none to read.
std::optional<std::pair<std::string, std::string>> read_input(const request& r, std::istream& in, std::ostream& err) {
    if (r.has_text) {
        if (!r.file.empty()) {
            err << "couplet: give either FILE or -e TEXT, not both\n";
            return std::nullopt;
        }
        return std::make_pair(std::string("<expression>"), r.text);
    }
    if (r.file.empty()) {
        err << "couplet: no input: give a FILE, '-' for standard input, or -e TEXT\n";
        return std::nullopt;
    }
    if (r.file == "-") return std::make_pair(std::string("<stdin>"), read_all(in));
    std::error_code ec;
    if (std::filesystem::is_directory(r.file, ec)) {
        err << "couplet: '" << r.file << "' is a directory; give a file of statements\n";
        return std::nullopt;
    }
    std::ifstream f(r.file, std::ios::binary);
    std::string text;
    if (f) text = read_all(f);
    if (!f || f.bad()) {
        err << "couplet: cannot read '" << r.file << "'\n";
        return std::nullopt;
    }
    return std::make_pair(r.file, text);
}

output_format format_of(const request& r) {
    if (r.format == "json") return output_format::json;
    if (r.command != "latex") return r.format == "latex" ? output_format::latex_fragment : output_format::text;
    return r.fragment ? output_format::latex_fragment : output_format::latex_document;
}

options options_of(const request& r, bool explicit_sampling) {
    options o;
    o.depth = r.depth;
    o.samples = r.samples;
    o.verify = !r.no_verify;
    o.prefer_clebsch = r.prefer == "cg";
    o.as_written = r.as_written;
    o.steps = r.steps;
    o.budgeted_verification = !explicit_sampling;
    o.max_terms = r.max_terms;
    o.time_limit_seconds = r.time_limit;
    return o;
}

// Results that could not be written are an error, not a success with nothing to show.
int output_lost(std::ostream& err) {
    err << "couplet: the output could not be written (standard output closed, or the disk full)\n";
    return bad_input;
}

// Every statement in order, each result written as soon as it is done; the exit code.
int run_input(const request& r, const std::string& name, const std::string& text, options o, std::ostream& out,
              std::ostream& err) {
    writer output(format_of(r), out);
    try {
        const program input = parse_each(text, name);
        // Progress goes to a terminal only: piped or captured stderr stays clean.
        std::optional<terminal_progress> meter;
        if (&err == &std::cerr && isatty(fileno(stderr))) {
            meter.emplace(err);
            o.progress = meter->callback();
        }
        bool any_failed = false, any_internal = false, any_error = false, any_undecided = false;
        output.begin(input);
        auto each = [&](const result& res) {
            output.write(res);
            if (!res.diagnostic.empty()) err << res.diagnostic;
            any_failed = any_failed || res.failed();
            any_undecided = any_undecided || (res.check && res.check->result == verdict::undecided);
            any_internal = any_internal || res.internal_failure;
        };
        // A statement that cannot be carried out is reported where it stands; the others run.
        auto failed = [&](const input_error& e) {
            err << e.diagnostic();
            output.error(e);
            any_error = true;
        };
        run_all(input, o, each, r.command == "eval" ? bare_meaning::eval : bare_meaning::simplify, failed);
        output.end();
        if (!out) return output_lost(err);
        return any_internal    ? internal_failure
               : any_error     ? bad_input
               : any_failed    ? check_false
               : any_undecided ? check_undecided
                               : ok;
    } catch (const input_error& e) {
        err << e.diagnostic();
        output.error(e);
        if (!out) return output_lost(err);
        return bad_input;
    }
}

}  // namespace

int run(const std::vector<std::string>& args, std::istream& in, std::ostream& out, std::ostream& err) {
    CLI::App app{
        "couplet: sums over magnetic quantum numbers of 3j and Clebsch-Gordan products,\n"
        "reduced and checked by exact arithmetic."};
    app.name("couplet");
    app.footer(help_footer());
    app.require_subcommand(1, 1);
    request r;
    add_commands(app, r);
    table_request table;
    add_table_command(app, table, r.file, r.text, r.command);
    std::vector<std::string> reversed(args.rbegin(), args.rend() - (args.empty() ? 0 : 1));
    try {
        app.parse(reversed);
    } catch (const CLI::CallForHelp& e) {
        out << app.help();
        return ok;
    } catch (const CLI::ParseError& e) {
        if (e.get_exit_code() == 0) {
            app.exit(e, out, err);
            return ok;
        }
        err << "couplet: " << e.what() << "\n(run 'couplet --help' for usage)\n";
        return bad_input;
    }
    bool explicit_sampling = false;
    for (CLI::App* sub : app.get_subcommands()) {
        if (sub->count("--expr")) r.has_text = true;
        if (sub->get_name() == "table") continue;  // it samples nothing
        explicit_sampling = explicit_sampling || sub->count("--depth") || sub->count("--samples");
    }
    auto input = read_input(r, in, err);
    if (!input) return bad_input;
    if (r.command == "table") return run_table(table, input->first, input->second, out, err);
    return run_input(r, input->first, input->second, options_of(r, explicit_sampling), out, err);
}

}  // namespace couplet::cli
