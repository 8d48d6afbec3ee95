// SPDX-License-Identifier: GPL-3.0-or-later
// Bulk imports (more than 10,000 encounters): the rows are checked on a
// second thread while the ones that passed are written, with the per-row
// audit trigger, foreign keys and CHECK constraints off for the
// transaction. Whatever happens, the result must be the same as row-by-row
// checking: every row or none, and the connection and schema as before.
#include "core/base/bounded_queue.h"
#include "core/store/colony_import.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/base/csv_reader.h"
#include "core/store/sqlite_statement.h"
#include "core/store/write_transaction.h"
#include "generated_import.h"
#include "import_test_support.h"

#include <gtest/gtest.h>
#include <sqlite3.h>

#include <stdexcept>
#include <thread>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;

namespace {

constexpr long kRows = 20000; // above ColonyStore::kBulkEncounters
constexpr int kAnimals = 12;

std::int64_t number(const ColonyStore& store, const std::string& sql)
{
    SqliteStatement q(store.handle(), sql.c_str());
    return q.step() ? q.integer(0) : -1;
}

std::string text(const ColonyStore& store, const std::string& sql)
{
    SqliteStatement q(store.handle(), sql.c_str());
    return q.step() ? q.text(0) : std::string("(no row)");
}

const char* kTriggerSql = "SELECT sql FROM sqlite_schema WHERE name = 'audit_encounter_insert'";

/// A colony holding the generated founders, and the generated encounters file.
struct Fixture {
    TempDir dir;
    std::string colony = dir.file("c.hierloom");
    std::string encounters = dir.file("encounters.csv");
    std::string pristineTrigger;
    Fixture()
    {
        hierloom::test::writeGeneratedAnimals(dir.file("animals.csv"), kAnimals);
        hierloom::test::writeGeneratedEncounters(encounters, kRows, kAnimals);
        ColonyStore store = ColonyStore::create(colony);
        EXPECT_TRUE(importFiles(store, {dir.file("animals.csv"), "", ""}, today()).ok());
        pristineTrigger = text(store, kTriggerSql);
    }
    /// The connection and schema are as they were before any bulk load.
    void expectRestored(const ColonyStore& store) const
    {
        EXPECT_EQ(text(store, kTriggerSql), pristineTrigger);
        EXPECT_EQ(number(store, "PRAGMA foreign_keys"), 1);
        EXPECT_EQ(number(store, "PRAGMA ignore_check_constraints"), 0);
        EXPECT_EQ(sqlite3_get_autocommit(store.handle()), 1) << "a transaction was left open";
    }
};

std::vector<std::string> lines(const std::string& path)
{
    std::vector<std::string> out;
    std::string all = readWholeFile(path);
    size_t start = 0;
    while (start < all.size()) {
        const size_t end = all.find('\n', start);
        out.push_back(all.substr(start, end - start));
        start = end + 1;
    }
    return out;
}

} // namespace

