#include <chrono>
#include <sstream>

#include "couplet/couplet.hpp"
#include "eval/evaluate.hpp"
#include "limits/run_limits.hpp"
#include "parse/lower.hpp"
#include "parse/parse.hpp"
#include "verify/identity_check.hpp"
#include "verify/sampler.hpp"

namespace couplet {

namespace {

const char* const conventions_text_head = R"(Conventions:
  Condon-Shortley phases: the ladder coefficients sqrt((j-+m)(j+-m+1)) are real and
  non-negative, and <j1 j1, j2 J-j1 | J J> > 0.  All 3j and CG values are real.
  <j1 m1, j2 m2 | J M> = (-1)^(j1-j2+M) sqrt(2J+1) 3j(j1, j2, J; m1, m2, -M).
  Admissible values: j >= 0 in steps of 1/2; |m| <= j with j-m an integer; a triad (a, b, c)
  needs |a-b| <= c <= a+b with a+b+c an integer.  A symbol whose numbers violate these is 0.

Language (one statement per line or separated by ';'; '#' starts a comment):
  int l, k | half s            declare integer / half-odd angular momenta
  let W = EXPR                 name an expression
  simplify EXPR   or  EXPR     simplify (a bare expression)
  check A == B    or  A == B   decide whether A equals B
  eval EXPR [at a=1/2, m=0]    exact value and a decimal
  3j(j1, j2, j3; m1, m2, m3)   6j{a, b, c; d, e, f}   9j{a, b, c; d, e, f; g, h, i}
  <j1 m1, j2 m2 | J M>         (-1)^(EXPR)  sqrt(EXPR)  delta(x, y)  tri(a, b, c)
  proj(j, m)                   1 when m is one of -j..j (m a projection of j), else 0
  sum(i, k : EXPR)             + - * / ^ and parentheses; numbers like 3 and 1/2
  <(j1, j2) j12, j3; J | j1, (j2, j3) j23; J>
                               recoupling coefficient: two coupling trees (a name, or
                               (tree, tree) label) coupled to J on each side, the same leaves;
                               the sum over all projections of the CG coefficients building both
                               states (left part first), divided by 2J+1.  At most 12 leaves: the
                               definition, which check and eval use, sums over 2n-1 projections.
                               simplify reduces it by the fewest sums, then 6j/9j (exact search up
                               to 8 leaves; beyond, where it runs long, a quicker search that
                               keeps the fewest sums it can, not always the fewest possible).
  <j || T^(k) || j'>           reduced matrix element of the tensor operator T of rank k: a
                               factor of its own (eval and check give it a fixed pseudo-random
                               exact value made from its name and arguments)
  <j m | T^(k)_q | j' m'>      matrix element of the component q: by the Wigner-Eckart theorem
                               (-1)^(j-m) 3j(j, k, j'; -m, q, m') <j || T^(k) || j'>
  <(j1, j2) J M | T^(k)_q(1) | (j1', j2') J' M'>
                               between coupled states (trees as above, alike on both sides), T
                               acting on leaf 1 counted from the left, the identity on the others:
                               the sum over the projections of the CG coefficients of both states
  <(j1, j2) J || T^(k)(1) || (j1', j2') J'>
                               its reduced element: sum over M, q, M' of
                               (-1)^(J-M) 3j(J, k, J'; -M, q, M') <J M | T^(k)_q(1) | J' M'>
  [T^(k1)(1) x U^(k2)(2)]^(k)_q
                               in place of T^(k)_q(1): the tensor product, components
                               sum over q1, q2 of <k1 q1, k2 q2 | k q> T_q1 U_q2; two on one part
                               go through the states between them, summed over j''
  T^(k)(1) . U^(k)(2)          the scalar product sum over q of (-1)^q T_q U_-q (k an integer);
                               no component
  J^(1)                        the angular momentum of its part: J_0 = J_z, J_+-1 = -+J+-/sqrt(2)
                               with the ladder coefficients, <j || J^(1) || j'> = delta(j, j')
                               sqrt(j(j+1)(2j+1))
  C^(k)                        Racah's spherical harmonic sqrt(4 pi/(2k+1)) Y_kq (k an integer):
                               <l || C^(k) || l'> = (-1)^l sqrt((2l+1)(2l'+1)) 3j(l, k, l'; 0, 0, 0)

Answers are written as a textbook prints them: weights like (2J+1) kept whole, like terms
collected, a triangle condition tri(a, b, c) only where no 3j/6j/9j of the same product
imposes it, proj(j, m) only where a phase holds m and no column does; never more sums
(then symbols, then terms) than the input in canonical form.

)";

// How points are sampled, written from the sampler's defaults.
std::string verification_text() {
    verify::sampling_options o;
    std::ostringstream os;
    os << "Checks and simplifications are verified by exact evaluation at every admissible point with\n"
       << "all free j <= --depth (default " << o.depth << "; at most " << o.exhaustive_limit
       << " points, chosen at random beyond that),\n"
       << "at --samples random points with j <= depth + 4 (default " << o.samples << "), at " << o.far_points
       << " random points with j up\n"
       << "to " << o.far_max_j << ", and, for each value 0, 1/2, ..., " << o.cover_max_j
       << " of each free j, at a point where the expression\n"
       << "is nonzero where one is found (a point costing more than " << o.far_work << " summands is skipped; this\n"
       << "search stops after " << std::chrono::duration<double>(o.reach_time).count()
       << " s).  check says \"holds\" from a symbolic proof, from every admissible\n"
       << "point where they are finitely many, or from at least " << verify::minimum_evidence
       << " points with a nonzero side;\n"
       << "otherwise \"undecided\" (exit status 4).  Its verdict says how far the points reached (the\n"
       << "largest j, and how many values of the free j were seen at a nonzero point).  At default\n"
       << "settings simplify checks fresh points of these kinds for about as long as the\n"
       << "simplification took (at least 12 points); give --depth or --samples to check them all.\n\n";
    return os.str();
}

// Written from the constants themselves, so the help cannot drift from what is enforced.
std::string bounds_text() {
    std::ostringstream os;
    evaluation_limits eval;
    os << "Bounds (each stops the statement with a message and exit status 2):\n"
       << "  --max-terms N (default " << run_limits{}.max_terms << ") terms from expanding one expression or one\n"
       << "    sum's body;  --time-limit S (default none) wall-clock seconds for the whole input;\n"
       << "  2j <= " << eval.max_twice_j << " for every entry of a symbol; " << eval.max_sum_terms
       << " summands in one evaluation (a 9j counts\n    the terms of its series);\n"
       << "  nesting of parentheses, calls and powers at most " << max_nesting << " deep; numbers of at most "
       << max_number_digits << " digits;\n"
       << "  integer powers x^n with |n| <= " << max_integer_exponent << ", and a power of numbers of at most "
       << max_computed_digits << " digits;\n"
       << "  a let nested at most " << max_definition_depth << " levels deep through the lets it uses.\n\n";
    return os.str();
}

}  // namespace

std::string conventions_text() { return conventions_text_head + verification_text() + bounds_text(); }

}  // namespace couplet
