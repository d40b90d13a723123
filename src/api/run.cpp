#include <chrono>
#include <sstream>
#include <stdexcept>

#include "api/statement_runner.hpp"
#include "limits/refusal.hpp"
#include "limits/run_limits.hpp"

namespace couplet {

namespace {

// The statement's own message when the time limit stops it, saying what is complete.
std::string stopped_message(double seconds, std::size_t done, std::size_t not_started, bool partial) {
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

run_limits limits_of(const options& o) {
    run_limits limits;
    limits.max_terms = o.max_terms;
    if (o.time_limit_seconds > 0)
        limits.deadline =
            std::chrono::steady_clock::now() + std::chrono::duration_cast<std::chrono::steady_clock::duration>(
                                                   std::chrono::duration<double>(o.time_limit_seconds));
    return limits;
}

// The time limit reached at statement k, which is then stopped with `done` statements finished.
struct stopped_at {
    std::size_t k, done;
    bool partial;  // the statement established something before the limit
};

// Statement k under the limits in force: every way it can be refused becomes a user_error at
// the statement; the time limit becomes stopped_at.
result run_one(const program::parts& p, std::size_t k, const options& o, bare_meaning bare, std::size_t done) {
    const std::size_t offset = p.lowered.statements.at(k).span.begin;
    try {
        check_deadline();
        return execute_statement(p, k, o, bare);
    } catch (const refusal& e) {
        throw user_error(offset, e.what());
    } catch (const std::overflow_error& e) {
        // The phase algebra works in 64-bit integers; coefficients beyond that are refused.
        throw user_error(offset, std::string("refused: numbers too large here: ") + e.what());
    } catch (const time_limit_reached&) {
        throw stopped_at{k, done, false};
    }
}

input_error stopped_error(const program::parts& p, const options& o, const stopped_at& s) {
    const std::size_t not_started = p.statements.size() - s.k - 1;
    return as_input_error(p.source, user_error(p.statements[s.k].offset,
                                               stopped_message(o.time_limit_seconds, s.done, not_started, s.partial)));
}

result last_statement(const std::string& text, const options& o, bare_meaning bare) {
    program p = parse(text);
    if (p.size() == 0) throw as_input_error(p.internals().source, user_error(0, "no statement to carry out"));
    return run(p, p.size() - 1, o, bare);
}

}  // namespace

bool result::failed() const { return check && check->result != verdict::holds && check->result != verdict::undecided; }

result run(const program& p, std::size_t k, const options& o, bare_meaning bare) {
    const program::parts& parts = p.internals();
    scoped_run_limits in_force(limits_of(o));
    try {
        return run_one(parts, k, o, bare, 0);
    } catch (const user_error& e) {
        throw as_input_error(parts.source, e);
    } catch (const stopped_at& s) {
        throw stopped_error(parts, o, s);
    }
}

void run_all(const program& p, const options& o, const std::function<void(const result&)>& each, bare_meaning bare,
             const std::function<void(const input_error&)>& failed) {
    const program::parts& parts = p.internals();
    if (!parts.errors.empty() && !failed) throw parts.errors.front();
    scoped_run_limits in_force(limits_of(o));
    std::size_t done = 0;        // statements finished
    std::size_t next_error = 0;  // statements that could not be read are reported in their places
    auto report_errors_before = [&](std::size_t offset) {
        for (; next_error < parts.errors.size() && parts.lowered.errors[next_error].offset() < offset; ++next_error)
            failed(parts.errors[next_error]);
    };
    try {
        for (std::size_t k = 0; k < parts.statements.size(); ++k) {
            if (failed) report_errors_before(parts.statements[k].offset);
            try {
                result r = run_one(parts, k, o, bare, done);
                each(r);
                if (r.stopped) throw stopped_at{k, done, true};
                ++done;
            } catch (const user_error& e) {
                // A refusal ends its statement only, where the caller takes the errors.
                if (!failed) throw as_input_error(parts.source, e);
                failed(as_input_error(parts.source, e));
            }
        }
    } catch (const stopped_at& s) {
        throw stopped_error(parts, o, s);
    }
    if (failed) report_errors_before(std::string::npos);
}

result simplify(const std::string& text, const options& o) { return last_statement(text, o, bare_meaning::simplify); }
result eval(const std::string& text, const options& o) { return last_statement(text, o, bare_meaning::eval); }
result check(const std::string& text, const options& o) {
    program p = parse(text);
    if (p.size() == 0 || p[p.size() - 1].kind != statement_kind::check)
        throw as_input_error(p.internals().source,
                             user_error(p.size() == 0 ? 0 : p[p.size() - 1].offset, "not a check: write A == B"));
    return run(p, p.size() - 1, o);
}

}  // namespace couplet
