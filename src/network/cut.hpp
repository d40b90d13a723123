// Separation of a coupling network on a cut of two or three lines (the factorization theorems
// of the graphical method).  When the summed lines split the vertices into a part A without
// open ends and a part B, joined only by the cut lines, the A part is an invariant of the cut
// lines' angular momenta; an invariant of two is delta(j1, j2) times the metric (-1)^(j1-m1),
// an invariant of three is a multiple of the 3j (j1 j2 j3).  So the term is
//   two lines:   delta(j1, j2) / (2 j1 + 1) * (A closed by joining its two cut ends into one line
//                with the metric) * (B closed likewise),
//   three lines: (A closed with a new 3j of the cut lines) * (B closed with the same 3j),
// the 3j normalization sum(m's : 3j^2) = 1 making the second exact.  A is made an invariant by
// the flips and vertex rules that make each of its lines a proper contraction (as in
// is_proper_network); the phase those vertex rules put on the cut lines moves over to B, which
// is treated by algebra alone and may keep open ends.  Where A has no such form the cut is
// refused.
#pragma once

#include <ginac/ginac.h>

#include <optional>
#include <string>
#include <vector>

#include "model/identity.hpp"
#include "network/term.hpp"

namespace couplet::network {

struct line_cut {
    std::vector<int> lines;  // indices into msum_term::lines, in the order the new 3j takes them
    std::vector<bool> in_a;  // per vertex: on the side without open ends
};

// The cuts of `size` lines (2 or 3) of t: removing them leaves exactly two connected parts,
// each cut line joins the two, one part has no open end, and (for three lines) each part has
// at least two vertices, so that each closed part is smaller than t.  Most balanced first.
std::vector<line_cut> find_cuts(const msum_term& t, int size);

// Which phases the separation writes; both are needed, and the self-test shows it by leaving
// each out.
struct separation_variant {
    bool closing_metric = true;  // two lines: the metric (-1)^(j1 - m) of each joined line
    bool rule_phase = true;      // (-1)^(r (sign m + j)) that the vertex rules of A move onto B
};

struct separation {
    const identity* used = nullptr;  // two_line_cut_identity or three_line_cut_identity
    GiNaC::ex factor;                // delta(j1, j2) / (2 j1 + 1) or 1, times the phase free of projections
    GiNaC::ex body_a, body_b;        // the closed parts' summands
    GiNaC::lst indices_a, indices_b;
};

// The separated form of t on c, or nothing where A is not an invariant (a line of A that no
// flips and vertex rules make proper, a line with different angular momenta at its two ends,
// a phase not linear in the projections).  `fresh` gives the new projections of A's closing
// 3j for a three-line cut (three names the term does not use).
std::optional<separation> separate(const msum_term& t, const line_cut& c, const std::vector<GiNaC::symbol>& fresh,
                                   const separation_variant& variant = {});

// factor * sum(indices_a : body_a) * sum(indices_b : body_b)
GiNaC::ex joined(const separation& s);

}  // namespace couplet::network