TEST(BulkImport, WritesEveryRowInFileOrderAndRestoresTheConnection)
{
    Fixture f;
    ColonyStore store = ColonyStore::open(f.colony);
    const ImportResult r = importFiles(store, {"", "", f.encounters}, today());
    ASSERT_TRUE(r.ok()) << r.problems.text();
    EXPECT_EQ(r.encounters, static_cast<size_t>(kRows));
    EXPECT_EQ(store.encounterCount(), kRows);
    // seq follows the file: compare the first, a middle and the last row with the file's lines.
    const auto file = lines(f.encounters);
    ASSERT_EQ(file.size(), static_cast<size_t>(kRows) + 1);
    const auto loaded = store.loadEncounters();
    for (long i : {0L, kRows / 2, kRows - 1}) {
        const Encounter& e = loaded[static_cast<size_t>(i)];
        EXPECT_EQ(e.seq, i + 1);
        const std::string expected = formatDate(e.date) + "," + formatTimeOfDay(*e.time) + "," + e.winner + "," +
                                     e.loser + "," + (e.outcome == Outcome::Draw ? "draw" : "decided") + "," +
                                     e.behaviour + "," + e.group + "," + e.observer + ",";
        EXPECT_EQ(file[static_cast<size_t>(i) + 1], expected);
    }
    // One audit row for the load; the observers are recorded.
    EXPECT_EQ(number(store, "SELECT count(*) FROM audit WHERE tbl = 'encounter'"), 1);
    EXPECT_EQ(number(store, "SELECT json_extract(new_values, '$.count') FROM audit WHERE action = 'import'"), kRows);
    EXPECT_EQ(store.observers(), (std::vector<std::string>{"OB0", "OB1", "OB2"}));
    f.expectRestored(store);
    // The schema's rules hold again on this connection: CHECK, foreign key, per-row audit.
    EXPECT_THROW(store.exec("INSERT INTO encounter(uid, date, winner, loser) VALUES ('u1', '2020-01-01', 'A1', 'A1')"),
                 ColonyFileError);
    EXPECT_THROW(store.exec("INSERT INTO encounter(uid, date, winner, loser) VALUES ('u2', '2020-01-01', 'A1', 'ZZ')"),
                 ColonyFileError);
    store.exec("INSERT INTO encounter(uid, date, winner, loser) VALUES ('u3', '2020-01-01', 'A1', 'A2')");
    EXPECT_EQ(number(store, "SELECT count(*) FROM audit WHERE tbl = 'encounter' AND action = 'insert'"), 1);
}

TEST(BulkImport, AProblemInTheLastRowsWritesNothingAndReportsEveryProblem)
{
    Fixture f;
    {
        std::string bad = readWholeFile(f.encounters);
        bad += "2012-05-05,09:00,A1,A1,decided,threat,main,OB1,\n"; // line kRows + 2
        bad += "2012-05-06,09:00,A1,NOBODY,decided,threat,main,OB1,\n";
        f.dir.write("encounters.csv", bad);
    }
    const std::string before = fileBytes(f.colony);
    {
        ColonyStore store = ColonyStore::open(f.colony);
        const ImportResult r = importFiles(store, {"", "", f.encounters}, today());
        EXPECT_FALSE(r.ok());
        EXPECT_EQ(r.encounters, 0U);
        const std::string first = ":" + std::to_string(kRows + 2) + ": loser: 'A1' is also the winner";
        const std::string second = ":" + std::to_string(kRows + 3) + ": loser: 'NOBODY' is not an animal";
        EXPECT_NE(r.problems.text().find(first), std::string::npos) << r.problems.text();
        EXPECT_NE(r.problems.text().find(second), std::string::npos) << r.problems.text();
        EXPECT_EQ(store.encounterCount(), 0);
        f.expectRestored(store);
    }
    EXPECT_EQ(fileBytes(f.colony), before);
}

TEST(BulkImport, AFailedWriteStopsTheCheckingThreadAndWritesNothing)
{
    Fixture f;
    ColonyStore store = ColonyStore::open(f.colony);
    // A write that fails part way, as a full disk would.
    store.exec("CREATE TEMP TRIGGER fail_midway BEFORE INSERT ON main.encounter_row WHEN new.seq = 15000 "
               "BEGIN SELECT RAISE(ABORT, 'no space left'); END");
    try {
        importFiles(store, {"", "", f.encounters}, today());
        FAIL() << "the failed write was not reported";
    } catch (const ColonyFileError& e) {
        EXPECT_NE(std::string(e.what()).find("no space left"), std::string::npos) << e.what();
    }
    EXPECT_EQ(store.encounterCount(), 0);
    f.expectRestored(store);
    store.exec("DROP TRIGGER temp.fail_midway");
    EXPECT_TRUE(importFiles(store, {"", "", f.encounters}, today()).ok());
    EXPECT_EQ(store.encounterCount(), kRows);
}

