// The queries of a phase context: integrality, equality and canonical forms.
#include "phase/context.hpp"

#include "phase/bounded_projections.hpp"
#include "phase/phase_lattice.hpp"
#include "phase/phase_level.hpp"
#include "phase/representative_search.hpp"
#include "phase/witness_search.hpp"

#include <algorithm>
#include <numeric>

namespace couplet::phase {

using detail::int_vector;

namespace {

// A row over (u, 1) with u = 2v: "f is an integer" (modulus > 0) or "f == 0" (modulus 0).
std::optional<detail::integer_constraint> doubled_row(const linear_form& f, bool exact,
                                                      const std::map<std::string, std::size_t>& index) {
    const cln::cl_RA half = cln::cl_RA(1) / 2;
    cln::cl_I scale = cln::denominator(f.constant());
    for (const auto& term : f.coefficients()) scale = cln::lcm(scale, cln::denominator(term.second * half));
    detail::integer_constraint c;
    c.row.assign(index.size() + 1, 0);
    bool has_variables = false;
    for (const auto& [name, coefficient] : f.coefficients()) {
        c.row[index.at(name)] = cln::numerator(coefficient * half * scale);
        has_variables = true;
    }
    c.row.back() = cln::numerator(f.constant() * scale);
    c.modulus = exact ? cln::cl_I(0) : scale;
    // Nothing to ask: an exact 0 == 0, or an integer-valued form with integer coefficients.
    if (exact ? (!has_variables && cln::zerop(c.row.back())) : scale == 1) return std::nullopt;
    return c;
}

bool is_integer_value(const cln::cl_RA& x) { return cln::denominator(x) == 1; }

std::int64_t mod(std::int64_t x, std::int64_t q) {
    const std::int64_t r = x % q;
    return r < 0 ? r + q : r;
}

// The first signature entry that is not 0 mod `modulus`: 0 stands for the origin, k for the
// origin plus basis vector k.
std::optional<std::size_t> first_failure(const int_vector& signature, std::int64_t modulus) {
    for (std::size_t k = 0; k < signature.size(); ++k)
        if (signature[k] % modulus != 0) return k;
    return std::nullopt;
}

int_vector failing_point(const detail::phase_lattice& lattice, std::size_t k) {
    int_vector u = lattice.points().origin;
    if (k > 0)
        for (std::size_t i = 0; i < u.size(); ++i) u[i] += lattice.points().basis[k - 1][i];
    return u;
}

}  // namespace

const detail::phase_lattice& context::lattice() const {
    if (lattice_) return *lattice_;
    std::vector<detail::integer_constraint> rows;
    for (const auto& f : integer_forms_)
        if (auto c = doubled_row(f, false, index_)) rows.push_back(std::move(*c));
    for (const auto& f : zero_forms_)
        if (auto c = doubled_row(f, true, index_)) rows.push_back(std::move(*c));
    std::vector<detail::bounded_coordinate> bounded;
    for (std::size_t i = 0; i < names_.size(); ++i) {
        const linear_form& owner = info_[i].owner;
        if (!info_[i].projection || !owner.is_constant()) continue;
        const cln::cl_RA twice = 2 * owner.constant();
        if (cln::denominator(twice) == 1 && !cln::minusp(twice) && twice <= detail::largest_enumerated_box)
            bounded.push_back({i, detail::to_int64(cln::numerator(twice))});
    }
    for (auto& c : detail::bound_constraints(names_.size(), rows, bounded)) rows.push_back(std::move(c));
    detail::witness_geometry geometry;
    for (std::size_t i = 0; i < names_.size(); ++i) {
        if (info_[i].projection)
            geometry.projections.emplace_back(i, detail::to_doubled(info_[i].owner, index_));
        else
            geometry.angular.push_back(i);
    }
    for (const auto& t : triads_)
        geometry.triads.push_back(
            {detail::to_doubled(t[0], index_), detail::to_doubled(t[1], index_), detail::to_doubled(t[2], index_)});
    lattice_ = std::make_shared<detail::phase_lattice>(names_.size(), std::move(rows), std::move(geometry));
    return *lattice_;
}

bool context::satisfiable() const { return !lattice().empty(); }

bool context::admits(const assignment& values) const {
    for (const auto& name : names_) {
        auto it = values.find(name);
        if (it == values.end()) throw std::out_of_range("phase: no value for variable '" + name + "'");
        if (!is_integer_value(cln::cl_RA(2) * it->second)) return false;
    }
    for (const auto& f : integer_forms_)
        if (!is_integer_value(f.evaluate(values))) return false;
    for (const auto& f : zero_forms_)
        if (!cln::zerop(f.evaluate(values))) return false;
    return true;
}

namespace {

assignment to_assignment(const int_vector& u, const std::vector<std::string>& names) {
    assignment values;
    for (std::size_t i = 0; i < names.size(); ++i) values[names[i]] = cln::cl_RA(u[i]) / 2;
    return values;
}

}  // namespace

bool context::is_integer(const linear_form& x) const {
    const detail::phase_lattice& l = lattice();
    if (l.empty()) return true;
    const detail::scaled_form s = detail::to_scaled(x, index_);
    return !first_failure(l.signature(s.w, 4 * s.level), 2 * s.level);
}

integrality context::check_integer(const linear_form& x) const {
    const detail::phase_lattice& l = lattice();
    if (l.empty()) return {};
    const detail::scaled_form s = detail::to_scaled(x, index_);
    const auto failure = first_failure(l.signature(s.w, 4 * s.level), 2 * s.level);
    if (!failure) return {};
    const int_vector u = detail::polish_witness(l, failing_point(l, *failure), s.w, 2 * s.level);
    return {false, to_assignment(u, names_)};
}

verdict context::equal(const linear_form& x, const linear_form& y) const {
    const detail::phase_lattice& l = lattice();
    if (l.empty()) return verdict::equal;
    const detail::scaled_form sx = detail::to_scaled(x, index_), sy = detail::to_scaled(y, index_);
    const int_vector tx = l.signature(sx.w, 4 * sx.level), ty = l.signature(sy.w, 4 * sy.level);
    if (first_failure(tx, 2 * sx.level) || first_failure(ty, 2 * sy.level)) return verdict::not_integer;
    // Signatures are linear: the difference's, at the common level, without a third pass.
    const std::int64_t level = std::lcm(sx.level, sy.level);
    const std::int64_t q = 4 * level;
    for (std::size_t k = 0; k < tx.size(); ++k)
        if (mod(tx[k] * (level / sx.level) - ty[k] * (level / sy.level), q) != 0) return verdict::not_equal;
    return verdict::equal;
}

comparison context::compare(const linear_form& x, const linear_form& y) const {
    for (const auto* f : {&x, &y}) {
        integrality i = check_integer(*f);
        if (!i.integer) return {verdict::not_integer, std::move(i.witness)};
    }
    const detail::phase_lattice& l = lattice();
    if (l.empty()) return {};
    const detail::scaled_form d = detail::to_scaled(x - y, index_);
    const auto failure = first_failure(l.signature(d.w, 4 * d.level), 4 * d.level);
    if (!failure) return {};
    const int_vector u = detail::polish_witness(l, failing_point(l, *failure), d.w, 4 * d.level);
    return {verdict::not_equal, to_assignment(u, names_)};
}

linear_form context::canonical(const linear_form& x) const {
    const detail::phase_lattice& l = lattice();
    if (l.empty()) return {};
    const detail::scaled_form s = detail::to_scaled(x, index_);
    const int_vector signature = l.signature(s.w, 4 * s.level);
    // The class is printed at the smallest level that can express it, so that the level is a
    // property of the class and not of the exponent handed in.  Levels above 8 are only tried
    // as the form's own (exotic denominators; there the choice may depend on the input).
    constexpr std::int64_t largest_searched_level = 8;
    std::vector<std::int64_t> levels;
    for (std::int64_t level = 1; level <= std::min(s.level, largest_searched_level); ++level) levels.push_back(level);
    if (s.level > largest_searched_level) levels.push_back(s.level);
    for (std::int64_t level : levels) {
        std::optional<int_vector> w;
        if (level == s.level) {
            w = s.w;
        } else {
            int_vector scaled(signature.size());
            bool integral = true;
            for (std::size_t k = 0; k < signature.size() && integral; ++k) {
                integral = (signature[k] * level) % s.level == 0;
                scaled[k] = mod(signature[k] * level / s.level, 4 * level);
            }
            if (!integral) continue;
            w = l.level(level).preimage(scaled);
            if (!w) continue;
        }
        const detail::phase_level& at = l.level(level);
        const int_vector& best = detail::readable_representative(at, at.reduce(*w));
        if (at.signature(best) != at.signature(*w)) throw std::logic_error("phase: canonical form changed the phase");
        return detail::from_scaled(best, level, names_);
    }
    throw std::logic_error("phase: no level expresses the exponent");
}

}  // namespace couplet::phase
