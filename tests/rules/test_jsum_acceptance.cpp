// Acceptance cases through `couplet simplify`: each rule's left side in a disguised form (columns
// permuted, rows swapped, index renamed, phase split or padded with (-1)^(4x) or (-1)^(2(a+b+c)))
// must come out as the right side.  The output is checked for its shape and, exactly, against
// the input at sampled points.
#include <catch2/catch.hpp>

#include "cli_simplify.hpp"
#include "rules/engine.hpp"
#include "simplify/simplify.hpp"
#include "support.hpp"

using namespace couplet;
using couplet::testing::count_of;
using couplet::testing::require_exact;
using couplet::testing::simplify_and_compare;

TEST_CASE("6j orthogonality in disguise gives delta/(2p+1) with the triangles of p", "[rules][cli]") {
    // DLMF 34.5.14; columns permuted, upper and lower swapped, index y, extra (-1)^(4y).
    auto s = simplify_and_compare("", "sum(y : (-1)^(4*y) * (2*y+1) * 6j{d, c, y; b, a, p} * 6j{y, b, a; q, d, c})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
    CHECK(count_of(s.text, "tri(") == 2);
}

TEST_CASE("Racah sum rule in disguise gives one 6j", "[rules][cli]") {
    // DLMF 34.5.15; phase split over two factors and padded with (-1)^(2(a+b+z)).
    auto s = simplify_and_compare(
        "", "sum(z : (-1)^(p+z) * (2*z+1) * 6j{b, a, z; d, c, p} * (-1)^(q+2*(a+b+z)) * 6j{z, d, c; q, a, b})", false);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 1);
}

TEST_CASE("Biedenharn-Elliott in disguise gives two 6j", "[rules][cli]") {
    // DLMF 34.5.16-34.5.17; every 6j rearranged, the phase split, an extra (-1)^(4c).
    auto s = simplify_and_compare("",
                                  "sum(w : (-1)^(a+b+c+d+w) * (2*w+1) * 6j{w, a, b; p, c, d} * (-1)^(e+f+p+q+r+4*c)"
                                  " * 6j{f, e, w; d, c, q} * 6j{w, e, f; r, b, a})",
                                  false);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 2);
}

TEST_CASE("three 6j summed as in DLMF 34.6.2 are recognized as one 9j", "[rules][cli]") {
    // DLMF 34.6.2 with (-1)^(2w) written as (-1)^(2(a+i)) through the triad (a, i, w).
    auto s = simplify_and_compare(
        "", "sum(w : (-1)^(2*a+2*i) * (2*w+1) * 6j{a, b, c; f, i, w} * 6j{w, f, b; e, h, d} * 6j{w, a, i; g, h, d})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "9j") == 1);
}

TEST_CASE("9j orthogonality with one 9j transposed and renamed indices gives two deltas", "[rules][cli]") {
    // DLMF 34.7.2; the second 9j transposed (no phase), indices u and v.
    auto s = simplify_and_compare(
        "", "sum(u, v : (2*u+1) * (2*v+1) * 9j{a, b, u; c, d, v; p, q, e} * 9j{a, c, pp; b, d, qq; u, v, e})", true,
        60);
    INFO(s.text << "\n" << s.report.first_mismatch);
    CHECK(s.report.mismatches == 0);
    CHECK(s.report.compared >= 50);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "9j") == 0);
    CHECK(count_of(s.text, "delta(") == 2);
    CHECK(count_of(s.text, "tri(") == 3);
}

TEST_CASE("sum of (2k+1) over a triangle gives (2a+1)(2b+1)", "[rules][cli]") {
    // Common practice, no source: k = |a-b| .. a+b.  Extra (-1)^(2(a+b+k)), arguments permuted.
    auto s = simplify_and_compare("", "sum(k : (-1)^(2*(a+b+k)) * (2*k+1) * tri(b, k, a))");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "tri(") == 0);
}

