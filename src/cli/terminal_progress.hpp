// The progress of a long verification on a terminal.
#pragma once

#include <chrono>
#include <cstddef>
#include <functional>
#include <iosfwd>

namespace couplet::cli {

// Prints "checking: done/total points" on one line of a terminal, only once a verification
// has run for a while, at most a few times a second, and clears the line when it ends.
class terminal_progress {
public:
    explicit terminal_progress(std::ostream& out) : out_(out) {}
    ~terminal_progress();
    terminal_progress(const terminal_progress&) = delete;
    terminal_progress& operator=(const terminal_progress&) = delete;

    void operator()(std::size_t done, std::size_t total);
    std::function<void(std::size_t, std::size_t)> callback() {
        return [this](std::size_t done, std::size_t total) { (*this)(done, total); };
    }

private:
    using clock = std::chrono::steady_clock;
    std::ostream& out_;
    clock::time_point started_ = clock::now(), last_shown_{};
    bool shown_ = false;
};

}  // namespace couplet::cli
