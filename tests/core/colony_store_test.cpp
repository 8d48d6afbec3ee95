// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/colony_schema.h"
#include "core/colony_store.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

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
