// SPDX-License-Identifier: GPL-3.0-or-later
// "Checked once, trusted until it changes" (requireIntactOnce,
// core/store/integrity_check.h): a read-only open skips the whole-file check
// only while the file is as it was when the check passed; a byte changed by
// another program is refused at the next open, even with its modification time
// put back; a write by this program keeps the pass only when the file was
// trusted as the write began and nobody else wrote; the forced check always
// reads everything. Each test process has its own cache (private_cache_folder.h).
#include "core/store/check_cache.h"
#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"
#include "import_test_support.h"
#include "two_animal_colony.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <chrono>
#include <fcntl.h>
#include <fstream>
#include <random>
#include <sys/stat.h>
#include <thread>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

std::int64_t nowNs()
{
    return std::chrono::duration_cast<std::chrono::nanoseconds>(std::chrono::system_clock::now().time_since_epoch())
        .count();
}

/// Waits until a check of the file now could be recorded (its last change a clock tick ago).
void waitUntilSettled(const std::string& path)
{
    for (int i = 0; i < 500; ++i) {
        const auto s = colonyFileState(path);
        if (s && settledBefore(*s, nowNs())) return;
        std::this_thread::sleep_for(std::chrono::milliseconds(10));
    }
    FAIL() << path << " did not settle";
}

bool cacheVouches(const std::string& path)
{
    const auto s = colonyFileState(path);
    return s && CheckCache::fromEnvironment().vouchesFor(path, *s, nowNs() / 1'000'000'000);
}

/// What a faulty program or disk would do: records the file as checked in the
/// state it is in now, whatever its bytes.
void vouchAsIs(const std::string& path)
{
    CheckCache::fromEnvironment().record(path, *colonyFileState(path), nowNs() / 1'000'000'000);
}

/// The root page of a table (or of the first index on it), read without the store and its cache.
int rootPage(const std::string& path, const std::string& table, bool index)
{
    sqlite3* db = nullptr;
    sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr);
    int page = 0;
    {
        // The uid index (sqlite_autoindex_...), which count(*) and the loaders never read.
        SqliteStatement q(db, index ? "SELECT rootpage FROM sqlite_schema WHERE type = 'index' AND tbl_name = ? "
                                      "ORDER BY name DESC LIMIT 1"
                                    : "SELECT rootpage FROM sqlite_schema WHERE type = 'table' AND name = ?");
        q.bind(1, table);
        if (q.step()) page = static_cast<int>(q.integer(0));
    }
    sqlite3_close(db);
    return page;
}

/// Overwrites the first byte of a b-tree page (its type) with one no page has,
/// as a byte write from outside SQLite; the file's size stays the same.
void breakPage(const std::string& path, int page)
{
    ASSERT_GT(page, 1);
    const std::int64_t pageSize = 16384; // every colony file (ColonyStore::create)
    std::fstream f(path, std::ios::in | std::ios::out | std::ios::binary);
    f.seekp(static_cast<std::streamoff>((page - 1) * pageSize));
    const char bad = 0x7F;
    f.write(&bad, 1);
}

/// A file whose index on encounters is broken: a scan of the table reads as
/// before, only a check sees the damage.
void breakEncounterIndex(const std::string& path) { breakPage(path, rootPage(path, "encounter_row", true)); }

void expectRefusedAsDamaged(const std::string& path)
{
    try {
        ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        ADD_FAILURE() << "opened a damaged file";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged) << e.what();
        EXPECT_EQ(std::string(e.what()).rfind(path + ": is damaged (", 0), 0U) << e.what();
    }
}

/// The checked_at field of the file's line in the checked-files cache.
std::string checkTimeOf(const std::string& path)
{
    const std::string text = hierloom::test::fileBytes(CheckCache::fromEnvironment().filePath());
    const auto at = text.find("\t" + path + "\n");
    if (at == std::string::npos) return {};
    const auto start = text.rfind('\n', at) + 1;
    return text.substr(start, text.find('\t', start) - start);
}

struct timespec mtimeOf(const std::string& path)
{
    struct stat st {};
    ::stat(path.c_str(), &st);
    return st.st_mtim;
}

} // namespace

