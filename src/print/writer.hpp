// The structure shared by the text and LaTeX printers: how sums, products, fractions and signs
// are laid out and in which order.  Notation for each leaf lives in the two derived writers.
#pragma once

#include <ginac/ginac.h>

#include <string>
#include <vector>

namespace couplet::print_detail {

// Binding strength of what was printed, to decide on parentheses.
enum class level { sum = 1, product = 2, power = 3, atom = 4 };

struct printed {
    std::string text;
    level binding;
};

// A product split for printing: sign, numerator and denominator factors, each sorted.
struct product_parts {
    bool negative = false;
    GiNaC::numeric numerator = 1, denominator = 1;
    std::vector<GiNaC::ex> top, bottom;  // bottom holds the positive powers of the denominator
};

product_parts split_product(const GiNaC::ex& e);
// Terms of a sum in couplet's fixed order (by their printed non-numeric part, constants last).
std::vector<GiNaC::ex> ordered_terms(const GiNaC::ex& sum);
// True for c0 + sum c_i x_i: printed compactly (j1+1/2) rather than spaced.
bool prints_compactly(const GiNaC::ex& sum);

class writer {
public:
    virtual ~writer() = default;
    printed write(const GiNaC::ex& e);
    std::string at_least(const GiNaC::ex& e, level needed);

protected:
    virtual printed number(const GiNaC::numeric& n) = 0;
    virtual printed name(const std::string& n) = 0;
    virtual printed fraction(const std::string& top, const printed& bottom, level bottom_level) = 0;
    virtual std::string times() = 0;
    virtual std::string parenthesize(const std::string& s) = 0;
    virtual printed power(const GiNaC::ex& base, const GiNaC::numeric& exponent) = 0;
    virtual printed root(const GiNaC::ex& radicand) = 0;
    virtual printed phase(const GiNaC::ex& exponent) = 0;
    virtual printed function(const GiNaC::ex& f) = 0;
    virtual printed sum_over(const GiNaC::ex& s) = 0;
    // <(j1, j2) j12, j3; J | j1, (j2, j3) j23; J>: the brackets, the bar, and what stands
    // between a coupling's parentheses and its label.
    struct recoupling_layout {
        std::string open, bar, close, label_gap;
    };
    virtual recoupling_layout recoupling_brackets() = 0;
    // <a || T^(k) || b> and <j m | T^(k)_q | j' m'> (model/tensor_operator.hpp), and both
    // between coupled states (model/coupled_element.hpp): the brackets, the bars, and what
    // stands between a j and its m.
    struct element_layout {
        std::string open, bar, double_bar, close, gap;
    };
    virtual element_layout element_brackets() = 0;
    // T^(k), with its component when there is one.
    std::string operator_symbol(const std::string& name, const GiNaC::ex& rank, const GiNaC::ex* component) {
        return operator_identifier(name) + rank_marks(rank, component);
    }
    virtual std::string operator_identifier(const std::string& name) = 0;
    // ^(k)_q, or ^(k) without a component.
    virtual std::string rank_marks(const GiNaC::ex& rank, const GiNaC::ex* component) = 0;
    // [A x B] and A . B (model/composite_operator.hpp).
    struct product_layout {
        std::string open, times, close, dot;
    };
    virtual product_layout product_signs() = 0;
    // A j or m inside an element.
    virtual std::string element_entry(const GiNaC::ex& e) = 0;

private:
    printed recoupling(const GiNaC::ex& e);
    std::string coupled(const GiNaC::ex& held, const recoupling_layout& layout);
    printed tensor_element(const GiNaC::ex& e);
    std::string operator_expression(const GiNaC::ex& op, const GiNaC::ex* component);
    printed sum(const GiNaC::ex& e);
    printed product(const GiNaC::ex& e);
    std::string join_factors(const std::vector<GiNaC::ex>& factors, const GiNaC::numeric& coefficient);
};

}  // namespace couplet::print_detail
