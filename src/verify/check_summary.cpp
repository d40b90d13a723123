#include "verify/check_summary.hpp"

#include "print/print.hpp"
#include "verify/phase_fit.hpp"

namespace couplet::verify {

namespace {

std::string half(long twice) { return twice % 2 == 0 ? std::to_string(twice / 2) : std::to_string(twice) + "/2"; }

// What the points reached: the largest j, and whether each free j took every value up to
// cover_max_j at a nonzero point.
std::string reach_text(const reach_summary& r) {
    if (r.largest_twice_j < 0) return "";
    std::string out = "; j up to " + half(r.largest_twice_j);
    if (r.wanted == 0) return out;
    if (r.covered == r.wanted)
        return out + ", each free j at every value 0.." + std::to_string(r.cover_max_j) + " at a nonzero point";
    return out + ", the free j at " + std::to_string(r.covered) + " of their " + std::to_string(r.wanted) +
           " values 0.." + std::to_string(r.cover_max_j) + " at a nonzero point";
}

std::string evidence(const check_report& r) {
    if (r.finite) return "checked exactly at every admissible point (" + std::to_string(r.points) + ")";
    std::string out = "checked exactly at " + std::to_string(r.points) + " point" + (r.points == 1 ? "" : "s");
    if (r.nonzero != 0 && r.points != r.nonzero) out += ", " + std::to_string(r.nonzero) + " of them nonzero";
    if (r.undefined != 0) out += " (" + std::to_string(r.undefined) + " more where a side divides by 0)";
    return out + reach_text(r.reach);
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
            out += r.proved_symbolically || r.finite
                       ? (r.proved_symbolically ? "proved symbolically; " : "") + evidence(r)
                       : "sampled, not proved: " + evidence(r);
            if (!r.note.empty()) out += " (" + r.note + ")";
            return out;
        }
        case verdict::fails_by_phase:
            return "fails by a phase: holds after multiplying " +
                   (r.phase_site ? describe(*r.phase_site) : std::string("the right side")) + " by " +
                   phase_text(*r.missing_phase) + "; " + evidence(r);
        case verdict::fails_by_factor:
            return "fails by a factor: holds after multiplying the right side by " + to_text(*r.missing_factor) + "; " +
                   evidence(r);
        case verdict::undecided:
            if (r.stopped)
                return "undecided: the two sides agree at the " + std::to_string(r.points) + " point" +
                       (r.points == 1 ? "" : "s") + " checked before the time limit";
            return "undecided: the two sides agree, but " + r.note + "; " + evidence(r);
        default: {
            std::string out = "fails: " + values_at(*r.counter);
            if (!r.note.empty()) out += "; " + r.note;
            return out;
        }
    }
}

}  // namespace couplet::verify
