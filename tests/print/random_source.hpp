// Random, well-formed couplet expressions (as source text) for round-trip tests.  Angular
// momenta and projections come from separate name pools so that roles never conflict.
#pragma once

#include <random>
#include <string>
#include <vector>

namespace couplet::testing {

class random_source {
public:
    explicit random_source(unsigned seed) : rng_(seed) {}

    std::string expression(int depth = 3) {
        if (depth <= 0) return leaf();
        switch (pick(9)) {
            case 0:
                return expression(depth - 1) + " + " + expression(depth - 1);
            case 1:
                return expression(depth - 1) + " - " + term(depth - 1);
            case 2:
                return term(depth - 1) + "*" + term(depth - 1);
            case 3:
                return term(depth - 1) + "/(2*" + jname() + "+1)";
            case 4:
                return "(-1)^(" + jform() + "+" + jform() + ")*" + term(depth - 1);
            case 5:
                return "sqrt(2*" + jname() + "+1)*" + term(depth - 1);
            case 6:
                return "(" + expression(depth - 1) + ")^2";
            case 7:
                return summed(depth - 1);
            default:
                return "-" + term(depth - 1);
        }
    }

private:
    int pick(int n) { return std::uniform_int_distribution<int>(0, n - 1)(rng_); }

    std::string term(int depth) { return depth <= 0 ? leaf() : "(" + expression(depth) + ")"; }

    std::string jname() {
        static const std::vector<std::string> names{"a", "b", "c", "j1", "j2", "j12", "J", "J'", "l", "lambda"};
        return names[pick(static_cast<int>(names.size()))];
    }
    std::string mname() {
        static const std::vector<std::string> names{"ma", "mb", "m1", "m2", "M", "mu"};
        return names[pick(static_cast<int>(names.size()))];
    }
    std::string number() {
        static const std::vector<std::string> numbers{"0", "1", "2", "3", "1/2", "3/2", "7/3", "12"};
        return numbers[pick(static_cast<int>(numbers.size()))];
    }
    std::string jform() {
        switch (pick(4)) {
            case 0:
                return jname() + "+1/2";
            case 1:
                return jname() + "-1";
            case 2:
                return "2*" + jname();
            default:
                return jname();
        }
    }
    std::string mform() {
        switch (pick(4)) {
            case 0:
                return "-" + mname();
            case 1:
                return mname() + "+1";
            case 2:
                return mname() + "-" + mname();
            default:
                return mname();
        }
    }
    std::string cg_atom(bool projection) {
        switch (pick(4)) {
            case 0:
                return number();
            case 1:
                return "(" + (projection ? mform() : jform()) + ")";
            case 2:
                return projection ? "-" + mname() : jname();
            default:
                return projection ? mname() : jname();
        }
    }

    std::string leaf() {
        switch (pick(9)) {
            case 0:
                return number();
            case 1:
                return jname();
            case 2:
                return "3j(" + jform() + ", " + jname() + ", " + jform() + "; " + mform() + ", " + mform() + ", " +
                       mname() + ")";
            case 3:
                return "6j{" + jname() + ", " + jform() + ", " + jname() + "; " + jname() + ", " + jname() + ", " +
                       jform() + "}";
            case 4: {
                std::string s = "9j{";
                for (int k = 0; k < 9; ++k) s += (k == 0 ? "" : k % 3 == 0 ? "; " : ", ") + jname();
                return s + "}";
            }
            case 5:
                return "<" + cg_atom(false) + " " + cg_atom(true) + ", " + cg_atom(false) + " " + cg_atom(true) +
                       " | " + cg_atom(false) + " " + cg_atom(true) + ">";
            case 6:
                return "delta(" + jname() + ", " + jform() + ")";
            case 7:
                return "tri(" + jname() + ", " + jname() + ", " + jform() + ")";
            default:
                return "(-1)^(" + jform() + "-" + mname() + ")";
        }
    }

    std::string summed(int depth) {
        std::string m = mname();
        return "sum(" + m + " : 3j(" + jname() + ", " + jname() + ", " + jname() + "; " + m + ", -" + m + ", 0)*" +
               term(depth) + ")";
    }

    std::mt19937 rng_;
};

}  // namespace couplet::testing
