#include "rules/structure.hpp"

#include "canonical/phase_reduction.hpp"

#include <algorithm>
#include <set>
#include <stdexcept>

#include "model/structure.hpp"
#include "model/symbols.hpp"

namespace couplet::rules {

using namespace GiNaC;

std::vector<triad> triads_of(const ex& f) {
    coupling_structure c;
    add_structure(f, c);
    return c.triads;
}

std::vector<triad> all_triads(const ex& e) {
    std::vector<triad> out;
    for (const_preorder_iterator it = e.preorder_begin(); it != e.preorder_end(); ++it) {
        auto t = triads_of(*it);
        out.insert(out.end(), t.begin(), t.end());
    }
    return out;
}

namespace {

bool has_compound_entry(const ex& s) {
    for (const ex& entry : s)
        if (!is_a<symbol>(entry) && !is_a<numeric>(entry)) return true;
    return false;
}

// The 144 arrangements: the classical 24 closed under Regge's symmetry (DLMF 34.5.9).  A
// Regge image of a 6j with plain entries has half-sums for entries, so only such a 6j can be
// one; for plain entries the images add nothing a pattern of plain symbols could meet.
std::vector<symmetry::transformed> sixj_regge_orbit(const ex& s) {
    std::vector<symmetry::transformed> out{{s, 0}};
    for (size_t k = 0; k < out.size(); ++k)
        for (const auto& g : symmetry::sixj_symmetries()) {
            ex image = g.apply(out[k].symbol).symbol;
            auto known = std::find_if(out.begin(), out.end(), [&](const auto& t) { return t.symbol.is_equal(image); });
            if (known == out.end()) out.push_back({image, 0});  // no 6j symmetry costs a phase
        }
    return out;
}

}  // namespace

std::vector<symmetry::transformed> arrangements(const ex& s) {
    switch (kind_of(s)) {
        case symbol_kind::sixj:
            return has_compound_entry(s) ? sixj_regge_orbit(s) : symmetry::sixj_orbit(s);
        case symbol_kind::ninej:
            return symmetry::ninej_orbit(s);
        case symbol_kind::triangle: {
            // tri(a, b, c) is symmetric in its three arguments.
            static const int perms[6][3] = {{0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}};
            std::vector<symmetry::transformed> out;
            for (const auto& p : perms) out.push_back({triangle(s.op(p[0]), s.op(p[1]), s.op(p[2])).hold(), 0});
            return out;
        }
        default:
            return {{s, 0}};
    }
}

phase::context context_for(const ex& term, const quantum_numbers& numbers, const std::optional<symbol>& loose) {
    phase::context ctx;
    std::set<std::string> present;
    for (const_preorder_iterator it = term.preorder_begin(); it != term.preorder_end(); ++it)
        if (is_a<symbol>(*it)) present.insert(ex_to<symbol>(*it).get_name());
    if (loose) present.insert(loose->get_name());
    for (const std::string& name : present) {
        const quantum_number* q = numbers.find(name);
        bool is_loose = loose && loose->get_name() == name;
        if (!q || is_loose) {
            ctx.declare_angular(name, phase::parity::unknown);
            continue;
        }
        declare_in(ctx, *q);
    }
    for (const triad& t : all_triads(term)) {
        try {
            ctx.add_triad(linear_form_of(t[0]), linear_form_of(t[1]), linear_form_of(t[2]));
        } catch (const std::invalid_argument&) {
            // A slot that is no linear form constrains nothing we can use.
        }
    }
    return ctx;
}

bool same_phase(const phase::context& ctx, const ex& x, const ex& y) {
    try {
        return ctx.equal(linear_form_of(x), linear_form_of(y)) == phase::verdict::equal;
    } catch (const std::invalid_argument&) {
        return false;
    }
}

ex without_phases(const ex& e) {
    if (is_a<phase_factor>(e)) return 1;
    if (is_a<mul>(e)) {
        exvector ops;
        for (const ex& o : e) ops.push_back(without_phases(o));
        return mul(ops);
    }
    return e;
}

}  // namespace couplet::rules
