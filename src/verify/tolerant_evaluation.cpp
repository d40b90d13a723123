#include "verify/tolerant_evaluation.hpp"

#include <exception>
#include <stdexcept>

namespace couplet::verify {

tolerant_expression::tolerant_expression(const GiNaC::ex& e, const quantum_numbers& numbers, evaluation_limits limits)
    : e_(e), numbers_(numbers), limits_(limits), whole_(e, numbers, limits) {}

exact::number tolerant_expression::at(const assignment& values) const {
    try {
        return whole_.at(values);
    } catch (const work_limit_exceeded&) {
        throw;  // the parts would cost as much again
    } catch (const evaluation_error&) {
    } catch (const std::domain_error&) {
    }
    return forgiving(e_, values);
}

const compiled_expression& tolerant_expression::compiled(const GiNaC::ex& e) const {
    auto it = parts_.find(e);
    if (it == parts_.end()) it = parts_.emplace(e, std::make_unique<compiled_expression>(e, numbers_, limits_)).first;
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
        // A division by 0 is never excused, so every factor is looked at.
        std::exception_ptr undefined;
        exact::number product(1L);
        for (const GiNaC::ex& factor : e) {
            try {
                product *= forgiving(factor, values);
            } catch (const division_by_zero&) {
                throw;
            } catch (const work_limit_exceeded&) {
                throw;
            } catch (const evaluation_error&) {
                undefined = std::current_exception();
            } catch (const std::domain_error&) {
                undefined = std::current_exception();
            }
        }
        if (product.is_zero() || !undefined) return product;
        std::rethrow_exception(undefined);
    }
    return compiled(e).at(values);
}

division_by_zero undefined_everywhere(const std::string& divisor, std::size_t points) {
    return division_by_zero(divisor, "at every admissible point checked (" + std::to_string(points) +
                                         (points == 1 ? " point)" : " points)"));
}

}  // namespace couplet::verify
