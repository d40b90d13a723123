#include "api/statement_runner.hpp"

#include <chrono>
#include <sstream>

#include "canonical/phase_reduction.hpp"
#include "canonical/symmetries.hpp"
#include "eval/evaluate.hpp"
#include "exact/number.hpp"
#include "model/normalize.hpp"
#include "print/print.hpp"
#include "simplify/closed_form.hpp"
#include "simplify/simplify.hpp"
#include "verify/check_summary.hpp"
#include "verify/simplification_check.hpp"

namespace couplet {

using GiNaC::ex;

namespace {

struct statement_context {
    const lowered_statement& s;
    const quantum_numbers& numbers;
    const options& o;
    const verify::simplifier_function& simplifier;
};

verify::sampling_options sampling_of(const options& o) {
    verify::sampling_options s;
    s.depth = o.depth;
    s.samples = o.samples;
    return s;
}

exact_value value_of(const exact::number& n) {
    exact_value v;
    v.exact = n.to_string();
    v.decimal = n.to_decimal(20);
    v.latex = exact_to_latex(n);
    v.rational = n.terms().size() == 1 && n.terms().begin()->first == 1;
    return v;
}

// The answer, and the derivation when the built-in simplifier made it.
simplification run_simplifier(const statement_context& c) {
    // Recoupling coefficients reach the simplifier whole; the answer is verified against
    // their definitions (c.s.value).
    const ex& e = c.s.written;
    simplification done =
        c.simplifier ? simplification{c.simplifier(e, c.numbers), {}} : simplify_with_steps(e, c.numbers);
    ex& result = done.answer;
    // The CG form is applied before verification, so that what is printed is what was checked.
    if (c.o.prefer_clebsch)
        result = merge_phases(reduce_phases(merge_phases(symmetry::prefer_clebsch(result)), c.numbers));
    if (c.o.as_written) {
        const ex rearranged = merge_phases(in_written_arrangement(result, e));
        if (!rearranged.is_equal(result)) result = merge_phases(reduce_phases(rearranged, c.numbers));
    }
    return done;
}

// The recorded steps as a reader sees them: like terms collected as in an answer (the j-sum
// stage works on expanded summands) and phases reduced, except where the step is the phase
// reduction itself.
std::vector<step> readable_steps(const std::vector<simplification_step>& steps, const quantum_numbers& numbers) {
    std::vector<step> out;
    for (const simplification_step& s : steps) {
        auto reading = [&](const ex& x) {
            return s.shown_as_recorded ? x : collected_terms(phases_reduced_for_reading(x, numbers));
        };
        out.push_back({s.rule, s.reference, reading(s.before), reading(s.after)});
    }
    return out;
}

reach public_reach(const verify::reach_summary& r) {
    reach out;
    if (r.largest_twice_j >= 0) {
        std::ostringstream os;
        os << GiNaC::numeric(r.largest_twice_j, 2);
        out.largest_j = os.str();
    }
    out.values_up_to = r.cover_max_j;
    out.values_covered = r.covered;
    out.values_wanted = r.wanted;
    return out;
}

// A result is returned only once it agrees with the input at every sample point; a
// disagreement is couplet's own bug, so the input is shown unsimplified and marked.
result simplify(const statement_context& c) {
    auto started = std::chrono::steady_clock::now();
    result r;
    r.done = statement_kind::simplify;
    simplification done = run_simplifier(c);
    r.answer = done.answer;
    verify::verification_budget budget;
    if (c.o.budgeted_verification) budget = verify::matching_budget(std::chrono::steady_clock::now() - started);
    if (c.o.steps) r.steps = readable_steps(done.steps, c.numbers);
    if (!c.o.verify) return r;
    verify::simplification_check v;
    try {
        v = verify::verify_simplification(c.s.value, r.answer, c.numbers, sampling_of(c.o), c.o.progress, budget);
    } catch (const division_by_zero& e) {
        throw user_error(c.s.span.begin, std::string("the input is undefined: ") + e.what());
    } catch (const evaluation_error& e) {
        throw user_error(c.s.span.begin, std::string("cannot verify the simplification: ") + e.what() +
                                             " (--no-verify prints it unverified)");
    }
    r.checked.attempted = true;
    r.checked.points = v.points;
    if (v.agrees) {
        r.checked.verified = true;
        r.checked.nonzero_points = v.nonzero;
        r.checked.points_sampled = v.sampled;
        r.checked.reached = public_reach(v.reach);
        return r;
    }
    r.checked.disagreement = !v.result_error.empty()
                                 ? "the result cannot be evaluated" +
                                       (v.counter ? " at " + verify::describe(*v.counter) : "") + ": " + v.result_error
                                 : "at " + verify::describe(*v.counter) + " the input is " +
                                       v.counter->lhs.to_string() + " but the result is " + v.counter->rhs.to_string();
    r.internal_failure = true;
    r.diagnostic = "couplet: internal check failed: simplifying '" + c.s.text + "' gave " + to_text(r.answer) +
                   ", which differs from the input: " + r.checked.disagreement +
                   ".  The input is printed unsimplified; please report this.\n";
    r.answer = c.s.value;
    return r;
}

result evaluate(const statement_context& c) {
    assignment at;
    for (const value_assignment& a : c.s.at) at[a.name] = a.value;
    evaluator eval(c.numbers);
    result r;
    r.done = statement_kind::eval;
    try {
        r.value = value_of(eval(c.s.value, at));
    } catch (const evaluation_error& e) {
        throw user_error(c.s.span.begin, std::string("cannot evaluate: ") + e.what());
    }
    return r;
}

verdict public_verdict(verify::verdict v) {
    switch (v) {
        case verify::verdict::holds:
            return verdict::holds;
        case verify::verdict::fails_by_phase:
            return verdict::fails_by_phase;
        case verify::verdict::fails_by_factor:
            return verdict::fails_by_factor;
        case verify::verdict::undecided:
            return verdict::undecided;
        default:
            return verdict::fails;
    }
}

check_record public_record(const verify::check_report& r) {
    check_record out;
    out.result = public_verdict(r.result);
    out.summary = verify::summary(r);
    out.proved_symbolically = r.proved_symbolically;
    out.points = r.points;
    out.nonzero_points = r.nonzero;
    out.undefined_points = r.undefined;
    out.every_point = r.finite;
    out.reached = public_reach(r.reach);
    out.exhaustive = r.complete;
    out.depth = r.depth;
    out.missing_phase = r.missing_phase;
    if (r.phase_site)
        out.phase_site =
            check_record::summand_site{r.phase_site->indices, r.phase_site->on_left, verify::describe(*r.phase_site)};
    if (r.rearranged)
        out.arrangement = check_record::rearrangement{r.rearranged->written, r.rearranged->needed,
                                                      r.rearranged->on_left, verify::describe(*r.rearranged)};
    out.missing_factor = r.missing_factor;
    if (r.counter) {
        counterexample c;
        c.at = r.counter->at;
        c.lhs = value_of(r.counter->lhs);
        c.rhs = value_of(r.counter->rhs);
        c.assignment = r.counter->at.empty() ? "" : verify::describe(*r.counter);
        out.counter = c;
    }
    out.note = r.note;
    out.stopped = r.stopped;
    return out;
}

// Decided by exact evaluation at sample points (and symbolically when the simplifier reduces
// the difference to 0); a failure is diagnosed as a missing phase, a missing factor, or a
// counterexample.
result check(const statement_context& c) {
    verify::check_options o;
    o.sampling = sampling_of(c.o);
    o.progress = c.o.progress;
    o.simplifier = c.simplifier;
    verify::check_report report;
    try {
        report = verify::check_identity(c.s.value, c.s.rhs, c.numbers, o);
    } catch (const evaluation_error& e) {
        throw user_error(c.s.span.begin, std::string("cannot decide this check: ") + e.what());
    }
    result r;
    r.done = statement_kind::check;
    if (report.symbolic_conflict) {
        r.internal_failure = true;
        r.diagnostic = "couplet: internal check failed: the simplifier reduced the difference of the two sides of '" +
                       c.s.text + "' to 0, but " + verify::describe(*report.counter) + " gives " +
                       report.counter->lhs.to_string() + " on the left and " + report.counter->rhs.to_string() +
                       " on the right; please report this.\n";
        return r;
    }
    r.check = public_record(report);
    r.stopped = report.stopped;
    return r;
}

}  // namespace

result execute_statement(const program::parts& p, std::size_t k, const options& o, bare_meaning bare,
                         const verify::simplifier_function& simplifier) {
    const lowered_statement& s = p.lowered.statements.at(k);
    // Which j a projection belongs to is read from this statement alone: the phase algebra must
    // not borrow a pairing that another line of the program made.
    const quantum_numbers numbers =
        p.lowered.numbers.for_statement(s.kind == request_kind::check ? ex(GiNaC::lst{s.value, s.rhs}) : s.value);
    const statement_context c{s, numbers, o, simplifier};
    result r;
    switch (s.kind) {
        case request_kind::simplify:
            r = s.bare && bare == bare_meaning::eval ? evaluate(c) : simplify(c);
            break;
        case request_kind::eval:
            r = evaluate(c);
            break;
        case request_kind::check:
            r = check(c);
            break;
        default:
            r.done = p.statements.at(k).kind;
    }
    r.source = p.statements.at(k);
    return r;
}

}  // namespace couplet