TEST_CASE("6j with a zero argument anywhere gives deltas, a triangle and a phase", "[rules][cli]") {
    // DLMF 34.5.1; the zero in the upper row, columns permuted.
    auto s = simplify_and_compare("", "6j{e, 0, f; b, c, a}");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 2);
    CHECK(count_of(s.text, "tri(") == 1);
}

TEST_CASE("9j with a zero argument and swapped rows gives a 6j", "[rules][cli]") {
    // DLMF 34.7.1; rows 1 and 2 swapped (costing the phase of all nine: common practice, no source).
    auto s = simplify_and_compare("", "9j{d, e, f; a, b, c; g, h, 0}");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "9j") == 0);
    CHECK(count_of(s.text, "6j") == 1);
    CHECK(count_of(s.text, "delta(") == 2);
}

TEST_CASE("a delta collapses a sum over admissible values only", "[rules][cli]") {
    // Common practice, no source.  With x of any parity the sum becomes its summand at x = a.
    auto s = simplify_and_compare("", "sum(x : delta(a, x) * (2*x+1) * 6j{x, b, c; d, e, f})");
    require_exact(s);
    CHECK(count_of(s.text, "sum(") == 0);
    // With x declared integer and a of any parity the sum is zero at half-odd a: it must stay
    // correct there (whatever form it takes).
    auto t = simplify_and_compare("int x\n", "sum(x : delta(a, x) * (2*x+1) * 6j{x, b, c; d, e, f})");
    INFO(t.text << "\n" << t.report.first_mismatch);
    CHECK(t.report.mismatches == 0);
}

TEST_CASE("symbols odd under one of their own symmetries vanish", "[rules][cli]") {
    // Common practice, no source: 3j(l 1 l; 0 0 0) = (-1)^(2l+1) times itself for integer l, and
    // a 9j with two equal columns is (-1)^(sum of all nine) times itself.
    auto s = simplify_and_compare("int l\n", "3j(l, 1, l; 0, 0, 0)");
    CHECK(s.text == "0");
    CHECK(s.report.mismatches == 0);
    auto t = simplify_and_compare("", "9j{a, a, 1; b, b, 1; c, c, 1}");
    CHECK(t.text == "0");
    CHECK(t.report.mismatches == 0);
}

