#include "cli/run.hpp"

#include <unistd.h>

#include <CLI/CLI.hpp>
#include <chrono>
#include <cstdio>
#include <fstream>
#include <iostream>
#include <optional>
#include <sstream>

#include "cli/execute.hpp"
#include "cli/report.hpp"
#include "eval/evaluate.hpp"
#include "parse/lower.hpp"
#include "limits/run_limits.hpp"
#include "simplify/simplify.hpp"
#include "verify/progress.hpp"

namespace couplet::cli {
namespace {

const char* const conventions_text_head = R"(Conventions:
  Condon-Shortley phases: the ladder coefficients sqrt((j-+m)(j+-m+1)) are real and
  non-negative, and <j1 j1, j2 J-j1 | J J> > 0.  All 3j and CG values are real.
  <j1 m1, j2 m2 | J M> = (-1)^(j1-j2+M) sqrt(2J+1) 3j(j1, j2, J; m1, m2, -M).
  Admissible values: j >= 0 in steps of 1/2; |m| <= j with j-m an integer; a triad (a, b, c)
  needs |a-b| <= c <= a+b with a+b+c an integer.  A symbol whose numbers violate these is 0.

Language (one statement per line or separated by ';'; '#' starts a comment):
  int l, k | half s            declare integer / half-odd angular momenta
  let W = EXPR                 name an expression
  simplify EXPR   or  EXPR     simplify (a bare expression)
  check A == B    or  A == B   decide whether A equals B
  eval EXPR [at a=1/2, m=0]    exact value and a decimal
  3j(j1, j2, j3; m1, m2, m3)   6j{a, b, c; d, e, f}   9j{a, b, c; d, e, f; g, h, i}
  <j1 m1, j2 m2 | J M>         (-1)^(EXPR)  sqrt(EXPR)  delta(x, y)  tri(a, b, c)
  sum(i, k : EXPR)             + - * / ^ and parentheses; numbers like 3 and 1/2

Answers are written as a textbook prints them: weights like (2J+1) kept whole, like terms
collected, a triangle condition tri(a, b, c) only where no 3j/6j/9j of the same product
imposes it; never more sums (then symbols, then terms) than the input in canonical form.

Checks and simplifications are verified by exact evaluation at every admissible point with
all free j <= --depth (default 2; at most 4000 points, chosen at random beyond that)
and at --samples random points with larger j (default 200).  At default settings simplify
checks fresh points of these kinds for about as long as the simplification took (at least
12 points); give --depth or --samples to check them all.

)";

const char* const exit_status_text = R"(Exit status: 0 done (every check holds), 1 a check fails, 2 bad input or a refused request,
3 an internal check failed (a simplification changed the value; the input is printed as is).)";

// Written from the constants themselves, so the help cannot drift from what is enforced.
std::string bounds_text() {
    std::ostringstream os;
    evaluation_limits eval;
    os << "Bounds (each stops the statement with a message and exit status 2):\n"
       << "  --max-terms N (default " << run_limits{}.max_terms << ") terms from expanding one expression or one\n"
       << "    sum's body;  --time-limit S (default none) wall-clock seconds for the whole input;\n"
       << "  2j <= " << eval.max_twice_j << " for every entry of a symbol; " << eval.max_sum_terms
       << " summands in one evaluation;\n"
       << "  nesting of parentheses, calls and powers at most " << max_nesting << " deep; numbers of at most "
       << max_number_digits << " digits;\n"
       << "  integer powers x^n with |n| <= " << max_integer_exponent << ".\n\n";
    return os.str();
}

std::string conventions_text() { return conventions_text_head + bounds_text() + exit_status_text; }

struct request {
    std::string command, file, text, format = "text";
    bool has_text = false, fragment = false, no_verify = false, steps = false, as_written = false;
    int depth = 2, samples = 200;
    std::string prefer = "3j";
    std::size_t max_terms = run_limits{}.max_terms;
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
    sub.add_option("--format", r.format, "Output format")
        ->check(CLI::IsMember({"text", "latex", "json"}));
    sub.add_option("--depth", r.depth, "Check exactly at every admissible point with all free j <= DEPTH (default 2)")
        ->check(CLI::Range(0, 6));
    sub.add_option("--samples", r.samples, "Also check at N random points with larger j (default 200)")
        ->check(CLI::Range(0, 100000));
    sub.add_flag("--no-verify", r.no_verify, "Print simplifications without checking them against the input");
    sub.add_option("--prefer", r.prefer, "Write results with 3j symbols (default) or Clebsch-Gordan coefficients")
        ->check(CLI::IsMember({"3j", "cg"}));
    sub.add_flag("--as-written", r.as_written,
                 "Keep each 6j and 9j of the input in the input's arrangement (default: the canonical one, the "
                 "same in every file)");
    sub.add_option("--max-terms", r.max_terms,
                   "Refuse to expand an expression into more than N terms (default 100000)")
        ->check(CLI::Range(std::size_t{1}, std::size_t{1000000000}));
    sub.add_option("--time-limit", r.time_limit,
                   "Stop after SECONDS of wall-clock time; statements finished by then are printed (default: none)")
        ->check(CLI::Range(0.001, 1e6));
}

