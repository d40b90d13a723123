// Blocks of work spread over forked processes (GiNaC is not thread-safe), their output
// gathered in block order.
#pragma once

#include <cstddef>
#include <functional>
#include <stdexcept>
#include <string>

namespace couplet::cli {

// A worker could not finish its block: `what()` is the message it gave (a diagnostic), or
// says how the process ended.
class worker_failure : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// Block b is produced by worker b % jobs into a string, which `consume` receives in the order
// b = 0, 1, ..., blocks - 1.  Worker 0 is this process; the others are forked and run at most
// a pipe's buffer ahead of it.
// `produce` may throw std::exception: its what() ends the run as a worker_failure.  With
// jobs == 1 everything runs in this process.  consume returns false to stop early (the workers
// are then ended).
void run_ordered(std::size_t blocks, std::size_t jobs, const std::function<void(std::size_t, std::string&)>& produce,
                 const std::function<bool(std::size_t, const std::string&)>& consume);

}  // namespace couplet::cli
