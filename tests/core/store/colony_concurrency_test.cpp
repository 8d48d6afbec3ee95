// SPDX-License-Identifier: GPL-3.0-or-later
// Two at once (issue 9): readers never wait for a writer (WAL); a second
// writer waits (busy timeout) and then gets a clear message; two writer
// processes on one file never corrupt it.
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "generated_import.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <array>
#include <chrono>
#include <fstream>
#include <sys/wait.h>
#include <unistd.h>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

using Clock = std::chrono::steady_clock;

double secondsSince(Clock::time_point t0) { return std::chrono::duration<double>(Clock::now() - t0).count(); }

Encounter encounter(int i)
{
    Encounter e;
    e.date = *parseDate("2012-01-01") + i % 1000;
    e.winner = "A" + std::to_string(i % 7);
    e.loser = "A" + std::to_string(i % 7 + 1);
    e.group = "main";
    return e;
}

std::int64_t scalar(sqlite3* db, const char* sql)
{
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(db, sql, -1, &q, nullptr);
    const std::int64_t v = sqlite3_step(q) == SQLITE_ROW ? sqlite3_column_int64(q, 0) : -1;
    sqlite3_finalize(q);
    return v;
}

} // namespace

TEST(ColonyConcurrency, ReadersNeverWaitAndASecondWriterGetsAClearBusyMessage)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::writeGeneratedAnimals(dir.file("animals.csv"), 10);
    {
        ColonyStore store = ColonyStore::create(path);
        ASSERT_TRUE(importFiles(store, {dir.file("animals.csv"), "", ""}, today()).ok());
        store.append({}, {}, {encounter(1)});
    }
    ColonyStore first = ColonyStore::open(path);
    first.exec("BEGIN IMMEDIATE");
    first.exec("DELETE FROM encounter"); // uncommitted

    // A reader sees the last committed state at once.
    const auto t0 = Clock::now();
    const ColonyStore reader = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(reader.encounterCount(), 1);
    EXPECT_LT(secondsSince(t0), 1.0);

    // A second writer waits for its busy timeout, then is told what happened.
    ColonyStore second = ColonyStore::open(path);
    second.setBusyTimeout(300);
    const auto t1 = Clock::now();
    try {
        second.append({}, {}, {encounter(2)});
        FAIL() << "the second writer wrote while the first held the file";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Busy);
        EXPECT_NE(std::string(e.what()).find("being written by another program"), std::string::npos) << e.what();
    }
    EXPECT_GE(secondsSince(t1), 0.29);
    first.exec("ROLLBACK");
    // Once the first writer is done, the second one goes through.
    second.append({}, {}, {encounter(3)});
    EXPECT_EQ(reader.encounterCount(), 2);
}

