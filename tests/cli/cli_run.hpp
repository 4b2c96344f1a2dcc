// SPDX-License-Identifier: MPL-2.0
// Running the built `isentra` binary from a test: arguments, standard input,
// standard output split into lines, standard error and the exit code.
#pragma once

#include <gtest/gtest.h>

#include <sys/wait.h>
#include <unistd.h>

#include <cstdio>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace isentra::clitest {

struct Outcome {
    int status = -1;               // exit code
    std::string out, err;          // standard output and standard error
    std::vector<std::string> lines;  // standard output split at '\n' (the last '\n' ends the last line)
};

inline std::string quote(const std::string& s) {
    std::string q = "'";
    for (char c : s) {
        if (c == '\'') q += "'\\''";
        else q += c;
    }
    return q + "'";
}

inline std::string read_file(const std::string& path) {
    std::ifstream f(path, std::ios::binary);
    std::ostringstream ss;
    ss << f.rdbuf();
    return ss.str();
}

// Runs isentra with the arguments, the text on standard input.
inline Outcome run(const std::vector<std::string>& args, const std::string& input = "") {
    char in_name[] = "/tmp/isentra_cli_in_XXXXXX";
    char err_name[] = "/tmp/isentra_cli_err_XXXXXX";
    const int in_fd = mkstemp(in_name);
    const int err_fd = mkstemp(err_name);
    Outcome r;
    if (in_fd < 0 || err_fd < 0) {
        ADD_FAILURE() << "mkstemp failed";
        return r;
    }
    if (!input.empty() && write(in_fd, input.data(), input.size()) != static_cast<ssize_t>(input.size()))
        ADD_FAILURE() << "write failed";
    close(in_fd);
    close(err_fd);
    std::string cmd = quote(ISENTRA_CLI_PATH);
    for (const std::string& a : args) cmd += " " + quote(a);
    cmd += " <" + quote(in_name) + " 2>" + quote(err_name);
    FILE* p = popen(cmd.c_str(), "r");
    if (!p) {
        ADD_FAILURE() << "popen failed: " << cmd;
        return r;
    }
    char buf[4096];
    std::size_t n;
    while ((n = std::fread(buf, 1, sizeof buf, p)) > 0) r.out.append(buf, n);
    const int st = pclose(p);
    r.status = WIFEXITED(st) ? WEXITSTATUS(st) : -1;
    r.err = read_file(err_name);
    std::remove(in_name);
    std::remove(err_name);
    std::string line;
    for (char c : r.out) {
        if (c == '\n') {
            r.lines.push_back(line);
            line.clear();
        } else {
            line += c;
        }
    }
    EXPECT_TRUE(line.empty()) << "output does not end with a newline: " << r.out;
    return r;
}

}  // namespace isentra::clitest
