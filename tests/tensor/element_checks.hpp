// The command-line runs the tensor-operator tests make: `check` of one statement, and the
// message of an input that simplify refuses.
#pragma once

#include <catch2/catch.hpp>

#include <string>

#include "support.hpp"

namespace couplet::testing {

// `check -e statement`: 0 when it holds, 1 when it fails.
inline int check_statement(const std::string& statement) {
    auto r = run_cli({"check", "-e", statement});
    INFO(statement << "\n" << r.out << r.err);
    return r.code;
}

// `check` of an element against a closed form.
inline int check_equal(const std::string& element, const std::string& closed_form) {
    return check_statement(element + " == " + closed_form);
}

// The error of `simplify -e text`, which must be refused with exit code 2.
inline std::string simplify_error(const std::string& text) {
    auto r = run_cli({"simplify", "-e", text});
    CHECK(r.code == 2);
    return r.err;
}

}  // namespace couplet::testing
