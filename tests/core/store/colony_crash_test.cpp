// SPDX-License-Identifier: GPL-3.0-or-later
// Crash safety (issue 9): a child process runs the real import (importFiles:
// read, check every row, one transaction) and is killed with SIGKILL at
// seeded random moments; after each kill the file must pass
// `PRAGMA integrity_check` and hold either none or all of the import. The
// file is trusted by the checked-files cache as each import begins; a kill
// while the import writes its transaction leaves it untrusted, and a file
// left trusted passes the check.
#include "core/store/check_cache.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/base/csv_reader.h"
#include "generated_import.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <algorithm>
#include <chrono>
#include <csignal>
#include <cstdio>
#include <random>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

#if defined(__SANITIZE_ADDRESS__)
constexpr long crashRows = 50000; // a Debug sanitizer build runs the import ~10x slower
#else
constexpr long crashRows = 1000000; // the size issue 9 names
#endif
constexpr int crashAnimals = 200;

using Clock = std::chrono::steady_clock;

/// Forks a child that imports `encounters` into `colony` (or only plans it) and exits.
pid_t startImport(const std::string& colony, const std::string& encounters, bool planOnly)
{
    const pid_t pid = ::fork();
    if (pid != 0) return pid;
    int status = 0;
    try {
        ColonyStore store = ColonyStore::open(colony);
        if (planOnly) {
            ImportInput in;
            in.encounters = ImportSource{encounters, readWholeFile(encounters)};
            status = planImport(store.loadAnimals(), store.loadResidences(), in, today()).ok() ? 0 : 3;
        } else {
            status = importFiles(store, {"", "", encounters}, today()).ok() ? 0 : 3;
        }
    } catch (...) {
        status = 4;
    }
    ::_exit(status);
}

double runToEnd(const std::string& colony, const std::string& encounters, bool planOnly)
{
    const auto t0 = Clock::now();
    const pid_t pid = startImport(colony, encounters, planOnly);
    int status = 0;
    ::waitpid(pid, &status, 0);
    EXPECT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0) << "status " << status;
    return std::chrono::duration<double>(Clock::now() - t0).count();
}

struct FileState {
    std::string integrity;
    std::int64_t encounters = -1;
};

FileState inspect(const std::string& path)
{
    FileState s;
    sqlite3* db = nullptr;
    // A read-write connection, as the next program to open the file would use: it
    // recovers from the -wal file the killed process left behind.
    if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE, nullptr) == SQLITE_OK) {
        sqlite3_stmt* q = nullptr;
        if (sqlite3_prepare_v2(db, "PRAGMA integrity_check", -1, &q, nullptr) == SQLITE_OK && sqlite3_step(q) == SQLITE_ROW)
            s.integrity = reinterpret_cast<const char*>(sqlite3_column_text(q, 0));
        sqlite3_finalize(q);
        if (sqlite3_prepare_v2(db, "SELECT count(*) FROM encounter", -1, &q, nullptr) == SQLITE_OK &&
            sqlite3_step(q) == SQLITE_ROW)
            s.encounters = sqlite3_column_int64(q, 0);
        sqlite3_finalize(q);
    }
    sqlite3_close(db);
    return s;
}

std::int64_t fileSize(const std::string& path)
{
    std::error_code ec;
    const auto n = std::filesystem::file_size(path, ec);
    return ec ? 0 : static_cast<std::int64_t>(n);
}

std::int64_t nowSeconds()
{
    return std::chrono::duration_cast<std::chrono::seconds>(std::chrono::system_clock::now().time_since_epoch())
        .count();
}

/// A copy of the sound file `from`, recorded in the checked-files cache as checked.
void freshCopy(const std::string& from, const std::string& to)
{
    for (const char* suffix : {"", "-wal", "-shm"}) std::filesystem::remove(to + suffix);
    std::filesystem::copy_file(from, to);
    CheckCache::fromEnvironment().record(to, *colonyFileState(to), nowSeconds());
}

/// Whether the checked-files cache vouches for the file as the import left it (before any recovery).
bool trusted(const std::string& path)
{
    const auto s = colonyFileState(path);
    return s && CheckCache::fromEnvironment().vouchesFor(path, *s, nowSeconds());
}

} // namespace