TEST_CASE("chain: orthogonality over x, then the delta collapses the sum over y", "[rules][cli]") {
    // DLMF 34.5.14, then the delta rule (common practice, no source).
    auto s = simplify_and_compare(
        "", "sum(x, y : (2*x+1) * (2*y+1) * 6j{a, b, x; c, d, y} * 6j{c, d, x; a, b, q} * 6j{e, f, y; g, h, r})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 1);
}

TEST_CASE("chain: a 9j expanded, then Biedenharn-Elliott and orthogonality give two 6j", "[rules][cli]") {
    // DLMF 34.6.2 backwards (the 9j expanded only because a rule on i then fires), then
    // DLMF 34.5.16-34.5.17 over i and DLMF 34.5.14 over the new index.
    auto s = simplify_and_compare("", "sum(i : (2*i+1) * 9j{a, b, c; d, e, f; g, h, i} * 6j{c, f, i; g, h, r})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "9j") == 0);
    CHECK(count_of(s.text, "6j") == 2);
}

TEST_CASE("recoupling ((a b) p, c) J -> (a, (b c) y) J composed with its inverse gives a delta", "[rules][cli]") {
    // Each transformation is (-1)^(a+b+c+J) sqrt((2p+1)(2y+1)) {a b p; c J y} (common practice, no
    // source); the product summed over y is DLMF 34.5.14 with the phases split over the factors.
    auto s = simplify_and_compare("",
                                  "sum(y : (-1)^(a+b+c+J) * (2*y+1) * sqrt((2*p+1)*(2*q+1)) * 6j{a, b, p; c, J, y}"
                                  " * (-1)^(a+b+c+J) * 6j{q, c, J; y, a, b})",
                                  false);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
}

TEST_CASE("a sum no rule knows stays a sum and keeps its value", "[rules][cli]") {
    auto s = simplify_and_compare("", "sum(x : (2*x+1) * 6j{a, b, x; c, d, p} * 6j{a, b, x; e, f, q})");
    require_exact(s);
    CHECK(count_of(s.text, "sum(") >= 1);
}

TEST_CASE("the trace records each applied rule with its reference", "[rules]") {
    auto program = testing::lower_text("sum(y : (2*y+1) * 6j{a, b, y; c, d, p} * 6j{a, b, y; c, d, q})");
    GiNaC::ex e = program.statements.back().value;
    auto has_orthogonality = [](const std::vector<rules::rule_step>& trace) {
        for (const auto& step : trace)
            if (step.rule == "6j orthogonality" && step.reference == "DLMF 34.5.14") return true;
        return false;
    };
    CHECK(has_orthogonality(rules::reduce_jsums(e, program.numbers).trace));
    CHECK(has_orthogonality(simplify_with_steps(e, program.numbers).steps));
}

TEST_CASE("delta elimination in disguise: the later name goes everywhere", "[rules][cli]") {
    // Common practice, no source: delta(q, p) f(q) = delta(q, p) f(p); the delta written with
    // its arguments reversed and the 6j with its columns permuted.
    // Many points: the delta holds at few of them.
    auto s = simplify_and_compare("", "delta(q, p) * 6j{q, b, a; d, c, e} * (2*q+1)", true, 600);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "delta(") >= 1);
    CHECK(count_of(s.text, "q") == count_of(s.text, "delta("));  // q only inside the deltas
}

TEST_CASE("a delta with a value puts the value in, and a delta taken twice counts once", "[rules][cli]") {
    // Common practice, no source: delta(c, 0) f(c) = delta(c, 0) f(0), delta^2 = delta; then the
    // 6j with a zero argument (DLMF 34.5.1) and tri(a, a, 0) = 1 (DLMF 34.2, the triangle
    // condition).  Written as a bubble pair leaves it: the delta squared, its value second.
    auto s = simplify_and_compare("", "delta(c, 0)^2 * tri(a, a, c) * 6j{a, b, c; d, e, f} * (2*c+1)", true, 600);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "^2") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "c") == 1);  // only inside delta(0, c)
    // A value that is a linear form: delta(c, d+1) f(c) = delta(c, d+1) f(d+1).
    auto t = simplify_and_compare("", "delta(d+1, c) * 6j{c, b, a; d, e, f}", true, 600);
    require_exact(t);
    INFO(t.text);
    CHECK(count_of(t.text, "c") == 1);
}

TEST_CASE("tri with a zero entry is the delta of the other two", "[rules]") {
    // DLMF 34.2: (x, y, 0) is a triad exactly when x = y.  The symbolic form is compared with
    // the numeric triangle test at every pair of j <= 4 (and the zero in each position).
    GiNaC::symbol x("x"), y("y");
    for (int position = 0; position < 3; ++position) {
        GiNaC::ex args[3] = {x, y, 0};
        std::swap(args[2], args[position]);
        GiNaC::ex symbolic = triangle(args[0], args[1], args[2]);
        CHECK(kind_of(symbolic) == symbol_kind::delta);
        for (int a = 0; a <= 8; ++a)
            for (int b = 0; b <= 8; ++b) {
                GiNaC::exmap at{{x, GiNaC::numeric(a, 2)}, {y, GiNaC::numeric(b, 2)}};
                GiNaC::ex numeric_args[3] = {args[0].subs(at), args[1].subs(at), args[2].subs(at)};
                CHECK(symbolic.subs(at).is_equal(triangle(numeric_args[0], numeric_args[1], numeric_args[2])));
            }
    }
    // An entry that is not a bare name may be negative, where a delta would say 1.
    CHECK(kind_of(triangle(x - 1, x - 1, 0)) == symbol_kind::triangle);
}

