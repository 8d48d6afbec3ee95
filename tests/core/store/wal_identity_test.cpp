// SPDX-License-Identifier: GPL-3.0-or-later
// A -wal file left beside a path by another colony file must not be laid over
// the file copied there; a -wal the same file left in a crash must still be recovered.
#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <filesystem>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;
namespace fs = std::filesystem;

namespace {

std::vector<Encounter> encounters(int n, const char* winner, const char* loser)
{
    std::vector<Encounter> out(static_cast<size_t>(n));
    for (auto& e : out) {
        e.date = *parseDate("2012-01-01");
        e.winner = winner;
        e.loser = loser;
        e.group = "main";
    }
    return out;
}

/// A colony of two animals named `a` and `b` with `n` encounters between them.
void makeColony(const std::string& path, const char* a, const char* b, int n)
{
    ColonyStore store = ColonyStore::create(path);
    Animal f, m;
    f.id = a;
    f.sex = Sex::Female;
    m.id = b;
    m.sex = Sex::Male;
    f.entry = m.entry = parseDate("2010-01-01");
    store.append({f, m},
                 {{a, "main", *parseDate("2010-01-01"), std::nullopt, ""},
                  {b, "main", *parseDate("2010-01-01"), std::nullopt, ""}},
                 encounters(n, a, b));
}

/// Opens `path`, stops checkpoints and appends `n` encounters, leaving them only
/// in the -wal; returns the open store so that the -wal stays.
ColonyStore appendWithoutCheckpoint(const std::string& path, const char* a, const char* b, int n)
{
    ColonyStore store = ColonyStore::open(path);
    store.exec("PRAGMA wal_autocheckpoint = 0");
    store.append({}, {}, encounters(n, a, b));
    return store;
}

} // namespace

TEST(WalIdentity, AnotherColonysWalBesideACopiedFileIsRefused)
{
    TempDir dir;
    const std::string a = dir.file("a.hierloom");
    const std::string b = dir.file("b.hierloom");
    makeColony(a, "FA", "MA", 3);
    makeColony(b, "FB", "MB", 5);
    const std::string bBytes = fileBytes(b);
    {
        ColonyStore writer = appendWithoutCheckpoint(a, "FA", "MA", 4);
        ASSERT_GT(fs::file_size(a + "-wal"), 0U);
        // Someone copies colony B over A's path while A's -wal (and -shm) stay.
        fs::copy_file(b, a, fs::copy_options::overwrite_existing);
        try {
            ColonyStore::open(a, ColonyStore::Mode::ReadOnly);
            FAIL() << "opened B's file through A's -wal";
        } catch (const ColonyFileError& e) {
            EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
            EXPECT_NE(std::string(e.what()).find(a + "-wal"), std::string::npos) << e.what();
            EXPECT_NE(std::string(e.what()).find("another colony file"), std::string::npos) << e.what();
        }
        EXPECT_THROW(ColonyStore::open(a), ColonyFileError);
        EXPECT_EQ(fileBytes(a), bBytes); // nothing rolled forward into it
        // Keep A's -wal for the next case when the writer goes away.
        fs::copy_file(a + "-wal", dir.file("a-wal-kept"));
        sqlite3_db_config(writer.handle(), SQLITE_DBCONFIG_NO_CKPT_ON_CLOSE, 1, nullptr);
    }
    // The same after a crash: B's file at the path, A's -wal beside it, no -shm.
    fs::remove(a + "-shm");
    fs::copy_file(dir.file("a-wal-kept"), a + "-wal", fs::copy_options::overwrite_existing);
    EXPECT_THROW(ColonyStore::open(a, ColonyStore::Mode::ReadOnly), ColonyFileError);
    EXPECT_EQ(fileBytes(a), bBytes);
    // Moving the -wal away, as the message says, gives B's records.
    fs::remove(a + "-wal");
    fs::remove(a + "-shm");
    EXPECT_EQ(ColonyStore::open(a, ColonyStore::Mode::ReadOnly).encounterCount(), 5);
}

TEST(WalIdentity, TheFilesOwnWalLeftByACrashIsRecovered)
{
    TempDir dir;
    const std::string a = dir.file("a.hierloom");
    makeColony(a, "FA", "MA", 3);
    {
        ColonyStore writer = appendWithoutCheckpoint(a, "FA", "MA", 4);
        // What a crash leaves: the file and its -wal as they are now, no -shm.
        fs::copy_file(a, dir.file("crash.hierloom"));
        fs::copy_file(a + "-wal", dir.file("crash.hierloom-wal"));
    }
    EXPECT_EQ(ColonyStore::open(dir.file("crash.hierloom"), ColonyStore::Mode::ReadOnly).encounterCount(), 7);
    ColonyStore reopened = ColonyStore::open(dir.file("crash.hierloom"));
    EXPECT_EQ(reopened.encounterCount(), 7);
}

TEST(WalIdentity, AWalOfAnotherPageSizeIsRefused)
{
    TempDir dir;
    const std::string a = dir.file("a.hierloom");
    makeColony(a, "FA", "MA", 3);
    {
        ColonyStore writer = appendWithoutCheckpoint(a, "FA", "MA", 4);
        fs::copy_file(a + "-wal", dir.file("a-wal-kept"));
        sqlite3_db_config(writer.handle(), SQLITE_DBCONFIG_NO_CKPT_ON_CLOSE, 1, nullptr);
    }
    // A 4 KiB-page file (as earlier builds made) at the path, A's 16 KiB -wal beside it.
    fs::remove(a);
    fs::remove(a + "-shm");
    {
        sqlite3* db = nullptr;
        ASSERT_EQ(sqlite3_open(a.c_str(), &db), SQLITE_OK);
        ASSERT_EQ(sqlite3_exec(db, "PRAGMA page_size = 4096; PRAGMA journal_mode = WAL; CREATE TABLE t(x)", nullptr,
                               nullptr, nullptr),
                  SQLITE_OK);
        sqlite3_close(db);
    }
    fs::copy_file(dir.file("a-wal-kept"), a + "-wal", fs::copy_options::overwrite_existing);
    try {
        probeColonyFile(a);
        FAIL() << "a 16 KiB -wal was laid over a 4 KiB file";
    } catch (const ColonyFileError& e) {
        EXPECT_NE(std::string(e.what()).find("16384-byte pages"), std::string::npos) << e.what();
    }
}

TEST(WalIdentity, EveryWriteCarriesTheIdentityAndAnOlderFileGetsOneOnItsFirstWrite)
{
    TempDir dir;
    const std::string a = dir.file("a.hierloom");
    makeColony(a, "FA", "MA", 3);
    std::string id;
    {
        ColonyStore store = ColonyStore::open(a);
        SqliteStatement q(store.handle(), "SELECT id, writes FROM file_identity");
        ASSERT_TRUE(q.step());
        id = q.text(0);
        EXPECT_EQ(id.size(), 32U);
        EXPECT_GE(q.integer(1), 2); // the schema and the records
        EXPECT_FALSE(q.step());     // one identity
        // A file from before identities: the table goes, the next write brings a new one.
        store.exec("DROP TABLE file_identity");
    }
    ColonyStore store = ColonyStore::open(a);
    store.append({}, {}, encounters(1, "FA", "MA"));
    SqliteStatement q(store.handle(), "SELECT id FROM file_identity");
    ASSERT_TRUE(q.step());
    EXPECT_EQ(q.text(0).size(), 32U);
    EXPECT_NE(q.text(0), id);
}
