// SPDX-License-Identifier: GPL-3.0-or-later
// Uids stored as 16 bytes (schema version 4): the stored form and its text
// fallback, the audit rows that keep text uids, and the migration of
// version-1, -2 and -3 files, including a migration killed half-way.
#include "core/base/derived_uid.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/record_history.h"
#include "core/store/uid_storage.h"
#include "import_test_support.h"
#include "file_queries.h"
#include "killed_open.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <chrono>
#include <csignal>
#include <filesystem>
#include <random>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>

using namespace hierloom::core;
using hierloom::test::scalar;
using hierloom::test::scalarOfFile;
using hierloom::test::TempDir;

namespace {

Day day(const char* text) { return *parseDate(text); }

/// The schema SQL as programs before version 4 wrote it: the audit triggers
/// put the uid column itself (then always text) into the audit row.
std::string olderForm(std::string sql)
{
    for (const char* row : {"new", "old"})
        for (const char* column : {"uid", "encounter"}) {
            const std::string value = std::string(row) + "." + column;
            const std::string now = uidTextSql(value);
            for (size_t at = sql.find(now); at != std::string::npos; at = sql.find(now, at + value.size()))
                sql.replace(at, now.size(), value);
        }
    return sql;
}

const char* kCanonical = "11111111-1111-4111-8111-111111111111";
const char* kUpperCase = "ABCDEF01-2345-4678-89AB-CDEF01234567"; // valid in an import file, not canonical
const char* kHandMade = "legacy-animal-7";                        // written by another tool
const char* kEncounterUid = "55555555-5555-4555-8555-555555555555";
const char* kSecondEncounterUid = "5555aaaa-5555-4555-8555-5555aaaa5555";

/// A file as the program of `version` (1, 2 or 3) wrote it, with records
/// whose uids are canonical, upper-case and hand-made; supporters in a
/// version-3 file.
std::string writeOlderFile(const TempDir& dir, int version, const std::string& name = "")
{
    const std::string path = dir.file(name.empty() ? "v" + std::to_string(version) + ".hierloom" : name);
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    std::string sql = std::string("PRAGMA journal_mode = WAL; BEGIN;") + schemaVersion1Sql();
    if (version >= 2) sql += olderForm(schemaVersion2Sql());
    if (version >= 3) sql += olderForm(std::string(encounterIndexSqlBeforeVersion5()) + schemaVersion3Sql());
    sql += std::string("INSERT INTO animal(uid, id, sex, entry_date, entry_type) VALUES "
                       "('") + kCanonical + "', 'F1', 'F', '2010-01-01', 'founder'),"
           "('" + kUpperCase + "', 'M1', 'M', '2010-01-01', 'founder'),"
           "('" + kHandMade + "', 'F2', 'F', '2010-01-01', 'founder');"
           "INSERT INTO residence(uid, animal, grp, from_date) VALUES "
           "('33333333-3333-4333-8333-333333333333', 'F1', 'main', '2010-01-01'),"
           "('44444444-4444-4444-8444-444444444444', 'M1', 'main', '2010-01-01'),"
           "('77777777-7777-4777-8777-777777777777', 'F2', 'main', '2010-01-01');"
           "INSERT INTO encounter(seq, uid, date, winner, loser, grp) VALUES "
           "(1, '" + kEncounterUid + "', '2011-01-01', 'F1', 'M1', 'main'),"
           "(2, '" + kSecondEncounterUid + "', '2011-01-02', 'M1', 'F2', 'main');";
    if (version >= 3)
        sql += std::string("INSERT INTO encounter_support(encounter, animal, side) VALUES ('") + kEncounterUid +
               "', 'F2', 'winner');";
    sql += "PRAGMA application_id = " + std::to_string(colonyApplicationId) +
           "; PRAGMA user_version = " + std::to_string(version) + "; COMMIT;";
    EXPECT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    sqlite3_close(db);
    return path;
}

} // namespace

