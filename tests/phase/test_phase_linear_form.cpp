#include <catch2/catch.hpp>

#include "phase/linear_form.hpp"

#include <stdexcept>

using couplet::phase::assignment;
using couplet::phase::linear_form;
using couplet::phase::var;

namespace {
const cln::cl_RA half = cln::cl_RA(1) / 2;
}

TEST_CASE("phase: linear forms drop zero coefficients", "[phase]") {
    const linear_form a = var("a"), b = var("b");
    const linear_form f = 2 * a - b + 3;
    CHECK(f.coefficient("a") == 2);
    CHECK(f.coefficient("b") == -1);
    CHECK(f.constant() == 3);
    const linear_form g = f - 2 * a;
    CHECK(g.coefficients().count("a") == 0);
    CHECK(g == -b + 3);
    CHECK((a - a).is_constant());
    CHECK((a - a) == linear_form());
    CHECK(0 * f == linear_form());
    CHECK(f != g);
}

TEST_CASE("phase: linear forms print in couplet syntax", "[phase]") {
    const linear_form a = var("a"), b = var("b"), c = var("c"), j = var("j"), m = var("m");
    CHECK((a + b + c).to_string() == "a+b+c");
    CHECK((2 * j).to_string() == "2*j");
    CHECK((j - m + 1).to_string() == "j-m+1");
    CHECK((a + b + half).to_string() == "a+b+1/2");
    CHECK((-j).to_string() == "-j");
    CHECK((half * j - cln::cl_RA(3) / 2).to_string() == "1/2*j-3/2");
    CHECK(linear_form().to_string() == "0");
    CHECK(linear_form(-half).to_string() == "-1/2");
    // An explicit order wins over the alphabet; names it omits follow alphabetically.
    CHECK((a + b + c).to_string({"c", "a"}) == "c+a+b");
    CHECK((a - c).to_string({"c"}) == "-c+a");
}

TEST_CASE("phase: linear forms evaluate exactly", "[phase]") {
    const linear_form a = var("a"), b = var("b");
    const assignment at{{"a", half}, {"b", cln::cl_RA(3)}};
    CHECK((2 * a - b + 1).evaluate(at) == -1);
    CHECK((a * cln::cl_RA(3)).evaluate(at) == cln::cl_RA(3) / 2);
    CHECK_THROWS_AS((a + var("z")).evaluate(at), std::out_of_range);
}
