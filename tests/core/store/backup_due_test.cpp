// SPDX-License-Identifier: GPL-3.0-or-later
// The crash test and the two-writer test again, with a scheduled backup due
// whenever a write starts (issue 16): a backup interval far shorter than the
// time between writes, so every import or merge first takes its backup, as
// the command line and the desktop do (backupIfDue, then the write).
#include "core/store/colony_backup.h"
#include "core/store/colony_import.h"
#include "core/store/colony_merge.h"
#include "core/store/colony_store.h"
#include "generated_import.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <array>
#include <chrono>
#include <csignal>
#include <filesystem>
#include <fstream>
#include <random>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

using namespace hierloom::core;
using hierloom::test::TempDir;
namespace fs = std::filesystem;

namespace {

using Clock = std::chrono::steady_clock;

std::int64_t scalar(const std::string& path, const char* sql, std::string* text = nullptr)
{
    sqlite3* db = nullptr;
    std::int64_t v = -1;
    // Read-write, as the next program would open it: recovers a -wal left by a killed writer.
    if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE, nullptr) == SQLITE_OK) {
        sqlite3_stmt* q = nullptr;
        if (sqlite3_prepare_v2(db, sql, -1, &q, nullptr) == SQLITE_OK && sqlite3_step(q) == SQLITE_ROW) {
            v = sqlite3_column_int64(q, 0);
            if (text && sqlite3_column_text(q, 0)) *text = reinterpret_cast<const char*>(sqlite3_column_text(q, 0));
        }
        sqlite3_finalize(q);
    }
    sqlite3_close(db);
    return v;
}

std::string integrity(const std::string& path)
{
    std::string text;
    scalar(path, "PRAGMA integrity_check", &text);
    return text;
}

std::vector<std::string> partialsIn(const std::string& folder)
{
    std::vector<std::string> out;
    std::error_code ec;
    for (const auto& e : fs::directory_iterator(folder, ec))
        if (e.path().filename().string().find(".partial") != std::string::npos) out.push_back(e.path().string());
    return out;
}

/// A backup is due at every write: one every 0.36 ms.
void makeBackupsDueAlways(const std::string& path)
{
    ColonyStore store = ColonyStore::open(path);
    store.setSetting("backup_interval_hours", "0.0000001");
    store.setSetting("backup_keep", "1000");
}

} // namespace

