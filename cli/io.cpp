// SPDX-License-Identifier: MPL-2.0
#include "io.hpp"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <chrono>
#include <system_error>

namespace isentra::cli {

bool Reader::fill() {
    if (eof_) return false;
    // Keep the unconsumed tail at the front; grow when it fills the buffer
    // (one record longer than the buffer).
    if (start_ > 0) {
        std::memmove(buf_.data(), buf_.data() + start_, stop_ - start_);
        stop_ -= start_;
        start_ = 0;
    }
    if (stop_ == buf_.size()) buf_.resize(buf_.size() * 2);
    for (;;) {
        if (before_wait) before_wait(before_wait_arg);
        const ssize_t n = ::read(fd_, buf_.data() + stop_, buf_.size() - stop_);
        if (n > 0) {
            stop_ += static_cast<std::size_t>(n);
            total_ += static_cast<unsigned long long>(n);
            return true;
        }
        if (n == 0) {
            eof_ = true;
            return false;
        }
        if (errno == EINTR) continue;
        error_ = errno;
        eof_ = true;
        return false;
    }
}

void Writer::flush() {
    std::size_t done = 0;
    while (done < buf_.size() && error_ == 0) {
        const ssize_t n = ::write(fd_, buf_.data() + done, buf_.size() - done);
        if (n > 0) done += static_cast<std::size_t>(n);
        else if (n < 0 && errno == EINTR) continue;
        else error_ = n < 0 ? errno : EIO;
    }
    buf_.clear();
}

bool parse_number(std::string_view field, char decimal, double& out) {
    const char* p = field.data();
    const char* e = p + field.size();
    while (p < e && (*p == ' ' || *p == '\t')) ++p;
    while (e > p && (e[-1] == ' ' || e[-1] == '\t')) --e;
    if (p == e) return false;
    bool negative = false;
    if (*p == '+' || *p == '-') {
        negative = *p == '-';
        ++p;
        if (p == e || *p == '+' || *p == '-') return false;
    }
    if (decimal != '.') {
        // Copy with the decimal mark replaced ('.' is refused).
        char buf[80];
        const std::size_t n = static_cast<std::size_t>(e - p);
        if (n >= sizeof buf) return false;
        for (std::size_t k = 0; k < n; ++k) {
            const char c = p[k];
            if (c == '.') return false;
            buf[k] = c == decimal ? '.' : c;
        }
        const auto r = std::from_chars(buf, buf + n, out, std::chars_format::general);
        if (r.ec != std::errc() || r.ptr != buf + n) return false;
    } else {
        const auto r = std::from_chars(p, e, out, std::chars_format::general);
        if (r.ec != std::errc() || r.ptr != e) return false;
    }
    if (negative) out = -out;
    return true;
}

char* format_shortest(double v, char decimal, char* buf) {
    char* end = std::to_chars(buf, buf + 32, v).ptr;
    if (decimal != '.')
        for (char* q = buf; q < end; ++q)
            if (*q == '.') *q = decimal;
    return end;
}

int create_new_file(const std::string& path) {
    return ::open(path.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0666);
}

bool stderr_is_terminal() { return ::isatty(2) == 1; }

double now_seconds() {
    using namespace std::chrono;
    return duration<double>(steady_clock::now().time_since_epoch()).count();
}

}  // namespace isentra::cli
