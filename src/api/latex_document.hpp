// The LaTeX form of a run: a document (or with --fragment only the formulas) in which each
// statement is a display that fits the text width; `#` comments become paragraphs, `let` names
// are typeset as named quantities and used by name afterwards, the triangle condition and the
// projection bracket get a legend where they first appear, a check shows its verdict in words,
// an eval its exact value, the point and the decimal, and with --steps a simplification shows
// each step with the identity it used.
#pragma once

#include <ginac/ginac.h>

#include <ostream>
#include <string>
#include <utility>
#include <vector>

#include "couplet/couplet.hpp"
#include "print/latex_display.hpp"
#include "source/source.hpp"

namespace couplet {

class latex_document {
public:
    latex_document(bool document, std::ostream& out) : document_(document), out_(out) {}

    void begin();
    // The comment lines of `src` between the previous statement and this one come first.
    void statement(const source_file& src, const result& r);
    void end(const source_file& src);

private:
    void comments_before(const source_file& src, std::size_t offset);
    void display(const display_formula& f);
    std::vector<latex_piece> side(const GiNaC::ex& e);
    std::vector<latex_piece> raw(const std::string& tex) const { return {{tex, true}}; }
    GiNaC::ex named(const GiNaC::ex& e) const;
    void legend_for(const GiNaC::ex& e);
    void simplification(const result& r);
    void evaluation(const result& r);
    void check(const result& r);
    void steps(const std::vector<step>& steps);

    bool document_;
    std::ostream& out_;
    std::size_t read_up_to_ = 0;                          // source offset consumed by comments
    std::vector<std::pair<GiNaC::ex, GiNaC::ex>> names_;  // (value, symbol) of each `let`
    bool triangle_explained_ = false;
    bool projection_explained_ = false;
};

}  // namespace couplet