// Two processes write at once, each taking the due backup first: both keep
// going (success or a clear "busy"), never a disk I/O error from a shared
// partial file; the colony and every backup pass the integrity check.
TEST(BackupDue, TwoWritersWithABackupDueKeepTheFileAndTheBackupsWhole)
{
    TempDir dir;
    const int animals = 50;
    const long rows = 12000; // above the bulk threshold
    hierloom::test::writeGeneratedAnimals(dir.file("animals.csv"), animals);
    hierloom::test::writeGeneratedEncounters(dir.file("encounters.csv"), rows, animals, 7);
    hierloom::test::writeGeneratedEncounters(dir.file("few.csv"), 40, animals, 8);
    const std::string path = dir.file("shared.hierloom");
    {
        ColonyStore store = ColonyStore::create(path);
        ASSERT_TRUE(importFiles(store, {dir.file("animals.csv"), "", ""}, today()).ok());
    }
    makeBackupsDueAlways(path);
    auto child = [&](int which) -> pid_t {
        const pid_t pid = ::fork();
        if (pid != 0) return pid;
        int ok = 0, busy = 0, other = 0, backups = 0;
        std::string failure;
        for (int round = 0; round < (which == 0 ? 3 : 12); ++round) {
            try {
                ColonyStore store = ColonyStore::open(path);
                if (backupIfDue(store, std::chrono::system_clock::now())) ++backups;
                const std::string file = dir.file(which == 0 ? "encounters.csv" : "few.csv");
                if (importFiles(store, {"", "", file}, today()).ok()) ++ok;
                else ++other;
            } catch (const ColonyFileError& e) {
                if (e.kind() == ColonyFileError::Kind::Busy) ++busy;
                else {
                    ++other;
                    failure = e.what();
                }
            } catch (const std::exception& e) {
                ++other;
                failure = e.what();
            }
        }
        std::ofstream(dir.file("writer" + std::to_string(which) + ".txt"))
            << ok << ' ' << busy << ' ' << other << ' ' << backups << '\n'
            << failure << '\n';
        ::_exit(0);
    };
    const pid_t a = child(0);
    const pid_t b = child(1);
    int status = 0;
    ::waitpid(a, &status, 0);
    ::waitpid(b, &status, 0);
    std::array<std::array<int, 4>, 2> r{};
    for (int which = 0; which < 2; ++which) {
        std::ifstream in(dir.file("writer" + std::to_string(which) + ".txt"));
        in >> r[which][0] >> r[which][1] >> r[which][2] >> r[which][3];
        std::string rest, failure;
        std::getline(in, rest);
        std::getline(in, failure);
        EXPECT_EQ(r[which][2], 0) << "writer " << which << " failed other than by a busy file: " << failure;
        EXPECT_EQ(r[which][0] + r[which][1], which == 0 ? 3 : 12);
        EXPECT_GT(r[which][3], 0) << "writer " << which << " never found a backup due";
    }
    EXPECT_EQ(integrity(path), "ok");
    // Every import whole.
    EXPECT_EQ(scalar(path, "SELECT count(*) FROM encounter"), rows * r[0][0] + 40 * r[1][0]);
    EXPECT_EQ(scalar(path, "SELECT count(DISTINCT uid) FROM encounter"), rows * r[0][0] + 40 * r[1][0]);
    // Every backup taken is there, whole, and no partial file is left.
    const auto backups = listBackups(path);
    EXPECT_EQ(static_cast<int>(backups.size()), r[0][3] + r[1][3]);
    for (const BackupFile& f : backups) EXPECT_EQ(integrity(f.path), "ok") << f.path;
    EXPECT_TRUE(partialsIn(backupFolder(path)).empty());
    std::printf("[ due-2wr  ] importer: %d imports, %d busy, %d backups; appender: %d imports, %d busy, %d backups\n",
                r[0][0], r[0][1], r[0][3], r[1][0], r[1][1], r[1][3]);
}

