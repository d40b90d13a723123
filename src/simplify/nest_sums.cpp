#include "simplify/nest_sums.hpp"

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

bool is_angular(const ex& index, const quantum_numbers& numbers) {
    if (!is_a<symbol>(index)) return false;
    const quantum_number* q = numbers.find(ex_to<symbol>(index));
    return q && q->role == qn_role::angular;
}

class nester : public map_function {
public:
    explicit nester(const quantum_numbers& numbers) : numbers_(numbers) {}

    ex operator()(const ex& e) override {
        if (!is_a<index_sum>(e)) return e.map(*this);
        const auto& s = ex_to<index_sum>(e);
        lst angular, others;
        for (const ex& i : s.indices()) (is_angular(i, numbers_) ? angular : others).append(i);
        ex body = (*this)(s.body());
        if (angular.nops() == 0 || others.nops() == 0) return make_sum(body, s.indices());
        return make_sum(make_sum(body, others), angular);
    }

private:
    const quantum_numbers& numbers_;
};

}  // namespace

ex nest_projection_sums(const ex& e, const quantum_numbers& numbers) {
    nester n(numbers);
    return n(e);
}

}  // namespace couplet
