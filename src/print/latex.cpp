// LaTeX notation (amsmath): pmatrix for 3j, Bmatrix for 6j and 9j, angle brackets for
// Clebsch-Gordan coefficients, explicit (-1)^{...} phases.
#include <cctype>
#include <set>
#include <sstream>

#include "couplet/model/symbols.hpp"
#include "couplet/print/print.hpp"
#include "print/writer.hpp"

namespace couplet {

std::string latex_identifier(const std::string& name) {
    static const std::set<std::string> greek = {
        "alpha", "beta", "gamma", "delta", "epsilon", "zeta", "eta", "theta", "iota", "kappa",
        "lambda", "mu", "nu", "xi", "pi", "rho", "sigma", "tau", "upsilon", "phi", "chi", "psi",
        "omega", "Gamma", "Delta", "Theta", "Lambda", "Xi", "Pi", "Sigma", "Upsilon", "Phi", "Psi",
        "Omega"};
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
            if (std::isalnum(static_cast<unsigned char>(c)) || c == '\'') safe += c;
            else if (c == '_') safe += "\\_";
        return "\\mathit{" + safe + "}";
    }
    // Every context that follows a name is punctuation, a brace or a space, so a command like
    // \lambda needs no trailing blank.
    std::string out = greek.count(letters) ? "\\" + letters
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
    printed phase(const ex& exponent) override {
        return {"(-1)^{" + write(exponent).text + "}", level::power};
    }

    printed function(const ex& f) override {
        switch (kind_of(f)) {
            case symbol_kind::threej: return {matrix(f, "pmatrix"), level::atom};
            case symbol_kind::sixj:
            case symbol_kind::ninej: return {matrix(f, "Bmatrix"), level::atom};
            case symbol_kind::delta:
                return {"\\delta_{" + write(f.op(0)).text + "," + write(f.op(1)).text + "}", level::atom};
            case symbol_kind::triangle:
                return {"\\Delta(" + write(f.op(0)).text + "," + write(f.op(1)).text + "," +
                            write(f.op(2)).text + ")",
                        level::atom};
            default: break;
        }
        auto entry = [&](size_t i) { return at_least(f.op(i), level::product); };
        return {"\\langle " + entry(0) + "\\, " + entry(1) + ", " + entry(2) + "\\, " + entry(3) +
                    " \\mid " + entry(4) + "\\, " + entry(5) + "\\rangle",
                level::atom};
    }

    printed sum_over(const ex& s) override {
        const auto& is = ex_to<index_sum>(s);
        std::string under;
        for (size_t i = 0; i < is.indices().nops(); ++i) under += (i ? " " : "") + write(is.indices().op(i)).text;
        return {"\\sum_{" + under + "} " + at_least(is.body(), level::product), level::product};
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

}  // namespace couplet