TEST(CheckedOpen, APassIsRecordedOnlyForAFileThatHadSettledAndHeldStill)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 20);
    // Opened within the clock tick of its last change: checked, not recorded.
    const auto justWritten = colonyFileState(path);
    ASSERT_TRUE(justWritten);
    if (!settledBefore(*justWritten, nowNs())) {
        ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        EXPECT_FALSE(cacheVouches(path));
    }
    waitUntilSettled(path);
    ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    EXPECT_TRUE(cacheVouches(path));
    // Opening for writing neither checks nor forgets.
    ColonyStore store = ColonyStore::open(path);
    EXPECT_TRUE(cacheVouches(path));
}

TEST(CheckedOpen, WritesOfThisProgramToATrustedFileKeepItTrusted)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 20);
    waitUntilSettled(path);
    ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    ASSERT_TRUE(cacheVouches(path));
    const std::string checkedAt = checkTimeOf(path);
    {
        ColonyStore store = ColonyStore::open(path);
        store.append({}, {}, hierloom::test::twoAnimalEncounters(1));
        EXPECT_TRUE(colonyFileState(path)->wal); // the commit is in the -wal, which the pass now covers
        EXPECT_TRUE(cacheVouches(path));
        store.addObserver("GW");
        store.append({}, {}, hierloom::test::twoAnimalEncounters(ColonyStore::kBulkEncounters + 1), "bulk");
        EXPECT_TRUE(cacheVouches(path));
    }
    // The last connection's close copied the -wal into the file and deleted it.
    EXPECT_FALSE(colonyFileState(path)->wal);
    EXPECT_TRUE(cacheVouches(path));
    EXPECT_EQ(checkTimeOf(path), checkedAt); // a week after the check it is checked again, writes or not
    {
        // A reader open meanwhile (as the desktop's background connection): the
        // writer's close leaves the -wal to it. (The reader opens first: SQLite
        // running as root gives the -wal the file's owner at every open, which
        // moves the -wal's status-change time.)
        const ColonyStore reader = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        {
            ColonyStore store = ColonyStore::open(path);
            store.append({}, {}, hierloom::test::twoAnimalEncounters(2));
        }
        EXPECT_TRUE(colonyFileState(path)->wal);
        EXPECT_TRUE(cacheVouches(path));
        EXPECT_EQ(reader.encounterCount(), 20 + 1 + ColonyStore::kBulkEncounters + 1 + 2);
    }
    EXPECT_TRUE(cacheVouches(path));
    EXPECT_EQ(ColonyStore::open(path, ColonyStore::Mode::ReadOnly).encounterCount(),
              20 + 1 + ColonyStore::kBulkEncounters + 1 + 2);
}

TEST(CheckedOpen, AWriteToAFileNotTrustedAsItBeganLeavesItUntrusted)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 20);
    // Never checked: the write checks it and the next open checks again.
    ColonyStore::open(path).append({}, {}, hierloom::test::twoAnimalEncounters(1));
    EXPECT_FALSE(cacheVouches(path));
    // The same bytes written back from outside, the modification time put back:
    // only the status-change time moves, and that is enough.
    waitUntilSettled(path);
    ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    ASSERT_TRUE(cacheVouches(path));
    const struct timespec before = mtimeOf(path);
    {
        const std::string bytes = hierloom::test::fileBytes(path);
        std::fstream f(path, std::ios::in | std::ios::out | std::ios::binary);
        f.seekp(16384);
        f.write(bytes.data() + 16384, 100);
    }
    const struct timespec times[2] = {{0, UTIME_OMIT}, before};
    ASSERT_EQ(::utimensat(AT_FDCWD, path.c_str(), times, 0), 0);
    ColonyStore::open(path).append({}, {}, hierloom::test::twoAnimalEncounters(1));
    EXPECT_FALSE(cacheVouches(path));
    EXPECT_EQ(hierloom::test::fileBytes(CheckCache::fromEnvironment().filePath()).find(path), std::string::npos);
}

