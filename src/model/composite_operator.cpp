#include "model/composite_operator.hpp"

#include "model/symbols.hpp"
#include "model/tensor_operator.hpp"

namespace couplet {

using namespace GiNaC;

REGISTER_FUNCTION(acting_on, dummy())
REGISTER_FUNCTION(tensor_product, dummy())
REGISTER_FUNCTION(scalar_product, dummy())

namespace {

bool has_serial(const ex& e, unsigned serial) { return is_a<function>(e) && ex_to<function>(e).get_serial() == serial; }

void expand_into(const ex& op, const ex& component, const std::function<ex(const ex&)>& new_component,
                 component_expansion& out) {
    if (is_acting_on(op)) {
        out.factors.push_back({name_of(op), op.op(1), component, part_of(op)});
        return;
    }
    const ex &a = op.op(0), &b = op.op(1);
    const ex ka = rank_of(a), kb = rank_of(b);
    const ex qa = new_component(ka);
    out.summed.append(qa);
    if (is_scalar_product(op)) {
        out.coefficient *= make_phase(qa);
        expand_into(a, qa, new_component, out);
        expand_into(b, -qa, new_component, out);
        return;
    }
    const ex qb = new_component(kb);
    out.summed.append(qb);
    out.coefficient *= clebsch(ka, qa, kb, qb, op.op(2), component);
    expand_into(a, qa, new_component, out);
    expand_into(b, qb, new_component, out);
}

}  // namespace

ex make_acting_on(const std::string& op, const ex& rank, std::size_t part) {
    return acting_on(operator_name(op), rank, numeric(static_cast<long>(part))).hold();
}
ex make_tensor_product(const ex& a, const ex& b, const ex& rank) { return tensor_product(a, b, rank).hold(); }
ex make_scalar_product(const ex& a, const ex& b) { return scalar_product(a, b).hold(); }

bool is_acting_on(const ex& e) { return has_serial(e, acting_on_SERIAL::serial); }
bool is_tensor_product(const ex& e) { return has_serial(e, tensor_product_SERIAL::serial); }
bool is_scalar_product(const ex& e) { return has_serial(e, scalar_product_SERIAL::serial); }

ex rank_of(const ex& op) {
    if (is_acting_on(op)) return op.op(1);
    if (is_tensor_product(op)) return op.op(2);
    return 0;
}

std::size_t part_of(const ex& acting) { return static_cast<std::size_t>(ex_to<numeric>(acting.op(2)).to_long()); }

const std::string& name_of(const ex& acting) { return ex_to<operator_name>(acting.op(0)).name(); }

component_expansion expand_component(const ex& op, const ex& component,
                                     const std::function<ex(const ex& rank)>& new_component) {
    component_expansion out;
    expand_into(op, component, new_component, out);
    return out;
}

}  // namespace couplet
