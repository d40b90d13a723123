#include "verify/tolerant_evaluation.hpp"

#include <exception>
#include <stdexcept>

namespace couplet::verify {

tolerant_expression::tolerant_expression(const GiNaC::ex& e, const quantum_numbers& numbers)
    : e_(e), numbers_(numbers), whole_(e, numbers) {}

exact::number tolerant_expression::at(const assignment& values) const {
    try {
        return whole_.at(values);
    } catch (const evaluation_error&) {
    } catch (const std::domain_error&) {
    }
    return forgiving(e_, values);
}

const compiled_expression& tolerant_expression::compiled(const GiNaC::ex& e) const {
    auto it = parts_.find(e);
    if (it == parts_.end()) it = parts_.emplace(e, std::make_unique<compiled_expression>(e, numbers_)).first;
    return *it->second;
}

// Sums and products are split until the undefined part is found; a sum over indices is one
// part (its summands need the indices' values), so an undefined factor inside it still fails.
exact::number tolerant_expression::forgiving(const GiNaC::ex& e, const assignment& values) const {
    if (GiNaC::is_a<GiNaC::add>(e)) {
        exact::number total;
        for (const GiNaC::ex& term : e) total += forgiving(term, values);
        return total;
    }
    if (GiNaC::is_a<GiNaC::mul>(e)) {
        std::exception_ptr undefined;
        exact::number product(1L);
        for (const GiNaC::ex& factor : e) {
            try {
                exact::number v = forgiving(factor, values);
                if (v.is_zero()) return v;
                product *= v;
            } catch (const evaluation_error&) {
                undefined = std::current_exception();
            } catch (const std::domain_error&) {
                undefined = std::current_exception();
            }
        }
        if (undefined) std::rethrow_exception(undefined);
        return product;
    }
    return compiled(e).at(values);
}

}  // namespace couplet::verify
