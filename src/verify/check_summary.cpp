#include "verify/check_summary.hpp"

#include "print/print.hpp"
#include "verify/phase_fit.hpp"

namespace couplet::verify {

namespace {

std::string evidence(const check_report& r) {
    std::string out = "checked exactly at " + std::to_string(r.points) + " point" + (r.points == 1 ? "" : "s");
    if (r.nonzero != 0 && r.points != r.nonzero) out += ", " + std::to_string(r.nonzero) + " of them nonzero";
    return out;
}

std::string values_at(const counterexample& c) {
    std::string where = c.at.empty() ? "" : "at " + describe(c) + ": ";
    return where + "the left side is " + c.lhs.to_string() + ", the right side " + c.rhs.to_string();
}

}  // namespace

std::string summary(const check_report& r) {
    switch (r.result) {
        case verdict::holds: {
            if (r.points == 0) return "holds vacuously: " + r.note;
            std::string out = "holds: ";
            out += r.proved_symbolically ? "proved symbolically; " + evidence(r) : evidence(r) + " (no symbolic proof)";
            if (!r.note.empty()) out += " (" + r.note + ")";
            return out;
        }
        case verdict::fails_by_phase:
            return "fails by a phase: holds after multiplying the right side by " + phase_text(*r.missing_phase) +
                   "; " + evidence(r);
        case verdict::fails_by_factor:
            return "fails by a factor: holds after multiplying the right side by " + to_text(*r.missing_factor) + "; " +
                   evidence(r);
        case verdict::undecided:
            return "undecided: the two sides agree at the " + std::to_string(r.points) + " point" +
                   (r.points == 1 ? "" : "s") + " checked before the time limit";
        default: {
            std::string out = "fails: " + values_at(*r.counter);
            if (!r.note.empty()) out += "; " + r.note;
            return out;
        }
    }
}

}  // namespace couplet::verify
