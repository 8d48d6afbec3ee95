// SPDX-License-Identifier: GPL-3.0-or-later
// Schema version 5: encounters in `encounter_row` (day numbers, 0/1 outcomes,
// codes into `encounter_term`) behind the view `encounter` with the columns
// and texts of versions 1-4. The migration of version-1 to -4 files, the view
// and its INSTEAD OF triggers, the audit JSON (the same text as before), the
// keys that follow a renamed animal, and a migration killed half-way.
#include "core/store/colony_edits.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"
#include "import_test_support.h"
#include "file_queries.h"
#include "killed_open.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <chrono>
#include <csignal>
#include <random>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

using namespace hierloom::core;
using hierloom::test::scalar;
using hierloom::test::scalarOfFile;
using hierloom::test::TempDir;

namespace {

/// Runs `sql` on the file as another tool would (foreign keys on): "" or SQLite's message.
std::string execOnFile(const std::string& path, const std::string& sql)
{
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    sqlite3_exec(db, "PRAGMA foreign_keys = ON", nullptr, nullptr, nullptr);
    char* error = nullptr;
    sqlite3_exec(db, sql.c_str(), nullptr, nullptr, &error);
    std::string out = error ? error : "";
    sqlite3_free(error);
    sqlite3_close(db);
    return out;
}

/// Every encounter as the view (or the old table) shows it, uids as text: one JSON text.
std::string encounterRows(const std::string& path)
{
    return scalarOfFile(path, "SELECT json_group_array(json_array(seq, " + uidTextSql("uid") +
                                  ", date, time, winner, loser, outcome, behaviour, grp, observer, note, "
                                  "typeof(date), typeof(outcome))) FROM (SELECT * FROM encounter ORDER BY seq)");
}

std::string supportRows(const std::string& path)
{
    return scalarOfFile(path, "SELECT json_group_array(json_array(rowid, " + uidTextSql("encounter") +
                                  ", animal, side)) FROM (SELECT rowid, * FROM encounter_support ORDER BY rowid)");
}

std::string auditRows(const std::string& path)
{
    return scalarOfFile(path, "SELECT json_group_array(json_array(tbl, uid, action, old_values, new_values)) "
                              "FROM (SELECT * FROM audit ORDER BY id)");
}

/// A file as the program of `version` (1-4) wrote it: three animals, five
/// encounters with draws, times, behaviours, observers, notes and an empty
/// group; supporters from version 3; 16-byte uids from version 4.
std::string writeOlderFile(const TempDir& dir, int version, const std::string& name, int extra = 0)
{
    const std::string path = dir.file(name);
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    std::string sql = std::string("PRAGMA journal_mode = WAL; BEGIN;") + schemaVersion1Sql();
    if (version >= 2) sql += schemaVersion2Sql();
    if (version >= 3) sql += std::string(encounterIndexSqlBeforeVersion5()) + schemaVersion3Sql();
    sql += "INSERT INTO animal(uid, id, sex, entry_date, entry_type) VALUES "
           "('11111111-1111-4111-8111-111111111111', 'F1', 'F', '2010-01-01', 'founder'),"
           "('22222222-2222-4222-8222-222222222222', 'M1', 'M', '2010-01-01', 'founder'),"
           "('legacy-animal-7', 'F2', 'F', '2010-01-01', 'founder');"
           "INSERT INTO residence(uid, animal, grp, from_date) VALUES "
           "('33333333-3333-4333-8333-333333333333', 'F1', 'main', '2010-01-01'),"
           "('44444444-4444-4444-8444-444444444444', 'M1', 'main', '2010-01-01'),"
           "('77777777-7777-4777-8777-777777777777', 'F2', 'main', '2010-01-01');"
           "INSERT INTO encounter(seq, uid, date, time, winner, loser, outcome, behaviour, grp, observer, note) VALUES "
           "(1, '55555555-5555-4555-8555-555555555555', '2011-01-01', 480, 'F1', 'M1', 'decided', 'bite', 'main', 'ana', ''),"
           "(2, 'ABCDEF01-2345-4678-89AB-CDEF01234567', '2011-01-02', NULL, 'M1', 'F2', 'draw', '', 'main', '', 'a note, \"quoted\"'),"
           "(3, '66666666-6666-4666-8666-666666666666', '1969-12-31', 0, 'F2', 'F1', 'decided', 'chase', '', 'ben', ''),"
           "(5, 'hand-made-encounter', '2024-02-29', 1439, 'F1', 'F2', 'decided', 'main', 'east', 'ana', ''),"
           "(4, '88888888-8888-4888-8888-888888888888', '2011-01-02', 600, 'F1', 'M1', 'draw', 'bite', 'main', 'ana', '');";
    if (extra > 0)
        sql += "WITH RECURSIVE k(i) AS (SELECT 6 UNION ALL SELECT i + 1 FROM k WHERE i < " + std::to_string(extra + 5) +
               ") INSERT INTO encounter(seq, uid, date, time, winner, loser, outcome, behaviour, grp, observer) SELECT i, "
               "lower(printf('%08x-%04x-4%03x-8%03x-%012x', i * 2654435761 % 4294967296, i % 65536, i % 4096, "
               "i % 4095, i)), date('2012-01-01', '+' || (i / 20) || ' days'), i % 1440, "
               "CASE WHEN i % 2 THEN 'F1' ELSE 'M1' END, CASE WHEN i % 2 THEN 'M1' ELSE 'F1' END, "
               "CASE WHEN i % 50 THEN 'decided' ELSE 'draw' END, CASE WHEN i % 3 THEN 'bite' ELSE 'chase' END, "
               "'main', 'ana' FROM k;";
    if (version >= 3)
        sql += "INSERT INTO encounter_support(encounter, animal, side) VALUES "
               "('55555555-5555-4555-8555-555555555555', 'F2', 'winner'),"
               "('hand-made-encounter', 'M1', 'loser');";
    sql += "PRAGMA application_id = " + std::to_string(colonyApplicationId) +
           "; PRAGMA user_version = " + std::to_string(version) + "; COMMIT;";
    EXPECT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    if (version >= 4) {
        // Version 4 stored canonical uids as 16 bytes (its migration's own statements).
        registerCompactUidFunction(db);
        const char* compact = "INSERT INTO audit_pause VALUES ('test');"
                              "UPDATE animal SET uid = hierloom_compact_uid(uid);"
                              "UPDATE residence SET uid = hierloom_compact_uid(uid);"
                              "UPDATE encounter SET uid = hierloom_compact_uid(uid);"
                              "UPDATE encounter_support SET encounter = hierloom_compact_uid(encounter);"
                              "DELETE FROM audit_pause;";
        EXPECT_EQ(sqlite3_exec(db, compact, nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    }
    sqlite3_close(db);
    return path;
}

/// Edits made with SQL on the encounters, as a version-4 file takes them on
/// its table and a version-5 file through its view.
const char* kEdits = "UPDATE encounter SET note = 'limped', grp = 'west', outcome = 'draw' WHERE seq = 1;"
                     "UPDATE encounter SET date = '2012-03-04', time = NULL, behaviour = 'new code' WHERE seq = 3;"
                     "DELETE FROM encounter WHERE seq = 4;"
                     "INSERT INTO encounter(seq, uid, date, time, winner, loser, outcome, behaviour, grp, observer, note) "
                     "VALUES (9, 'inserted-by-hand', '2013-05-06', 75, 'M1', 'F1', 'decided', 'grab', 'main', 'cy', 'x');";

} // namespace

TEST(EncounterRows, VersionOneToFourFilesMigrateAndShowTheSameEncounters)
{
    for (int version : {1, 2, 3, 4}) {
        SCOPED_TRACE(version);
        TempDir dir;
        const std::string path = writeOlderFile(dir, version, "c.hierloom");
        const std::string rowsBefore = encounterRows(path);
        const std::string supportBefore = version >= 3 ? supportRows(path) : "";
        const std::string auditBefore = version >= 2 ? auditRows(path) : "";
        ASSERT_NE(rowsBefore.find("2024-02-29"), std::string::npos) << rowsBefore;
        {
            ColonyStore store = ColonyStore::open(path);
            EXPECT_EQ(store.schemaVersion(), 5);
            const Colony c = store.load();
            ASSERT_EQ(c.encounters.size(), 5U);
            EXPECT_EQ(c.encounters[0].uid, "55555555-5555-4555-8555-555555555555");
            EXPECT_EQ(c.encounters[0].time, 480);
            EXPECT_EQ(c.encounters[0].behaviour, "bite");
            EXPECT_EQ(c.encounters[0].observer, "ana");
            EXPECT_EQ(c.encounters[1].uid, "ABCDEF01-2345-4678-89AB-CDEF01234567");
            EXPECT_EQ(c.encounters[1].outcome, Outcome::Draw);
            EXPECT_EQ(c.encounters[1].note, "a note, \"quoted\"");
            EXPECT_EQ(c.encounters[2].date, -1);
            EXPECT_EQ(c.encounters[2].group, "");
            EXPECT_EQ(c.encounters[3].seq, 4);
            EXPECT_EQ(c.encounters[4].uid, "hand-made-encounter");
            EXPECT_EQ(c.encounters[4].date, *parseDate("2024-02-29"));
            EXPECT_EQ(c.encounters[4].behaviour, "main"); // a behaviour and a group may share a text
            EXPECT_EQ(c.encounters[4].group, "east");
            if (version >= 3) EXPECT_EQ(c.encounters[4].loserSupport, std::vector<std::string>{"M1"});
            EXPECT_EQ(store.lastEncounterDay(), *parseDate("2024-02-29"));
            EXPECT_EQ(store.loadEncounters(EncounterScope{"east", {}, {}}).size(), 1U);
        }
        EXPECT_EQ(encounterRows(path), rowsBefore);
        if (version >= 3) EXPECT_EQ(supportRows(path), supportBefore);
        if (version >= 2) EXPECT_EQ(auditRows(path), auditBefore);
        EXPECT_EQ(scalarOfFile(path, "SELECT type FROM sqlite_schema WHERE name = 'encounter'"), "view");
        EXPECT_EQ(scalarOfFile(path, "SELECT group_concat(text, ',') FROM (SELECT text FROM encounter_term ORDER BY code)"),
                  ",ana,bite,main,ben,chase,east");
        EXPECT_EQ(scalarOfFile(path, "SELECT group_concat(typeof(day) || typeof(draw) || typeof(grp), ',') FROM encounter_row"),
                  "integerintegerinteger,integerintegerinteger,integerintegerinteger,integerintegerinteger,"
                  "integerintegerinteger");
        EXPECT_EQ(scalarOfFile(path, "SELECT count(*) FROM sqlite_schema WHERE name = 'encounter_by_group' AND "
                                     "tbl_name = 'encounter_row'"),
                  "1");
        EXPECT_EQ(probeColonyFile(path + ".v" + std::to_string(version) + ".bak"), version);
        EXPECT_EQ(scalarOfFile(path, "PRAGMA integrity_check"), "ok");
        EXPECT_EQ(scalarOfFile(path, "PRAGMA foreign_key_check"), "<none>");
    }
}

// The audit rows of edits made through the view are the same text as those
// of the same edits on a version-4 file's table: history and merge compare them.
TEST(EncounterRows, AuditRowsOfEditsAreTheSameTextAsBefore)
{
    TempDir dir;
    const std::string old = writeOlderFile(dir, 4, "old.hierloom");
    const std::string migrated = writeOlderFile(dir, 4, "new.hierloom");
    ColonyStore::open(migrated); // to version 5
    ASSERT_EQ(scalarOfFile(migrated, "PRAGMA user_version"), "5");
    const std::string added = "INSERT INTO animal(uid, id, sex) VALUES ('99999999-9999-4999-8999-999999999999', 'cy', 'U');"
                              "INSERT INTO observer(name) VALUES ('cy');";
    for (const std::string& path : {old, migrated}) {
        ASSERT_EQ(execOnFile(path, "DELETE FROM audit;" + added + kEdits), "") << path;
        ASSERT_EQ(execOnFile(path, "DELETE FROM encounter_support;"), "") << path;
    }
    const std::string before = auditRows(old);
    EXPECT_NE(before.find("limped"), std::string::npos);
    EXPECT_NE(before.find("\\\"date\\\":\\\"2012-03-04\\\""), std::string::npos) << before;
    EXPECT_EQ(auditRows(migrated), before);
    EXPECT_EQ(encounterRows(migrated), encounterRows(old));
    EXPECT_EQ(scalarOfFile(migrated, "PRAGMA foreign_key_check"), "<none>");
}

TEST(EncounterRows, TheViewRefusesWhatTheOldTableRefused)
{
    TempDir dir;
    const std::string path = writeOlderFile(dir, 4, "c.hierloom");
    ColonyStore::open(path);
    const std::string insert =
        "INSERT INTO encounter(uid, date, winner, loser, outcome) VALUES ('x', ";
    EXPECT_NE(execOnFile(path, insert + "'2021-02-30', 'F1', 'M1', 'decided')"), "");  // not a day of the calendar
    EXPECT_NE(execOnFile(path, insert + "'2021-2-3', 'F1', 'M1', 'decided')"), "");    // not YYYY-MM-DD
    EXPECT_NE(execOnFile(path, insert + "'2021-02-03', 'F1', 'M1', 'won')"), "");      // no such outcome
    EXPECT_NE(execOnFile(path, insert + "'2021-02-03', 'F1', 'F1', 'decided')"), "");  // winner is loser
    EXPECT_NE(execOnFile(path, insert + "'2021-02-03', 'F1', 'nobody', 'decided')"), ""); // no such animal
    EXPECT_NE(execOnFile(path, "UPDATE encounter SET time = 1440 WHERE seq = 1"), "");
    EXPECT_NE(execOnFile(path, "INSERT INTO encounter_support(encounter, animal, side) VALUES ('no-such', 'F1', 'winner')"), "");
    EXPECT_EQ(scalarOfFile(path, "SELECT count(*) FROM encounter"), "5");
    EXPECT_EQ(execOnFile(path, insert + "'2021-02-03', 'F1', 'M1', 'decided')"), "");
    EXPECT_EQ(scalarOfFile(path, "SELECT date || outcome || behaviour || grp FROM encounter WHERE uid = 'x'"),
              "2021-02-03decided");
}

// An animal renamed with SQL (ON UPDATE CASCADE, as before) keeps its
// encounters and supporters; deleting an encounter deletes its supporters.
TEST(EncounterRows, RenamedAnimalsAndDeletedEncountersKeepTheKeys)
{
    TempDir dir;
    const std::string path = writeOlderFile(dir, 4, "c.hierloom");
    ColonyStore::open(path);
    ASSERT_EQ(execOnFile(path, "UPDATE animal SET id = 'F9' WHERE id = 'F2'"), "");
    EXPECT_EQ(scalarOfFile(path, "SELECT group_concat(winner || loser, ',') FROM (SELECT * FROM encounter ORDER BY seq)"),
              "F1M1,M1F9,F9F1,F1M1,F1F9");
    EXPECT_EQ(scalarOfFile(path, "SELECT group_concat(animal, ',') FROM encounter_support"), "F9,M1");
    EXPECT_NE(execOnFile(path, "DELETE FROM animal WHERE id = 'F9'"), ""); // still named by encounters
    {
        ColonyStore store = ColonyStore::open(path);
        EXPECT_EQ(deleteEncounters(store, {"55555555-5555-4555-8555-555555555555"}).size(), 1U);
    }
    EXPECT_EQ(scalarOfFile(path, "SELECT group_concat(animal, ',') FROM encounter_support"), "M1");
    EXPECT_EQ(scalarOfFile(path, "SELECT count(*) FROM encounter"), "4");
    EXPECT_EQ(scalarOfFile(path, "PRAGMA foreign_key_check"), "<none>");
}

TEST(EncounterRows, AnImpossibleDateStopsTheMigrationAndLeavesTheFile)
{
    TempDir dir;
    const std::string path = writeOlderFile(dir, 4, "c.hierloom");
    ASSERT_EQ(execOnFile(path, "UPDATE encounter SET date = '2021-02-30' WHERE seq = 3"), "");
    try {
        ColonyStore::open(path);
        ADD_FAILURE() << "a file with an impossible date was migrated";
    } catch (const ColonyFileError& e) {
        EXPECT_EQ(e.kind(), ColonyFileError::Kind::Damaged);
        EXPECT_EQ(std::string(e.what()), path + ": holds an impossible date '2021-02-30'");
    }
    EXPECT_EQ(scalarOfFile(path, "PRAGMA user_version"), "4");
    EXPECT_EQ(scalarOfFile(path, "SELECT type FROM sqlite_schema WHERE name = 'encounter'"), "table");
}

// A migration from version 4 killed at seeded random moments (SIGKILL)
// leaves either the version-4 file or the whole version-5 one.
TEST(EncounterRows, AKilledMigrationLeavesTheOldFileOrTheWholeNewOne)
{
    TempDir dir;
    constexpr int n = 40000;
    const std::string reference = writeOlderFile(dir, 4, "reference.hierloom", n);
    const std::string rows = encounterRows(reference);
    const auto t0 = std::chrono::steady_clock::now();
    ColonyStore::open(reference);
    const double full = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    ASSERT_EQ(encounterRows(reference), rows);
    std::mt19937 rng(5);
    int killedBefore = 0, killedAfter = 0;
    for (int round = 0; round < 6; ++round) {
        SCOPED_TRACE(round);
        const std::string path = writeOlderFile(dir, 4, "r" + std::to_string(round) + ".hierloom", n);
        hierloom::test::openAndKillAtRandomMoment(path, full, rng);
        const std::string version = scalarOfFile(path, "PRAGMA user_version");
        EXPECT_EQ(scalarOfFile(path, "PRAGMA integrity_check"), "ok");
        EXPECT_EQ(encounterRows(path), rows); // the old table or the whole view
        if (version == "4") {
            ++killedBefore;
            EXPECT_EQ(scalarOfFile(path, "SELECT type FROM sqlite_schema WHERE name = 'encounter'"), "table");
        } else {
            ++killedAfter;
            EXPECT_EQ(version, "5");
            EXPECT_EQ(scalarOfFile(path, "SELECT count(*) FROM encounter_row"), std::to_string(n + 5));
        }
        ColonyStore::open(path); // the survivor migrates to the same rows
        EXPECT_EQ(encounterRows(path), rows);
    }
    std::printf("killed migrations: %d left version 4, %d version 5 (a full one %.2f s)\n", killedBefore, killedAfter,
                full);
}
