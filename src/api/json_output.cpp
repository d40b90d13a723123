// JSON is written here only, at the output edge, from the typed results.
#include <nlohmann/json.hpp>

#include <sstream>

#include "couplet/couplet.hpp"
#include "print/print.hpp"
#include "verify/identity_check.hpp"
#include "verify/phase_fit.hpp"

namespace couplet {

using nlohmann::json;

namespace {

// Input text is echoed in the records; a byte that is not UTF-8 becomes U+FFFD instead of
// stopping the JSON library.
std::string line_of(const json& record) { return record.dump(-1, ' ', false, json::error_handler_t::replace); }

const char* verdict_text(verdict v) {
    switch (v) {
        case verdict::holds:
            return verify::verdict_name(verify::verdict::holds);
        case verdict::fails_by_phase:
            return verify::verdict_name(verify::verdict::fails_by_phase);
        case verdict::fails_by_factor:
            return verify::verdict_name(verify::verdict::fails_by_factor);
        case verdict::undecided:
            return verify::verdict_name(verify::verdict::undecided);
        default:
            return verify::verdict_name(verify::verdict::fails);
    }
}

std::string numeric_text(const GiNaC::numeric& n) {
    std::ostringstream os;
    os << n;
    return os.str();
}

json counterexample_json(const counterexample& c) {
    json at = json::object();
    for (const auto& [name, value] : c.at) at[name] = numeric_text(value);
    return {{"at", at}, {"assignment", c.assignment}, {"lhs", c.lhs.exact}, {"rhs", c.rhs.exact}};
}

json reach_json(const reach& r) {
    return {{"largest_j", r.largest_j.empty() ? json() : json(r.largest_j)},
            {"values_up_to", r.values_up_to},
            {"values_covered", r.values_covered},
            {"values_wanted", r.values_wanted}};
}

json check_json(const check_record& r) {
    json j;
    j["holds"] = r.result == verdict::undecided ? json() : json(r.result == verdict::holds);
    j["verdict"] = verdict_text(r.result);
    j["missing_phase"] = r.missing_phase ? json(verify::phase_text(*r.missing_phase)) : json();
    j["missing_phase_site"] = r.phase_site ? json(r.phase_site->text) : json();
    j["arrangement"] = r.arrangement ? json{{"written", to_text(r.arrangement->written)},
                                            {"needed", to_text(r.arrangement->needed)},
                                            {"side", r.arrangement->on_left ? "left" : "right"}}
                                     : json();
    j["missing_factor"] = r.missing_factor ? json(to_text(*r.missing_factor)) : json();
    j["points"] = r.points;
    j["nonzero_points"] = r.nonzero_points;
    j["undefined_points"] = r.undefined_points;
    j["reach"] = reach_json(r.reached);
    j["symbolic_proof"] = r.proved_symbolically;
    j["every_admissible_point"] = r.every_point;
    j["depth"] = r.depth;
    j["exhaustive"] = r.exhaustive;
    j["counterexample"] = r.result != verdict::holds && r.counter ? counterexample_json(*r.counter) : json();
    j["note"] = r.note.empty() ? json() : json(r.note);
    j["stopped_by_time_limit"] = r.stopped;
    return j;
}

json simplify_json(const result& r) {
    json j{{"kind", "simplify"},
           {"input", r.source.text},
           {"result", to_text(r.answer)},
           {"latex", to_latex(r.answer)},
           {"input_latex", to_latex(r.source.written)},
           {"verified", r.checked.verified},
           {"points", r.checked.points}};
    if (r.checked.verified) {
        j["nonzero_points"] = r.checked.nonzero_points;
        j["points_sampled"] = r.checked.points_sampled;
        j["reach"] = reach_json(r.checked.reached);
    }
    if (!r.checked.disagreement.empty()) j["internal_error"] = r.checked.disagreement;
    if (r.steps) {
        j["steps"] = json::array();
        for (const step& s : *r.steps)
            j["steps"].push_back({{"rule", s.rule},
                                  {"reference", s.reference},
                                  {"before", to_text(s.before)},
                                  {"after", to_text(s.after)}});
    }
    return j;
}

json kind_record(const result& r) {
    switch (r.done) {
        case statement_kind::simplify:
            return simplify_json(r);
        case statement_kind::eval:
            return json{{"kind", "eval"},
                        {"input", r.source.text},
                        {"result", r.value->exact},
                        {"exact", r.value->exact},
                        {"decimal", r.value->decimal},
                        {"latex", r.value->latex},
                        {"input_latex", to_latex(r.source.written)}};
        case statement_kind::check: {
            json j{{"kind", "check"}, {"input", r.source.text}, {"latex", to_latex(r)}, {"result", to_text(r)}};
            if (r.check) {
                j.update(check_json(*r.check));
            } else {
                j["holds"] = nullptr;
                j["verdict"] = "internal check failed";
            }
            return j;
        }
        case statement_kind::definition:
            return json{{"kind", "definition"}, {"input", r.source.text}, {"name", r.source.name}};
        default:
            return json{{"kind", "declaration"}, {"input", r.source.text}};
    }
}

json record_of(const result& r) {
    json j = kind_record(r);
    j["line"] = r.source.line;
    return j;
}

}  // namespace

std::string to_json(const result& r) { return line_of(record_of(r)); }

std::string to_json(const input_error& e) {
    return line_of({{"error", e.what()}, {"line", e.line()}, {"column", e.column()}});
}

}  // namespace couplet
