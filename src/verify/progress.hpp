// Progress of a long verification: points done out of the total.
#pragma once

#include <chrono>
#include <cstddef>
#include <functional>
#include <iosfwd>

namespace couplet::verify {

using progress_callback = std::function<void(std::size_t done, std::size_t total)>;

// Prints "checking: done/total points" on one line of a terminal, only once a verification
// has run for a while, at most a few times a second, and clears the line when it ends.
class terminal_progress {
public:
    explicit terminal_progress(std::ostream& out) : out_(out) {}
    ~terminal_progress();
    terminal_progress(const terminal_progress&) = delete;
    terminal_progress& operator=(const terminal_progress&) = delete;

    void operator()(std::size_t done, std::size_t total);
    progress_callback callback() {
        return [this](std::size_t done, std::size_t total) { (*this)(done, total); };
    }

private:
    using clock = std::chrono::steady_clock;
    std::ostream& out_;
    clock::time_point started_ = clock::now(), last_shown_{};
    bool shown_ = false;
};

}  // namespace couplet::verify
