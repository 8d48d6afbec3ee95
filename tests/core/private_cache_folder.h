// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
// Every test process gets a checked-files cache of its own (core/store/check_cache.h):
// tests never read or write the person's ~/.cache, nor each other's entries
// when CTest runs them in parallel. Command-line programs the tests start
// inherit it through the environment.
#include <gtest/gtest.h>

#include <cstdlib>
#include <filesystem>
#include <string>
#include <unistd.h>

namespace hierloom::test {

class PrivateCacheFolder : public ::testing::Environment {
public:
    void SetUp() override
    {
        folder_ = std::filesystem::temp_directory_path() /
                  ("hierloom-test-cache-" + std::to_string(::getpid()));
        std::filesystem::remove_all(folder_);
        std::filesystem::create_directories(folder_);
        ::setenv("HIERLOOM_CACHE_DIR", folder_.c_str(), 1);
        ::unsetenv("HIERLOOM_CHECK_EVERY_OPEN");
    }
    void TearDown() override
    {
        std::error_code ec;
        std::filesystem::remove_all(folder_, ec);
    }

private:
    std::filesystem::path folder_;
};

} // namespace hierloom::test
