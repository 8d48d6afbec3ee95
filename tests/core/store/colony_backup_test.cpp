// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_backup.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/record_history.h"
#include "import_test_support.h"
#include "two_animal_colony.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <filesystem>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;
using Clock = std::chrono::system_clock;

namespace {

const Clock::time_point noon = hierloom::test::kNoon;

ColonyStore smallColony(const std::string& path)
{
    return hierloom::test::twoAnimalColony(path, 5);
}

} // namespace

TEST(ColonyBackup, ACopyNamedByTimeBesideTheFileWithARotation)
{
    TempDir dir;
    const std::string path = dir.file("field.hierloom");
    ColonyStore store = smallColony(path);
    EXPECT_EQ(backupFolder(path), dir.file("field.hierloom-backups"));
    const std::string first = backupColony(store, noon);
    EXPECT_EQ(first, dir.file("field.hierloom-backups/field-20240501-120000.hierloom"));
    EXPECT_EQ(probeColonyFile(first), currentSchemaVersion);
    EXPECT_EQ(ColonyStore::open(first, ColonyStore::Mode::ReadOnly).encounterCount(), 5);
    EXPECT_FALSE(std::filesystem::exists(first + "-wal")); // one self-contained file
    // A second backup in the same second gets a serial number instead of overwriting.
    const std::string again = backupColony(store, noon);
    EXPECT_EQ(again, dir.file("field.hierloom-backups/field-20240501-120000-2.hierloom"));
    // Twelve more, an hour apart, keeping 10: the oldest ones go.
    for (int h = 1; h <= 12; ++h) backupColony(store, noon + std::chrono::hours(h), 10);
    const auto all = listBackups(path);
    ASSERT_EQ(all.size(), 10U);
    EXPECT_EQ(all.front().taken, noon + std::chrono::hours(12));
    EXPECT_EQ(all.back().taken, noon + std::chrono::hours(3));
    EXPECT_FALSE(std::filesystem::exists(first));
}

TEST(ColonyBackup, ABackupDuringAnotherWriteHoldsOnlyCommittedRecords)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    ColonyStore store = smallColony(path);
    ColonyStore writer = ColonyStore::open(path);
    writer.exec("BEGIN IMMEDIATE");
    writer.exec("DELETE FROM encounter");
    const std::string copy = backupColony(store, noon);
    writer.exec("COMMIT");
    EXPECT_EQ(ColonyStore::open(copy, ColonyStore::Mode::ReadOnly).encounterCount(), 5);
}

TEST(ColonyBackup, ScheduledBackupsFollowTheIntervalSetting)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    ColonyStore store = smallColony(path);
    EXPECT_TRUE(backupIfDue(store, noon)); // none yet
    EXPECT_FALSE(backupIfDue(store, noon + std::chrono::hours(23))); // default: every 24 h
    EXPECT_TRUE(backupIfDue(store, noon + std::chrono::hours(24)));
    store.setSetting("backup_interval_hours", "2");
    EXPECT_FALSE(backupIfDue(store, noon + std::chrono::hours(25)));
    EXPECT_TRUE(backupIfDue(store, noon + std::chrono::hours(26)));
    store.setSetting("backup_interval_hours", "0"); // off
    EXPECT_FALSE(backupIfDue(store, noon + std::chrono::hours(1000)));
    store.setSetting("backup_interval_hours", "1");
    store.setSetting("backup_keep", "2");
    EXPECT_TRUE(backupIfDue(store, noon + std::chrono::hours(1001)));
    EXPECT_EQ(listBackups(path).size(), 2U);
}

TEST(ColonyBackup, RestoreBringsBackTheRecordsAndKeepsWhatItReplaced)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    const std::string backup = backupColony(smallColony(path), noon);
    {
        ColonyStore store = ColonyStore::open(path);
        store.append({}, {}, hierloom::test::twoAnimalEncounters(7));
        EXPECT_EQ(store.encounterCount(), 12);
    }
    ColonyStore reader = ColonyStore::open(path, ColonyStore::Mode::ReadOnly); // an open reader does not stop it
    restoreBackup(backup, path, noon + std::chrono::hours(1));
    EXPECT_EQ(reader.encounterCount(), 5);
    ColonyStore store = ColonyStore::open(path);
    EXPECT_EQ(store.encounterCount(), 5);
    // The replaced state (12 encounters) became a backup itself.
    const auto all = listBackups(path);
    ASSERT_EQ(all.size(), 2U);
    EXPECT_EQ(ColonyStore::open(all.front().path, ColonyStore::Mode::ReadOnly).encounterCount(), 12);
    // The restore is in the audit trail.
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(store.handle(), "SELECT count(*) FROM audit WHERE action = 'restore'", -1, &q, nullptr);
    sqlite3_step(q);
    EXPECT_EQ(sqlite3_column_int(q, 0), 1);
    sqlite3_finalize(q);
}

