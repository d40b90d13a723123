#include "cli/execute.hpp"

#include <algorithm>
#include <chrono>

#include "eval/evaluate.hpp"
#include "exact/number.hpp"
#include "print/print.hpp"
#include "rules/engine.hpp"
#include "simplify/simplify.hpp"
#include "model/normalize.hpp"
#include "canonical/symmetries.hpp"
#include "simplify/closed_form.hpp"
#include "canonical/phase_reduction.hpp"
#include "verify/check_summary.hpp"
#include "verify/simplification_check.hpp"

namespace couplet::cli {

using GiNaC::ex;
using nlohmann::json;

namespace {

assignment values_of(const lowered_statement& s) {
    assignment at;
    for (const value_assignment& a : s.at) at[a.name] = a.value;
    return at;
}

ex run_simplifier(const ex& e, const quantum_numbers& numbers, const execute_options& options) {
    ex result = options.simplifier ? options.simplifier(e, numbers) : simplify_expression(e, numbers);
    // The CG form is applied before verification, so that what is printed is what was checked.
    if (options.prefer_clebsch)
        result = merge_phases(reduce_phases(merge_phases(symmetry::prefer_clebsch(result)), numbers));
    if (options.as_written) {
        const ex rearranged = merge_phases(in_written_arrangement(result, e));
        if (!rearranged.is_equal(result)) result = merge_phases(reduce_phases(rearranged, numbers));
    }
    return result;
}

// A result is printed only once it agrees with the input at every sample point; a
// disagreement is couplet's own bug, so the input is shown unsimplified and the run fails.
outcome simplify(const lowered_statement& s, const quantum_numbers& numbers, const execute_options& options) {
    auto started = std::chrono::steady_clock::now();
    ex result = run_simplifier(s.value, numbers, options);
    verify::verification_budget budget;
    if (options.limit_verification_time) budget = verify::matching_budget(std::chrono::steady_clock::now() - started);
    json record{{"kind", "simplify"}, {"input", s.text}, {"result", to_text(result)},
                {"latex", to_latex(result)}, {"input_latex", to_latex(s.value)},
                {"verified", false}, {"points", 0}};
    std::vector<simplification_step> readable;
    if (options.show_steps) {
        json steps = json::array();
        for (const simplification_step& step : last_simplification_steps()) {
            // Like terms collected as in an answer: the j-sum stage works on expanded summands.
            auto reading = [&](const ex& x) {
                return step.shown_as_recorded ? x : collected_terms(phases_reduced_for_reading(x, numbers));
            };
            readable.push_back({step.rule, step.reference, reading(step.before), reading(step.after)});
            steps.push_back({{"rule", step.rule},
                             {"reference", step.reference},
                             {"before", to_text(readable.back().before)},
                             {"after", to_text(readable.back().after)}});
        }
        record["steps"] = steps;
    }
    auto done = [&](const json& r) {
        outcome o;
        o.record = r;
        o.result = result;
        o.steps = readable;
        return o;
    };
    if (!options.verify_simplify) return done(record);
    verify::simplification_check v;
    try {
        v = verify::verify_simplification(s.value, result, numbers, options.sampling, options.progress, budget);
    } catch (const evaluation_error& e) {
        throw user_error(s.span.begin, std::string("cannot verify the simplification: ") + e.what() +
                                           " (--no-verify prints it unverified)");
    }
    if (v.agrees) {
        record["verified"] = true;
        record["points"] = v.points;
        record["nonzero_points"] = v.nonzero;
        record["points_sampled"] = v.sampled;
        return done(record);
    }
    std::string what = !v.result_error.empty()
                           ? "the result cannot be evaluated" + (v.counter ? " at " + verify::describe(*v.counter) : "") +
                                 ": " + v.result_error
                           : "at " + verify::describe(*v.counter) + " the input is " + v.counter->lhs.to_string() +
                                 " but the result is " + v.counter->rhs.to_string();
    outcome o = done(record);
    o.result = s.value;
    o.record["result"] = to_text(s.value);
    o.record["latex"] = to_latex(s.value);
    o.record["points"] = v.points;
    o.record["internal_error"] = what;
    o.internal_failure = true;
    o.diagnostic = "couplet: internal check failed: simplifying '" + s.text + "' gave " + to_text(result) +
                   ", which differs from the input: " + what + ".  The input is printed unsimplified; " +
                   "please report this.\n";
    return o;
}

outcome evaluate(const lowered_statement& s, const quantum_numbers& numbers) {
    evaluator eval(numbers);
    exact::number value;
    try {
        value = eval(s.value, values_of(s));
    } catch (const evaluation_error& e) {
        throw user_error(s.span.begin, std::string("cannot evaluate: ") + e.what());
    }
    std::string exact_text = value.to_string();
    outcome o;
    o.record = json{{"kind", "eval"},          {"input", s.text},
                    {"result", exact_text},    {"exact", exact_text},
                    {"decimal", value.to_decimal(20)}, {"latex", exact_to_latex(value)},
                    {"input_latex", to_latex(s.value)}};
    o.value = value;
    return o;
}

// Decided by exact evaluation at sample points (and symbolically when the simplifier reduces
// the difference to 0); a failure is diagnosed as a missing phase, a missing factor, or a
// counterexample.
outcome check(const lowered_statement& s, const quantum_numbers& numbers, const execute_options& options) {
    json record{{"kind", "check"}, {"input", s.text}, {"latex", to_latex(s.value) + " = " + to_latex(s.rhs)}};
    verify::check_options o;
    o.sampling = options.sampling;
    o.progress = options.progress;
    o.simplifier = options.simplifier;
    verify::check_report r;
    try {
        r = verify::check_identity(s.value, s.rhs, numbers, o);
    } catch (const evaluation_error& e) {
        throw user_error(s.span.begin, std::string("cannot decide this check: ") + e.what());
    }
    if (r.symbolic_conflict) {
        record["holds"] = nullptr;
        record["verdict"] = "internal check failed";
        record["result"] = "internal check failed (see the message on standard error)";
        outcome out;
        out.record = record;
        out.internal_failure = true;
        out.diagnostic = "couplet: internal check failed: the simplifier reduced the difference of the two sides of '" +
                         s.text + "' to 0, but " + verify::describe(*r.counter) + " gives " +
                         r.counter->lhs.to_string() + " on the left and " + r.counter->rhs.to_string() +
                         " on the right; please report this.\n";
        return out;
    }
    record.update(verify::to_json(r));
    record["result"] = verify::summary(r);
    const char* relation = r.result == verify::verdict::holds       ? " = "
                           : r.result == verify::verdict::undecided ? " \\overset{?}{=} "
                                                                     : " \\neq ";
    record["latex"] = to_latex(s.value) + relation + to_latex(s.rhs);
    outcome out;
    out.record = record;
    out.check_failed = r.result != verify::verdict::holds && r.result != verify::verdict::undecided;
    out.stopped = r.stopped;
    out.check = r;
    return out;
}

}  // namespace

outcome execute(const lowered_statement& s, const lowered_program& program, bare_meaning bare,
                const execute_options& options) {
    // Which j a projection belongs to is read from this statement alone: the phase algebra must
    // not borrow a pairing that another line of the program made.
    const quantum_numbers numbers =
        program.numbers.for_statement(s.kind == request_kind::check ? ex(GiNaC::lst{s.value, s.rhs}) : s.value);
    switch (s.kind) {
        case request_kind::simplify:
            if (s.bare && bare == bare_meaning::eval) return evaluate(s, numbers);
            return simplify(s, numbers, options);
        case request_kind::eval: return evaluate(s, numbers);
        case request_kind::check: return check(s, numbers, options);
        default: return {};
    }
}

}  // namespace couplet::cli
