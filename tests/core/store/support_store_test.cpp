// SPDX-License-Identifier: GPL-3.0-or-later
// Supporters of encounters in the colony file (schema version 3): migration
// from version-1 and version-2 files, export and import, edits with undo,
// the audit trail, merges and bulk loads.
#include "core/store/colony_csv_export.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_import.h"
#include "core/store/colony_merge.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/record_history.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <filesystem>
#include <fstream>
#include <sstream>

using namespace hierloom::core;
using hierloom::test::TempDir;

namespace {

Day day(const char* text) { return *parseDate(text); }
const Day kToday = day("2024-06-30");

using Ids = std::vector<std::string>;

/// A file as an older program wrote it: the schema up to `version`, two
/// females, a male and one encounter (no supporters: the table is new).
std::string writeOlderFile(const TempDir& dir, int version)
{
    const std::string path = dir.file("v" + std::to_string(version) + ".hierloom");
    sqlite3* db = nullptr;
    sqlite3_open(path.c_str(), &db);
    std::string sql = std::string("PRAGMA journal_mode = WAL; BEGIN;") + schemaVersion1Sql();
    if (version >= 2) sql += schemaVersion2Sql();
    sql += "INSERT INTO animal(uid, id, sex, entry_date, entry_type) VALUES "
           "('11111111-1111-4111-8111-111111111111', 'F1', 'F', '2010-01-01', 'founder'),"
           "('22222222-2222-4222-8222-222222222222', 'M1', 'M', '2010-01-01', 'founder'),"
           "('66666666-6666-4666-8666-666666666666', 'F2', 'F', '2010-01-01', 'founder');"
           "INSERT INTO residence(uid, animal, grp, from_date) VALUES "
           "('33333333-3333-4333-8333-333333333333', 'F1', 'main', '2010-01-01'),"
           "('44444444-4444-4444-8444-444444444444', 'M1', 'main', '2010-01-01'),"
           "('77777777-7777-4777-8777-777777777777', 'F2', 'main', '2010-01-01');"
           "INSERT INTO encounter(seq, uid, date, winner, loser, grp) VALUES "
           "(1, '55555555-5555-4555-8555-555555555555', '2011-01-01', 'F1', 'M1', 'main');"
           "PRAGMA application_id = " +
           std::to_string(colonyApplicationId) + "; PRAGMA user_version = " + std::to_string(version) + "; COMMIT;";
    EXPECT_EQ(sqlite3_exec(db, sql.c_str(), nullptr, nullptr, nullptr), SQLITE_OK) << sqlite3_errmsg(db);
    sqlite3_close(db);
    return path;
}

Encounter supported(const char* date, const char* winner, const char* loser, Ids winnerSide, Ids loserSide)
{
    Encounter e;
    e.date = day(date);
    e.winner = winner;
    e.loser = loser;
    e.winnerSupport = std::move(winnerSide);
    e.loserSupport = std::move(loserSide);
    return e;
}

/// Five animals in group main from 2010 on.
void addFounders(ColonyStore& store)
{
    std::vector<Animal> animals;
    std::vector<Residence> stays;
    for (const char* id : {"A", "B", "C", "D", "E"}) {
        Animal a;
        a.id = id;
        a.sex = Sex::Female;
        a.entry = day("2010-01-01");
        a.entryType = EntryType::Founder;
        animals.push_back(a);
        stays.push_back({id, "main", day("2010-01-01"), std::nullopt, ""});
    }
    store.append(std::move(animals), std::move(stays), {});
}

int countRows(const ColonyStore& store, const char* sql)
{
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(store.handle(), sql, -1, &q, nullptr);
    const int n = sqlite3_step(q) == SQLITE_ROW ? sqlite3_column_int(q, 0) : -1;
    sqlite3_finalize(q);
    return n;
}

} // namespace

