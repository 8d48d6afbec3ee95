// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <random>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;

TEST(ColonyStore, CreateStampsApplicationIdAndVersion)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    {
        ColonyStore store = ColonyStore::create(path);
        EXPECT_EQ(store.schemaVersion(), currentSchemaVersion);
        EXPECT_FALSE(store.behaviourCodes().empty());
    }
    EXPECT_EQ(probeColonyFile(path), currentSchemaVersion);
    EXPECT_THROW(ColonyStore::create(path), ColonyFileError);
}

TEST(ColonyStore, AppendAndLoadRoundTrip)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    ColonyStore store = ColonyStore::create(path);
    Animal mum{"F1", "Ada", Sex::Female, parseDate("2010-04-02"), "", "", parseDate("2012-01-01"),
               EntryType::Founder, std::nullopt, ExitType::None, ""};
    Animal kid{"F2", "Bea, \"little\"", Sex::Female, parseDate("2015-05-01"), "F1", "", parseDate("2015-05-01"),
               EntryType::Born, parseDate("2020-01-03"), ExitType::Died, ""};
    Residence r1{"F1", "main", *parseDate("2012-01-01"), std::nullopt, ""};
    Residence r2{"F2", "main", *parseDate("2015-05-01"), parseDate("2020-01-03"), ""};
    Encounter e;
    e.date = *parseDate("2016-01-01");
    e.time = 9 * 60 + 5;
    e.winner = "F1";
    e.loser = "F2";
    e.group = "main";
    e.observer = "JK";
    store.append({mum, kid}, {r1, r2}, {e, e});
    const Colony c = store.load();
    ASSERT_EQ(c.animals.size(), 2U);
    EXPECT_EQ(c.animals[1].name, "Bea, \"little\"");
    EXPECT_EQ(c.animals[1].mother, "F1");
    EXPECT_EQ(c.animals[1].exit, parseDate("2020-01-03"));
    EXPECT_EQ(c.animals[0].uid.size(), 36U);
    EXPECT_NE(c.animals[0].uid, c.animals[1].uid);
    ASSERT_EQ(c.encounters.size(), 2U);
    EXPECT_EQ(c.encounters[0].seq, 1);
    EXPECT_EQ(c.encounters[1].seq, 2);
    EXPECT_EQ(c.encounters[0].time, 545);
    EXPECT_EQ(store.observers(), std::vector<std::string>{"JK"});
}

TEST(ColonyStore, DatabaseRejectsWhatItCanCheckItself)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    Animal a;
    a.id = "A";
    a.sex = Sex::Female;
    a.entry = parseDate("2010-01-01");
    Encounter self;
    self.date = *parseDate("2011-01-01");
    self.winner = "A";
    self.loser = "A";
    // CHECK (winner <> loser): the append rolls back as a whole.
    EXPECT_THROW(store.append({a}, {}, {self}), ColonyFileError);
    EXPECT_TRUE(store.loadAnimals().empty());
    Encounter ghost = self;
    ghost.loser = "nobody";
    // Foreign key: the loser must be an animal.
    EXPECT_THROW(store.append({a}, {}, {ghost}), ColonyFileError);
    EXPECT_TRUE(store.loadAnimals().empty());
}

TEST(ColonyStore, MigratesAnUnversionedFileAndKeepsABackup)
{
    TempDir dir;
    const std::string path = dir.file("old.hierloom");
    sqlite3* db = nullptr;
    ASSERT_EQ(sqlite3_open(path.c_str(), &db), SQLITE_OK);
    // Version 0: stamped as a colony file, no tables yet.
    sqlite3_exec(db, ("PRAGMA application_id = " + std::to_string(colonyApplicationId)).c_str(), nullptr, nullptr,
                 nullptr);
    sqlite3_exec(db, "CREATE TABLE placeholder(x)", nullptr, nullptr, nullptr);
    sqlite3_close(db);
    EXPECT_EQ(probeColonyFile(path), 0);
    {
        ColonyStore store = ColonyStore::open(path);
        EXPECT_EQ(store.schemaVersion(), currentSchemaVersion);
        EXPECT_TRUE(store.loadAnimals().empty());
    }
    EXPECT_TRUE(std::filesystem::exists(path + ".v0.bak"));
    EXPECT_EQ(probeColonyFile(path + ".v0.bak"), 0);
}

