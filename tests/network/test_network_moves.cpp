// Each network move is an identity between its pattern sum and its result; both sides are
// evaluated exactly at random admissible points of the pattern's free quantum numbers.
#include <catch2/catch.hpp>

#include <iostream>

#include "network/move.hpp"
#include "network_points.hpp"

using namespace couplet;

TEST_CASE("every network move holds exactly at 200 random admissible points", "[network][moves]") {
    // The identities are DLMF 34.6.1, 34.6.1 with 34.3.16, 34.4.1, 34.5.23, 34.3.16,
    // 34.3.16 with 34.3.1, and 34.5.23 with 34.3.17, as each move's `reference` names.
    unsigned seed = 11;
    std::vector<network::move> moves = network::network_moves();
    moves.push_back(network::interchange_move());
    for (const auto& m : moves) {
        INFO(m.name << " (" << m.reference << ")");
        auto a = testing::network_agreement_at_points(network::left_side(m), network::right_side(m), network::pattern_numbers(),
                                            seed++, 200, 4);
        CHECK(a.points == 200);
        CHECK(a.equal == a.points);
        CHECK(a.nonzero > 20);  // the points test something
        std::cout << "move " << m.name << ": " << a.equal << "/" << a.points << " points agree, " << a.nonzero
                  << " nonzero\n";
    }
}

TEST_CASE("a wrong phase in a move's pattern is caught by its self-test", "[network][moves]") {
    // The triangle with the factor (-1)^(l1+u1) taken away no longer equals 3j x 6j (DLMF 34.5.23
    // needs all three): the self-test can fail.
    for (const auto& m : network::network_moves()) {
        if (m.name != "triangle to 3j times 6j") continue;
        network::move broken = m;
        const auto& q = network::pattern_numbers();
        GiNaC::ex l1 = q.find("l1")->symbol, u1 = q.find("u1")->symbol;
        broken.phase = m.phase - l1 - u1;
        auto a = testing::network_agreement_at_points(network::left_side(broken), m.result, network::pattern_numbers(), 5, 100, 4);
        CHECK(a.equal < a.points);
    }
}

TEST_CASE("the interchange move fails its self-test without the phase of the new line", "[network][moves]") {
    // DLMF 34.5.23 with 34.3.17 needs (-1)^(b+c+e+x) beside the metric (-1)^(x-xi); dropping
    // (-1)^(b+c+e+x) gives an x-dependent sign that no overall phase repairs.
    network::move broken = network::interchange_move();
    const auto& q = network::pattern_numbers();
    GiNaC::ex b = q.find("j2")->symbol, c = q.find("l1")->symbol, e = q.find("j3")->symbol, x = q.find("x")->symbol;
    broken.result = broken.result * couplet::make_phase(-(b + c + e + x));
    auto a = testing::network_agreement_at_points(network::left_side(broken), network::right_side(broken), q, 6, 100, 4);
    CHECK(a.equal < a.points);
}