TEST(SupportStore, VersionOneAndTwoFilesMigrateToTheSupportTableKeepingTheirRecords)
{
    for (int version : {1, 2}) {
        SCOPED_TRACE(version);
        TempDir dir;
        const std::string path = writeOlderFile(dir, version);
        ASSERT_EQ(probeColonyFile(path), version);
        {
            ColonyStore store = ColonyStore::open(path);
            EXPECT_EQ(store.schemaVersion(), currentSchemaVersion);
            Colony c = store.load();
            ASSERT_EQ(c.encounters.size(), 1U);
            EXPECT_TRUE(c.encounters[0].winnerSupport.empty());
            // The migrated file takes supporters and files their audit rows under the encounter.
            std::vector<Encounter> more{supported("2011-01-02", "F1", "M1", {"F2"}, {})};
            ASSERT_TRUE(insertEncounters(store, more, kToday).empty());
            c = store.load();
            ASSERT_EQ(c.encounters.size(), 2U);
            EXPECT_EQ(c.encounters[1].winnerSupport, Ids{"F2"});
            bool audited = false;
            for (const AuditEntry& a : recordHistory(store, more[0].uid))
                audited = audited || (a.table == "encounter_support" && a.action == "insert" &&
                                      a.newValues.find("\"F2\"") != std::string::npos);
            EXPECT_TRUE(audited);
        }
        EXPECT_EQ(probeColonyFile(path + ".v" + std::to_string(version) + ".bak"), version);
    }
}

TEST(SupportStore, ExportThenImportReproducesSupportersExactly)
{
    TempDir dir;
    ColonyStore first = ColonyStore::create(dir.file("first.hierloom"));
    addFounders(first);
    std::vector<Encounter> es{supported("2012-01-01", "A", "B", {"C", "D"}, {"E"}),
                              supported("2012-01-02", "B", "C", {}, {"E", "A", "D"}),
                              supported("2012-01-03", "D", "E", {}, {})};
    ASSERT_TRUE(insertEncounters(first, es, kToday).empty());
    const Colony before = first.load();

    std::ostringstream a, r, e;
    writeAnimalsCsv(a, before);
    writeResidencesCsv(r, before);
    writeEncountersCsv(e, before);
    // The two columns come last, after the uid (docs/file-formats.md).
    EXPECT_EQ(e.str().substr(0, e.str().find('\n')),
              "date,time,winner,loser,outcome,behaviour,group,observer,note,uid,winner_support,loser_support");
    EXPECT_NE(e.str().find(",C D,E\n"), std::string::npos) << e.str();
    EXPECT_NE(e.str().find(",,E A D\n"), std::string::npos) << e.str();

    ColonyStore second = ColonyStore::create(dir.file("second.hierloom"));
    const ImportResult imported = importFiles(
        second, {dir.write("a.csv", a.str()), dir.write("r.csv", r.str()), dir.write("e.csv", e.str())}, kToday);
    ASSERT_TRUE(imported.ok()) << imported.problems.text();
    const Colony after = second.load();
    ASSERT_EQ(after.encounters.size(), before.encounters.size());
    for (size_t i = 0; i < before.encounters.size(); ++i) {
        EXPECT_EQ(after.encounters[i].uid, before.encounters[i].uid);
        EXPECT_EQ(after.encounters[i].winnerSupport, before.encounters[i].winnerSupport);
        EXPECT_EQ(after.encounters[i].loserSupport, before.encounters[i].loserSupport);
    }
    EXPECT_EQ(after.encounters[1].loserSupport, (Ids{"E", "A", "D"})); // order as recorded
    std::ostringstream again;
    writeEncountersCsv(again, after);
    EXPECT_EQ(again.str(), e.str());
}

TEST(SupportStore, AColonyWithoutSupportersExportsTheOldColumnsOnly)
{
    Colony c;
    c.encounters.push_back(supported("2012-01-01", "A", "B", {}, {}));
    std::ostringstream e;
    writeEncountersCsv(e, c);
    EXPECT_EQ(e.str().substr(0, e.str().find('\n')), "date,time,winner,loser,outcome,behaviour,group,observer,note");
}

