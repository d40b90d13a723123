// The rows of a table: every combination of values of the free quantum numbers, in the order
// of the columns, that the ranges give and the rules keep.
#pragma once

#include <ginac/ginac.h>

#include <cstddef>
#include <functional>
#include <map>
#include <string>
#include <vector>

#include "table/ranges.hpp"
#include "verify/domain.hpp"

namespace couplet::table_detail {

// What a table asks of its rows.
struct row_request {
    std::vector<named_range> ranges;  // names free in the expression, each once
    // Leave out rows that a selection rule makes 0 in every term (a triangle, m1 + m2 + m3 = 0,
    // |m| <= j): `term_rules` holds, for each term, the selection rules of the factors that make
    // the whole term vanish when they do.
    bool allowed_only = false;
    std::vector<verify::sampling_domain> term_rules;
};

// Columns: the ranged names in the order given, then the others in the domain's order (angular
// momenta before projections), each placed once the columns before it bound it.  A row keeps
// the domain's hard rules (declared parities, a triad's sum and j - m integral, |m| <= j of a
// column's own j); a name without a range takes the values its symbols' inequalities allow
// given the columns before it.  Throws user_error at `offset` when nothing bounds a name.
class row_plan {
public:
    row_plan(const verify::sampling_domain& domain, const row_request& request, std::size_t offset);

    const std::vector<GiNaC::symbol>& columns() const { return columns_; }
    // Calls visit with each row's doubled values in column order, in lexicographic order of the
    // columns; stops early when visit returns false.
    void for_each_row(const std::function<bool(const std::vector<long>&)>& visit) const;

private:
    struct column_values {
        bool ranged = false;
        long from = 0, to = 0, step = 1;
        bool nonnegative = false;                          // an angular momentum
        std::vector<verify::rule> lower, upper;            // c*t + rest >= 0 with this column last
        std::vector<verify::rule> solved;                  // allowed_only: c*t + rest = 0, this column last
        std::vector<verify::rule> checks;                  // rules whose last column this is
        std::vector<verify::rule> kept_lower, kept_upper;  // the inequalities among them
    };
    void keep(const verify::rule& r);  // every row keeps r
    void visit_from(std::size_t k, std::vector<long>& t, const std::function<bool(const std::vector<long>&)>& visit,
                    bool& go_on) const;
    bool kept_by_some_term(const std::vector<long>& t) const;

    std::vector<GiNaC::symbol> columns_;
    std::vector<column_values> values_;
    std::vector<std::vector<verify::rule>> term_checks_;  // several terms: one of them must be allowed
};

}  // namespace couplet::table_detail