TEST_CASE("chain over two indices: Biedenharn-Elliott over v, then orthogonality over w", "[rules][cli]") {
    // DLMF 34.5.16-34.5.17 with b = a, c = d, f = e, so that its two 6j are one 6j squared, then
    // DLMF 34.5.14 over w = p.  Every 6j rearranged, the phase split and padded with (-1)^(4v).
    auto s = simplify_and_compare("",
                                  "sum(w, v : (-1)^(2*a+2*d+w) * (2*v+1) * 6j{w, d, a; v, a, d}"
                                  " * (-1)^(2*e+q+r+v+4*v) * 6j{d, v, d; e, q, e} * (2*w+1) * 6j{a, v, a; e, r, e})",
                                  false);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "tri(") == 2);
    std::string applied = couplet::testing::rules_applied(
        "sum(w, v : (-1)^(2*a+2*d+w) * (2*v+1) * 6j{w, d, a; v, a, d}"
        " * (-1)^(2*e+q+r+v+4*v) * 6j{d, v, d; e, q, e} * (2*w+1) * 6j{a, v, a; e, r, e})");
    INFO(applied);
    // With b = a and c = d the w-sum is also the signed one-6j sum (Varshalovich et al. 1988
    // sec. 9.8, from memory), a shorter way to the same answer; either derivation is sound.
    const bool chain = applied.find("Biedenharn-Elliott identity\n") < applied.find("6j orthogonality\n") &&
                       count_of(applied, "6j orthogonality") == 1;
    const bool shortcut = count_of(applied, "sum of (-1)^(a+b+x) (2x+1) times one 6j") == 1;
    CHECK((chain || shortcut));
}

TEST_CASE("chain: a transposed 9j expanded, with a rearranged 6j and (-1)^(4k)", "[rules][cli]") {
    // As the chain above (DLMF 34.6.2 backwards, DLMF 34.5.16-34.5.17, DLMF 34.5.14), the 9j
    // transposed (no phase), the 6j with two columns exchanged and flipped, the index k.
    auto s = simplify_and_compare("",
                                  "sum(k : (-1)^(4*k) * (2*k+1) * 9j{a, d, g; b, e, h; c, f, k}"
                                  " * 6j{h, g, k; f, c, r})");
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "9j") == 0);
    CHECK(count_of(s.text, "6j") == 2);
}

TEST_CASE("chain: a 9j summed over a corner is expanded, then the Racah sum rule and orthogonality", "[rules][cli]") {
    // 9j{z a b; b c d; a e f} with its corner z summed: DLMF 34.6.2 backwards (z then stands in
    // two of the three 6j), DLMF 34.5.15 over z, DLMF 34.5.14 over the expansion's index.  The 9j
    // transposed, the phase (-1)^(z+a+b) split and padded with (-1)^(4z).
    auto s = simplify_and_compare("", "sum(z : (-1)^(z+a) * (2*z+1) * (-1)^(b+4*z) * 9j{z, b, a; a, c, e; b, d, f})",
                                  false, 150);
    INFO(s.text << "\n" << s.report.first_mismatch);
    CHECK(s.report.mismatches == 0);
    CHECK(s.report.compared >= 150);
    CHECK(s.report.nonzero >= 5);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "9j") == 0);
    CHECK(count_of(s.text, "6j") == 0);
    CHECK(count_of(s.text, "delta(") == 1);
    std::string applied =
        couplet::testing::rules_applied("sum(z : (-1)^(z+a) * (2*z+1) * (-1)^(b+4*z) * 9j{z, b, a; a, c, e; b, d, f})");
    INFO(applied);
    CHECK(count_of(applied, "9j expanded as a sum of three 6j") == 1);
    // After the expansion, the repeated a and b make one 6j the signed one-6j sum (Varshalovich
    // et al. 1988 sec. 9.8, from memory): that or the Racah sum rule with orthogonality.
    const bool chain = count_of(applied, "Racah sum rule") == 1 && count_of(applied, "6j orthogonality") == 1;
    const bool shortcut = count_of(applied, "sum of (-1)^(a+b+x) (2x+1) times one 6j") == 1;
    CHECK((chain || shortcut));
}

