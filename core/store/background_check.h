// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <exception>
#include <string>
#include <thread>

namespace hierloom::core {

/// The whole-file check of a read-only open (requireIntactOnce) run on a
/// thread and connection of its own, so that a command can read and compute
/// meanwhile (ColonyStore::openCheckedElsewhere). Nothing read from the file
/// may be shown or written before wait() has returned.
class BackgroundCheck {
public:
    /// Starts opening `path` read-only on a thread of its own: the quick check,
    /// a pass recorded in the checked-files cache (check_cache.h).
    explicit BackgroundCheck(std::string path);
    /// Waits for the thread.
    ~BackgroundCheck();
    BackgroundCheck(const BackgroundCheck&) = delete;
    BackgroundCheck& operator=(const BackgroundCheck&) = delete;

    const std::string& path() const { return path_; }

    /// Waits for the check; throws what the open threw: ColonyFileError,
    /// Damaged for a damaged file, with the message of a check before reading.
    void wait();

private:
    std::string path_;
    std::exception_ptr failure_;
    std::thread thread_;
};

} // namespace hierloom::core