TEST(ColonyBackup, RestoreOverADamagedFileKeepsTheDamagedOneAside)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    const std::string backup = backupColony(smallColony(path), noon);
    const std::string bytes = fileBytes(path);
    std::ofstream(path, std::ios::binary | std::ios::trunc) << bytes.substr(0, bytes.size() / 2);
    EXPECT_THROW(ColonyStore::open(path), ColonyFileError);
    restoreBackup(backup, path, noon + std::chrono::hours(2));
    EXPECT_EQ(ColonyStore::open(path).encounterCount(), 5);
    const std::string kept = dir.file("c.hierloom-backups/c-damaged-20240501-140000.hierloom");
    EXPECT_EQ(fileBytes(kept), bytes.substr(0, bytes.size() / 2));
    // A missing colony file is restored too.
    std::filesystem::remove(path);
    restoreBackup(backup, path, noon + std::chrono::hours(3));
    EXPECT_EQ(ColonyStore::open(path).encounterCount(), 5);
}

TEST(ColonyBackup, RestoreRefusesADamagedBackupAndAWritingProgram)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    const std::string backup = backupColony(smallColony(path), noon);
    const std::string before = fileBytes(path);
    std::string broken = fileBytes(backup);
    for (size_t i = 4096; i < broken.size(); i += 7) broken[i] = static_cast<char>(broken[i] ^ 0x5A);
    const std::string bad = dir.write("bad.hierloom", broken);
    EXPECT_THROW(restoreBackup(bad, path, noon), ColonyFileError);
    EXPECT_EQ(fileBytes(path), before);
    EXPECT_THROW(restoreBackup(dir.file("none.hierloom"), path, noon), ColonyFileError);

    ColonyStore writer = ColonyStore::open(path);
    writer.exec("BEGIN IMMEDIATE");
    writer.exec("DELETE FROM encounter");
    try {
        restoreBackup(backup, path, noon + std::chrono::hours(1)); // waits its 5 s busy timeout
        FAIL() << "restored while another program was writing";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Busy);
        EXPECT_NE(std::string(e.what()).find("another program is writing"), std::string::npos) << e.what();
    }
    writer.exec("COMMIT");
    EXPECT_EQ(writer.encounterCount(), 0);
}

TEST(ColonyBackup, ABackupWithAnotherPageSizeIsRefusedOverALiveFileButRestoresIntoANewOne)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    const std::string backup = backupColony(smallColony(path), noon);
    {
        // Rewrite the backup with 4 KiB pages, as files of earlier builds have.
        sqlite3* db = nullptr;
        ASSERT_EQ(sqlite3_open(backup.c_str(), &db), SQLITE_OK);
        ASSERT_EQ(sqlite3_exec(db, "PRAGMA page_size = 4096; VACUUM", nullptr, nullptr, nullptr), SQLITE_OK);
        sqlite3_close(db);
    }
    const std::string before = fileBytes(path);
    try {
        restoreBackup(backup, path, noon + std::chrono::hours(1));
        FAIL() << "restored pages of another size over a WAL file";
    } catch (const ColonyFileError& e) {
        EXPECT_NE(std::string(e.what()).find("4 KiB pages"), std::string::npos) << e.what();
        EXPECT_NE(std::string(e.what()).find("restore it into a new file"), std::string::npos) << e.what();
    }
    EXPECT_EQ(fileBytes(path), before);
    const std::string fresh = dir.file("restored.hierloom");
    restoreBackup(backup, fresh, noon + std::chrono::hours(1));
    EXPECT_EQ(ColonyStore::open(fresh).encounterCount(), 5);
}