TEST(CheckedOpen, AnotherConnectionsWriteLosesTheTrust)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 20);
    auto trustNow = [&] {
        waitUntilSettled(path);
        ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        ASSERT_TRUE(cacheVouches(path));
    };
    int outsideWrites = 0;
    auto writeWithSqlite = [&] {
        sqlite3* db = nullptr;
        ASSERT_EQ(sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE, nullptr), SQLITE_OK);
        const std::string sql = "INSERT INTO observer(name) VALUES ('other " + std::to_string(++outsideWrites) + "')";
        EXPECT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK);
        sqlite3_close(db);
    };
    // Between the pass and this program's write.
    trustNow();
    writeWithSqlite();
    ColonyStore::open(path).append({}, {}, hierloom::test::twoAnimalEncounters(1));
    EXPECT_FALSE(cacheVouches(path));
    // Between this program's commit and its close.
    trustNow();
    {
        ColonyStore store = ColonyStore::open(path);
        store.append({}, {}, hierloom::test::twoAnimalEncounters(1));
        ASSERT_TRUE(cacheVouches(path));
        writeWithSqlite();
        EXPECT_FALSE(cacheVouches(path));
    }
    EXPECT_FALSE(cacheVouches(path));
    // Between two writes of one connection.
    trustNow();
    {
        ColonyStore store = ColonyStore::open(path);
        store.append({}, {}, hierloom::test::twoAnimalEncounters(1));
        writeWithSqlite();
        store.append({}, {}, hierloom::test::twoAnimalEncounters(1));
        EXPECT_FALSE(cacheVouches(path));
    }
    EXPECT_FALSE(cacheVouches(path));
    EXPECT_EQ(ColonyStore::open(path, ColonyStore::Mode::ReadOnly).observers().size(), 3U);
}

TEST(CheckedOpen, AByteChangedAfterAPassingOpenIsRefusedAtTheNextOpen)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 50);
    waitUntilSettled(path);
    EXPECT_EQ(ColonyStore::open(path, ColonyStore::Mode::ReadOnly).encounterCount(), 50);
    ASSERT_TRUE(cacheVouches(path));
    breakEncounterIndex(path);
    EXPECT_FALSE(cacheVouches(path));
    expectRefusedAsDamaged(path);
    expectRefusedAsDamaged(path); // and again: a failed check is never recorded
}

TEST(CheckedOpen, PuttingBackTheModificationTimeDoesNotHideTheChange)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 50);
    waitUntilSettled(path);
    ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    ASSERT_TRUE(cacheVouches(path));
    const struct timespec before = mtimeOf(path);
    breakEncounterIndex(path);
    // As `touch -d` or a copying tool keeping times would: the size and the
    // modification time are as they were; the status-change time cannot be set back.
    const struct timespec times[2] = {{0, UTIME_OMIT}, before};
    ASSERT_EQ(::utimensat(AT_FDCWD, path.c_str(), times, 0), 0);
    EXPECT_EQ(mtimeOf(path).tv_sec, before.tv_sec);
    EXPECT_EQ(mtimeOf(path).tv_nsec, before.tv_nsec);
    expectRefusedAsDamaged(path);
}

TEST(CheckedOpen, TheForcedCheckReadsEverythingWhateverTheCacheSays)
{
    // The limit of the rule: a file whose stamps do not move (decay of the
    // disk, a raw write to the device) is trusted as recorded. Here the cache
    // is made to vouch for a damaged file, and only the forced check sees it.
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 50);
    breakEncounterIndex(path);
    vouchAsIs(path);
    EXPECT_EQ(ColonyStore::open(path, ColonyStore::Mode::ReadOnly).encounterCount(), 50); // not checked
    try {
        ColonyStore::openVerified(path);
        ADD_FAILURE() << "the forced check passed a damaged file";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
        EXPECT_EQ(std::string(e.what()).rfind(path + ": is damaged (", 0), 0U) << e.what();
    }
    EXPECT_FALSE(cacheVouches(path)); // the failure is not forgotten at the next open
    expectRefusedAsDamaged(path);
    // A sound file passes the forced check, which records it like any check.
    const std::string sound = dir.file("sound.hierloom");
    hierloom::test::twoAnimalColony(sound, 5);
    waitUntilSettled(sound);
    EXPECT_EQ(ColonyStore::openVerified(sound).encounterCount(), 5);
    EXPECT_TRUE(cacheVouches(sound));
}