TEST(CompactUid, CanonicalTextIsItsSixteenBytesAndBack)
{
    // The bytes of a UUID are its 32 hex digits in order (RFC 9562, section 4).
    const auto b = compactUid("00112233-4455-6677-8899-aabbccddeeff");
    ASSERT_TRUE(b);
    for (size_t i = 0; i < 16; ++i) EXPECT_EQ((*b)[i], i * 0x11) << i;
    EXPECT_EQ(uidText(b->data()), "00112233-4455-6677-8899-aabbccddeeff");
    // Anything that would not read back exactly stays text.
    EXPECT_FALSE(compactUid(kUpperCase));
    EXPECT_FALSE(compactUid(kHandMade));
    EXPECT_FALSE(compactUid("00112233-4455-6677-8899-aabbccddeef"));    // 35 characters
    EXPECT_FALSE(compactUid("00112233-4455-6677-8899-aabbccddeeff0"));  // 37
    EXPECT_FALSE(compactUid("001122334-455-6677-8899-aabbccddeeff"));   // a dash moved
    EXPECT_FALSE(compactUid("00112233-4455-6677-8899-aabbccddeefg"));   // not hex
    // Derived uids (imports) have the canonical form, so they are stored compactly.
    EXPECT_TRUE(compactUid(derivedUid("encounters.csv:7")));
    EXPECT_TRUE(compactUid(derivedRowUid("encounters.csv", 123456, "2011-01-01,F1,M1")));
}

TEST(CompactUid, RandomUidsRoundTripAndOnlyTheCanonicalCaseIsCompacted)
{
    std::mt19937_64 rng(17);
    for (int i = 0; i < 2000; ++i) {
        UidBytes bytes{};
        for (auto& c : bytes) c = static_cast<unsigned char>(rng());
        const std::string text = uidText(bytes.data());
        const auto back = compactUid(text);
        ASSERT_TRUE(back) << text;
        EXPECT_EQ(*back, bytes) << text;
        std::string upper = text;
        for (char& c : upper) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
        EXPECT_EQ(compactUid(upper).has_value(), upper == text) << upper; // all-digit uids have no case
    }
}

TEST(CompactUid, StoredAsBytesOrTextAndReadBackExactly)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    {
        ColonyStore store = ColonyStore::create(path);
        std::vector<Animal> animals(3);
        const char* ids[] = {"F1", "M1", "F2"};
        const char* uids[] = {kCanonical, kUpperCase, kHandMade};
        for (size_t i = 0; i < 3; ++i) {
            animals[i].id = ids[i];
            animals[i].uid = uids[i];
            animals[i].sex = Sex::Female;
        }
        std::vector<Residence> stays = {{"F1", "main", day("2010-01-01"), std::nullopt, kHandMade},
                                        {"M1", "main", day("2010-01-01"), std::nullopt, ""}};
        std::vector<Encounter> encounters(2);
        encounters[0].uid = kEncounterUid;
        encounters[1].uid = kUpperCase;
        for (Encounter& e : encounters) {
            e.date = day("2011-01-01");
            e.winner = "F1";
            e.loser = "M1";
            e.group = "main";
            e.loserSupport = {"F2"};
        }
        store.append(animals, stays, encounters);
        EXPECT_FALSE(stays[1].uid.empty()); // a new uid, canonical
        EXPECT_EQ(scalar(store.handle(), "SELECT typeof(uid) || length(uid) FROM residence WHERE animal = 'M1'"), "blob16");
    }
    ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    sqlite3* db = store.handle();
    EXPECT_EQ(scalar(db, "SELECT typeof(uid) || length(uid) FROM animal WHERE id = 'F1'"), "blob16");
    EXPECT_EQ(scalar(db, "SELECT typeof(uid) FROM animal WHERE id = 'M1'"), "text");
    EXPECT_EQ(scalar(db, "SELECT typeof(uid) FROM animal WHERE id = 'F2'"), "text");
    EXPECT_EQ(scalar(db, "SELECT typeof(uid) || length(uid) FROM encounter WHERE seq = 1"), "blob16");
    EXPECT_EQ(scalar(db, "SELECT typeof(uid) FROM encounter WHERE seq = 2"), "text");
    EXPECT_EQ(scalar(db, "SELECT group_concat(t) FROM (SELECT typeof(encounter) AS t FROM encounter_support ORDER BY rowid)"), "blob,text");
    const Colony c = store.load();
    ASSERT_EQ(c.animals.size(), 3U);
    EXPECT_EQ(c.animals[0].uid, kCanonical); // ordered by id: F1, F2, M1
    EXPECT_EQ(c.animals[1].uid, kHandMade);
    EXPECT_EQ(c.animals[2].uid, kUpperCase);
    EXPECT_EQ(c.residences[0].uid, kHandMade);
    ASSERT_EQ(c.encounters.size(), 2U);
    EXPECT_EQ(c.encounters[0].uid, kEncounterUid);
    EXPECT_EQ(c.encounters[1].uid, kUpperCase);
    EXPECT_EQ(c.encounters[0].loserSupport, std::vector<std::string>{"F2"});
    EXPECT_EQ(c.encounters[1].loserSupport, std::vector<std::string>{"F2"});
    EXPECT_EQ(store.encounterUids(), (std::unordered_set<std::string>{kEncounterUid, kUpperCase}));
}

