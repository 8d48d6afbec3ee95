// SPDX-License-Identifier: GPL-3.0-or-later
// Reading only the encounters a question needs (EncounterScope) and the index
// that makes it cheap.
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/encounter_scope_sql.h"
#include "core/store/sqlite_statement.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <random>
#include <string>
#include <vector>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

Encounter encounter(const char* date, const char* winner, const char* loser, const char* group)
{
    Encounter e;
    e.date = *parseDate(date);
    e.winner = winner;
    e.loser = loser;
    e.group = group;
    return e;
}

/// N1, N2 live in North; S1 in South until 2020-06-30, then in North; S2 in South.
/// Seq: 1 North, 2 South, 3 no group (winner N1), 4 no group (winner S2),
/// 5 North, 6 no group (winner S1, who moved to North later), 7 South.
/// The scope of a group is a superset of the selection of docs/methods.md:
/// row 6 is read for North although S1 was in South that day.
std::string writeTwoGroups(const TempDir& dir)
{
    const std::string path = dir.file("two.hierloom");
    ColonyStore store = ColonyStore::create(path);
    std::vector<Animal> animals;
    for (const char* id : {"N1", "N2", "S1", "S2"}) {
        Animal a;
        a.id = id;
        a.sex = Sex::Female;
        a.entry = parseDate("2019-01-01");
        a.entryType = EntryType::Founder;
        animals.push_back(a);
    }
    const Day start = *parseDate("2019-01-01");
    std::vector<Residence> residences = {{"N1", "North", start, std::nullopt, ""},
                                         {"N2", "North", start, std::nullopt, ""},
                                         {"S1", "South", start, parseDate("2020-06-30"), ""},
                                         {"S1", "North", *parseDate("2020-07-01"), std::nullopt, ""},
                                         {"S2", "South", start, std::nullopt, ""}};
    std::vector<Encounter> encounters = {encounter("2020-01-01", "N1", "N2", "North"), encounter("2020-01-02", "S1", "S2", "South"),
                  encounter("2020-01-03", "N1", "N2", ""), encounter("2020-01-04", "S2", "S1", ""),
                  encounter("2020-02-01", "N2", "N1", "North"), encounter("2020-03-01", "S1", "S2", ""),
                  encounter("2020-04-01", "S2", "S1", "South")};
    store.append(animals, residences, encounters);
    return path;
}

std::vector<std::int64_t> seqs(const std::vector<Encounter>& encounters)
{
    std::vector<std::int64_t> out;
    for (const Encounter& e : encounters) out.push_back(e.seq);
    return out;
}

} // namespace

TEST(EncounterScope, GroupReadsItsRowsAndUngroupedRowsOfItsAnimalsInEntryOrder)
{
    TempDir dir;
    const ColonyStore store = ColonyStore::open(writeTwoGroups(dir), ColonyStore::Mode::ReadOnly);
    // Hand-worked from the rows above: North's own rows 1 and 5; rows 3 (N1) and
    // 6 (S1, a North resident at some time) have no group; 2, 4 and 7 are South's.
    EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{"North", {}, {}})), (std::vector<std::int64_t>{1, 3, 5, 6}));
    EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{"South", {}, {}})),
              (std::vector<std::int64_t>{2, 4, 6, 7}));
    EXPECT_TRUE(store.loadEncounters(EncounterScope{"West", {}, {}}).empty());
    // A window, with and without a group: both ends inclusive.
    EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{"North", parseDate("2020-01-03"), parseDate("2020-02-01")})),
              (std::vector<std::int64_t>{3, 5}));
    EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{"", parseDate("2020-01-02"), parseDate("2020-01-04")})),
              (std::vector<std::int64_t>{2, 3, 4}));
    EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{})), (std::vector<std::int64_t>{1, 2, 3, 4, 5, 6, 7}));
    EXPECT_EQ(store.lastEncounterDay(), parseDate("2020-04-01"));
    // Without uids: the same rows and fields, every uid empty.
    const std::vector<Encounter> with = store.loadEncounters(EncounterScope{"North", {}, {}});
    EncounterScope bare{"North", {}, {}};
    bare.uids = false;
    const std::vector<Encounter> without = store.loadEncounters(bare);
    ASSERT_EQ(without.size(), with.size());
    for (size_t i = 0; i < with.size(); ++i) {
        EXPECT_EQ(with[i].uid.size(), 36U);
        EXPECT_EQ(without[i].uid, "");
        EXPECT_EQ(without[i].seq, with[i].seq);
        EXPECT_EQ(without[i].winner, with[i].winner);
        EXPECT_EQ(without[i].group, with[i].group);
    }
    EncounterScope all;
    all.uids = false;
    EXPECT_EQ(seqs(store.loadEncounters(all)), (std::vector<std::int64_t>{1, 2, 3, 4, 5, 6, 7}));
}

