// The coupling symbols, Kronecker and triangle deltas as GiNaC functions, and the two classes
// GiNaC lacks for this domain: a phase (-1)^x and a sum with bound indices.
#pragma once

#include <ginac/ginac.h>

namespace couplet {

// 3j(j1, j2, j3; m1, m2, m3)
DECLARE_FUNCTION_6P(wigner3j)
// {a b c; d e f}
DECLARE_FUNCTION_6P(wigner6j)
// {a b c; d e f; g h i}
DECLARE_FUNCTION_9P(wigner9j)
// <j1 m1, j2 m2 | J M>, argument order j1, m1, j2, m2, J, M
DECLARE_FUNCTION_6P(clebsch)
// delta(x, y)
DECLARE_FUNCTION_2P(kdelta)
// tri(a, b, c): 1 when (a, b, c) satisfy the triangle condition with a+b+c integer, else 0
DECLARE_FUNCTION_3P(triangle)
// proj(j, m): 1 when m is one of the projections -j, ..., j of j, else 0.  An answer carries it
// where a projection's column is gone but a phase still needs to know whose projection it is.
DECLARE_FUNCTION_2P(projection_of)

enum class symbol_kind { threej, sixj, ninej, clebsch_gordan, delta, triangle, projection, none };
// Which of our functions e is, if any.
symbol_kind kind_of(const GiNaC::ex& e);

// (-1)^x with x kept exact: GiNaC's pow(-1, x) neither merges nor reduces mod 2.
class phase_factor : public GiNaC::basic {
    GINAC_DECLARE_REGISTERED_CLASS(phase_factor, GiNaC::basic)
public:
    explicit phase_factor(const GiNaC::ex& exponent);
    const GiNaC::ex& exponent() const { return x_; }
    size_t nops() const override { return 1; }
    GiNaC::ex op(size_t) const override { return x_; }
    GiNaC::ex& let_op(size_t) override;
    GiNaC::ex eval() const override;

protected:
    void do_print(const GiNaC::print_context& c, unsigned level) const;

private:
    GiNaC::ex x_;
};

// sum(i, k, ... : body).  The indices are bound: substitution never touches them.
class index_sum : public GiNaC::basic {
    GINAC_DECLARE_REGISTERED_CLASS(index_sum, GiNaC::basic)
public:
    index_sum(const GiNaC::ex& body, const GiNaC::lst& indices);
    const GiNaC::ex& body() const { return body_; }
    const GiNaC::lst& indices() const { return indices_; }
    size_t nops() const override { return 1; }
    GiNaC::ex op(size_t) const override { return body_; }
    GiNaC::ex& let_op(size_t) override;
    GiNaC::ex subs(const GiNaC::exmap& m, unsigned options = 0) const override;
    GiNaC::ex eval() const override;

protected:
    void do_print(const GiNaC::print_context& c, unsigned level) const;

private:
    GiNaC::ex body_;
    GiNaC::lst indices_;
};

// A 6j kept as written, neither evaluated nor rearranged: for writing identities' patterns.
inline GiNaC::ex held_sixj(const GiNaC::ex& a, const GiNaC::ex& b, const GiNaC::ex& c, const GiNaC::ex& d,
                           const GiNaC::ex& e, const GiNaC::ex& f) {
    return wigner6j(a, b, c, d, e, f).hold();
}

GiNaC::ex make_phase(const GiNaC::ex& exponent);
GiNaC::ex make_sum(const GiNaC::ex& body, const GiNaC::lst& indices);

}  // namespace couplet