// The statement's own message when the time limit stops it, saying what is complete.
std::string stopped_message(double seconds, std::size_t done, std::size_t not_started, bool partial = false) {
    std::ostringstream os;
    os << "stopped: the time limit of " << seconds << " s was reached while working on this statement; ";
    if (partial) os << "what it established by then is printed; ";
    if (done == 0)
        os << "no statement was finished";
    else
        os << "the " << done << " statement" << (done == 1 ? "" : "s") << " before it " << (done == 1 ? "is" : "are")
           << " complete and printed";
    if (not_started > 0)
        os << ", the " << not_started << " after it " << (not_started == 1 ? "was" : "were") << " not started";
    os << " (raise --time-limit)";
    return os.str();
}

}  // namespace

int run(const std::vector<std::string>& args, std::istream& in, std::ostream& out, std::ostream& err) {
    CLI::App app{"couplet: sums over magnetic quantum numbers of 3j and Clebsch-Gordan products,\n"
                 "reduced and checked by exact arithmetic."};
    app.name("couplet");
    app.footer(conventions_text());
    app.require_subcommand(1, 1);
    request r;
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
        explicit_sampling = explicit_sampling || sub->count("--depth") || sub->count("--samples");
    }

    std::string name = "<expression>", text;
    if (r.has_text) {
        if (!r.file.empty()) {
            err << "couplet: give either FILE or -e TEXT, not both\n";
            return bad_input;
        }
        text = r.text;
    } else if (r.file.empty()) {
        err << "couplet: no input: give a FILE, '-' for standard input, or -e TEXT\n";
        return bad_input;
    } else if (r.file == "-") {
        name = "<stdin>";
        text = read_all(in);
    } else {
        std::ifstream f(r.file, std::ios::binary);
        if (!f) {
            err << "couplet: cannot read '" << r.file << "'\n";
            return bad_input;
        }
        name = r.file;
        text = read_all(f);
    }

    reporter rep(r.command == "latex" ? (r.format == "json" ? "json" : "latex") : r.format,
                 r.command == "latex" && !r.fragment && r.format != "json", out, err);
    source_file src(name, text);
    try {
        lowered_program program = read_program(src);
        bool any_failed = false, any_internal = false;
        bare_meaning bare = r.command == "eval" ? bare_meaning::eval : bare_meaning::simplify;
        execute_options options;
        options.sampling.depth = r.depth;
        options.sampling.samples = r.samples;
        options.verify_simplify = !r.no_verify;
        options.prefer_clebsch = r.prefer == "cg";
        options.as_written = r.as_written;
        options.show_steps = r.steps;
        options.limit_verification_time = !explicit_sampling;
        // Progress goes to a terminal only: piped or captured stderr stays clean.
        std::optional<verify::terminal_progress> meter;
        if (&err == &std::cerr && isatty(fileno(stderr))) {
            meter.emplace(err);
            options.progress = meter->callback();
        }
        run_limits limits;
        limits.max_terms = r.max_terms;
        if (r.time_limit > 0)
            limits.deadline = std::chrono::steady_clock::now() +
                              std::chrono::duration_cast<std::chrono::steady_clock::duration>(
                                  std::chrono::duration<double>(r.time_limit));
        scoped_run_limits in_force(limits);
        rep.begin();
        const auto& statements = program.statements;
        for (std::size_t k = 0; k < statements.size(); ++k) {
            const lowered_statement& s = statements[k];
            outcome o;
            try {
                check_deadline();
                o = execute(s, program, bare, options);
            } catch (const refusal& e) {
                throw user_error(s.span.begin, e.what());
            } catch (const std::overflow_error& e) {
                // The phase algebra works in 64-bit integers; coefficients beyond that are refused.
                throw user_error(s.span.begin, std::string("refused: numbers too large here: ") + e.what());
            } catch (const time_limit_reached&) {
                throw user_error(s.span.begin, stopped_message(r.time_limit, k, statements.size() - k - 1));
            }
            rep.statement(src, s, o);
            if (!o.diagnostic.empty()) err << o.diagnostic;
            if (o.stopped)
                throw user_error(s.span.begin, stopped_message(r.time_limit, k, statements.size() - k - 1, true));
            any_failed = any_failed || o.check_failed;
            any_internal = any_internal || o.internal_failure;
        }
        rep.end(src);
        return any_internal ? internal_failure : any_failed ? check_false : ok;
    } catch (const user_error& e) {
        rep.error(src, e);
        return bad_input;
    }
}

}  // namespace couplet::cli