TEST(EncounterScope, GroupQueryUsesTheIndexAndOlderFilesGetItOnTheirFirstWrite)
{
    TempDir dir;
    const std::string path = writeTwoGroups(dir);
    auto plan = [](const ColonyStore& store) {
        const EncounterScope scope{"North", std::nullopt, *parseDate("2020-02-01")};
        SqliteStatement q(store.handle(),
                          ("EXPLAIN QUERY PLAN SELECT seq FROM encounter_row WHERE 1" + encounterScopeSql(scope)).c_str());
        std::string out;
        while (q.step()) out += q.text(3) + "\n";
        return out;
    };
    {
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        EXPECT_NE(plan(store).find("encounter_by_group"), std::string::npos) << plan(store);
    }
    {
        ColonyStore store = ColonyStore::open(path);
        store.exec("DROP INDEX encounter_by_group");
        EXPECT_EQ(plan(store).find("encounter_by_group"), std::string::npos);
    }
    {
        // Opened read-only, the file is not changed: the scope reads by a scan, with the same rows.
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        EXPECT_EQ(plan(store).find("encounter_by_group"), std::string::npos);
        EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{"North", {}, {}})), (std::vector<std::int64_t>{1, 3, 5, 6}));
    }
    const ColonyStore store = ColonyStore::open(path);
    EXPECT_NE(plan(store).find("encounter_by_group"), std::string::npos);
    EXPECT_EQ(store.schemaVersion(), currentSchemaVersion);
}

// The latest date is found by seeking the end of each group's range of the
// index, and a group's rows are read in index order and put in entry order;
// both checked against brute force over every row read back, on random files
// (rows in random date order, groups with and without rows, rows without a
// group), with and without the index.
TEST(EncounterScope, LastDayAndAGroupsRowsMatchBruteForceOnRandomFiles)
{
    std::mt19937_64 rng(2026);
    const char* groups[] = {"", "A", "B", "Cc", "D"};
    for (int round = 0; round < 12; ++round) {
        TempDir dir;
        const std::string path = dir.file("c.hierloom");
        {
            ColonyStore store = ColonyStore::create(path);
            std::vector<Animal> animals;
            for (const char* id : {"X1", "X2"}) {
                Animal a;
                a.id = id;
                a.sex = Sex::Female;
                a.entry = parseDate("2000-01-01");
                a.entryType = EntryType::Founder;
                animals.push_back(a);
            }
            std::vector<Encounter> rows;
            const int n = static_cast<int>(rng() % 40); // none at all in some rounds
            for (int i = 0; i < n; ++i) {
                Encounter e;
                e.date = *parseDate("2000-01-01") + static_cast<int>(rng() % 9000);
                e.winner = "X1";
                e.loser = "X2";
                e.group = groups[rng() % (round % 2 ? 5 : 2)];
                rows.push_back(e);
            }
            std::vector<Residence> residences = {{"X1", "A", *parseDate("2000-01-01"), std::nullopt, ""},
                                                 {"X2", "A", *parseDate("2000-01-01"), std::nullopt, ""}};
            store.append(animals, residences, rows);
            if (round % 3 == 2) store.exec("DROP INDEX encounter_by_group"); // a file made before the index
        }
        const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
        std::optional<Day> brute;
        for (const Encounter& e : store.loadEncounters())
            if (!brute || e.date > *brute) brute = e.date;
        EXPECT_EQ(store.lastEncounterDay(), brute) << "round " << round;
        // Rows entered out of date order still come back in entry order: for
        // group A its own rows and the rows without a group (X1 lives in A),
        // for B its own rows only.
        for (const std::string group : {"A", "B"}) {
            std::vector<std::int64_t> expected;
            for (const Encounter& e : store.loadEncounters())
                if (e.group == group || (group == "A" && e.group.empty())) expected.push_back(e.seq);
            EXPECT_EQ(seqs(store.loadEncounters(EncounterScope{group, {}, {}})), expected) << "round " << round;
        }
    }
}
