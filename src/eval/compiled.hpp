// An expression compiled for repeated exact evaluation: symbols become slots of a value
// vector, linear forms become coefficient lists, and each summand carries the selection rules
// (linear forms that must be >= 0, = 0 or integral) that bound its summation indices.
#pragma once

#include <cln/rational.h>
#include <ginac/ginac.h>

#include <map>
#include <memory>
#include <string>
#include <vector>

#include "couplet/exact/number.hpp"

namespace couplet::eval_detail {

struct linear {
    cln::cl_RA constant = 0;
    std::vector<std::pair<int, cln::cl_RA>> terms;  // slot, coefficient
    std::string text;                              // for messages
};

enum class rule_kind { nonnegative, zero, integral };
struct selection_rule {
    rule_kind kind;
    linear form;
};

struct node;
using node_ptr = std::unique_ptr<node>;

enum class node_kind {
    constant, variable, add, mul, power, root_power, phase, threej, clebsch, sixj, ninej, delta,
    triangle, sum
};

struct summand {
    node_ptr body;
    std::vector<selection_rule> rules;
};

struct node {
    node_kind kind;
    exact::number value;            // constant
    int slot = -1;                  // variable
    std::vector<node_ptr> children; // add, mul; power/root_power: one child
    long exponent = 0;              // power: x^n; root_power: sqrt(x)^n
    std::vector<linear> forms;      // phase (1), coupling symbols, delta, triangle
    std::vector<int> indices;       // sum
    std::vector<summand> terms;     // sum: the summands, each with its own bounds
    std::string text;               // for messages
    GiNaC::ex source;               // coupling symbols: the symbol, for its selection rules
};

struct program {
    node_ptr root;
    std::vector<std::string> slot_names;
    std::vector<int> free_slots;    // slots that the caller must assign
    std::map<std::string, int> slot_of;
    std::vector<int> declared_parity;  // per slot: 0 any, 1 integer, 2 half-odd
};

}  // namespace couplet::eval_detail
