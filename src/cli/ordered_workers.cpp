#include "cli/ordered_workers.hpp"

#include <fcntl.h>
#include <signal.h>
#include <sys/wait.h>
#include <unistd.h>

#include <cerrno>
#include <cstdint>
#include <cstring>
#include <vector>

namespace couplet::cli {

namespace {

// A frame on a worker's pipe: one byte of kind, eight of length, then the bytes.
constexpr char data_frame = 'D', error_frame = 'E';

bool write_all(int fd, const char* p, std::size_t n) {
    while (n > 0) {
        const ssize_t w = ::write(fd, p, n);
        if (w < 0 && errno == EINTR) continue;
        if (w <= 0) return false;
        p += w;
        n -= static_cast<std::size_t>(w);
    }
    return true;
}

bool read_all(int fd, char* p, std::size_t n) {
    while (n > 0) {
        const ssize_t r = ::read(fd, p, n);
        if (r < 0 && errno == EINTR) continue;
        if (r <= 0) return false;
        p += r;
        n -= static_cast<std::size_t>(r);
    }
    return true;
}

bool send(int fd, char kind, const std::string& payload) {
    char head[9];
    head[0] = kind;
    const std::uint64_t n = payload.size();
    std::memcpy(head + 1, &n, sizeof n);
    return write_all(fd, head, sizeof head) && write_all(fd, payload.data(), payload.size());
}

// The worker's loop; never returns.
[[noreturn]] void work(std::size_t first, std::size_t blocks, std::size_t jobs, int fd,
                       const std::function<void(std::size_t, std::string&)>& produce) {
    for (std::size_t b = first; b < blocks; b += jobs) {
        std::string out;
        try {
            produce(b, out);
        } catch (const std::exception& e) {
            send(fd, error_frame, e.what());
            ::_exit(2);
        }
        if (!send(fd, data_frame, out)) ::_exit(1);  // the reader is gone
    }
    ::_exit(0);
}

struct worker {
    pid_t pid = -1;
    int fd = -1;
};

void end_all(std::vector<worker>& workers, bool kill_them) {
    for (worker& w : workers) {
        if (w.fd >= 0) ::close(w.fd);
        if (w.pid > 0) {
            if (kill_them) ::kill(w.pid, SIGKILL);
            int status = 0;
            while (::waitpid(w.pid, &status, 0) < 0 && errno == EINTR) {
            }
        }
        w = worker{};
    }
}

}  // namespace

void run_ordered(std::size_t blocks, std::size_t jobs, const std::function<void(std::size_t, std::string&)>& produce,
                 const std::function<bool(std::size_t, const std::string&)>& consume) {
    if (jobs <= 1 || blocks <= 1) {
        for (std::size_t b = 0; b < blocks; ++b) {
            std::string out;
            try {
                produce(b, out);
            } catch (const std::exception& e) {
                throw worker_failure(e.what());
            }
            if (!consume(b, out)) return;
        }
        return;
    }
    if (jobs > blocks) jobs = blocks;
    // This process is worker 0 and writes the output between its own blocks; the others are
    // forked.  A pipe holds a few blocks, so that a worker need not wait while this one computes.
    std::vector<worker> workers(jobs);
    for (std::size_t w = 1; w < jobs; ++w) {
        int fds[2];
        if (::pipe(fds) != 0) {
            end_all(workers, true);
            throw worker_failure(std::string("cannot create a pipe for a worker: ") + std::strerror(errno));
        }
        ::fcntl(fds[1], F_SETPIPE_SZ, 1 << 20);  // best effort: the system's limit may be lower
        const pid_t pid = ::fork();
        if (pid == 0) {
            ::close(fds[0]);
            for (std::size_t v = 1; v < w; ++v) ::close(workers[v].fd);
            work(w, blocks, jobs, fds[1], produce);
        }
        ::close(fds[1]);
        if (pid < 0) {
            ::close(fds[0]);
            end_all(workers, true);
            throw worker_failure(std::string("cannot start a worker process: ") + std::strerror(errno));
        }
        workers[w] = {pid, fds[0]};
    }
    for (std::size_t b = 0; b < blocks; ++b) {
        if (b % jobs == 0) {
            std::string own;
            try {
                produce(b, own);
            } catch (const std::exception& e) {
                end_all(workers, true);
                throw worker_failure(e.what());
            }
            if (!consume(b, own)) {
                end_all(workers, true);
                return;
            }
            continue;
        }
        worker& w = workers[b % jobs];
        char head[9];
        std::uint64_t n = 0;
        std::string payload;
        bool complete = read_all(w.fd, head, sizeof head);
        if (complete) {
            std::memcpy(&n, head + 1, sizeof n);
            payload.resize(n);
            complete = read_all(w.fd, payload.data(), n);
        }
        if (!complete || head[0] != data_frame) {
            end_all(workers, true);
            throw worker_failure(complete ? payload : "a worker process ended before finishing its rows");
        }
        if (!consume(b, payload)) {
            end_all(workers, true);
            return;
        }
    }
    end_all(workers, false);
}

}  // namespace couplet::cli