TEST(SupportStore, AnEditChangesSupportersAndItsUndoWritesThemBack)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    addFounders(store);
    std::vector<Encounter> es{supported("2012-01-01", "A", "B", {"C"}, {})};
    ASSERT_TRUE(insertEncounters(store, es, kToday).empty());
    const Encounter original = store.loadEncounters().front();

    Encounter edited = original;
    edited.winnerSupport = {"D"};
    edited.loserSupport = {"C"};
    ASSERT_TRUE(updateEncounter(store, edited, kToday).empty());
    Encounter now = store.loadEncounters().front();
    EXPECT_EQ(now.winnerSupport, Ids{"D"});
    EXPECT_EQ(now.loserSupport, Ids{"C"});

    // The undo of the edit command: write the earlier state back.
    std::vector<Encounter> back{original};
    writeEncounterChange(store, {now}, back);
    now = store.loadEncounters().front();
    EXPECT_EQ(now.winnerSupport, Ids{"C"});
    EXPECT_TRUE(now.loserSupport.empty());

    // A refused edit (a supporter that is the loser) writes nothing.
    Encounter bad = now;
    bad.winnerSupport = {"B"};
    EXPECT_EQ(problemFor(updateEncounter(store, bad, kToday), "winner_support"),
              "'B' is the loser of this encounter, not a supporter");
    EXPECT_EQ(store.loadEncounters().front().winnerSupport, Ids{"C"});

    // Deleting the encounter deletes its supporter rows; the history keeps them.
    deleteEncounters(store, {now.uid});
    EXPECT_EQ(countRows(store, "SELECT count(*) FROM encounter_support"), 0);
    int deletedRows = 0;
    for (const AuditEntry& a : recordHistory(store, now.uid))
        if (a.table == "encounter_support" && a.action == "delete") ++deletedRows;
    // Rows removed: C by the edit, D and C by the undo, C by the deletion.
    EXPECT_EQ(deletedRows, 4);
}

TEST(SupportStore, AnAnimalThatSupportedCannotLeaveBeforeThatDay)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    addFounders(store);
    std::vector<Encounter> es{supported("2012-01-01", "A", "B", {"C"}, {})};
    ASSERT_TRUE(insertEncounters(store, es, kToday).empty());
    const AnimalChange c = planExit(store.load(), "C", day("2011-06-01"), ExitType::Died, kToday);
    EXPECT_EQ(problemFor(c.problems, "exit_date"), "'C' has 1 encounter after 2011-06-01");
}

// Merge semantics of supporters (docs/file-formats.md, "Merging"): each side's
// list is merged like a field from the newest state both files had.
TEST(SupportStore, AMergeBringsNewSupportersAndTakesAListChangedInTheOtherFileOnly)
{
    TempDir dir;
    const std::string a = dir.file("a.hierloom"), b = dir.file("b.hierloom");
    {
        ColonyStore s = ColonyStore::create(a);
        addFounders(s);
        std::vector<Encounter> es{supported("2012-01-01", "A", "B", {"C"}, {})};
        ASSERT_TRUE(insertEncounters(s, es, kToday).empty());
    }
    std::filesystem::copy_file(a, b);
    {
        ColonyStore s = ColonyStore::open(b);
        std::vector<Encounter> es{supported("2012-02-01", "C", "D", {"A"}, {"E"})};
        ASSERT_TRUE(insertEncounters(s, es, kToday).empty());
        s.exec("UPDATE encounter_support SET side = 'loser' WHERE animal = 'C'");
    }
    ColonyStore target = ColonyStore::open(a);
    const ColonyStore other = ColonyStore::open(b, ColonyStore::Mode::ReadOnly);
    MergeOptions o;
    o.today = kToday;
    const MergeReport r = mergeColonies(target, other, o);
    ASSERT_TRUE(r.conflicts.empty()) << r.conflicts[0].what;
    ASSERT_TRUE(r.written) << r.problems.text();
    const std::vector<Encounter> merged = target.loadEncounters();
    ASSERT_EQ(merged.size(), 2U);
    EXPECT_TRUE(merged[0].winnerSupport.empty());
    EXPECT_EQ(merged[0].loserSupport, Ids{"C"});
    EXPECT_EQ(merged[1].winnerSupport, Ids{"A"});
    EXPECT_EQ(merged[1].loserSupport, Ids{"E"});
    // Merging again changes nothing: both files now hold the same lists.
    EXPECT_FALSE(mergeColonies(target, other, o).written);
}

