#include "api/latex_document.hpp"

#include <sstream>

#include "model/rewrite.hpp"
#include "model/symbols.hpp"
#include "print/print.hpp"
#include "print/step_change.hpp"

namespace couplet {

using GiNaC::ex;

namespace {

bool has_kind(const ex& e, symbol_kind k) {
    for (GiNaC::const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it)
        if (kind_of(*it) == k) return true;
    return false;
}

std::string words(const std::string& text) { return "\\text{" + latex_escaped_text(text) + "}"; }

std::string point_latex(const std::vector<std::pair<std::string, GiNaC::numeric>>& at) {
    std::string out;
    for (const auto& [name, value] : at)
        out += (out.empty() ? "" : ",\\ ") + latex_identifier(name) + " = " + to_latex(value);
    return out;
}

}  // namespace

void latex_document::begin() {
    if (document_) out_ << "\\documentclass{article}\n\\usepackage{amsmath}\n\\allowdisplaybreaks\n\\begin{document}\n";
}

void latex_document::end(const source_file& src) {
    comments_before(src, src.text().size());
    if (document_) out_ << "\\end{document}\n";
}

// Each run of comment lines is one paragraph; a blank line or a statement ends it.
void latex_document::comments_before(const source_file& src, std::size_t offset) {
    const std::string& text = src.text();
    std::string paragraph;
    auto flush = [&] {
        if (document_ && !paragraph.empty()) out_ << "\n" << latex_escaped_text(paragraph) << "\n\n";
        paragraph.clear();
    };
    std::size_t at = read_up_to_;
    while (at < offset && at < text.size()) {
        std::size_t line_end = std::min(text.find('\n', at), offset);
        if (line_end == std::string::npos) line_end = std::min(text.size(), offset);
        const std::string line = text.substr(at, line_end - at);
        const std::size_t hash = line.find('#');
        if (hash != std::string::npos) {
            std::string comment = line.substr(hash + 1);
            while (!comment.empty() && (comment.front() == ' ' || comment.front() == '#')) comment.erase(0, 1);
            while (!comment.empty() && (comment.back() == ' ' || comment.back() == '\r')) comment.pop_back();
            if (!comment.empty()) paragraph += (paragraph.empty() ? "" : " ") + comment;
        } else if (line.find_first_not_of(" \t\r;") == std::string::npos) {
            flush();
        }
        at = line_end + 1;
    }
    flush();
    read_up_to_ = std::max(read_up_to_, offset);
}

void latex_document::display(const display_formula& f) {
    out_ << layout_display(f, document_ ? display_style::document : display_style::fragment);
}

std::vector<latex_piece> latex_document::side(const ex& e) {
    legend_for(e);
    return latex_pieces(named(e), display_width_em);
}

ex latex_document::named(const ex& e) const {
    ex out = e;
    for (auto it = names_.rbegin(); it != names_.rend(); ++it) out = replaced(out, it->first, it->second);
    return out;
}

void latex_document::legend_for(const ex& e) {
    if (!document_) return;
    if (!triangle_explained_ && has_kind(e, symbol_kind::triangle)) {
        triangle_explained_ = true;
        out_ << "\nHere $\\{a\\, b\\, c\\}$ stands for the triangle condition: it is $1$ when "
                "$|a-b| \\le c \\le a+b$ and $a+b+c$ is an integer, and $0$ otherwise.\n\n";
    }
    if (!projection_explained_ && has_kind(e, symbol_kind::projection)) {
        projection_explained_ = true;
        out_ << "\nHere $[\\,|m| \\le j\\,]$ is $1$ when $m$ is one of the projections "
                "$-j, -j+1, \\ldots, j$ of $j$, and $0$ otherwise.\n\n";
    }
}

void latex_document::statement(const source_file& src, const result& r) {
    const couplet::statement& s = r.source;
    comments_before(src, s.offset);
    read_up_to_ = std::max(read_up_to_, s.end);
    switch (r.done) {
        case statement_kind::definition: {
            display_formula f;
            f.sides = {raw(latex_identifier(s.name)), side(s.written)};
            f.relations = {"="};
            display(f);
            names_.emplace_back(s.written, GiNaC::symbol(s.name));
            return;
        }
        case statement_kind::simplify:
            return simplification(r);
        case statement_kind::eval:
            return evaluation(r);
        case statement_kind::check:
            return check(r);
        default:
            return;
    }
}

void latex_document::simplification(const result& r) {
    const couplet::statement& s = r.source;
    if (document_ && r.steps && !r.steps->empty()) {
        display_formula input;
        input.sides = {side(s.written)};
        input.tag = "input";
        display(input);
        steps(*r.steps);
        display_formula answer;
        answer.sides = {side(r.answer)};
        answer.relations = {};
        answer.tag = "result";
        display(answer);
        return;
    }
    display_formula f;
    f.sides = {side(s.written)};
    if (!r.answer.is_equal(s.written)) {
        f.sides.push_back(side(r.answer));
        f.relations = {"="};
    }
    display(f);
}

// One display per step: what it changed, with the identity and its reference at the side.
void latex_document::steps(const std::vector<step>& steps) {
    int k = 0;
    for (const step& step : steps) {
        auto [before, after] = changed_parts(step.before, step.after);
        // A change to a bare number (a triangle that a symbol beside it implies) reads only in context.
        if (GiNaC::is_a<GiNaC::numeric>(before) || GiNaC::is_a<GiNaC::numeric>(after))
            before = step.before, after = step.after;
        display_formula f;
        f.sides = {side(before), side(after)};
        f.relations = {"="};
        f.tag = std::to_string(++k) + ". " + step.rule + " (" + step.reference + ")";
        display(f);
    }
}

void latex_document::evaluation(const result& r) {
    const couplet::statement& s = r.source;
    display_formula f;
    f.sides = {side(s.written), raw(r.value->latex)};
    f.relations = {"="};
    if (!r.value->rational) {
        f.sides.push_back(raw(r.value->decimal));
        f.relations.push_back("\\approx");
    }
    if (!s.at.empty()) f.notes = {"\\quad\\text{at } " + point_latex(s.at)};
    display(f);
}

namespace {

// "holds after multiplying <where> by", with the summation indices in math.
std::string repair_site_latex(const std::optional<check_record::summand_site>& site) {
    if (!site) return words("holds after multiplying the right side by ");
    std::string indices;
    for (const GiNaC::ex& i : site->indices) indices += (indices.empty() ? "" : ",\\, ") + to_latex(i);
    return words("holds after multiplying the summand of the sum over ") + " " + indices +
           words(site->on_left ? " on the left side by " : " on the right side by ");
}

}  // namespace

void latex_document::check(const result& res) {
    const couplet::statement& s = res.source;
    display_formula f;
    f.sides = {side(s.written), side(s.written_rhs)};
    if (!res.check) {  // an internal conflict: the message on standard error says what happened
        f.relations = {"\\overset{?}{=}"};
        f.notes = {"\\quad" + words("(internal check failed)")};
        display(f);
        return;
    }
    const check_record& r = *res.check;
    std::ostringstream points;
    points << r.points;
    switch (r.result) {
        case verdict::holds:
            f.relations = {"="};
            f.notes = {"\\quad" +
                       words(r.points == 0           ? "(holds vacuously: no admissible point)"
                             : r.proved_symbolically ? "(proved; checked exactly at " + points.str() + " points)"
                             : r.every_point         ? "(checked exactly at every admissible point)"
                                                     : "(sampled, not proved: " + points.str() + " points, " +
                                                   std::to_string(r.nonzero_points) + " nonzero" +
                                                   (r.reached.largest_j.empty() ? std::string()
                                                                                : ", j up to " + r.reached.largest_j) +
                                                   ")")};
            break;
        case verdict::undecided:
            f.relations = {"\\overset{?}{=}"};
            f.notes = {"\\quad" + words(r.stopped
                                            ? "(undecided: stopped by the time limit after " + points.str() + " points)"
                                            : "(undecided: only " + std::to_string(r.nonzero_points) + " of " +
                                                  points.str() + " points nonzero)")};
            break;
        case verdict::fails_by_phase:
            f.relations = {"\\neq"};
            f.notes = {"\\quad" + repair_site_latex(r.phase_site) + " " + to_latex(make_phase(*r.missing_phase))};
            break;
        case verdict::fails_by_factor:
            f.relations = {"\\neq"};
            f.notes = {"\\quad" + words("holds after multiplying the right side by ") + " " +
                       to_latex(*r.missing_factor)};
            break;
        case verdict::fails:
            f.relations = {"\\neq"};
            if (r.counter)
                f.notes = {"\\quad" + words("at ") + point_latex(r.counter->at),
                           "\\quad" + words("the left side is ") + r.counter->lhs.latex + words(", the right side ") +
                               r.counter->rhs.latex};
            if (r.arrangement)
                f.notes.push_back("\\quad" + words("it holds with ") + to_latex(r.arrangement->needed) +
                                  words(" in place of ") + to_latex(r.arrangement->written) +
                                  words(r.arrangement->on_left ? " on the left side" : " on the right side"));
            break;
    }
    display(f);
}

}  // namespace couplet
