// SPDX-License-Identifier: GPL-3.0-or-later
// A file damaged inside (its header still fine) is refused before any write,
// before a backup and when read, with a short message naming the newest good backup.
#include "core/store/colony_backup.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_store.h"
#include "core/store/integrity_check.h"
#include "core/store/sqlite_statement.h"
#include "import_test_support.h"
#include "two_animal_colony.h"

#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>

using namespace hierloom::core;
using hierloom::test::TempDir;
using Clock = std::chrono::system_clock;

namespace {

const Clock::time_point noon = hierloom::test::kNoon;

void makeColony(const std::string& path)
{
    hierloom::test::twoAnimalColony(path, 50);
}

/// Breaks the page of the index on encounter uids: the records read as before
/// (a scan of the table never touches the index), only a check sees it.
void breakEncounterIndex(const std::string& path)
{
    int page = 0, pageSize = 0;
    {
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        SqliteStatement q(store.handle(), "SELECT rootpage FROM sqlite_schema WHERE type = 'index' AND "
                                          "tbl_name = 'encounter_row' ORDER BY name LIMIT 1");
        ASSERT_TRUE(q.step());
        page = static_cast<int>(q.integer(0));
        SqliteStatement s(store.handle(), "PRAGMA page_size");
        ASSERT_TRUE(s.step());
        pageSize = static_cast<int>(s.integer(0));
    }
    ASSERT_GT(page, 1);
    std::fstream f(path, std::ios::in | std::ios::out | std::ios::binary);
    f.seekp(static_cast<std::streamoff>(page - 1) * pageSize);
    const char bad = 0x7F; // not a b-tree page type
    f.write(&bad, 1);
}

} // namespace

TEST(IntegrityCheck, AWriteToADamagedFileIsRefusedNamingTheNewestGoodBackup)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    makeColony(path);
    std::string backup;
    {
        ColonyStore store = ColonyStore::open(path);
        backup = backupColony(store, noon);
    }
    breakEncounterIndex(path);
    const std::string before = hierloom::test::fileBytes(path);
    ColonyStore store = ColonyStore::open(path); // opening for writing reads nothing yet
    try {
        store.append({}, {}, hierloom::test::twoAnimalEncounters(1));
        FAIL() << "wrote into a damaged file";
    } catch (const ColonyFileError& e) {
        const std::string m = e.what();
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
        EXPECT_EQ(m.rfind(path + ": is damaged", 0), 0U) << m;
        EXPECT_NE(m.find(backup), std::string::npos) << m;
        EXPECT_EQ(m.find('\n'), std::string::npos) << m; // one line, not SQLite's whole report
        EXPECT_LT(m.size(), 400U + 3 * path.size()) << m;
    }
    std::vector<Encounter> one = hierloom::test::twoAnimalEncounters(1); // an edit from the desktop goes the same way
    EXPECT_THROW(writeEncounterChange(store, {}, one), ColonyFileError);
    // A backup of it is refused too, and none is made.
    EXPECT_THROW(backupColony(store, noon + std::chrono::hours(1)), ColonyFileError);
    EXPECT_EQ(listBackups(path, noon + std::chrono::hours(1)).size(), 1U);
    EXPECT_EQ(hierloom::test::fileBytes(path), before);
}

TEST(IntegrityCheck, ReadingADamagedFileFailsInsteadOfShowingAlteredRecords)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    makeColony(path);
    breakEncounterIndex(path);
    try {
        ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        FAIL() << "read a damaged file";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
        EXPECT_NE(std::string(e.what()).find("No good backup"), std::string::npos) << e.what();
    }
}


// The desktop's background read checks the file on a connection of its own;
// the writing connection then trusts that check only while nobody else wrote.
// The damage is in the encounter index, which a write of the observer list
// never touches: only the check can refuse it.
TEST(IntegrityCheck, ACheckPassedElsewhereIsTrustedOnlyUntilAnotherConnectionWrites)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    makeColony(path);
    {
        ColonyStore trusting = ColonyStore::open(path);
        trusting.trustIntegrityCheckedAt(trusting.dataVersion());
        breakEncounterIndex(path);
        EXPECT_NO_THROW(writeObservers(trusting, {"GW"})); // the check was skipped
        ColonyStore checking = ColonyStore::open(path);
        EXPECT_THROW(writeObservers(checking, {"HK"}), ColonyFileError); // no trust: checked and refused
    }
    const std::string other = dir.file("d.hierloom");
    makeColony(other);
    ColonyStore store = ColonyStore::open(other);
    const std::int64_t checkedAt = store.dataVersion();
    {
        ColonyStore second = ColonyStore::open(other);
        writeObservers(second, {"JL"}); // another connection commits after the check
    }
    breakEncounterIndex(other);
    store.trustIntegrityCheckedAt(checkedAt);
    EXPECT_THROW(writeObservers(store, {"GW"}), ColonyFileError);
}
