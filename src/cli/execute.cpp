#include "cli/execute.hpp"

#include "couplet/eval/evaluate.hpp"
#include "couplet/exact/number.hpp"
#include "couplet/model/normalize.hpp"
#include "couplet/print/print.hpp"
#include "couplet/simplify.hpp"

namespace couplet::cli {

using GiNaC::ex;
using nlohmann::json;

namespace {

assignment values_of(const lowered_statement& s) {
    assignment at;
    for (const value_assignment& a : s.at) at[a.name] = a.value;
    return at;
}

outcome simplify(const lowered_statement& s, const lowered_program& program) {
    ex result = simplify_expression(s.value, program.numbers);
    return {json{{"kind", "simplify"}, {"input", s.text}, {"result", to_text(result)},
                 {"latex", to_latex(result)}, {"input_latex", to_latex(s.value)}}};
}

outcome evaluate(const lowered_statement& s, const lowered_program& program) {
    evaluator eval(program.numbers);
    exact::number value;
    try {
        value = eval(s.value, values_of(s));
    } catch (const evaluation_error& e) {
        throw user_error(s.span.begin, std::string("cannot evaluate: ") + e.what());
    }
    std::string exact_text = value.to_string();
    return {json{{"kind", "eval"}, {"input", s.text}, {"result", exact_text}, {"exact", exact_text},
                 {"decimal", value.to_decimal(20)}, {"latex", to_latex(to_ex(value))},
                 {"input_latex", to_latex(s.value)}}};
}

// Until the identity engines exist a check is decided symbolically when the difference
// normalizes to zero, and exactly when both sides are closed numbers.
outcome check(const lowered_statement& s, const lowered_program& program) {
    json record{{"kind", "check"}, {"input", s.text}, {"latex", to_latex(s.value) + " = " + to_latex(s.rhs)}};
    ex difference = normalize(s.value - s.rhs).expand();
    if (difference.is_zero()) {
        record["holds"] = true;
        record["verdict"] = "holds";
        record["result"] = "holds (the two sides are the same expression)";
        return {record};
    }
    evaluator eval(program.numbers);
    exact::number lhs, rhs;
    try {
        lhs = eval(s.value, {});
        rhs = eval(s.rhs, {});
    } catch (const evaluation_error& e) {
        throw user_error(s.span.begin, std::string("cannot decide this check yet: ") + e.what());
    }
    bool holds = lhs == rhs;
    record["holds"] = holds;
    record["verdict"] = holds ? "holds" : "fails";
    record["result"] = holds ? "holds (both sides are " + lhs.to_string() + ")"
                             : "fails: the left side is " + lhs.to_string() + ", the right side " +
                                   rhs.to_string();
    return {record, !holds};
}

}  // namespace

outcome execute(const lowered_statement& s, const lowered_program& program, bare_meaning bare) {
    switch (s.kind) {
        case request_kind::simplify:
            if (s.bare && bare == bare_meaning::eval) return evaluate(s, program);
            return simplify(s, program);
        case request_kind::eval: return evaluate(s, program);
        case request_kind::check: return check(s, program);
        default: return {json()};
    }
}

}  // namespace couplet::cli
