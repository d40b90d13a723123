#include <cctype>
#include <string>
#include <tuple>

#include "couplet/print/print.hpp"

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

}  // namespace couplet
