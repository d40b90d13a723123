// An expression compiled for repeated exact evaluation: symbols become slots of a value
// vector, linear forms become coefficient lists, and each summand carries the selection rules
// (linear forms that must be >= 0, = 0 or integral) that bound its summation indices, and the
// order in which its indices are bound (eval/plan.hpp).
#pragma once

#include <array>
#include <cstddef>
#include <unordered_map>

#include <cln/rational.h>
#include <ginac/ginac.h>

#include <map>
#include <memory>
#include <string>
#include <vector>

#include "exact/number.hpp"

namespace couplet::eval_detail {

struct linear {
    cln::cl_RA constant = 0;
    std::vector<std::pair<int, cln::cl_RA>> terms;  // slot, coefficient
    std::string text;                               // for messages
    // The same form on doubled values t = 2x, in machine integers: 2 * scale * value =
    // sum coefficient * t[slot] + constant, scale > 0.  Quantum numbers are multiples of 1/2,
    // so this is exact wherever every value is; `fits` is false when a coefficient is too large.
    struct doubled_form {
        long constant = 0, scale = 1;
        std::vector<std::pair<int, long>> terms;
        bool fits = true;
    } doubled;
};

// Sets f.doubled from the rational form (merging repeated slots).
void fill_doubled(linear& f);

enum class rule_kind { nonnegative, zero, integral };
struct selection_rule {
    rule_kind kind;
    linear form;
};

struct node;
using node_ptr = std::unique_ptr<node>;

enum class node_kind {
    constant,
    variable,
    add,
    mul,
    power,
    root_power,
    phase,
    threej,
    clebsch,
    sixj,
    ninej,
    delta,
    triangle,
    projection,
    reduced_element,  // <a || T^(k) || b>: a fixed pseudo-random value (model/tensor_operator.hpp)
    sum
};

// Binds one summation index: a loop over the values its bounding rules leave, or solved from
// a rule `form = 0` whose other slots are already bound.  Then the rules and factors whose
// slots are all bound are checked and evaluated.
struct plan_step {
    enum class how { loop, solve } kind = how::loop;
    int slot = -1;
    int solver = -1;                // solve: the zero rule
    std::vector<int> lower, upper;  // loop: nonnegative rules with a positive / negative coefficient
    int parity_rule = -1;           // loop: an integral rule that fixes the parity of t[slot]
    std::vector<int> checks;        // rules that become decidable here
    std::vector<int> factors;       // factors of the body that become evaluable here
};

struct summand_plan {
    std::vector<int> entry_checks;   // rules on the outer quantum numbers only
    std::vector<int> entry_factors;  // factors that do not depend on the indices: evaluated once
    std::vector<plan_step> steps;
    std::string unbounded;  // the indices nothing bounds ("'x', 'y'"), or empty
};

struct summand {
    node_ptr body;
    std::vector<selection_rule> rules;
    std::vector<const node*> factors;  // the multiplicative factors of body (body itself if no product)
    summand_plan plan;
};

struct node {
    node_kind kind;
    exact::number value;             // constant
    int slot = -1;                   // variable
    std::vector<node_ptr> children;  // add, mul; power/root_power: one child
    long exponent = 0;               // power: x^n; root_power: sqrt(x)^n
    std::vector<linear> forms;       // phase (1), coupling symbols, delta, triangle
    std::vector<int> indices;        // sum
    std::vector<summand> terms;      // sum: the summands, each with its own bounds
    std::string text;                // for messages
    GiNaC::ex source;                // coupling symbols: the symbol, for its selection rules
    std::vector<int> slots;          // the slots the value depends on, ascending (a sum's indices excluded)
};

// Values of coupling symbols already computed, by kind and doubled arguments: the same 3j
// recurs across the terms of a sum and across the points of a verification.
struct symbol_memo {
    using key = std::array<long, 10>;
    struct key_hash {
        std::size_t operator()(const key& k) const {
            std::size_t h = 1469598103934665603ULL;
            for (long v : k) h = (h ^ static_cast<std::size_t>(v)) * 1099511628211ULL;
            return h;
        }
    };
    std::unordered_map<key, exact::number, key_hash> values;
    static constexpr std::size_t capacity = 1 << 18;  // then it starts afresh
};

struct program {
    node_ptr root;
    std::vector<std::string> slot_names;
    std::vector<int> free_slots;  // slots that the caller must assign
    std::map<std::string, int> slot_of;
    std::vector<int> declared_parity;  // per slot: 0 any, 1 integer, 2 half-odd
    bool doubled_forms_fit = true;     // every linear form has its machine-integer version
    symbol_memo memo;                  // filled by evaluation; a compiled expression is not shared between threads
};

}  // namespace couplet::eval_detail
