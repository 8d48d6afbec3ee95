// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_store.h"
#include "core/store/record_history.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

Animal founder(const std::string& id, Sex sex)
{
    Animal a;
    a.id = id;
    a.sex = sex;
    a.entry = parseDate("2010-01-01");
    a.entryType = EntryType::Founder;
    return a;
}

Encounter encounter(const std::string& winner, const std::string& loser, Day date)
{
    Encounter e;
    e.date = date;
    e.winner = winner;
    e.loser = loser;
    e.group = "main";
    return e;
}

std::int64_t count(const ColonyStore& store, const char* sql)
{
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(store.handle(), sql, -1, &q, nullptr);
    const std::int64_t n = sqlite3_step(q) == SQLITE_ROW ? sqlite3_column_int64(q, 0) : -1;
    sqlite3_finalize(q);
    return n;
}

} // namespace

TEST(RecordHistory, EveryChangeKeepsWhoWhenAndTheValues)
{
    TempDir dir;
    const std::string path = dir.file("c.hierloom");
    ColonyStore store = ColonyStore::create(path);
    store.setUserName("alice");
    EXPECT_EQ(store.userName(), "alice");
    std::vector<Animal> animals{founder("F1", Sex::Female), founder("M1", Sex::Male)};
    std::vector<Residence> residences{{"F1", "main", *parseDate("2010-01-01"), std::nullopt, ""},
                                      {"M1", "main", *parseDate("2010-01-01"), std::nullopt, ""}};
    std::vector<Encounter> encounters{encounter("F1", "M1", *parseDate("2011-01-01"))};
    store.append(animals, residences, encounters);
    const std::string f1 = animals[0].uid;

    // A second program (another connection, another user) edits the same animal.
    {
        ColonyStore other = ColonyStore::open(path);
        other.setUserName("bob");
        other.exec("UPDATE animal SET name = 'Ada' WHERE id = 'F1'");
    }
    // A change made with another tool (no Hierloom session) is recorded without a user.
    {
        sqlite3* raw = nullptr;
        sqlite3_open(path.c_str(), &raw);
        sqlite3_exec(raw, "UPDATE animal SET name = 'Ada L.' WHERE id = 'F1'", nullptr, nullptr, nullptr);
        sqlite3_close(raw);
    }
    const auto h = recordHistory(store, f1);
    ASSERT_EQ(h.size(), 3U);
    EXPECT_EQ(h[0].action, "insert");
    EXPECT_EQ(h[0].user, "alice");
    EXPECT_EQ(h[0].table, "animal");
    EXPECT_EQ(h[0].oldValues, "");
    EXPECT_NE(h[0].newValues.find("\"id\":\"F1\""), std::string::npos) << h[0].newValues;
    EXPECT_EQ(h[1].action, "update");
    EXPECT_EQ(h[1].user, "bob");
    EXPECT_NE(h[1].oldValues.find("\"name\":\"\""), std::string::npos) << h[1].oldValues;
    EXPECT_NE(h[1].newValues.find("\"name\":\"Ada\""), std::string::npos) << h[1].newValues;
    EXPECT_EQ(h[2].user, "");
    EXPECT_NE(h[2].newValues.find("Ada L."), std::string::npos);
    // Times are UTC ISO stamps: 2024-05-01T12:00:00Z has 20 characters.
    EXPECT_EQ(h[0].time.size(), 20U);
    EXPECT_EQ(h[0].time.back(), 'Z');

    // Deleting a stay is kept with the values it had.
    const std::string stay = residences[1].uid;
    store.exec("DELETE FROM residence WHERE animal = 'M1'");
    const auto hs = recordHistory(store, stay);
    ASSERT_EQ(hs.size(), 2U);
    EXPECT_EQ(hs[1].action, "delete");
    EXPECT_NE(hs[1].oldValues.find("\"grp\":\"main\""), std::string::npos);
    EXPECT_EQ(hs[1].newValues, "");

    EXPECT_EQ(animalUid(store, "F1"), f1);
    EXPECT_EQ(animalUid(store, "nobody"), std::nullopt);
    // A small append keeps one row per encounter.
    EXPECT_EQ(recordHistory(store, encounters[0].uid).size(), 1U);
}

TEST(RecordHistory, ABulkImportIsOneAuditRowThatStillCoversEachEncounter)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    store.setUserName("importer");
    store.append({founder("F1", Sex::Female), founder("M1", Sex::Male)},
                 {{"F1", "main", *parseDate("2010-01-01"), std::nullopt, ""},
                  {"M1", "main", *parseDate("2010-01-01"), std::nullopt, ""}},
                 {});
    std::vector<Encounter> many(12000, encounter("F1", "M1", *parseDate("2011-01-01")));
    std::vector<Animal> none;
    std::vector<Residence> noStays;
    store.append(none, noStays, many, "import of big.csv");
    EXPECT_EQ(store.encounterCount(), 12000);
    // More than 10,000 encounters: one 'import' row instead of 12,000 'insert' rows.
    EXPECT_EQ(count(store, "SELECT count(*) FROM audit WHERE tbl = 'encounter'"), 1);
    const auto h = recordHistory(store, many[5000].uid);
    ASSERT_EQ(h.size(), 1U);
    EXPECT_EQ(h[0].action, "import");
    EXPECT_EQ(h[0].user, "importer");
    EXPECT_NE(h[0].newValues.find("\"source\":\"import of big.csv\""), std::string::npos) << h[0].newValues;
    EXPECT_NE(h[0].newValues.find("\"count\":12000"), std::string::npos);
    // The per-row trigger is back after the bulk append: a later single edit is audited row by row.
    store.exec("UPDATE encounter SET note = 'checked' WHERE seq = 1");
    EXPECT_EQ(recordHistory(store, many[0].uid).size(), 2U);
    EXPECT_EQ(count(store, "SELECT count(*) FROM audit_pause"), 0);
}
