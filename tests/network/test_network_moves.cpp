// Each network move is an identity between its pattern sum and its result, self-tested with
// every other identity (tests/simplify/test_identity_registry.cpp); here the self-test is
// shown to fail for a move with a phase taken away.
#include <catch2/catch.hpp>

#include "model/symbols.hpp"
#include "network/move.hpp"
#include "verify/identity_self_test.hpp"

using namespace couplet;

TEST_CASE("a wrong phase in a move's pattern is caught by its self-test", "[network][moves]") {
    // The triangle with the factor (-1)^(l1+u1) taken away no longer equals 3j x 6j (DLMF 34.5.23
    // needs all three): the self-test can fail.
    for (const auto& m : network::network_moves()) {
        if (m.name != "triangle to 3j times 6j") continue;
        network::move broken = m;
        GiNaC::ex l1 = m.numbers.find("l1")->symbol, u1 = m.numbers.find("u1")->symbol;
        broken.phase = m.phase - l1 - u1;
        broken.left = network::left_side(broken);
        CHECK(verify::self_test(m).holds);
        CHECK_FALSE(verify::self_test(broken).holds);
    }
}

TEST_CASE("the interchange move fails its self-test without the phase of the new line", "[network][moves]") {
    // DLMF 34.5.23 with 34.3.17 needs (-1)^(b+c+e+x) beside the metric (-1)^(x-xi); dropping
    // (-1)^(b+c+e+x) gives an x-dependent sign that no overall phase repairs.
    network::move broken = network::interchange_move();
    const auto& q = broken.numbers;
    GiNaC::ex b = q.find("j2")->symbol, c = q.find("l1")->symbol, e = q.find("j3")->symbol, x = q.find("x")->symbol;
    broken.result = broken.result * couplet::make_phase(-(b + c + e + x));
    broken.right = network::right_side(broken);
    CHECK_FALSE(verify::self_test(broken).holds);
}
