#include "model/normalize.hpp"

#include "model/symbols.hpp"

namespace couplet {

using namespace GiNaC;

namespace {

// (-1)^x as an exponent x, for a factor that is a phase or a power of one.
bool phase_exponent(const ex& f, ex& exponent) {
    if (is_a<phase_factor>(f)) {
        exponent = f.op(0);
        return true;
    }
    if (is_a<power>(f) && is_a<phase_factor>(f.op(0)) && is_a<numeric>(f.op(1)) &&
        ex_to<numeric>(f.op(1)).is_integer()) {
        exponent = f.op(0).op(0) * f.op(1);
        return true;
    }
    return false;
}

struct phase_merger : map_function {
    ex operator()(const ex& e) override {
        if (is_a<index_sum>(e)) {
            const auto& s = ex_to<index_sum>(e);
            return make_sum((*this)(s.body()), s.indices());
        }
        ex mapped = e.map(*this);
        ex exponent;
        if (is_a<mul>(mapped)) {
            ex total = 0, rest = 1;
            bool any = false;
            for (const ex& f : mapped) {
                if (phase_exponent(f, exponent)) {
                    total += exponent;
                    any = true;
                } else {
                    rest *= f;
                }
            }
            return any ? rest * make_phase(total.expand()) : mapped;
        }
        if (phase_exponent(mapped, exponent)) return make_phase(exponent.expand());
        return mapped;
    }
};

}  // namespace

ex merge_phases(const ex& e) {
    phase_merger m;
    return m(e);
}

ex normalize(const ex& e) { return merge_phases(e); }

}  // namespace couplet
