// The installed program prints one form for one input, run after run (cli/fixed_layout.hpp):
// without the fixed address layout, an invented square network came out in four different
// (equal) forms over twelve runs of one binary.
#include <catch2/catch.hpp>

#include <array>
#include <cstdio>
#include <cstdlib>
#include <set>
#include <string>

namespace {

std::string output_of(const std::string& command) {
    std::string out;
    FILE* pipe = popen(command.c_str(), "r");
    REQUIRE(pipe != nullptr);
    std::array<char, 4096> chunk{};
    while (std::size_t n = std::fread(chunk.data(), 1, chunk.size(), pipe)) out.append(chunk.data(), n);
    CHECK(pclose(pipe) == 0);
    return out;
}

}  // namespace

TEST_CASE("the program prints the same form of a result on every run", "[cli][process]") {
    // Where the system forbids turning randomization off, the program cannot either.
    if (std::system("setarch -R true > /dev/null 2>&1") != 0) {
        WARN("address randomization cannot be turned off here; the program's term order may vary");
        return;
    }
    const std::string command =
        std::string("'") + COUPLET_CLI_PATH +
        "' simplify --no-verify -e '"
        "sum(m1, m2, m3, m4 : (-1)^(a-m1+b-m2+c-m3+d-m4) * 3j(a, d, e; m1, -m4, M1) * 3j(b, a, f; m2, -m1, M2)"
        " * 3j(c, b, g; m3, -m2, M3) * 3j(d, c, h; m4, -m3, M4))'";
    std::set<std::string> forms;
    for (int run = 0; run < 8; ++run) forms.insert(output_of(command));
    INFO(*forms.begin());
    CHECK(forms.size() == 1);
    CHECK(forms.begin()->find("6j{") != std::string::npos);
}
