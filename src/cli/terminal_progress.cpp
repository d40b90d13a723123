#include "cli/terminal_progress.hpp"

#include <cmath>
#include <ostream>

namespace couplet::cli {

void terminal_progress::operator()(std::size_t done, std::size_t total) {
    auto now = clock::now();
    if (done == 0) started_ = now;
    if (done >= total) {
        if (shown_ && style_.terminal) out_ << "\r\033[K" << std::flush;
        shown_ = false;
        return;
    }
    if (now - started_ < style_.delay) return;
    const auto interval = style_.terminal ? std::chrono::milliseconds(200) : std::chrono::milliseconds(5000);
    if (shown_ && now - last_shown_ < interval) return;
    out_ << (style_.terminal ? "\r" : "") << style_.label << ": " << done << "/" << total << " " << style_.unit;
    if (style_.rate) {
        const double seconds = std::chrono::duration<double>(now - started_).count();
        const double per_second = seconds > 0 ? done / seconds : 0;
        out_ << ", " << std::llround(per_second) << " " << style_.unit << "/s";
        if (per_second > 0) out_ << ", " << std::llround((total - done) / per_second) << " s left";
    }
    out_ << (style_.terminal ? "\033[K" : "\n") << std::flush;
    shown_ = true;
    last_shown_ = now;
}

terminal_progress::~terminal_progress() {
    if (shown_ && style_.terminal) out_ << "\r\033[K" << std::flush;
}

}  // namespace couplet::cli
