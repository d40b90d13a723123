// couplet as a library: read statements in couplet's language, then simplify, check or
// evaluate them, and write the results as text, LaTeX or JSON.  This is the whole public
// interface; everything else is internal.
//
//   couplet::program p = couplet::parse("sum(m : 3j(a, a, 0; m, -m, 0)^2)");
//   couplet::result r = couplet::run(p, 0);
//   std::cout << couplet::to_text(r) << "\n" << couplet::to_latex(r) << "\n";
//
// Values are GiNaC expressions; Condon-Shortley phases throughout.  Nothing here is thread-safe
// (GiNaC is not): use one thread, or one process per worker.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <functional>
#include <iosfwd>
#include <memory>
#include <optional>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

namespace couplet {

// How statements are carried out.  The defaults are the command line's.
struct options {
    int depth = 2;       // check exactly at every admissible point with all free j <= depth
    int samples = 200;   // and at this many random points with larger j
    bool verify = true;  // simplify checks its answer against the input before returning it
    // At default sampling, simplify's check takes about as long as the simplification did;
    // false checks every sampled point.
    bool budgeted_verification = true;
    bool prefer_clebsch = false;     // answers with Clebsch-Gordan coefficients instead of 3j
    bool as_written = false;         // a 6j or 9j of the input keeps the input's arrangement
    bool steps = false;              // record the derivation (identities applied, before and after)
    std::size_t max_terms = 100000;  // refuse expansions above this many terms
    double time_limit_seconds = 0;   // wall clock for a whole run(); 0: none
    // Called during long verifications with (points done, points in all).
    std::function<void(std::size_t done, std::size_t total)> progress;
};

// Bad input or a refused request, at a place in the input.  what() is the one-line message;
// diagnostic() is FILE:LINE:COLUMN: error: MESSAGE with the line and a caret under the column.
class input_error : public std::runtime_error {
public:
    input_error(const std::string& message, std::string diagnostic, std::size_t line, std::size_t column)
        : std::runtime_error(message), diagnostic_(std::move(diagnostic)), line_(line), column_(column) {}
    const std::string& diagnostic() const { return diagnostic_; }
    std::size_t line() const { return line_; }
    std::size_t column() const { return column_; }

private:
    std::string diagnostic_;
    std::size_t line_, column_;
};

enum class statement_kind { simplify, check, eval, definition, declaration };

// One statement of the input, as read.
struct statement {
    statement_kind kind = statement_kind::simplify;
    std::string text;  // its source text
    std::string name;  // a definition's name (`let NAME = ...`)
    GiNaC::ex value;   // the expression; a check's left side
    GiNaC::ex rhs;     // a check's right side
    // value and rhs as written: a recoupling coefficient held whole, not yet replaced by its
    // Clebsch-Gordan definition.  The printers show these; eval and check compute with value.
    GiNaC::ex written, written_rhs;
    std::vector<std::pair<std::string, GiNaC::numeric>> at;  // eval ... at NAME=VALUE
    std::size_t offset = 0, end = 0;                         // where it starts and ends in the input (bytes)
    std::size_t line = 1, column = 1;                        // where it starts, as messages count
};

// One identity applied in a simplification, with the term it changed.
struct step {
    std::string rule, reference;  // the identity's name and where it is published
    GiNaC::ex before, after;
};

// How far sampled points reached: the largest j evaluated, and how many of the values
// 0, 1/2, ..., values_up_to of the free angular momenta were taken at a point where the
// expression is nonzero (each j on its own; values its parity or its triads exclude are not
// counted).
struct reach {
    std::string largest_j;  // "189/2"; empty when no free angular momentum was evaluated
    int values_up_to = 0;
    std::size_t values_covered = 0, values_wanted = 0;
};

// How simplify's answer was checked against its input by exact evaluation.
struct verification {
    bool attempted = false, verified = false;
    std::size_t points = 0, nonzero_points = 0, points_sampled = 0;
    reach reached;
    std::string disagreement;  // where and how the answer differed, when it did
};

enum class verdict { holds, fails_by_phase, fails_by_factor, fails, undecided };

// An exact value q1*sqrt(r1) + q2*sqrt(r2) + ...
struct exact_value {
    std::string exact, decimal, latex;  // "sqrt(6)/3", "0.81649658092772603273", \frac{\sqrt{6}}{3}
    bool rational = true;               // no square root in it
};

struct counterexample {
    std::vector<std::pair<std::string, GiNaC::numeric>> at;  // every free quantum number
    exact_value lhs, rhs;                                    // the two sides there
    std::string assignment;                                  // "j=1, m=-1/2"
};

// What `check` decided, and why.
struct check_record {
    verdict result = verdict::holds;
    std::string summary;  // one line: "holds: ...", "fails by a phase: ..."
    bool proved_symbolically = false;
    std::size_t points = 0, nonzero_points = 0;
    std::size_t undefined_points = 0;  // admissible points where a side divides by 0 (not counted)
    bool exhaustive = true;            // every admissible point with j <= depth was checked
    bool every_point = false;          // the admissible points are finitely many, all checked
    reach reached;
    int depth = 2;
    std::optional<GiNaC::ex> missing_phase;  // exponent E: the right side lacks (-1)^E
    // Where (-1)^E belongs when not on the whole right side: the summand of the sum over these
    // indices, on the left or the right side.
    struct summand_site {
        std::vector<GiNaC::ex> indices;
        bool on_left = true;
        std::string text;  // "the summand of the sum over x on the left side"
    };
    std::optional<summand_site> phase_site;
    std::optional<GiNaC::ex> missing_factor;  // the whole factor the right side lacks
    std::optional<counterexample> counter;    // the smallest point where the sides differ
    // A 6j written in an order its symmetries do not reach, when another order makes the
    // identity hold.
    struct rearrangement {
        GiNaC::ex written, needed;
        bool on_left = false;
        std::string text;  // "it holds with 6j{...} in place of 6j{...} on the right side"
    };
    std::optional<rearrangement> arrangement;
    std::string note;
    bool stopped = false;  // the time limit ended the comparison early
};

// The outcome of one statement.
struct result {
    statement source;
    statement_kind done = statement_kind::simplify;  // what was carried out (a bare statement
                                                     // is simplified or evaluated)
    GiNaC::ex answer;                                // simplify: the answer (the input where its check failed)
    std::optional<exact_value> value;                // eval
    std::optional<check_record> check;               // check
    std::optional<std::vector<step>> steps;          // simplify with options.steps: the derivation
    verification checked;                            // simplify
    // couplet caught itself in an error (a simplification that changed the value, two sides
    // reduced to 0 that evaluate differently): `diagnostic` says what; please report it.
    bool internal_failure = false;
    std::string diagnostic;
    bool stopped = false;  // the time limit ended the statement; what it established is shown
    bool failed() const;   // a check that does not hold
};

// A parsed input: its statements, with declarations and definitions applied.
class program {
public:
    struct parts;
    explicit program(std::shared_ptr<const parts> p) : parts_(std::move(p)) {}
    std::size_t size() const;
    const statement& operator[](std::size_t k) const;
    const std::string& name() const;  // the input's name in messages
    const std::string& text() const;
    // Statements that could not be read (parse_each only), in the order of the input.
    const std::vector<input_error>& errors() const;
    const parts& internals() const { return *parts_; }

private:
    std::shared_ptr<const parts> parts_;
};

// Throws input_error at the first statement that cannot be read.  `name` is how messages call
// the input (a file name).
program parse(const std::string& text, const std::string& name = "<expression>");
// Reads every statement that can be read and keeps the errors of the others (errors()), which
// run_all reports in their places.  A let that cannot be read leaves its name without a value.
// Throws only where no statement can be told apart (an unclosed bracket, nesting too deep).
program parse_each(const std::string& text, const std::string& name = "<expression>");

// What a statement without a keyword means: simplify (default) or eval.
enum class bare_meaning { simplify, eval };

// Carries out statement k.  Throws input_error for a request that cannot be carried out (the
// time limit counts from this call).
result run(const program& p, std::size_t k, const options& o = {}, bare_meaning bare = bare_meaning::simplify);

// Carries out every statement in order, handing each result to `each` as soon as it is done;
// the time limit counts for the whole run.  A statement that cannot be carried out goes to
// `failed` and the run goes on with the next; without `failed`, the run stops there and throws
// it.  The time limit stops the run either way: it throws, naming what was not started.
void run_all(const program& p, const options& o, const std::function<void(const result&)>& each,
             bare_meaning bare = bare_meaning::simplify, const std::function<void(const input_error&)>& failed = {});

// One statement given as text: the last statement of `text` (earlier ones may declare and define).
result simplify(const std::string& text, const options& o = {});
result check(const std::string& text, const options& o = {});
result eval(const std::string& text, const options& o = {});

// An expression in couplet's own notation (re-readable as input, in a fixed term order, unlike
// GiNaC's own printing) and as LaTeX.
std::string to_text(const GiNaC::ex& e);
std::string to_latex(const GiNaC::ex& e);

// A result in couplet's own notation: the answer (re-readable as input), the exact value and
// its decimal, or the check's verdict in one line; a recorded derivation follows as # comment
// lines.  Empty for a declaration or definition.
std::string to_text(const result& r);
// The result as LaTeX (amsmath): the answer, the exact value, or both sides of a check with
// the verdict's relation (=, \neq, or =? when undecided).
std::string to_latex(const result& r);
// The result as one JSON object on one line, with the statement's line in the input.
std::string to_json(const result& r);
// An input_error as a JSON object on one line: {"error", "line", "column"}.
std::string to_json(const input_error& e);

// A whole run written as the command line writes it: text lines, JSON lines, or a LaTeX
// document (or its displays alone) with the input's comments as paragraphs.
enum class output_format { text, json, latex_document, latex_fragment };
class writer {
public:
    writer(output_format format, std::ostream& out);
    ~writer();
    writer(const writer&) = delete;
    writer& operator=(const writer&) = delete;
    void begin(const program& p);
    void write(const result& r);
    void end();
    void error(const input_error& e);  // the JSON error line; text and LaTeX write nothing

private:
    struct state;
    std::unique_ptr<state> state_;
};

// A table of one expression's values over ranges of its free quantum numbers, for testing a
// numerical code against a derived formula.  The expression is prepared once; each row is an
// exact evaluation.  Rows are numbered 0, 1, ... within the requested shard.
enum class table_format { csv, json_lines };
struct table_options {
    std::string of;  // the `let` to tabulate; empty: the last statement's expression
    // Each text gives names and their values: "j1, j2 = 0..5", "J = 1/2..9/2 step 1", "m = -1".
    // Every value is a multiple of 1/2; a range steps by 1/2 unless it says otherwise, and a
    // value the name's kind or parity excludes is skipped.  A name without a range takes the
    // values its symbols allow given the names before it (a j by a triangle, an m by its j).
    std::vector<std::string> ranges;
    bool allowed_only = false;          // leave out rows that a selection rule makes 0 in every term
    bool nonzero_only = false;          // leave out rows whose value is 0
    std::size_t max_rows = 10'000'000;  // refuse a shard with more rows than this
    std::size_t shard = 1, shards = 1;  // compute the shard-th of `shards` consecutive parts
    table_format format = table_format::csv;
};

class table {
public:
    // Throws input_error for a request that cannot be carried out: an unknown name, a range
    // that cannot be read (its message points into the range's text), a name nothing bounds,
    // too many rows.
    table(const program& p, const table_options& o);
    ~table();
    table(table&&) noexcept;
    table& operator=(table&&) noexcept;

    std::size_t size() const;                         // rows of this shard (before nonzero_only)
    std::size_t total_size() const;                   // rows of the whole table
    const std::vector<std::string>& columns() const;  // the quantum numbers, in column order
    // CSV: the header line (written by the first shard only, so that the parts joined with
    // `cat` are the whole table); JSON lines: empty.
    std::string header() const;
    // Writes rows [from, to) of this shard, one line each; returns how many were written.  A
    // row where the expression divides by 0 is written with the value "undefined" (CSV) or
    // null (JSON).  Throws input_error where a row cannot be evaluated at all.
    std::size_t write(std::size_t from, std::size_t to, std::ostream& out) const;
    std::size_t append(std::size_t from, std::size_t to, std::string& out) const;  // the same, onto a string

private:
    struct state;
    std::unique_ptr<state> state_;
};

// The conventions and bounds as the command line's --help states them.
std::string conventions_text();

}  // namespace couplet
