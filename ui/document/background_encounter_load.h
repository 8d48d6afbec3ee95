// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/encounter_records.h"

#include <atomic>
#include <cstdint>
#include <functional>
#include <memory>
#include <string>
#include <thread>
#include <vector>

namespace hierloom::ui {

/// Reads every encounter of a colony file on a thread of its own, through a
/// read-only connection of its own, in parts along the primary key (seq), so
/// a large file opens with one group shown while the rest arrives with
/// progress. The callbacks run on that thread; the owner passes them on to
/// its own. Destroying the load cancels it and waits for the thread (a query
/// in progress is interrupted within a few thousand SQLite steps).
class BackgroundEncounterLoad {
public:
    using Encounters = std::shared_ptr<core::EncounterRecords>;
    /// After each part: parts read so far, of `total` (partsFor(expected)).
    using Progress = std::function<void(int done, int total)>;
    /// Once, unless cancelled: every encounter in seq order, or an error message (encounters null).
    using Done = std::function<void(Encounters encounters, const std::string& error)>;

    /// How many parts a file of `encounters` is read in (about 50,000 rows each, 1 to 100).
    static int partsFor(std::int64_t encounters);

    /// `expected`: the file's encounter count when the load began; a negative
    /// `expected` only opens the file (the read-only open runs `PRAGMA
    /// quick_check`) and calls `done` with no encounters and no error. When
    /// the count read differs from the file's at the end (another program
    /// wrote meanwhile), the file is read whole once more.
    BackgroundEncounterLoad(std::string path, std::int64_t expected, Progress progress, Done done);
    ~BackgroundEncounterLoad();
    BackgroundEncounterLoad(const BackgroundEncounterLoad&) = delete;
    BackgroundEncounterLoad& operator=(const BackgroundEncounterLoad&) = delete;

    /// Asks the thread to stop and waits for it; no callback runs afterwards.
    void cancel();

private:
    void run(std::string path, std::int64_t expected, Progress progress, Done done);

    std::atomic<bool> cancelled_{false};
    std::thread thread_;
};

} // namespace hierloom::ui
