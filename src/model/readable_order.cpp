#include "model/readable_order.hpp"

#include <algorithm>
#include <cctype>
#include <sstream>
#include <string>
#include <tuple>
#include <vector>

namespace couplet {

// j < j1 < j2 < j12 < J < J' < l < lambda: letters case-blind, lower case before upper case,
// subscripts by value, primes last.
bool readable_name_less(const std::string& a, const std::string& b) {
    auto split = [](const std::string& n) {
        std::size_t i = 0;
        std::string letters, lowered;
        while (i < n.size() && std::isalpha(static_cast<unsigned char>(n[i]))) {
            letters += n[i];
            lowered += static_cast<char>(std::tolower(static_cast<unsigned char>(n[i])));
            ++i;
        }
        std::size_t d = i;
        while (i < n.size() && std::isdigit(static_cast<unsigned char>(n[i]))) ++i;
        std::string digits = n.substr(d, i - d);
        std::string rest = n.substr(i);
        // Digits compare by value: shorter (after leading zeros) first, then lexically.
        return std::make_tuple(lowered, letters != lowered, digits.size(), digits, rest, letters);
    };
    return split(a) < split(b);
}

namespace {

using namespace GiNaC;

std::string numeric_text(const numeric& n) {
    std::ostringstream out;
    out << n;
    return out.str();
}

// One term of a linear form without its sign: "j", "2*j", "1/2".
std::string unsigned_term(const ex& t) {
    if (is_a<numeric>(t)) return numeric_text(abs(ex_to<numeric>(t)));
    if (is_a<mul>(t) && is_a<numeric>(t.op(t.nops() - 1))) {
        numeric c = abs(ex_to<numeric>(t.op(t.nops() - 1)));
        ex rest = t / t.op(t.nops() - 1);
        return c.is_equal(1) ? readable_key(rest) : numeric_text(c) + "*" + readable_key(rest);
    }
    return readable_key(t);
}

bool negative_term(const ex& t) {
    if (is_a<numeric>(t)) return ex_to<numeric>(t).is_negative();
    return is_a<mul>(t) && is_a<numeric>(t.op(t.nops() - 1)) && ex_to<numeric>(t.op(t.nops() - 1)).is_negative();
}

ex without_coefficient(const ex& t) {
    if (is_a<mul>(t) && is_a<numeric>(t.op(t.nops() - 1))) return t / t.op(t.nops() - 1);
    return t;
}

}  // namespace

std::string readable_key(const ex& e) {
    if (is_a<symbol>(e)) return ex_to<symbol>(e).get_name();
    if (is_a<numeric>(e)) return numeric_text(ex_to<numeric>(e));
    if (is_a<mul>(e) && negative_term(e)) return "-" + unsigned_term(e);
    if (is_a<mul>(e)) return unsigned_term(e);
    if (!is_a<add>(e)) {
        // Not a linear form: only a fixed order is needed, and the printed form of each
        // operand gives one.
        std::string key = ex_to<basic>(e).class_name();
        for (std::size_t i = 0; i < e.nops(); ++i) key += "," + readable_key(e.op(i));
        return key;
    }
    std::vector<ex> terms(e.begin(), e.end());
    std::stable_sort(terms.begin(), terms.end(), [](const ex& a, const ex& b) {
        bool ca = is_a<numeric>(a), cb = is_a<numeric>(b);
        if (ca != cb) return cb;
        ex ra = without_coefficient(a), rb = without_coefficient(b);
        if (is_a<symbol>(ra) && is_a<symbol>(rb))
            return readable_name_less(ex_to<symbol>(ra).get_name(), ex_to<symbol>(rb).get_name());
        return readable_key(ra) < readable_key(rb);
    });
    std::string key;
    for (std::size_t i = 0; i < terms.size(); ++i) {
        bool minus = negative_term(terms[i]);
        if (minus)
            key += "-";
        else if (i > 0)
            key += "+";
        key += unsigned_term(terms[i]);
    }
    return key;
}

bool readable_less(const ex& x, const ex& y) {
    if (is_a<symbol>(x) && is_a<symbol>(y))
        return readable_name_less(ex_to<symbol>(x).get_name(), ex_to<symbol>(y).get_name());
    return readable_key(x) < readable_key(y);
}

}  // namespace couplet
