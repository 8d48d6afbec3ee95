// SPDX-License-Identifier: GPL-3.0-or-later
// For the migration kill tests: a child process opens a colony file for
// writing (which migrates an older file) and is killed with SIGKILL at a
// seeded random moment within `seconds`, the time one whole open took.
#pragma once

#include "core/store/colony_store.h"

#include <chrono>
#include <csignal>
#include <random>
#include <string>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

namespace hierloom::test {

inline void openAndKillAtRandomMoment(const std::string& path, double seconds, std::mt19937& rng)
{
    const pid_t pid = ::fork();
    if (pid == 0) {
        try {
            core::ColonyStore::open(path);
        } catch (...) {
        }
        ::_exit(0);
    }
    std::this_thread::sleep_for(std::chrono::duration<double>(std::uniform_real_distribution<>(0.0, seconds)(rng)));
    ::kill(pid, SIGKILL);
    int status = 0;
    ::waitpid(pid, &status, 0);
}

} // namespace hierloom::test
