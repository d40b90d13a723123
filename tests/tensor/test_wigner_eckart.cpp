// Tensor operators named by the user: matrix elements <j m | T^(k)_q | j' m'> by the
// Wigner-Eckart theorem (Edmonds 1957, eq. 5.4.1), reduced elements <a || T^(k) || b> as
// factors with fixed pseudo-random values, results that follow from the theorem, and errors.
#include <catch2/catch.hpp>

#include "model/tensor_operator.hpp"
#include "rules/cli_simplify.hpp"
#include "support.hpp"

using namespace couplet;
using couplet::testing::count_of;
using couplet::testing::require_exact;
using couplet::testing::simplify_and_compare;

namespace {

testing::cli_result run(std::vector<std::string> args) { return testing::run_cli(std::move(args)); }

}  // namespace

TEST_CASE("a matrix element of a tensor operator is its Wigner-Eckart form", "[tensor][cli]") {
    // Edmonds (1957) eq. 5.4.1, the convention of DESIGN.
    auto r =
        run({"check", "-e", "<j m | T^(k)_q | jp mp> == (-1)^(j-m) * 3j(j, k, jp; -m, q, mp) * <j || T^(k) || jp>"});
    INFO(r.out << r.err);
    CHECK(r.code == 0);
    // The same with the phase of the other sign is found wrong, and the missing phase named.
    auto wrong =
        run({"check", "-e", "<j m | T^(k)_q | jp mp> == (-1)^(j+m) * 3j(j, k, jp; -m, q, mp) * <j || T^(k) || jp>"});
    INFO(wrong.out);
    CHECK(wrong.code == 1);
    CHECK_THAT(wrong.out, Catch::Contains("phase"));
}

TEST_CASE("a scalar operator is diagonal, its element the reduced one over sqrt(2j+1)", "[tensor][cli]") {
    // Edmonds (1957) eq. 5.4.1 with k = 0 and the 3j with a zero column, DLMF 34.3.1 (the
    // scalar case written out from memory).
    auto r = run(
        {"check", "-e", "<j m | S^(0)_0 | jp mp> == delta(j, jp) * delta(m, mp) * <j || S^(0) || j> / sqrt(2*j+1)"});
    INFO(r.out << r.err);
    CHECK(r.code == 0);
}

TEST_CASE("the squares of all components and projections sum to the squared reduced element", "[tensor][cli]") {
    // Orthogonality of the 3j symbols, DLMF 34.3.18, applied to Edmonds 5.4.1 (common practice).
    auto s = simplify_and_compare("", "sum(m, q, mp : <j m | T^(k)_q | jp mp>^2)");
    require_exact(s);
    CHECK(count_of(s.text, "sum(") == 0);
    CHECK(count_of(s.text, "3j") == 0);
    CHECK(count_of(s.text, "<j || T^(k) || jp>^2") == 1);
}

TEST_CASE("a reduced element has a fixed value that depends on everything it names", "[tensor]") {
    // Uninterpreted: only determinism and independence matter (common practice, no source).
    const auto a = reduced_element_value("T", 2, 2, 4), b = reduced_element_value("T", 2, 4, 2),
               c = reduced_element_value("U", 2, 2, 4), d = reduced_element_value("T", 4, 2, 4);
    CHECK(a == reduced_element_value("T", 2, 2, 4));
    CHECK(a != b);
    CHECK(a != c);
    CHECK(a != d);
    for (const auto& v : {a, b, c, d}) CHECK(!v.is_zero());
    auto r = run({"eval", "-e", "<1 || T^(1) || 2> - <2 || T^(1) || 1>"});
    INFO(r.out << r.err);
    CHECK(r.code == 0);
    CHECK(r.out.rfind("0 ", 0) != 0);  // the two differ: an exchanged bra and ket is caught
}

TEST_CASE("matrix elements print as written, in text and in LaTeX", "[tensor][cli]") {
    auto text = run({"simplify", "--steps", "-e", "<j m | T^(k)_q | jp mp>"});
    INFO(text.out);
    CHECK_THAT(text.out, Catch::Contains("<j m | T^(k)_q | jp mp>") && Catch::Contains("Wigner-Eckart theorem"));
    auto doc = run({"latex", "-e", "<j m | T^(k)_q | jp mp>"});
    INFO(doc.out);
    CHECK_THAT(doc.out, Catch::Contains("T^{(k)}_{q}") && Catch::Contains("\\| T^{(k)} \\|"));
}

TEST_CASE("a matrix element that cannot be read says where", "[tensor][cli]") {
    auto error_of = [](const std::string& text) {
        auto r = testing::run_cli({"simplify", "-e", text});
        CHECK(r.code == 2);
        return r.err;
    };
    CHECK_THAT(error_of("<j || T^(k) jp>"), Catch::Contains("1:13"));
    CHECK_THAT(error_of("<j m | T^(k) | jp mp>"), Catch::Contains("1:14"));
    CHECK_THAT(error_of("<j m | T(k)_q | jp mp>"), Catch::Contains("1:9"));
}