TEST(CheckedOpen, ADamagedPageMetWhileReadingIsRefusedAndTheFileCheckedAgain)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 50);
    breakPage(path, rootPage(path, "encounter_row", false));
    vouchAsIs(path);
    const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly); // trusted as recorded
    try {
        store.loadEncounters();
        ADD_FAILURE() << "read records from a damaged page";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
        EXPECT_EQ(std::string(e.what()).rfind(path + ": is damaged (", 0), 0U) << e.what();
    }
    EXPECT_FALSE(cacheVouches(path));
    expectRefusedAsDamaged(path);
}

TEST(CheckedOpen, WithoutACacheEveryOpenChecks)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    hierloom::test::twoAnimalColony(path, 50);
    breakEncounterIndex(path);
    vouchAsIs(path);
    ::setenv("HIERLOOM_CHECK_EVERY_OPEN", "1", 1);
    try {
        ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        ADD_FAILURE() << "opened a damaged file";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
    }
    ::unsetenv("HIERLOOM_CHECK_EVERY_OPEN");
}

// A model of the file (sound or damaged) against random sequences of what
// happens to a colony file: read-only opens, writes by this program, forced
// checks, byte damage from outside (with or without the old modification
// time put back), repair by copying a sound file back, and pauses long enough
// for a pass to be recorded. Whatever the cache holds, an open or a write
// succeeds exactly when the model says the file is sound.
TEST(CheckedOpen, OpensAndWritesSucceedExactlyWhenTheFileIsSound)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    const std::string good = dir.file("good.hierloom");
    hierloom::test::twoAnimalColony(path, 30);
    std::filesystem::copy_file(path, good);
    std::mt19937_64 rng(1717);
    bool damaged = false;
    std::int64_t encounters = 30, goodEncounters = 30;
    int trustedOpens = 0, refusedOpens = 0, keptTrust = 0;
    for (int step = 0; step < 150; ++step) {
        // Four in ten steps are read-only opens, two pauses, one in ten each of the others.
        const int draw = static_cast<int>(rng() % 10);
        const int op = draw < 4 ? 1 : draw - 2;
        SCOPED_TRACE("step " + std::to_string(step) + ", operation " + std::to_string(op));
        if (op == 1) { // read-only open
            const bool trusted = cacheVouches(path);
            if (damaged) {
                EXPECT_FALSE(trusted);
                expectRefusedAsDamaged(path);
                ++refusedOpens;
            } else {
                trustedOpens += trusted;
                EXPECT_EQ(ColonyStore::open(path, ColonyStore::Mode::ReadOnly).loadEncounters().size(),
                          static_cast<std::size_t>(encounters));
            }
        } else if (op == 2) { // a write by this program
            const bool trusted = cacheVouches(path);
            if (damaged) {
                EXPECT_FALSE(trusted);
                EXPECT_THROW(ColonyStore::open(path).append({}, {}, hierloom::test::twoAnimalEncounters(1)),
                             ColonyFileError);
            } else {
                ColonyStore::open(path).append({}, {}, hierloom::test::twoAnimalEncounters(1)); // and closes
                ++encounters;
                keptTrust += trusted;
                EXPECT_EQ(cacheVouches(path), trusted); // trusted after the write only if trusted before
            }
        } else if (op == 3) { // the forced check
            if (damaged) EXPECT_THROW(ColonyStore::openVerified(path), ColonyFileError);
            else EXPECT_NO_THROW(ColonyStore::openVerified(path));
        } else if (op == 4 && !damaged) { // damage from outside
            if (!std::filesystem::exists(path + "-wal")) {
                std::filesystem::copy_file(path, good, std::filesystem::copy_options::overwrite_existing);
                goodEncounters = encounters;
            }
            const struct timespec before = mtimeOf(path);
            breakEncounterIndex(path);
            if (rng() % 2) {
                const struct timespec times[2] = {{0, UTIME_OMIT}, before};
                ::utimensat(AT_FDCWD, path.c_str(), times, 0);
            }
            damaged = true;
        } else if (op == 5 && damaged) { // repair: a sound copy put back
            std::filesystem::copy_file(good, path, std::filesystem::copy_options::overwrite_existing);
            encounters = goodEncounters;
            damaged = false;
        } else if (op >= 6) {
            waitUntilSettled(path);
        }
    }
    // The sequence did exercise opens the cache vouched for, and refusals.
    EXPECT_GE(trustedOpens, 5);
    EXPECT_GE(refusedOpens, 5);
    EXPECT_GE(keptTrust, 2);
}
