// Declarations and constraints of a phase context; the queries are in context_queries.cpp.
#include "phase/context.hpp"

#include "phase/phase_lattice.hpp"

namespace couplet::phase {

unknown_variable::unknown_variable(const std::string& name)
    : std::invalid_argument("phase: unknown variable '" + name + "'"), name_(name) {}

context::context() = default;
context::~context() = default;
context::context(const context&) = default;
context& context::operator=(const context&) = default;
context::context(context&&) noexcept = default;
context& context::operator=(context&&) noexcept = default;

void context::invalidate() { lattice_.reset(); }

std::size_t context::declare_if_new(const std::string& name) {
    auto it = index_.find(name);
    if (it != index_.end()) return it->second;
    const std::size_t i = names_.size();
    names_.push_back(name);
    index_.emplace(name, i);
    info_.emplace_back();
    invalidate();
    return i;
}

void context::declare_names_in(const linear_form& f) {
    for (const auto& term : f.coefficients()) declare_if_new(term.first);
}

namespace {

void add_parity_constraint(std::vector<linear_form>& integer_forms, const std::string& name, parity p) {
    if (p == parity::integer) integer_forms.push_back(var(name));
    if (p == parity::half_odd) integer_forms.push_back(var(name) - cln::cl_RA(1) / 2);
}

}  // namespace

void context::declare_angular(const std::string& name, parity p) {
    if (auto it = index_.find(name); it != index_.end()) {
        variable_info& info = info_[it->second];
        if (info.projection) throw std::invalid_argument("phase: '" + name + "' is already a projection");
        if (info.par == p || p == parity::unknown) return;
        if (info.par != parity::unknown)
            throw std::invalid_argument("phase: '" + name + "' was declared with the other parity");
        info.par = p;
    } else {
        info_[declare_if_new(name)].par = p;
    }
    add_parity_constraint(integer_forms_, name, p);
    invalidate();
}

void context::declare_projection(const std::string& name, const linear_form& owner) {
    if (is_declared(name)) throw std::invalid_argument("phase: '" + name + "' is already declared");
    if (owner.coefficients().count(name))
        throw std::invalid_argument("phase: projection '" + name + "' cannot own itself");
    declare_names_in(owner);
    variable_info& info = info_[declare_if_new(name)];
    info.projection = true;
    info.owner = owner;
    integer_forms_.push_back(owner - var(name));
    invalidate();
}

void context::add_triad(const linear_form& a, const linear_form& b, const linear_form& c) {
    for (const auto* f : {&a, &b, &c}) declare_names_in(*f);
    integer_forms_.push_back(a + b + c);
    triads_.push_back({a, b, c});
    invalidate();
}

void context::add_zero_sum(const linear_form& a, const linear_form& b, const linear_form& c) { add_zero(a + b + c); }

void context::add_integer(const linear_form& x) {
    declare_names_in(x);
    integer_forms_.push_back(x);
    invalidate();
}

void context::add_zero(const linear_form& x) {
    declare_names_in(x);
    zero_forms_.push_back(x);
    invalidate();
}

bool context::is_projection(const std::string& name) const {
    auto it = index_.find(name);
    if (it == index_.end()) throw unknown_variable(name);
    return info_[it->second].projection;
}

parity context::parity_of(const std::string& name) const {
    auto it = index_.find(name);
    if (it == index_.end()) throw unknown_variable(name);
    return info_[it->second].par;
}

}  // namespace couplet::phase