TEST(CompactUid, AuditRowsKeepTheUidAsText)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("a.hierloom"));
    std::vector<Animal> animals(2);
    animals[0].id = "F1";
    animals[1].id = "M1";
    std::vector<Encounter> one(1);
    one[0].uid = kEncounterUid;
    one[0].date = day("2011-01-01");
    one[0].winner = "F1";
    one[0].loser = "M1";
    std::vector<Residence> none;
    store.append(animals, none, one);
    store.exec("UPDATE encounter SET note = 'limped' WHERE seq = 1");
    sqlite3* db = store.handle();
    EXPECT_EQ(scalar(db, "SELECT typeof(uid) || ' ' || uid FROM audit WHERE tbl = 'encounter' AND action = 'update'"),
              std::string("text ") + kEncounterUid);
    EXPECT_EQ(scalar(db, "SELECT json_extract(new_values, '$.uid') FROM audit WHERE action = 'update'"), kEncounterUid);
    EXPECT_EQ(scalar(db, "SELECT json_extract(new_values, '$.uid') FROM audit WHERE tbl = 'animal' AND "
                         "json_extract(new_values, '$.id') = 'F1'"),
              animals[0].uid);
    // The history of a record is found by its text uid, the import row by its encounter's seq.
    const std::vector<AuditEntry> history = recordHistory(store, kEncounterUid);
    ASSERT_EQ(history.size(), 2U);
    EXPECT_EQ(history[0].action, "insert");
    EXPECT_EQ(history[1].action, "update");
    EXPECT_EQ(animalUid(store, "F1"), animals[0].uid);
}

TEST(CompactUid, VersionOneTwoAndThreeFilesMigrateAndReadBackIdentically)
{
    for (int version : {1, 2, 3}) {
        SCOPED_TRACE(version);
        TempDir dir;
        const std::string path = writeOlderFile(dir, version);
        ASSERT_EQ(probeColonyFile(path), version);
        const std::string auditBefore =
            version >= 2 ? scalarOfFile(path, "SELECT group_concat(uid || action, ';') FROM audit ORDER BY id") : "";
        {
            ColonyStore store = ColonyStore::open(path);
            EXPECT_EQ(store.schemaVersion(), currentSchemaVersion);
            const Colony c = store.load();
            ASSERT_EQ(c.animals.size(), 3U);
            EXPECT_EQ(c.animals[0].uid, kCanonical);
            EXPECT_EQ(c.animals[1].uid, kHandMade);
            EXPECT_EQ(c.animals[2].uid, kUpperCase);
            ASSERT_EQ(c.residences.size(), 3U);
            EXPECT_EQ(c.residences[0].uid, "33333333-3333-4333-8333-333333333333");
            ASSERT_EQ(c.encounters.size(), 2U);
            EXPECT_EQ(c.encounters[0].uid, kEncounterUid);
            EXPECT_EQ(c.encounters[1].uid, kSecondEncounterUid);
            EXPECT_EQ(c.encounters[0].winner, "F1");
            EXPECT_EQ(c.encounters[1].date, day("2011-01-02"));
            if (version == 3) EXPECT_EQ(c.encounters[0].winnerSupport, std::vector<std::string>{"F2"});
            sqlite3* db = store.handle();
            EXPECT_EQ(scalar(db, "SELECT group_concat(typeof(uid)) FROM (SELECT uid FROM animal ORDER BY id)"),
                      "blob,text,text");
            EXPECT_EQ(scalar(db, "SELECT group_concat(typeof(uid)) FROM encounter"), "blob,blob");
            if (version == 3)
                EXPECT_EQ(scalar(db, "SELECT typeof(encounter) || length(encounter) FROM encounter_support"), "blob16");
            // The history written before the update is kept as it was.
            if (version >= 2)
                EXPECT_EQ(scalar(db, "SELECT group_concat(uid || action, ';') FROM audit ORDER BY id"), auditBefore);
            // The recreated triggers write text uids (the old ones would fail on bytes).
            store.exec("UPDATE encounter SET note = 'after' WHERE seq = 1");
            store.exec("DELETE FROM encounter_support");
            EXPECT_EQ(scalar(db, "SELECT uid FROM audit WHERE tbl = 'encounter' AND action = 'update'"), kEncounterUid);
            const std::vector<AuditEntry> history = recordHistory(store, kEncounterUid);
            ASSERT_FALSE(history.empty());
            EXPECT_EQ(history.back().action, version == 3 ? "delete" : "update");
        }
        EXPECT_EQ(probeColonyFile(path + ".v" + std::to_string(version) + ".bak"), version);
        EXPECT_EQ(scalarOfFile(path, "PRAGMA integrity_check"), "ok");
        EXPECT_EQ(scalarOfFile(path, "PRAGMA foreign_key_check"), "<none>");
    }
}

