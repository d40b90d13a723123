#include <iostream>
#include <string>
#include <vector>

#include "cli/run.hpp"

int main(int argc, char** argv) {
    std::vector<std::string> args(argv, argv + argc);
    return couplet::cli::run(args, std::cin, std::cout, std::cerr);
}
