// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <chrono>
#include <string>
#include <vector>

namespace hierloom::core {

/// A name for a file being written that will be renamed to `finalPath` when
/// complete: `finalPath.partial-HOST-PID-RANDOM`, in the same folder (so the
/// rename is atomic) and unique per process and call (two programs writing at
/// once never share a partial file).
std::string partialPathFor(const std::string& finalPath);

/// How long a partial file may go unmodified before it counts as abandoned
/// even when its writer cannot be checked (another host, a reused pid).
constexpr std::chrono::minutes partialFileGrace{10};

/// Removes abandoned partial files in `folder` whose names start with
/// `namePrefix` and hold ".partial" (with any -wal, -shm or -journal of
/// theirs). A partial file is abandoned when its name says it was written on
/// this host by a process that no longer exists, or when it was last modified
/// more than `partialFileGrace` before `now`. Returns the paths removed.
std::vector<std::string> removeAbandonedPartials(const std::string& folder, const std::string& namePrefix,
                                                 std::chrono::system_clock::time_point now);

/// Renames a complete partial file to `finalPath` unless a file of that name
/// exists (then false, nothing renamed); throws std::system_error otherwise.
bool publishPartial(const std::string& partialPath, const std::string& finalPath);

/// Flushes a folder's entries (a rename) to disk; never throws.
void syncFolder(const std::string& folder) noexcept;

/// Removes a partial file and SQLite's files beside it; never throws.
void removePartial(const std::string& partialPath) noexcept;

} // namespace hierloom::core
