// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/command_line.h"

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <unistd.h>
#include <vector>

namespace hierloom::test {

/// What one run of hierloom-cli gave.
struct CliResult {
    int status = -1;
    std::string out;
    std::string err;
};

/// Runs the command line in-process, as a shell would pass the words.
inline CliResult runCli(const std::vector<std::string>& words)
{
    std::vector<const char*> argv{"hierloom-cli"};
    for (const auto& w : words) argv.push_back(w.c_str());
    std::ostringstream out, err;
    CliResult r;
    r.status = hierloom::cli::run(static_cast<int>(argv.size()), argv.data(), out, err);
    r.out = out.str();
    r.err = err.str();
    return r;
}

/// A scratch folder for one test, removed afterwards.
class CliTempDir {
public:
    CliTempDir()
    {
        static int counter = 0;
        path_ = std::filesystem::temp_directory_path() /
                ("hierloom-cli-test-" + std::to_string(::getpid()) + "-" + std::to_string(counter++));
        std::filesystem::remove_all(path_);
        std::filesystem::create_directories(path_);
    }
    ~CliTempDir() { std::filesystem::remove_all(path_); }
    std::string file(const std::string& name) const { return (path_ / name).string(); }
    std::string write(const std::string& name, const std::string& text) const
    {
        std::ofstream(file(name), std::ios::binary) << text;
        return file(name);
    }
    static std::string read(const std::string& path)
    {
        std::ifstream in(path, std::ios::binary);
        std::ostringstream s;
        s << in.rdbuf();
        return s.str();
    }

private:
    std::filesystem::path path_;
};

/// Splits CSV output into lines (no quoted newlines in the program's output).
inline std::vector<std::string> lines(const std::string& text)
{
    std::vector<std::string> out;
    std::istringstream in(text);
    for (std::string line; std::getline(in, line);) out.push_back(line);
    return out;
}

} // namespace hierloom::test