TEST(ColonyStore, RefusesNewerFilesAndForeignFilesWithoutChangingThem)
{
    TempDir dir;
    const std::string newer = dir.file("newer.hierloom");
    ColonyStore::create(newer).exec("PRAGMA user_version = 99");
    const std::string before = fileBytes(newer);
    try {
        ColonyStore::open(newer);
        FAIL() << "a newer file opened";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::NewerVersion);
        EXPECT_NE(std::string(e.what()).find("newer"), std::string::npos);
    }
    EXPECT_EQ(fileBytes(newer), before);

    const std::string foreign = dir.file("other.db");
    sqlite3* db = nullptr;
    sqlite3_open(foreign.c_str(), &db);
    sqlite3_exec(db, "CREATE TABLE t(x); INSERT INTO t VALUES (1)", nullptr, nullptr, nullptr);
    sqlite3_close(db);
    const std::string foreignBefore = fileBytes(foreign);
    EXPECT_THROW(ColonyStore::open(foreign), ColonyFileError);
    EXPECT_EQ(fileBytes(foreign), foreignBefore);

    const std::string text = dir.write("notes.txt", "just some notes\n");
    try {
        ColonyStore::open(text);
        FAIL();
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::NotAColonyFile);
    }
    EXPECT_EQ(fileBytes(text), "just some notes\n");
    const std::string empty = dir.write("empty.hierloom", "");
    EXPECT_THROW(ColonyStore::open(empty), ColonyFileError);
    EXPECT_THROW(ColonyStore::open(dir.file("missing.hierloom")), ColonyFileError);
}

TEST(ColonyStore, TruncatedFileIsReportedAsDamagedNotACrash)
{
    TempDir dir;
    const std::string path = dir.file("t.hierloom");
    {
        ColonyStore store = ColonyStore::create(path);
        Animal a;
        a.id = "A";
        a.sex = Sex::Female;
        a.entry = parseDate("2010-01-01");
        store.append({a}, {}, {});
    }
    const std::string bytes = fileBytes(path);
    std::ofstream(path, std::ios::binary | std::ios::trunc) << bytes.substr(0, bytes.size() / 3);
    EXPECT_THROW(
        {
            ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
            store.load();
        },
        ColonyFileError);
}

namespace {

/// A small colony file written by the version-1 program: the version-1 tables and records, no audit trail.
std::string writeVersion1File(const TempDir& dir)
{
    const std::string path = dir.file("v1.hierloom");
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    const std::string sql = std::string("PRAGMA journal_mode = WAL; BEGIN;") + schemaVersion1Sql() +
                            "INSERT INTO animal(uid, id, sex, entry_date, entry_type) VALUES "
                            "('11111111-1111-4111-8111-111111111111', 'F1', 'F', '2010-01-01', 'founder'),"
                            "('22222222-2222-4222-8222-222222222222', 'M1', 'M', '2010-01-01', 'founder');"
                            "INSERT INTO residence(uid, animal, grp, from_date) VALUES "
                            "('33333333-3333-4333-8333-333333333333', 'F1', 'main', '2010-01-01'),"
                            "('44444444-4444-4444-8444-444444444444', 'M1', 'main', '2010-01-01');"
                            "INSERT INTO encounter(seq, uid, date, winner, loser, grp) VALUES "
                            "(1, '55555555-5555-4555-8555-555555555555', '2011-01-01', 'F1', 'M1', 'main');"
                            "PRAGMA application_id = " +
                            std::to_string(colonyApplicationId) + "; PRAGMA user_version = 1; COMMIT;";
    EXPECT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    sqlite3_close(db);
    return path;
}

std::string integrityOf(const std::string& path)
{
    sqlite3* db = nullptr;
    sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr);
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(db, "PRAGMA integrity_check", -1, &q, nullptr);
    std::string out = sqlite3_step(q) == SQLITE_ROW ? reinterpret_cast<const char*>(sqlite3_column_text(q, 0)) : "";
    sqlite3_finalize(q);
    sqlite3_close(db);
    return out;
}

} // namespace