namespace {

/// A version-3 file with `n` encounters (made by SQL, in the older form).
std::string writeLargeVersion3File(const TempDir& dir, const std::string& name, int n)
{
    const std::string path = writeOlderFile(dir, 3, name);
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    const std::string sql =
        "BEGIN; INSERT INTO audit_pause VALUES ('test');"
        "WITH RECURSIVE k(i) AS (SELECT 3 UNION ALL SELECT i + 1 FROM k WHERE i < " + std::to_string(n + 2) + ") "
        "INSERT INTO encounter(seq, uid, date, winner, loser, grp) SELECT i, "
        "lower(printf('%08x-%04x-4%03x-8%03x-%012x', i * 2654435761 % 4294967296, i % 65536, i % 4096, i % 4095, i)), "
        "'2012-01-01', CASE WHEN i % 2 THEN 'F1' ELSE 'M1' END, CASE WHEN i % 2 THEN 'M1' ELSE 'F1' END, 'main' FROM k;"
        "DELETE FROM audit_pause; COMMIT;";
    EXPECT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    sqlite3_close(db);
    return path;
}

std::string contentOf(const std::string& path)
{
    ColonyStore store = ColonyStore::open(path);
    std::string out;
    for (const Encounter& e : store.loadEncounters()) out += std::to_string(e.seq) + e.uid + e.winner + ";";
    for (const Animal& a : store.loadAnimals()) out += a.uid + a.id + ";";
    return out;
}

} // namespace

// A migration killed at seeded random moments (SIGKILL) leaves a file that
// is either the old version with its text uids or the new one, complete.
TEST(CompactUid, AKilledMigrationLeavesTheOldFileOrTheWholeNewOne)
{
    TempDir dir;
    constexpr int n = 40000;
    const std::string reference = writeLargeVersion3File(dir, "reference.hierloom", n);
    const std::string oldTexts = scalarOfFile(reference, "SELECT count(*) FROM encounter WHERE typeof(uid) = 'text'");
    ASSERT_EQ(oldTexts, std::to_string(n + 2));
    const auto t0 = std::chrono::steady_clock::now();
    const std::string expected = contentOf(reference); // migrates the reference
    const double full = std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
    std::mt19937 rng(4);
    int killedBefore = 0, killedAfter = 0;
    for (int round = 0; round < 6; ++round) {
        SCOPED_TRACE(round);
        const std::string path = writeLargeVersion3File(dir, "r" + std::to_string(round) + ".hierloom", n);
        hierloom::test::openAndKillAtRandomMoment(path, full, rng);
        const std::string version = scalarOfFile(path, "PRAGMA user_version");
        EXPECT_EQ(scalarOfFile(path, "PRAGMA integrity_check"), "ok");
        if (version == "3") {
            ++killedBefore;
            EXPECT_EQ(scalarOfFile(path, "SELECT count(*) FROM encounter WHERE typeof(uid) = 'text'"), oldTexts);
        } else {
            ++killedAfter;
            EXPECT_EQ(version, std::to_string(currentSchemaVersion));
            EXPECT_EQ(scalarOfFile(path, "SELECT count(*) FROM encounter WHERE typeof(uid) = 'text'"), "0");
        }
        EXPECT_EQ(contentOf(path), expected); // the survivor, opened again, migrates to the same records
    }
    std::printf("killed migrations: %d left version 3, %d the current one (a full one %.2f s)\n", killedBefore, killedAfter,
                full);
}
