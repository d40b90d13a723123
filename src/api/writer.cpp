#include <ostream>

#include "api/latex_document.hpp"
#include "api/program_parts.hpp"

namespace couplet {

struct writer::state {
    output_format format;
    std::ostream& out;
    latex_document latex;
    const program::parts* input = nullptr;
};

writer::writer(output_format format, std::ostream& out)
    : state_(new state{format, out, latex_document(format == output_format::latex_document, out)}) {}

writer::~writer() = default;

namespace {
bool is_latex(output_format f) { return f == output_format::latex_document || f == output_format::latex_fragment; }
}  // namespace

void writer::begin(const program& p) {
    state_->input = &p.internals();
    if (is_latex(state_->format)) state_->latex.begin();
}

// Each result is flushed as it is written: a later statement that runs long or is killed must
// not take the finished ones with it.
void writer::write(const result& r) {
    if (is_latex(state_->format)) {
        state_->latex.statement(state_->input->source, r);
    } else if (r.done != statement_kind::definition && r.done != statement_kind::declaration) {
        // Declarations and definitions print nothing: they only prepare later statements.
        state_->out << (state_->format == output_format::json ? to_json(r) : to_text(r)) << "\n";
    }
    state_->out.flush();
}

void writer::end() {
    if (is_latex(state_->format)) state_->latex.end(state_->input->source);
}

void writer::error(const input_error& e) {
    if (state_->format == output_format::json) state_->out << to_json(e) << "\n";
    state_->out.flush();
}

}  // namespace couplet
