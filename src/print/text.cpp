// Text notation: the couplet input language itself, so that output can be read back.
#include <map>
#include <sstream>

#include "model/symbols.hpp"
#include "print/print.hpp"
#include "print/writer.hpp"

namespace couplet {
namespace print_detail {
namespace {

using namespace GiNaC;

class text_writer : public writer {
protected:
    printed number(const numeric& n) override {
        std::ostringstream os;
        os << n;
        level l = n.is_negative() ? level::sum : n.is_integer() ? level::atom : level::product;
        return {os.str(), l};
    }
    printed name(const std::string& n) override { return {n, level::atom}; }
    printed fraction(const std::string& top, const printed& bottom, level) override {
        std::string b = bottom.binding >= level::power ? bottom.text : parenthesize(bottom.text);
        return {top + "/" + b, level::product};
    }
    std::string times() override { return "*"; }
    std::string parenthesize(const std::string& s) override { return "(" + s + ")"; }
    printed power(const ex& base, const numeric& exponent) override {
        std::string e = exponent.is_integer() ? number(exponent).text : "(" + number(exponent).text + ")";
        return {at_least(base, level::atom) + "^" + e, level::power};
    }
    printed root(const ex& radicand) override { return {"sqrt(" + write(radicand).text + ")", level::atom}; }
    printed phase(const ex& exponent) override { return {"(-1)^(" + write(exponent).text + ")", level::power}; }

    printed function(const ex& f) override {
        switch (kind_of(f)) {
            case symbol_kind::threej:
                return {"3j" + rows(f, "(", ")", 3), level::atom};
            case symbol_kind::sixj:
                return {"6j" + rows(f, "{", "}", 3), level::atom};
            case symbol_kind::ninej:
                return {"9j" + rows(f, "{", "}", 3), level::atom};
            case symbol_kind::delta:
                return {"delta" + rows(f, "(", ")", 2), level::atom};
            case symbol_kind::triangle:
                return {"tri" + rows(f, "(", ")", 3), level::atom};
            case symbol_kind::projection:
                return {"proj" + rows(f, "(", ")", 2), level::atom};
            default:
                break;
        }
        // <j1 m1, j2 m2 | J M>: blank-separated entries must be atoms.
        auto entry = [&](size_t i) { return cg_entry(f.op(i)); };
        return {"<" + entry(0) + " " + entry(1) + ", " + entry(2) + " " + entry(3) + " | " + entry(4) + " " + entry(5) +
                    ">",
                level::atom};
    }

    recoupling_layout recoupling_brackets() override { return {"<", " | ", ">", " "}; }

    // As written: <a || T^(k) || b>, <j m | T^(k)_q | j' m'>.
    element_layout element_brackets() override { return {"<", " | ", " || ", ">", " "}; }
    std::string operator_identifier(const std::string& name) override { return name; }
    std::string rank_marks(const ex& rank, const ex* component) override {
        return "^(" + write(rank).text + ")" + (component ? "_" + cg_entry(*component) : "");
    }
    product_layout product_signs() override { return {"[", " x ", "]", " . "}; }
    std::string element_entry(const ex& e) override { return cg_entry(e); }

    printed sum_over(const ex& s) override {
        const auto& is = ex_to<index_sum>(s);
        std::string out = "sum(";
        for (size_t i = 0; i < is.indices().nops(); ++i) out += (i ? ", " : "") + write(is.indices().op(i)).text;
        return {out + " : " + write(is.body()).text + ")", level::atom};
    }

private:
    std::string rows(const ex& f, const char* open, const char* close, size_t per_row) {
        std::string out = open;
        for (size_t i = 0; i < f.nops(); ++i) {
            if (i) out += i % per_row == 0 ? "; " : ", ";
            out += write(f.op(i)).text;
        }
        return out + close;
    }

    std::string cg_entry(const ex& e) {
        ex magnitude = e;
        std::string sign;
        if (is_a<numeric>(e) && ex_to<numeric>(e).is_negative()) {
            magnitude = -e;
            sign = "-";
        } else if (is_a<mul>(e) && split_product(e).negative && e.nops() == 2) {
            magnitude = -e;
            sign = "-";
        }
        bool atomic = is_a<symbol>(magnitude) || (is_a<numeric>(magnitude) && ex_to<numeric>(magnitude).is_rational());
        std::string body = write(magnitude).text;
        return sign + (atomic ? body : parenthesize(body));
    }
};

}  // namespace
}  // namespace print_detail

// The writer sorts terms and factors by their printed text, and each such key prints a subtree
// again: without a memo, printing costs grow exponentially with the nesting depth (eight
// levels of ((x+1)*y+1)*y took seconds).  One memo lives for the outermost call.
std::string to_text(const GiNaC::ex& e) {
    using memo = std::map<GiNaC::ex, std::string, GiNaC::ex_is_less>;
    thread_local memo* printed = nullptr;
    if (printed)
        if (auto it = printed->find(e); it != printed->end()) return it->second;
    memo own;
    struct scope {
        memo*& slot;
        bool outermost;
        ~scope() {
            if (outermost) slot = nullptr;
        }
    } guard{printed, printed == nullptr};
    if (guard.outermost) printed = &own;
    print_detail::text_writer w;
    std::string text = w.write(e).text;
    printed->emplace(e, text);
    return text;
}

}  // namespace couplet
