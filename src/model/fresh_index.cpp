#include "model/fresh_index.hpp"

#include <map>
#include <set>
#include <string>

namespace couplet {

using namespace GiNaC;

symbol fresh_index(const ex& term, const quantum_numbers& numbers) {
    static std::map<std::string, symbol> issued;
    std::set<std::string> taken;
    for (const quantum_number& q : numbers.all()) taken.insert(q.name);
    for (const_preorder_iterator it = term.preorder_begin(); it != term.preorder_end(); ++it)
        if (is_a<symbol>(*it)) taken.insert(ex_to<symbol>(*it).get_name());
    for (int n = 1;; ++n) {
        std::string name = "x" + std::to_string(n);
        if (taken.count(name)) continue;
        auto known = issued.find(name);
        if (known == issued.end()) known = issued.emplace(name, symbol(name)).first;
        return known->second;
    }
}

}  // namespace couplet
