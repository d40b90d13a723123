// The only translation unit that instantiates Catch2's runner: it is slow to compile, so it
// is kept apart from the test files.
#define CATCH_CONFIG_MAIN
#include <catch2/catch.hpp>
