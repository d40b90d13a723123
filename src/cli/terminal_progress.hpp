// The progress of a long run on stderr.
#pragma once

#include <chrono>
#include <cstddef>
#include <functional>
#include <iosfwd>
#include <string>

namespace couplet::cli {

// How a meter reads: "checking: 300/1200 points", or with a rate
// "table: 120000/1766270 rows, 61000 rows/s, 27 s left".
struct progress_style {
    std::string label = "checking", unit = "points";
    bool rate = false;
    std::chrono::milliseconds delay{700};  // nothing is shown for runs shorter than this
    // A terminal: one line rewritten in place; otherwise a line every few seconds.
    bool terminal = true;
};

// Shown only once the run has gone on for the style's delay, at most a few times a second,
// and cleared (on a terminal) when it ends.
class terminal_progress {
public:
    explicit terminal_progress(std::ostream& out, progress_style style = {}) : out_(out), style_(std::move(style)) {}
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
    progress_style style_;
    clock::time_point started_ = clock::now(), last_shown_{};
    bool shown_ = false;
};

}  // namespace couplet::cli