TEST(ColonyConcurrency, TwoWriterProcessesImportingAtOnceKeepTheFileWhole)
{
    TempDir dir;
    const int animals = 50;
    const long rows = 20000; // above the bulk threshold: the import path of big files
    hierloom::test::writeGeneratedAnimals(dir.file("animals.csv"), animals);
    hierloom::test::writeGeneratedEncounters(dir.file("encounters.csv"), rows, animals, 11);
    const std::string path = dir.file("shared.hierloom");
    {
        ColonyStore store = ColonyStore::create(path);
        ASSERT_TRUE(importFiles(store, {dir.file("animals.csv"), "", ""}, today()).ok());
    }
    // Each child writes `successes busy-refusals other-failures` to a file.
    auto child = [&](bool bulk) -> pid_t {
        const pid_t pid = ::fork();
        if (pid != 0) return pid;
        int ok = 0, busy = 0, other = 0;
        for (int round = 0; round < (bulk ? 3 : 20); ++round) {
            try {
                ColonyStore store = ColonyStore::open(path);
                if (bulk) {
                    if (importFiles(store, {"", "", dir.file("encounters.csv")}, today()).ok()) ++ok;
                    else ++other;
                } else {
                    std::vector<Encounter> few;
                    for (int i = 0; i < 50; ++i) few.push_back(encounter(round * 50 + i));
                    store.append({}, {}, std::move(few));
                    ++ok;
                }
            } catch (const ColonyFileError& e) {
                if (e.kind() == ColonyFileError::Kind::Busy &&
                    std::string(e.what()).find("another program") != std::string::npos)
                    ++busy;
                else
                    ++other;
            }
        }
        std::ofstream(dir.file(bulk ? "importer.txt" : "appender.txt")) << ok << ' ' << busy << ' ' << other << '\n';
        ::_exit(0);
    };
    auto outcome = [&](const char* name) {
        std::array<int, 3> r{-1, -1, -1};
        std::ifstream(dir.file(name)) >> r[0] >> r[1] >> r[2];
        return r;
    };
    const pid_t importer = child(true);
    const pid_t appender = child(false);
    // Meanwhile the parent reads: never blocked, and never a partial import.
    int reads = 0;
    double slowest = 0;
    int status = 0;
    while (::waitpid(importer, &status, WNOHANG) == 0) {
        const auto t0 = Clock::now();
        sqlite3* db = nullptr;
        sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr);
        sqlite3_busy_timeout(db, 5000);
        const std::int64_t bulkRows = scalar(db, "SELECT count(*) FROM encounter WHERE observer <> ''");
        sqlite3_close(db);
        slowest = std::max(slowest, secondsSince(t0));
        EXPECT_EQ(bulkRows % rows, 0) << "a reader saw part of an import";
        ++reads;
    }
    ::waitpid(appender, &status, 0);
    const auto imp = outcome("importer.txt");
    const auto app = outcome("appender.txt");
    EXPECT_EQ(imp[0] + imp[1], 3) << "each import either went through or was refused as busy";
    EXPECT_EQ(app[0] + app[1], 20);
    EXPECT_EQ(imp[2], 0) << "the importer failed other than by a busy file";
    EXPECT_EQ(app[2], 0) << "the appender failed other than by a busy file";
    const int importsDone = imp[0];
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(db, "PRAGMA integrity_check", -1, &q, nullptr);
    ASSERT_EQ(sqlite3_step(q), SQLITE_ROW);
    EXPECT_STREQ(reinterpret_cast<const char*>(sqlite3_column_text(q, 0)), "ok");
    sqlite3_finalize(q);
    // Every import whole; seq numbers 1..n without gaps or repeats.
    EXPECT_EQ(scalar(db, "SELECT count(*) FROM encounter WHERE observer <> ''"), rows * importsDone);
    const std::int64_t total = scalar(db, "SELECT count(*) FROM encounter");
    EXPECT_EQ(total - rows * importsDone, 50 * app[0]);
    EXPECT_EQ(scalar(db, "SELECT max(seq) FROM encounter"), total);
    EXPECT_EQ(scalar(db, "SELECT count(DISTINCT uid) FROM encounter"), total);
    sqlite3_close(db);
    std::printf("[ two-writ ] importer: %d imports, %d busy; appender: %d appends, %d busy; %d reads, slowest %.3f s\n",
                imp[0], imp[1], app[0], app[1], reads, slowest);
    EXPECT_LT(slowest, 2.0) << "a reader waited for a writer";
}

TEST(ColonyConcurrency, DataVersionChangesOnlyForAnotherConnectionsCommit)
{
    // SQLite's documentation of PRAGMA data_version: the value differs between
    // two calls on one connection when another connection committed a change
    // in between; this connection's own changes leave it as it was. The
    // desktop relies on both halves (ui/document/colony_document.h).
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::writeGeneratedAnimals(dir.file("animals.csv"), 10);
    {
        ColonyStore store = ColonyStore::create(path);
        ASSERT_TRUE(importFiles(store, {dir.file("animals.csv"), "", ""}, today()).ok());
    }
    ColonyStore mine = ColonyStore::open(path);
    const std::int64_t start = mine.dataVersion();
    mine.append({}, {}, {encounter(1)});
    EXPECT_EQ(mine.dataVersion(), start) << "its own write counted as another's";
    {
        // Another program that only reads (and opens for writing without writing) changes nothing.
        const ColonyStore reader = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        EXPECT_EQ(reader.encounterCount(), 1);
        const ColonyStore idle = ColonyStore::open(path);
        EXPECT_EQ(idle.encounterCount(), 1);
    }
    EXPECT_EQ(mine.dataVersion(), start);
    {
        ColonyStore other = ColonyStore::open(path);
        other.append({}, {}, {encounter(2)});
    }
    const std::int64_t after = mine.dataVersion();
    EXPECT_NE(after, start);
    EXPECT_EQ(mine.dataVersion(), after); // asked again with nothing new: the same
}