TEST(SupportStore, AListChangedInBothFilesIsAConflictAndAChangeHereOnlyStays)
{
    TempDir dir;
    const std::string a = dir.file("a.hierloom"), b = dir.file("b.hierloom");
    {
        ColonyStore s = ColonyStore::create(a);
        addFounders(s);
        std::vector<Encounter> es{supported("2012-01-01", "A", "B", {"C"}, {}),
                                  supported("2012-01-02", "A", "B", {"C"}, {})};
        ASSERT_TRUE(insertEncounters(s, es, kToday).empty());
    }
    std::filesystem::copy_file(a, b);
    {
        ColonyStore s = ColonyStore::open(a); // here: both encounters get D on the winner's side
        s.exec("INSERT INTO encounter_support(encounter, animal, side) SELECT uid, 'D', 'winner' FROM encounter");
    }
    {
        ColonyStore s = ColonyStore::open(b); // there: only the first gets E
        s.exec("INSERT INTO encounter_support(encounter, animal, side) SELECT uid, 'E', 'winner' FROM encounter "
               "WHERE date = '2012-01-01'");
    }
    ColonyStore target = ColonyStore::open(a);
    const ColonyStore other = ColonyStore::open(b, ColonyStore::Mode::ReadOnly);
    MergeOptions o;
    o.today = kToday;
    MergeReport r = mergeColonies(target, other, o);
    ASSERT_EQ(r.conflicts.size(), 1U); // the first; the second changed here only
    EXPECT_EQ(r.conflicts[0].what, "winner_support: 'C D' here, 'C E' in the other file");
    ASSERT_EQ(r.conflicts[0].fields.size(), 1U);
    EXPECT_EQ(r.conflicts[0].fields[0].base, std::optional<std::string>("C"));
    o.prefer = MergePreference::Theirs;
    r = mergeColonies(target, other, o);
    ASSERT_TRUE(r.written) << r.problems.text();
    const std::vector<Encounter> merged = target.loadEncounters();
    ASSERT_EQ(merged.size(), 2U);
    EXPECT_EQ(merged[0].winnerSupport, (Ids{"C", "E"}));
    EXPECT_EQ(merged[1].winnerSupport, (Ids{"C", "D"})); // changed here only: kept
}

TEST(SupportStore, ABulkImportKeepsSupportersAndRestoresTheAuditTrigger)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    addFounders(store);
    std::string text = "date,winner,loser,winner_support,loser_support\n";
    const size_t n = ColonyStore::kBulkEncounters + 5;
    for (size_t i = 0; i < n; ++i) text += i % 2 ? "2012-01-01,A,B,C D,E\n" : "2012-01-01,B,A,,\n";
    ImportPaths paths;
    paths.encounters = dir.write("e.csv", text);
    const ImportResult r = importFiles(store, paths, kToday);
    ASSERT_TRUE(r.ok()) << r.problems.text();
    EXPECT_EQ(countRows(store, "SELECT count(*) FROM encounter_support"), static_cast<int>(n / 2 * 3));
    EXPECT_EQ(countRows(store, "SELECT count(*) FROM sqlite_schema WHERE name = 'audit_encounter_support_insert'"), 1);
    const std::vector<Encounter> loaded = store.loadEncounters();
    EXPECT_EQ(loaded[1].winnerSupport, (Ids{"C", "D"}));
    EXPECT_EQ(loaded[1].loserSupport, Ids{"E"});
    EXPECT_TRUE(loaded[0].winnerSupport.empty());
}