TEST(ColonyStore, MigratesVersion1ToTheAuditedSchemaKeepingRecordsAndABackup)
{
    TempDir dir;
    const std::string path = writeVersion1File(dir);
    ASSERT_EQ(probeColonyFile(path), 1);
    // A version-1 file cannot be opened read-only by this program: it must be updated first.
    EXPECT_THROW(ColonyStore::open(path, ColonyStore::Mode::ReadOnly), ColonyFileError);
    {
        ColonyStore store = ColonyStore::open(path);
        EXPECT_EQ(store.schemaVersion(), currentSchemaVersion);
        const Colony c = store.load();
        ASSERT_EQ(c.animals.size(), 2U);
        EXPECT_EQ(c.animals[0].uid, "11111111-1111-4111-8111-111111111111");
        EXPECT_EQ(c.residences.size(), 2U);
        ASSERT_EQ(c.encounters.size(), 1U);
        EXPECT_EQ(c.encounters[0].uid, "55555555-5555-4555-8555-555555555555");
        // The migrated file audits changes from now on.
        store.setUserName("migrator");
        store.exec("UPDATE animal SET name = 'Ada' WHERE id = 'F1'");
        sqlite3_stmt* q = nullptr;
        sqlite3_prepare_v2(store.handle(), "SELECT user, action FROM audit", -1, &q, nullptr);
        ASSERT_EQ(sqlite3_step(q), SQLITE_ROW);
        EXPECT_STREQ(reinterpret_cast<const char*>(sqlite3_column_text(q, 0)), "migrator");
        EXPECT_STREQ(reinterpret_cast<const char*>(sqlite3_column_text(q, 1)), "update");
        EXPECT_EQ(sqlite3_step(q), SQLITE_DONE);
        sqlite3_finalize(q);
    }
    EXPECT_EQ(probeColonyFile(path + ".v1.bak"), 1);
    EXPECT_EQ(integrityOf(path), "ok");
    ColonyStore old = ColonyStore::open(path + ".v1.bak"); // the backup itself migrates when opened
    EXPECT_EQ(old.loadAnimals().size(), 2U);
}

TEST(ColonyStore, EveryDamagedOrForeignFileGetsAClearMessageAndStaysUntouched)
{
    TempDir dir;
    // A real colony file to damage.
    const std::string good = dir.file("good.hierloom");
    {
        ColonyStore store = ColonyStore::create(good);
        std::vector<Animal> animals;
        for (int i = 0; i < 300; ++i) {
            Animal a;
            a.id = "A" + std::to_string(i);
            a.name = std::string(40, 'n');
            a.sex = Sex::Female;
            a.entry = parseDate("2010-01-01");
            animals.push_back(a);
        }
        store.append(std::move(animals), {}, {});
    }
    const std::string goodBytes = fileBytes(good);
    ASSERT_GT(goodBytes.size(), 8192U);
    std::mt19937_64 rng(7);
    std::string noise(20000, '\0');
    for (char& c : noise) c = static_cast<char>(rng() & 0xFF);
    sqlite3* db = nullptr;
    const std::string foreign = dir.file("photos.db");
    sqlite3_open(foreign.c_str(), &db);
    sqlite3_exec(db, "CREATE TABLE photo(name, data); INSERT INTO photo VALUES ('a', x'00ff')", nullptr, nullptr, nullptr);
    sqlite3_close(db);
    const std::string newer = dir.file("newer.hierloom");
    ColonyStore::create(newer).exec(("PRAGMA user_version = " + std::to_string(currentSchemaVersion + 1)).c_str());

    struct Case {
        std::string path;
        ColonyFileError::Kind kind;
        const char* words; // what the message must say
    };
    const std::vector<Case> cases = {
        {dir.write("empty.hierloom", ""), ColonyFileError::Kind::NotAColonyFile, "is empty"},
        {dir.write("truncated.hierloom", goodBytes.substr(0, goodBytes.size() / 2)), ColonyFileError::Kind::Damaged,
         "cut short"},
        {dir.write("header-only.hierloom", goodBytes.substr(0, 300)), ColonyFileError::Kind::Damaged, "damaged"},
        {dir.write("noise.hierloom", noise), ColonyFileError::Kind::NotAColonyFile, "not an SQLite database"},
        {dir.write("sqlite-noise.hierloom", goodBytes.substr(0, 100) + noise), ColonyFileError::Kind::Damaged,
         "damaged"},
        {foreign, ColonyFileError::Kind::NotAColonyFile, "another program"},
        {newer, ColonyFileError::Kind::NewerVersion, "newer Hierloom"},
    };
    for (const Case& c : cases) {
        const std::string before = fileBytes(c.path);
        for (const auto mode : {ColonyStore::Mode::ReadWrite, ColonyStore::Mode::ReadOnly}) {
            try {
                ColonyStore store = ColonyStore::open(c.path, mode);
                store.load();
                ADD_FAILURE() << c.path << " opened";
            } catch (const ColonyFileError& e) {
                EXPECT_EQ(e.kind(), c.kind) << c.path << ": " << e.what();
                EXPECT_NE(std::string(e.what()).find(c.words), std::string::npos) << e.what();
                EXPECT_EQ(std::string(e.what()).rfind(c.path, 0), 0U) << "the message names the file: " << e.what();
            }
            EXPECT_EQ(fileBytes(c.path), before) << c.path << " was changed";
        }
    }
}