TEST(ColonyCrash, KilledImportLeavesTheWholeImportOrNoneOfIt)
{
    TempDir dir;
    const std::string animals = dir.file("animals.csv");
    const std::string encounters = dir.file("encounters.csv");
    hierloom::test::writeGeneratedAnimals(animals, crashAnimals);
    hierloom::test::writeGeneratedEncounters(encounters, crashRows, crashAnimals, 2024);
    const std::string base = dir.file("base.hierloom");
    {
        ColonyStore store = ColonyStore::create(base);
        ASSERT_TRUE(importFiles(store, {animals, "", ""}, today()).ok());
    }
    const std::string colony = dir.file("run.hierloom");

    // Calibration: how long reading and checking take, the whole import, and
    // how far the -wal file (the commit) and the file itself (the checkpoint) grow.
    freshCopy(base, colony);
    const double planSeconds = runToEnd(colony, encounters, true);
    freshCopy(base, colony);
    const auto baseSize = static_cast<std::int64_t>(std::filesystem::file_size(base));
    std::int64_t walPeak = 0;
    const auto t0 = Clock::now();
    {
        const pid_t pid = startImport(colony, encounters, false);
        int status = 0;
        while (::waitpid(pid, &status, WNOHANG) == 0) {
            walPeak = std::max(walPeak, fileSize(colony + "-wal"));
            std::this_thread::sleep_for(std::chrono::microseconds(200));
        }
    }
    const double fullSeconds = std::chrono::duration<double>(Clock::now() - t0).count();
    const std::int64_t finalSize = fileSize(colony);
    EXPECT_TRUE(trusted(colony)); // a whole import keeps the pass it began with
    ASSERT_EQ(inspect(colony).encounters, crashRows);
    ASSERT_GT(walPeak, 0);

    // Three kinds of kill point, in turn, all seeded so a failure can be replayed:
    // at a random time between the end of the checks and just past the end;
    // once the -wal file has reached a random part of its final size (mid-commit);
    // once the file has grown a random part of the way (mid-checkpoint).
    std::mt19937_64 rng(20240917);
    std::uniform_real_distribution<double> when(0.9 * planSeconds, 1.05 * fullSeconds);
    std::uniform_real_distribution<double> part(0.02, 0.98);
    const int killPoints = 12;
    int none = 0, whole = 0, walLeft = 0, stillTrusted = 0;
    for (int k = 0; k < killPoints; ++k) {
        freshCopy(base, colony);
        const int kind = k % 3;
        const double delay = when(rng);
        const double fraction = part(rng);
        const pid_t pid = startImport(colony, encounters, false);
        const auto start = Clock::now();
        auto reached = [&] {
            if (kind == 0) return std::chrono::duration<double>(Clock::now() - start).count() >= delay;
            if (kind == 1) return fileSize(colony + "-wal") >= static_cast<std::int64_t>(fraction * walPeak);
            return fileSize(colony) >= baseSize + static_cast<std::int64_t>(fraction * (finalSize - baseSize));
        };
        int status = 0;
        bool exited = false;
        while (!reached()) {
            if (::waitpid(pid, &status, WNOHANG) == pid) {
                exited = true;
                break;
            }
            std::this_thread::sleep_for(std::chrono::microseconds(100));
        }
        if (!exited) {
            ::kill(pid, SIGKILL);
            ::waitpid(pid, &status, 0);
        }
        if (fileSize(colony + "-wal") > 0) ++walLeft;
        const bool vouched = trusted(colony);
        // Killed while writing its transaction: the file is not as any pass saw it.
        if (!exited && kind == 1) {
            EXPECT_FALSE(vouched) << "kill point " << k;
        }
        stillTrusted += vouched;
        const FileState s = inspect(colony);
        if (vouched) {
            EXPECT_EQ(s.integrity, "ok") << "a file left trusted fails the check, kill point " << k;
        }
        EXPECT_EQ(s.integrity, "ok") << "kill point " << k << " (kind " << kind << ")";
        EXPECT_TRUE(s.encounters == 0 || s.encounters == crashRows)
            << "kill point " << k << " (kind " << kind << ") left " << s.encounters << " encounters";
        (s.encounters == 0 ? none : whole) += 1;
        // The file still opens as a colony file and loads.
        EXPECT_NO_THROW(ColonyStore::open(colony).loadAnimals());
    }
    std::printf("[ crash    ] %ld rows, plan %.2f s, import %.2f s, -wal peak %lld bytes; %d kill points: %d left "
                "no import, %d the whole import, %d left a -wal file to recover, %d still trusted\n",
                crashRows, planSeconds, fullSeconds, static_cast<long long>(walPeak), killPoints, none, whole, walLeft,
                stillTrusted);
    RecordProperty("kill_points", killPoints);
    EXPECT_EQ(none + whole, killPoints);
}