// Imports, merges and restores killed with SIGKILL at seeded random moments while a
// backup is due (so the kill also lands in the backup before the write, and
// in the merge's own backup): the colony passes the integrity check and holds
// all or none of the write, every finished backup is whole, and the next
// backup removes the partial file a killed one left.
TEST(BackupDue, KilledImportsMergesAndRestoresWithABackupDueLeaveEverythingWhole)
{
    TempDir dir;
    const int animals = 100;
    const long rows = 30000;
    hierloom::test::writeGeneratedAnimals(dir.file("animals.csv"), animals);
    hierloom::test::writeGeneratedEncounters(dir.file("encounters.csv"), rows, animals, 2026);
    const std::string base = dir.file("base.hierloom");
    {
        ColonyStore store = ColonyStore::create(base);
        ASSERT_TRUE(importFiles(store, {dir.file("animals.csv"), "", ""}, today()).ok());
    }
    makeBackupsDueAlways(base);
    // The other laptop for the merges: the base with the encounters imported.
    const std::string other = dir.file("other.hierloom");
    fs::copy_file(base, other);
    {
        ColonyStore store = ColonyStore::open(other);
        ASSERT_TRUE(importFiles(store, {"", "", dir.file("encounters.csv")}, today()).ok());
    }
    // A backup of the other laptop's file, for the restores.
    std::string otherBackup;
    {
        const ColonyStore store = ColonyStore::open(other, ColonyStore::Mode::ReadOnly);
        otherBackup = backupColony(store, std::chrono::system_clock::now(), 1000);
    }
    const std::string colony = dir.file("run.hierloom");
    auto fresh = [&] {
        for (const char* suffix : {"", "-wal", "-shm"}) fs::remove(colony + suffix);
        fs::remove_all(backupFolder(colony));
        fs::copy_file(base, colony);
    };
    // kind 0: scheduled backup then import; kind 1: scheduled backup then merge (which backs up again);
    // kind 2: a restore of the other laptop's backup (which backs up the replaced state first).
    auto start = [&](int kind) -> pid_t {
        const pid_t pid = ::fork();
        if (pid != 0) return pid;
        int status = 0;
        try {
            if (kind == 2) {
                restoreBackup(otherBackup, colony, std::chrono::system_clock::now());
                ::_exit(0);
            }
            ColonyStore store = ColonyStore::open(colony);
            backupIfDue(store, std::chrono::system_clock::now());
            if (kind == 0) {
                status = importFiles(store, {"", "", dir.file("encounters.csv")}, today()).ok() ? 0 : 3;
            } else {
                const ColonyStore from = ColonyStore::open(other, ColonyStore::Mode::ReadOnly);
                MergeOptions options;
                options.today = today();
                status = mergeColonies(store, from, options).written ? 0 : 3;
            }
        } catch (...) {
            status = 4;
        }
        ::_exit(status);
    };
    // Calibration: each whole run, which must succeed and take its backups.
    std::array<double, 3> full{};
    for (int kind = 0; kind < 3; ++kind) {
        fresh();
        const auto t0 = Clock::now();
        const pid_t pid = start(kind);
        int status = 0;
        ::waitpid(pid, &status, 0);
        full[static_cast<size_t>(kind)] = std::chrono::duration<double>(Clock::now() - t0).count();
        ASSERT_TRUE(WIFEXITED(status) && WEXITSTATUS(status) == 0) << "kind " << kind << " status " << status;
        ASSERT_EQ(scalar(colony, "SELECT count(*) FROM encounter"), rows);
        EXPECT_EQ(listBackups(colony).size(), kind == 1 ? 2U : 1U);
    }
    std::mt19937_64 rng(16);
    std::uniform_real_distribution<double> part(0.0, 1.05);
    const int killPoints = 24;
    int none = 0, whole = 0, partialsLeft = 0;
    for (int k = 0; k < killPoints; ++k) {
        fresh();
        const int kind = k % 3;
        const double delay = part(rng) * full[static_cast<size_t>(kind)];
        const auto t0 = Clock::now();
        const pid_t pid = start(kind);
        int status = 0;
        bool exited = false;
        while (std::chrono::duration<double>(Clock::now() - t0).count() < delay) {
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
        SCOPED_TRACE("kill point " + std::to_string(k) + " (kind " + std::to_string(kind) + ")");
        EXPECT_EQ(integrity(colony), "ok");
        const std::int64_t n = scalar(colony, "SELECT count(*) FROM encounter");
        EXPECT_TRUE(n == 0 || n == rows) << n << " encounters";
        (n == 0 ? none : whole) += 1;
        for (const BackupFile& f : listBackups(colony)) EXPECT_EQ(integrity(f.path), "ok") << f.path;
        partialsLeft += partialsIn(backupFolder(colony)).empty() ? 0 : 1;
        // The next program's backup clears what the killed one left, and the file still opens.
        {
            ColonyStore store = ColonyStore::open(colony);
            EXPECT_NO_THROW(backupColony(store, std::chrono::system_clock::now(), 1000));
        }
        EXPECT_TRUE(partialsIn(backupFolder(colony)).empty());
    }
    std::printf("[ due-kill ] import %.2f s, merge %.2f s, restore %.2f s; %d kill points: %d left none, %d the whole "
                "write, %d left a partial backup\n",
                full[0], full[1], full[2], killPoints, none, whole, partialsLeft);
    EXPECT_EQ(none + whole, killPoints);
}
