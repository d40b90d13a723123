// LaTeX notation (amsmath): pmatrix for 3j, Bmatrix for 6j and 9j, angle brackets for
// Clebsch-Gordan coefficients, explicit (-1)^{...} phases.
#include <cctype>
#include <set>
#include <sstream>

#include "exact/number.hpp"
#include "model/symbols.hpp"
#include "print/latex_width.hpp"
#include "print/print.hpp"
#include "print/writer.hpp"

namespace couplet {

std::string latex_identifier(const std::string& name) {
    static const std::set<std::string> greek = {
        "alpha", "beta",  "gamma",  "delta", "epsilon", "zeta",  "eta",     "theta", "iota", "kappa", "lambda", "mu",
        "nu",    "xi",    "pi",     "rho",   "sigma",   "tau",   "upsilon", "phi",   "chi",  "psi",   "omega",  "Gamma",
        "Delta", "Theta", "Lambda", "Xi",    "Pi",      "Sigma", "Upsilon", "Phi",   "Psi",  "Omega"};
    std::size_t i = 0;
    auto run = [&](auto pred) {
        std::size_t start = i;
        while (i < name.size() && pred(static_cast<unsigned char>(name[i]))) ++i;
        return name.substr(start, i - start);
    };
    std::string letters = run([](unsigned char c) { return std::isalpha(c); });
    std::string digits = run([](unsigned char c) { return std::isdigit(c); });
    std::string tail;
    if (i < name.size() && name[i] == '_') {
        ++i;
        tail = run([](unsigned char c) { return std::isalnum(c); });
    }
    std::string primes = run([](unsigned char c) { return c == '\''; });
    if (i != name.size() || letters.empty()) {
        // Anything else is shown literally, with the only TeX-special character escaped.
        std::string safe;
        for (char c : name)
            if (std::isalnum(static_cast<unsigned char>(c)) || c == '\'')
                safe += c;
            else if (c == '_')
                safe += "\\_";
        return "\\mathit{" + safe + "}";
    }
    // Every context that follows a name is punctuation, a brace or a space, so a command like
    // \lambda needs no trailing blank.
    std::string out = greek.count(letters)  ? "\\" + letters
                      : letters.size() == 1 ? letters
                                            : "\\mathit{" + letters + "}";
    std::string sub = digits;
    if (!tail.empty()) sub += (sub.empty() ? "" : ",") + tail;
    if (!sub.empty()) out += "_{" + sub + "}";
    out += primes;
    return out;
}

namespace print_detail {
namespace {

using namespace GiNaC;

class latex_writer : public writer {
protected:
    printed number(const numeric& n) override {
        std::ostringstream os;
        numeric a = abs(n);
        if (a.is_integer())
            os << a;
        else
            os << "\\frac{" << a.numer() << "}{" << a.denom() << "}";
        if (n.is_negative()) return {"-" + os.str(), level::sum};
        return {os.str(), a.is_integer() ? level::atom : level::product};
    }
    printed name(const std::string& n) override { return {latex_identifier(n), level::atom}; }
    printed fraction(const std::string& top, const printed& bottom, level) override {
        return {"\\frac{" + top + "}{" + bottom.text + "}", level::product};
    }
    std::string times() override { return " "; }
    std::string parenthesize(const std::string& s) override { return "\\left(" + s + "\\right)"; }
    printed power(const ex& base, const numeric& exponent) override {
        std::ostringstream os;
        os << exponent;
        return {at_least(base, level::atom) + "^{" + os.str() + "}", level::power};
    }
    printed root(const ex& radicand) override { return {"\\sqrt{" + write(radicand).text + "}", level::atom}; }
    printed phase(const ex& exponent) override { return {"(-1)^{" + write(exponent).text + "}", level::power}; }

    printed function(const ex& f) override {
        switch (kind_of(f)) {
            case symbol_kind::threej:
                return {matrix(f, "pmatrix"), level::atom};
            case symbol_kind::sixj:
            case symbol_kind::ninej:
                return {matrix(f, "Bmatrix"), level::atom};
            case symbol_kind::delta:
                return {"\\delta_{" + write(f.op(0)).text + "," + write(f.op(1)).text + "}", level::atom};
            // The triangle condition as the trade writes the condition, {a b c}, not as Racah's
            // coefficient Delta(abc) (DLMF 34.2.5), which is a different number.
            case symbol_kind::triangle:
                return {
                    "\\{" + write(f.op(0)).text + "\\, " + write(f.op(1)).text + "\\, " + write(f.op(2)).text + "\\}",
                    level::atom};
            // The range condition the trade leaves implicit, written out where nothing else in
            // the formula imposes it: [|m| <= j], an Iverson bracket (j - m is an integer too).
            case symbol_kind::projection:
                return {"[\\,|" + write(f.op(1)).text + "| \\le " + write(f.op(0)).text + "\\,]", level::atom};
            default:
                break;
        }
        auto entry = [&](size_t i) { return at_least(f.op(i), level::product); };
        return {"\\langle " + entry(0) + "\\, " + entry(1) + ", " + entry(2) + "\\, " + entry(3) + " \\mid " +
                    entry(4) + "\\, " + entry(5) + "\\rangle",
                level::atom};
    }

    // The trade's notation: \langle a \| T^{(k)} \| b \rangle, \langle j\, m \mid T^{(k)}_{q} \mid j'\, m' \rangle.
    element_layout element_brackets() override { return {"\\langle ", " \\mid ", " \\| ", " \\rangle", "\\, "}; }
    std::string operator_identifier(const std::string& name) override { return latex_identifier(name); }
    std::string rank_marks(const ex& rank, const ex* component) override {
        return "^{(" + write(rank).text + ")}" + (component ? "_{" + write(*component).text + "}" : "");
    }
    product_layout product_signs() override { return {"\\bigl[ ", " \\times ", " \\bigr]", " \\cdot "}; }
    std::string element_entry(const ex& e) override { return at_least(e, level::product); }

