// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli_test_support.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"

#include <sqlite3.h>

#include <gtest/gtest.h>

using namespace hierloom::test;

TEST(CliFiles, InitCreatesAndRefusesToOverwrite)
{
    CliTempDir dir;
    const std::string colony = dir.file("c.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const CliResult again = runCli({"init", colony});
    EXPECT_EQ(again.status, 2);
    EXPECT_NE(again.err.find("already exists"), std::string::npos);
}

TEST(CliFiles, UsageMistakesExitWithTwo)
{
    EXPECT_EQ(runCli({}).status, 2);
    EXPECT_EQ(runCli({"no-such-command"}).status, 2);
    EXPECT_EQ(runCli({"ranks"}).status, 2); // the colony file is required
    const CliResult missing = runCli({"ranks", "/nonexistent/x.hierloom"});
    EXPECT_EQ(missing.status, 2);
    EXPECT_NE(missing.err.find("no such colony file"), std::string::npos);
    EXPECT_EQ(runCli({"--help"}).status, 0);
    EXPECT_NE(runCli({"--version"}).out.find("hierloom-cli"), std::string::npos);
}

TEST(CliFiles, BadImportIsRefusedWithLocatedMessagesAndNothingWritten)
{
    CliTempDir dir;
    const std::string colony = dir.file("c.hierloom");
    ASSERT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("animals.csv", "id,sex,birth_date\nA1,F,2015-01-01\nA1,F,2016-01-01\n");
    const std::string before = CliTempDir::read(colony);
    const CliResult r = runCli({"import", colony, "--animals", animals});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find(animals + ":3: id: 'A1' appears twice (first on line 2)"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("nothing was imported"), std::string::npos);
    EXPECT_EQ(CliTempDir::read(colony), before);
}

TEST(CliFiles, ExportThenImportReproducesTheDemoColonyExactly)
{
    CliTempDir dir;
    const std::string first = dir.file("first.hierloom");
    ASSERT_EQ(runCli({"demo", first}).status, 0);
    ASSERT_EQ(runCli({"export", first, "--dir", dir.file("a")}).status, 0);
    const std::string second = dir.file("second.hierloom");
    ASSERT_EQ(runCli({"init", second}).status, 0);
    const CliResult imp = runCli({"import", second, "--animals", dir.file("a/animals.csv"), "--residences",
                                  dir.file("a/residences.csv"), "--encounters", dir.file("a/encounters.csv")});
    ASSERT_EQ(imp.status, 0) << imp.err;
    ASSERT_EQ(runCli({"export", second, "--dir", dir.file("b")}).status, 0);
    for (const char* name : {"animals.csv", "residences.csv", "encounters.csv"})
        EXPECT_EQ(CliTempDir::read(dir.file(std::string("a/") + name)), CliTempDir::read(dir.file(std::string("b/") + name)))
            << name;

    using namespace hierloom::core;
    const Colony a = ColonyStore::open(first, ColonyStore::Mode::ReadOnly).load();
    const Colony b = ColonyStore::open(second, ColonyStore::Mode::ReadOnly).load();
    ASSERT_EQ(a.animals.size(), b.animals.size());
    ASSERT_EQ(a.encounters.size(), b.encounters.size());
    ASSERT_GE(a.encounters.size(), 15000U);
    for (size_t i = 0; i < a.animals.size(); ++i) {
        EXPECT_EQ(a.animals[i].uid, b.animals[i].uid);
        EXPECT_EQ(a.animals[i].mother, b.animals[i].mother);
        EXPECT_EQ(a.animals[i].exit, b.animals[i].exit);
    }
    for (size_t i = 0; i < a.encounters.size(); ++i) {
        const Encounter& x = a.encounters[i];
        const Encounter& y = b.encounters[i];
        ASSERT_TRUE(x.uid == y.uid && x.seq == y.seq && x.date == y.date && x.time == y.time && x.winner == y.winner &&
                    x.loser == y.loser && x.outcome == y.outcome && x.behaviour == y.behaviour && x.group == y.group &&
                    x.observer == y.observer && x.note == y.note)
            << "encounter " << i;
    }
    // Importing the same export again is refused: the records are already there.
    const CliResult twice = runCli({"import", second, "--encounters", dir.file("a/encounters.csv")});
    EXPECT_EQ(twice.status, 2);
    EXPECT_NE(twice.err.find(":2: uid:"), std::string::npos);
}

TEST(CliFiles, OutFileIsWrittenWhole)
{
    CliTempDir dir;
    const std::string colony = dir.file("d.hierloom");
    ASSERT_EQ(runCli({"demo", colony}).status, 0);
    const CliResult r = runCli({"ranks", colony, "--out", dir.file("ranks.csv")});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_TRUE(r.out.empty());
    const auto rows = lines(CliTempDir::read(dir.file("ranks.csv")));
    ASSERT_GT(rows.size(), 10U);
    EXPECT_EQ(rows[0], "animal,rank,score,start_rule"); // Elo tables end with the start rule used
    EXPECT_FALSE(std::filesystem::exists(dir.file("ranks.csv.part")));
}

TEST(CliFiles, ARefusedImportIntoAnOlderFileSaysTheFileWasUpdated)
{
    // A version-1 file as that program wrote it: two animals, one encounter.
    CliTempDir dir;
    const std::string colony = dir.file("old.hierloom");
    sqlite3* db = nullptr;
    ASSERT_EQ(sqlite3_open(colony.c_str(), &db), SQLITE_OK);
    const std::string sql =
        std::string("BEGIN;") + hierloom::core::schemaVersion1Sql() +
        "INSERT INTO animal(uid, id, sex, entry_date, entry_type) VALUES "
        "('11111111-1111-4111-8111-111111111111', 'F1', 'F', '2010-01-01', 'founder'),"
        "('22222222-2222-4222-8222-222222222222', 'M1', 'M', '2010-01-01', 'founder');"
        "INSERT INTO encounter(seq, uid, date, winner, loser, grp) VALUES "
        "(1, '55555555-5555-4555-8555-555555555555', '2011-01-01', 'F1', 'M1', 'main');"
        "PRAGMA application_id = " + std::to_string(hierloom::core::colonyApplicationId) +
        "; PRAGMA user_version = 1; COMMIT;";
    ASSERT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    sqlite3_close(db);
    const std::string bad = dir.write("bad.csv", "date,winner,loser\n2011-02-30,F1,M1\n");

    const CliResult r = runCli({"import", colony, "--encounters", bad});
    EXPECT_EQ(r.status, 2);
    EXPECT_NE(r.err.find("bad.csv:2: date:"), std::string::npos) << r.err;
    // Not "unchanged": the open for writing updated the file and kept its old form.
    EXPECT_EQ(r.err.find(colony + " is unchanged"), std::string::npos) << r.err;
    EXPECT_NE(r.err.find("the records of " + colony + " are unchanged (the file was first updated from file version 1 "
                         "to " + std::to_string(hierloom::core::currentSchemaVersion)),
              std::string::npos)
        << r.err;
    EXPECT_TRUE(std::filesystem::exists(colony + ".v1.bak"));
    EXPECT_EQ(hierloom::core::probeColonyFile(colony), hierloom::core::currentSchemaVersion);

    // A second refused import into the now current file is "unchanged", byte for byte.
    const std::string before = CliTempDir::read(colony);
    const CliResult again = runCli({"import", colony, "--encounters", bad});
    EXPECT_EQ(again.status, 2);
    EXPECT_NE(again.err.find("nothing was imported; " + colony + " is unchanged"), std::string::npos) << again.err;
    EXPECT_EQ(CliTempDir::read(colony), before);
}