TEST_CASE("chain: a 9j expanded so that the Racah sum rule fires on two of its 6j gives one 6j", "[rules][cli]") {
    // sum(z, e : (-1)^(z+f+h) (2z+1)(2e+1) 9j{z b c; c e f; b h i} 6j{c e f; b y h})
    //   = (-1)^(2y) tri(b, f, y) tri(c, h, y) 6j{b i h; c y f}, derived by hand:
    // DLMF 34.6.2 backwards expands the 9j as sum(x : (-1)^(2x) (2x+1) 6j{z b c; f i x}
    // 6j{c e f; b x h} 6j{b h i; x z c}); the corner z stands in the first and third, which
    // DLMF 34.5.15 over z turns into 6j{b i h; c x f}; DLMF 34.5.14 over e (the second 6j against
    // the outside one) gives delta(x, y) tri(b, f, y) tri(c, h, y)/(2y+1), and the delta collapses
    // the expansion's sum.  The repeated b and c also admit DLMF 34.5.14 over z in another
    // arrangement of the 9j, a dead end the engine must not take.  Written disguised: the 9j
    // transposed and then two rows swapped (common practice, no source: the phase of all nine),
    // indices u and w, the 6j's columns permuted and two of them flipped, the phase split into
    // factors that are integers at admissible points and padded with (-1)^(4u).
    const std::string input =
        "sum(u, w : (-1)^(u+b+c+2*h) * (2*w+1) * 9j{u, c, b; c, f, i; b, w, h} * (-1)^(5*u+b+w+f)"
        " * 6j{f, y, b; h, w, c} * (-1)^(i+f+c) * (2*u+1))";
    auto s = simplify_and_compare("", input);
    require_exact(s);
    INFO(s.text);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "9j") == 0);
    CHECK(count_of(s.text, "6j") == 1);
    // The command line's own exact check of its result.
    auto json = couplet::testing::run_cli({"simplify", "-e", input, "--format", "json"});
    INFO(json.out << json.err);
    CHECK(json.code == 0);
    CHECK(count_of(json.out, "\"verified\":true") == 1);
    std::string applied = couplet::testing::rules_applied(input);
    INFO(applied);
    CHECK(count_of(applied, "9j expanded as a sum of three 6j") == 1);
    // The repeated b and c also make a 6j of the expansion a signed one-6j sum (Varshalovich et
    // al. 1988 sec. 9.8, from memory); that way or by the Racah sum rule and orthogonality.
    const bool chain = count_of(applied, "Racah sum rule") == 1 &&
                       applied.find("9j expanded as a sum of three 6j\n") < applied.find("Racah sum rule\n");
    const bool shortcut = count_of(applied, "sum of (-1)^(a+b+x) (2x+1) times one 6j") == 1;
    CHECK((chain || shortcut));
    // The steps the command line prints carry their references.
    auto steps = couplet::testing::run_cli({"simplify", "-e", input, "--steps", "--no-verify"});
    CHECK(count_of(steps.out, "9j expanded as a sum of three 6j (DLMF 34.6.2)") == 1);
    if (chain) {
        CHECK(count_of(steps.out, "Racah sum rule (DLMF 34.5.15)") == 1);
        CHECK(count_of(steps.out, "6j orthogonality (DLMF 34.5.14)") == 1);
    } else {
        CHECK(count_of(steps.out, "times one 6j (Varshalovich et al. (1988) sec. 9.8") == 1);
    }
}