    // Edmonds' layout (ch. 6): the two coupled states in one angle bracket.
    recoupling_layout recoupling_brackets() override {
        return {"\\left\\langle ", " \\,\\middle|\\, ", " \\right\\rangle", "\\, "};
    }

    printed sum_over(const ex& s) override {
        return {summation(s) + " " + at_least(ex_to<index_sum>(s).body(), level::product), level::product};
    }

public:
    // \sum with its indices separated by commas, stacked three to a row when there are more.
    std::string summation(const ex& s) {
        const lst& indices = ex_to<index_sum>(s).indices();
        std::string under;
        for (size_t i = 0; i < indices.nops(); ++i) {
            if (i) under += i % 3 == 0 ? " \\\\ " : ", ";
            under += write(indices.op(i)).text;
        }
        if (indices.nops() > 3) under = "\\substack{" + under + "}";
        return "\\sum_{" + under + "}";
    }

    // Where a long formula may break: the terms of a sum (each with its sign), and inside a
    // term too wide for a line its factors, and inside a sum over indices the factors of its
    // summand.  Joined without breaks, the pieces are the formula to_latex prints.
    std::vector<latex_piece> pieces(const ex& e, double width) {
        std::vector<latex_piece> out;
        if (!is_a<add>(e)) {
            term_pieces(e, "", width, out);
            return out;
        }
        bool first = true;
        for (const ex& t : ordered_terms(e)) {
            const bool negative = split_product(t).negative;
            const std::string sign = first ? (negative ? "-" : "") : (negative ? "- " : "+ ");
            term_pieces(negative ? ex(-t) : t, sign, width, out);
            first = false;
        }
        return out;
    }

private:
    void term_pieces(const ex& t, const std::string& sign, double width, std::vector<latex_piece>& out) {
        const std::string whole = sign + at_least(t, level::product);
        if (latex_width(whole) <= width || !(is_a<mul>(t) || is_a<index_sum>(t))) {
            out.push_back({whole, true});
            return;
        }
        const std::size_t first = out.size();
        if (is_a<index_sum>(t)) {
            out.push_back({summation(t), false});
            term_pieces(ex_to<index_sum>(t).body(), "", width, out);
        } else {
            product_parts p = split_product(t);
            std::string lead;
            if (!p.bottom.empty() || p.denominator != 1) {
                printed bottom =
                    p.bottom.empty() ? number(p.denominator) : printed{join(p.bottom, p.denominator), level::product};
                lead = fraction(p.numerator == 1 ? "1" : number(p.numerator).text, bottom, bottom.binding).text;
            } else if (p.numerator != 1) {
                lead = number(p.numerator).text;
            }
            if (!lead.empty()) out.push_back({lead, false});
            for (const ex& f : p.top) {
                if (is_a<index_sum>(f) && latex_width(write(f).text) > width) {
                    out.push_back({summation(f), false});
                    term_pieces(ex_to<index_sum>(f).body(), "", width, out);
                } else if (is_a<add>(f) && latex_width(write(f).text) > width) {
                    const std::size_t open = out.size();
                    std::vector<latex_piece> inner = pieces(f, width);
                    out.insert(out.end(), inner.begin(), inner.end());
                    out[open].text = "\\left(" + out[open].text;
                    out[open].opens = 1;
                    out[open].starts_term = false;
                    out.back().text += "\\right)";
                    out.back().closes += 1;
                } else {
                    out.push_back({at_least(f, level::product), false});
                }
            }
            if (p.negative) out[first].text = "-" + out[first].text;
        }
        out[first].text = sign + out[first].text;
        out[first].starts_term = true;
    }

    std::string join(const std::vector<ex>& factors, const numeric& coefficient) {
        std::string out = coefficient == 1 ? "" : number(coefficient).text;
        for (const ex& f : factors) out += (out.empty() ? "" : " ") + at_least(f, level::product);
        return out;
    }

private:
    std::string matrix(const ex& f, const char* env) {
        std::string out = std::string("\\begin{") + env + "} ";
        for (size_t i = 0; i < f.nops(); ++i) {
            if (i) out += i % 3 == 0 ? " \\\\ " : " & ";
            out += write(f.op(i)).text;
        }
        return out + " \\end{" + env + "}";
    }
};

}  // namespace
}  // namespace print_detail

std::string to_latex(const GiNaC::ex& e) {
    print_detail::latex_writer w;
    return w.write(e).text;
}

std::string exact_to_latex(const exact::number& value) {
    if (value.is_zero()) return "0";
    std::string out;
    for (const auto& [radicand, coefficient] : value.terms()) {
        const GiNaC::numeric q{cln::cl_N(coefficient)}, r{cln::cl_N(radicand)};
        const GiNaC::numeric a = GiNaC::abs(q);
        std::ostringstream top, bottom;
        if (r != 1) {
            if (a.numer() != 1) top << a.numer() << " ";
            top << "\\sqrt{" << r << "}";
        } else {
            top << a.numer();
        }
        bottom << a.denom();
        std::string term = a.denom() == 1 ? top.str() : "\\frac{" + top.str() + "}{" + bottom.str() + "}";
        if (out.empty())
            out = q.is_negative() ? "-" + term : term;
        else
            out += (q.is_negative() ? " - " : " + ") + term;
    }
    return out;
}

std::vector<latex_piece> latex_pieces(const GiNaC::ex& e, double width_em) {
    print_detail::latex_writer w;
    return w.pieces(e, width_em);
}

}  // namespace couplet
