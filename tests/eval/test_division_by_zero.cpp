// Division by a quantity that is zero at the point evaluated: a clear error at the statement
// (exit 2), never an abort, whatever the divisor is (a coupling symbol, a name, a sum, a root
// of one).  Each input below once ended the program with an uncaught exception.  That these
// divisors are zero is common practice, no source: 3j(1 1 1; 0 0 0) = 0 because 1+1+1 is odd
// (DLMF 34.3.5), and sum(m : 3j(1 1 1; m -m 0)) = 0 by the same parity.
#include <catch2/catch.hpp>

#include "support.hpp"

using couplet::testing::run_cli;

TEST_CASE("division by zero during evaluation is an error at the statement, not a crash", "[eval][cli]") {
    for (const char* input :
         {"eval 1/3j(1,1,1;0,0,0)", "eval 3j(1,1,1;0,0,0)^-1", "eval 1/x at x=0", "eval 1/sum(m: 3j(1,1,1;m,-m,0))",
          "eval sqrt(1/3j(1,1,1;0,0,0))", "eval 1/(J-1) at J=1"}) {
        INFO(input);
        auto r = run_cli({"eval", "-e", input});
        CHECK(r.code == 2);
        CHECK(r.err.find("1:1: error: cannot evaluate: division by zero: the divisor of") != std::string::npos);
    }
}

TEST_CASE("statements before a division by zero keep their results", "[eval][cli]") {
    auto r = run_cli({"eval", "-"}, "eval 6j{1, 1, 1; 1, 1, 1}\neval 1/(J-1) at J=1\n");
    CHECK(r.code == 2);
    CHECK(r.out.find("1/6") != std::string::npos);  // {1 1 1; 1 1 1} = 1/6 (from memory)
    CHECK(r.err.find("2:1: error: cannot evaluate: division by zero") != std::string::npos);
    // The same divisor where it is not zero evaluates: 1/(J-1) at J=3 is 1/2.
    auto fine = run_cli({"eval", "-e", "eval 1/(J-1) at J=3"});
    CHECK(fine.code == 0);
    CHECK(fine.out.rfind("1/2", 0) == 0);
}
