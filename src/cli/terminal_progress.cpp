#include "cli/terminal_progress.hpp"

#include <ostream>

namespace couplet::cli {

void terminal_progress::operator()(std::size_t done, std::size_t total) {
    auto now = clock::now();
    if (done == 0) started_ = now;
    if (done >= total) {
        if (shown_) out_ << "\r\033[K" << std::flush;
        shown_ = false;
        return;
    }
    if (now - started_ < std::chrono::milliseconds(700)) return;
    if (shown_ && now - last_shown_ < std::chrono::milliseconds(200)) return;
    out_ << "\rchecking: " << done << "/" << total << " points" << std::flush;
    shown_ = true;
    last_shown_ = now;
}

terminal_progress::~terminal_progress() {
    if (shown_) out_ << "\r\033[K" << std::flush;
}

}  // namespace couplet::cli