TEST(SupportStore, ABulkImportWritesEveryRowAsPlannedBetweenStatementsOfManyRows)
{
    // A bulk load writes runs of rows without supporters many to a statement
    // and the others one by one: the result must be the plan, row for row,
    // with the supporter rows in the order one-by-one writing gives them.
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    addFounders(store);
    const char* ids[] = {"A", "B", "C", "D", "E"};
    std::string text = "date,time,winner,loser,outcome,behaviour,observer,note,winner_support,loser_support\n";
    const size_t n = ColonyStore::kBulkEncounters + 333;
    for (size_t i = 0; i < n; ++i) {
        const bool supported = i % 150 < 2 || i % 977 == 3 || (i > 5000 && i < 5070 && i % 7 == 0);
        const size_t w = i % 5, l = (i / 5 + 1 + i) % 5 == w ? (w + 1) % 5 : (i / 5 + 1 + i) % 5;
        const size_t s = 3 - (w + l) % 3 == w || 3 - (w + l) % 3 == l ? 4 : 3 - (w + l) % 3;
        text += formatDate(day("2011-01-01") + static_cast<Day>(i % 4000)) + "," +
                (i % 3 ? formatTimeOfDay(static_cast<int>(i % 1440)) : "") + "," + ids[w] + "," + ids[l] + "," +
                (i % 11 ? "decided" : "draw") + "," + (i % 2 ? "bite" : "chase") + "," + (i % 5 ? "ann" : "") + "," +
                (i % 13 ? "" : "\"a, note\"") + "," + (supported && s != w && s != l ? ids[s] : "") + ",\n";
    }
    ImportInput input;
    input.encounters = ImportSource{"encounters.csv", text};
    ImportPlan plan = planImport(store.loadAnimals(), store.loadResidences(), input, kToday);
    ASSERT_TRUE(plan.ok()) << plan.problems.text();
    deriveUids(plan, importEpoch(store));
    const ImportResult r = importInput(store, input, kToday);
    ASSERT_TRUE(r.ok()) << r.problems.text();

    const std::vector<Encounter> loaded = store.loadEncounters();
    ASSERT_EQ(loaded.size(), n);
    std::string expectedSupport, support;
    int supportedRows = 0;
    for (size_t i = 0; i < n; ++i) {
        const Encounter& want = plan.encounters[i];
        const Encounter& got = loaded[i];
        EXPECT_EQ(got.seq, static_cast<std::int64_t>(i + 1));
        EXPECT_EQ(got.uid, want.uid) << i;
        EXPECT_EQ(got.date, want.date) << i;
        EXPECT_EQ(got.time, want.time) << i;
        EXPECT_EQ(got.winner + got.loser, want.winner + want.loser) << i;
        EXPECT_EQ(got.outcome, want.outcome) << i;
        EXPECT_EQ(got.behaviour + "|" + got.group + "|" + got.observer + "|" + got.note,
                  want.behaviour + "|" + want.group + "|" + want.observer + "|" + want.note) << i;
        EXPECT_EQ(got.winnerSupport, want.winnerSupport) << i;
        for (const std::string& a : want.winnerSupport) expectedSupport += std::to_string(i + 1) + " winner " + a + "\n";
        supportedRows += want.winnerSupport.empty() ? 0 : 1;
    }
    EXPECT_GT(supportedRows, 100);
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(store.handle(),
                       "SELECT e.seq, s.side, s.animal FROM encounter_support s JOIN encounter_row e ON e.uid = s.encounter "
                       "ORDER BY s.rowid",
                       -1, &q, nullptr);
    while (sqlite3_step(q) == SQLITE_ROW)
        support += std::to_string(sqlite3_column_int64(q, 0)) + " " +
                   reinterpret_cast<const char*>(sqlite3_column_text(q, 1)) + " " +
                   reinterpret_cast<const char*>(sqlite3_column_text(q, 2)) + "\n";
    sqlite3_finalize(q);
    EXPECT_EQ(support, expectedSupport);
    EXPECT_EQ(store.observers(), Ids{"ann"});
}