TEST(BulkImport, ProblemsInAnimalsAndInABulkEncountersFileAreReportedTogether)
{
    Fixture f;
    std::string bad = readWholeFile(f.encounters);
    bad += "2012-02-30,,A1,A2,,,,,\n";
    // A good row naming the new animal of the (failing) animals file: not a problem.
    bad += "2012-06-01,,NEW,A1,,,,,\n";
    f.dir.write("encounters.csv", bad);
    const std::string animals = f.dir.write("more.csv", "id,sex,birth_date\nNEW,X,2011-01-01\n");
    const std::string before = fileBytes(f.colony);
    {
        ColonyStore store = ColonyStore::open(f.colony);
        const ImportResult r = importFiles(store, {animals, "", f.encounters}, today());
        EXPECT_NE(r.problems.text().find("more.csv:2: sex:"), std::string::npos) << r.problems.text();
        EXPECT_NE(r.problems.text().find(":" + std::to_string(kRows + 2) + ": date: '2012-02-30'"),
                  std::string::npos)
            << r.problems.text();
        EXPECT_EQ(r.problems.list().size(), 2U) << r.problems.text();
        f.expectRestored(store);
    }
    EXPECT_EQ(fileBytes(f.colony), before);
}

TEST(WriteTransaction, RollsBackUnlessCommittedAndRefusesACheckedBulkInsideAnother)
{
    Fixture f;
    ColonyStore store = ColonyStore::open(f.colony);
    {
        WriteTransaction tx(store, WriteTransaction::Size::CheckedBulk);
        EXPECT_EQ(number(store, "PRAGMA foreign_keys"), 0);
        EXPECT_EQ(number(store, "PRAGMA ignore_check_constraints"), 1);
        EXPECT_EQ(text(store, kTriggerSql), "(no row)");
        store.exec("DELETE FROM residence");
    } // no commit: rolled back
    EXPECT_EQ(store.loadResidences().size(), static_cast<size_t>(kAnimals));
    f.expectRestored(store);

    WriteTransaction outer(store);
    EXPECT_THROW(WriteTransaction(store, WriteTransaction::Size::CheckedBulk), std::logic_error);
    {
        WriteTransaction inner(store, WriteTransaction::Size::Bulk); // a savepoint
        EXPECT_EQ(text(store, kTriggerSql), "(no row)");
        EXPECT_EQ(number(store, "PRAGMA foreign_keys"), 1); // unchanged inside another transaction
        store.exec("DELETE FROM residence");
    }
    EXPECT_EQ(text(store, kTriggerSql), f.pristineTrigger);
    EXPECT_EQ(store.loadResidences().size(), static_cast<size_t>(kAnimals));
    outer.commit();
    f.expectRestored(store);
}

TEST(BoundedQueue, HandsOverEveryItemInOrderBetweenThreads)
{
    BoundedQueue<int> queue(3);
    std::thread producer([&] {
        for (int i = 0; i < 100000; ++i) ASSERT_TRUE(queue.push(i));
        queue.close();
    });
    int expected = 0;
    while (auto item = queue.pop()) EXPECT_EQ(*item, expected++);
    producer.join();
    EXPECT_EQ(expected, 100000);
}

TEST(BoundedQueue, AConsumerThatStopsReleasesAWaitingProducer)
{
    BoundedQueue<int> queue(2);
    bool refused = false;
    std::thread producer([&] {
        for (int i = 0; i < 1000; ++i)
            if (!queue.push(i)) {
                refused = true;
                return;
            }
    });
    EXPECT_EQ(queue.pop(), 0);
    queue.close();
    producer.join();
    EXPECT_TRUE(refused);
}

TEST(ColonyStore, NewColonyFilesUse16KiBPages)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
    EXPECT_EQ(number(store, "PRAGMA page_size"), 16384);
    EXPECT_EQ(text(store, "PRAGMA journal_mode"), "wal");
}
