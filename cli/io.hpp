// SPDX-License-Identifier: MPL-2.0
// Input, output and number text for the `isentra` command: a block reader
// and a buffered writer on file descriptors (no stdio locking per line, no
// locale), std::from_chars / std::to_chars numbers with a choice of decimal
// mark, and opening an output file without ever writing over a file.
#pragma once

#include <charconv>
#include <cstddef>
#include <cstring>
#include <string>
#include <string_view>
#include <vector>

namespace isentra::cli {

// Reads a file descriptor in large blocks into one growing buffer; the
// caller consumes from the front and asks for more when a record is cut off.
class Reader {
public:
    explicit Reader(int fd) : fd_(fd) {}
    // Appends the next block (keeping the unconsumed data). False at the end
    // of the input or on a read error (error() tells which).
    bool fill();
    const char* begin() const { return buf_.data() + start_; }
    const char* end() const { return buf_.data() + stop_; }
    void consume_to(const char* p) { start_ = static_cast<std::size_t>(p - buf_.data()); }
    bool eof() const { return eof_; }
    int error() const { return error_; }  // errno of a failed read, or 0
    unsigned long long bytes_read() const { return total_; }
    // Called before a read that may wait for more input (a co-process must
    // see every answer to the lines it sent before we wait).
    void (*before_wait)(void*) = nullptr;
    void* before_wait_arg = nullptr;

private:
    int fd_;
    std::vector<char> buf_ = std::vector<char>(1 << 20);
    std::size_t start_ = 0, stop_ = 0;
    bool eof_ = false;
    int error_ = 0;
    unsigned long long total_ = 0;
};

// Buffered writer on a file descriptor. Write errors are remembered (the
// first errno) and reported by the caller at the end.
class Writer {
public:
    explicit Writer(int fd) : fd_(fd) { buf_.reserve(1 << 20); }
    ~Writer() { flush(); }
    void put(char c) {
        buf_.push_back(c);
        if (buf_.size() >= (1 << 20)) flush();
    }
    void put(std::string_view s) {
        buf_.append(s.data(), s.size());
        if (buf_.size() >= (1 << 20)) flush();
    }
    void flush();
    int error() const { return error_; }

private:
    int fd_;
    std::string buf_;
    int error_ = 0;
};

// A number read from a field: optional surrounding spaces, an optional sign,
// digits with the given decimal mark, an optional exponent; also "inf" and
// "nan" (which the functions then reject as not finite). Locale-independent.
// With decimal ',' a '.' is never accepted (it could be a thousands mark).
// Returns false if the whole field is not one number.
bool parse_number(std::string_view field, char decimal, double& out);

// The shortest text that reads back as exactly v (std::to_chars), with the
// given decimal mark. Returns the end of the text in buf (at least 32 chars).
char* format_shortest(double v, char decimal, char* buf);

// Creates `path` for writing; fails (errno EEXIST) if it exists, so no
// existing file, and in particular never the input, is written over.
// Returns the descriptor or -1.
int create_new_file(const std::string& path);

// True if standard error is a terminal (progress lines go there only then).
bool stderr_is_terminal();

// Seconds on a monotonic clock.
double now_seconds();

}  // namespace isentra::cli
