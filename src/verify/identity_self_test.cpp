#include "verify/identity_self_test.hpp"

#include "eval/evaluate.hpp"
#include "verify/identity_check.hpp"
#include "verify/simplification_check.hpp"

namespace couplet::verify {

identity_test self_test(const identity& id, const sampling_options& options) {
    identity_test out;
    simplification_check v;
    try {
        v = verify_simplification(id.left, id.right, id.numbers, options);
    } catch (const evaluation_error& e) {
        out.disagreement = std::string("the left side cannot be evaluated: ") + e.what();
        return out;
    }
    out.holds = v.agrees;
    out.points = v.points;
    out.nonzero = v.nonzero;
    if (!v.agrees)
        out.disagreement = !v.result_error.empty()
                               ? "the right side cannot be evaluated: " + v.result_error
                               : "at " + describe(*v.counter) + " the left side is " + v.counter->lhs.to_string() +
                                     ", the right side " + v.counter->rhs.to_string();
    return out;
}

}  // namespace couplet::verify
