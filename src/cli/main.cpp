#include <iostream>
#include <string>
#include <vector>

#include "cli/fixed_layout.hpp"
#include "cli/run.hpp"

int main(int argc, char** argv) {
    couplet::cli::run_with_fixed_address_layout(argv);
    std::vector<std::string> args(argv, argv + argc);
    return couplet::cli::run(args, std::cin, std::cout, std::cerr);
}
