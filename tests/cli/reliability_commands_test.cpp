// SPDX-License-Identifier: GPL-3.0-or-later
#include "cli_test_support.h"
#include "core/store/colony_backup.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"

#include <gtest/gtest.h>

#include <filesystem>

using namespace hierloom::test;

namespace {

std::string setUp(const CliTempDir& dir)
{
    const std::string colony = dir.file("c.hierloom");
    EXPECT_EQ(runCli({"init", colony}).status, 0);
    const std::string animals = dir.write("animals.csv", "id,sex,birth_date\nF1,F,2010-01-01\nM1,M,2010-01-01\n");
    EXPECT_EQ(runCli({"import", colony, "--animals", animals}).status, 0);
    return colony;
}

} // namespace

TEST(CliReliability, ImportTakesTheScheduledBackupAndRestoreBringsItBack)
{
    CliTempDir dir;
    const std::string colony = setUp(dir);
    // The first import found no backup: the scheduled one (every 24 h by default) was taken before it.
    ASSERT_EQ(hierloom::core::listBackups(colony).size(), 1U);
    const std::string encounters = dir.write("e.csv", "date,winner,loser\n2012-01-01,F1,M1\n2012-01-02,M1,F1\n");
    const CliResult imported = runCli({"import", colony, "--encounters", encounters});
    ASSERT_EQ(imported.status, 0) << imported.err;
    EXPECT_EQ(imported.err.find("backed up"), std::string::npos); // not due again within the day
    EXPECT_EQ(hierloom::core::ColonyStore::open(colony).encounterCount(), 2);

    const CliResult backup = runCli({"backup", colony, "--keep", "5"});
    ASSERT_EQ(backup.status, 0) << backup.err;
    const std::string copy = lines(backup.out).at(0);
    EXPECT_TRUE(std::filesystem::exists(copy));
    const CliResult list = runCli({"backup", colony, "--list"});
    EXPECT_EQ(lines(list.out).size(), 3U); // header + 2 backups
    EXPECT_EQ(lines(list.out)[1], copy);   // newest first

    // Restore the backup taken before any encounter.
    const std::string oldest = lines(list.out)[2];
    const CliResult restored = runCli({"restore", colony, "--from", oldest});
    ASSERT_EQ(restored.status, 0) << restored.err;
    EXPECT_EQ(hierloom::core::ColonyStore::open(colony).encounterCount(), 0);
    EXPECT_EQ(runCli({"restore", colony, "--latest"}).status, 0);
    // The newest backup is the state the first restore replaced.
    EXPECT_EQ(hierloom::core::ColonyStore::open(colony).encounterCount(), 2);
    EXPECT_EQ(runCli({"restore", colony}).status, 2);
    EXPECT_EQ(runCli({"restore", colony, "--from", dir.file("none.hierloom")}).status, 2);
}

TEST(CliReliability, MergeListsConflictsThenSettlesThemWhenAsked)
{
    CliTempDir dir;
    const std::string a = setUp(dir);
    const std::string b = dir.file("b.hierloom");
    std::filesystem::copy_file(a, b);
    ASSERT_EQ(runCli({"import", a, "--encounters", dir.write("ea.csv", "date,winner,loser\n2012-01-01,F1,M1\n")}).status, 0);
    ASSERT_EQ(runCli({"import", b, "--encounters", dir.write("eb.csv", "date,winner,loser\n2012-02-01,M1,F1\n")}).status, 0);
    for (const auto& [file, name] : {std::pair{a, "Eve"}, std::pair{b, "Ada"}}) {
        // F1 renamed on both laptops since they parted: a real conflict.
        hierloom::core::ColonyStore s = hierloom::core::ColonyStore::open(file);
        s.exec((std::string("UPDATE animal SET name = '") + name + "' WHERE id = 'F1'").c_str());
    }
    const CliResult conflict = runCli({"merge", a, "--from", b});
    EXPECT_EQ(conflict.status, 2);
    EXPECT_NE(conflict.out.find("conflict,animal,"), std::string::npos) << conflict.out;
    EXPECT_NE(conflict.out.find("name: 'Eve' here, 'Ada' in the other file, '' before"), std::string::npos)
        << conflict.out;
    EXPECT_NE(conflict.err.find("nothing was merged"), std::string::npos);
    EXPECT_EQ(hierloom::core::ColonyStore::open(a).encounterCount(), 1);

    const CliResult dry = runCli({"merge", a, "--from", b, "--prefer", "theirs", "--dry-run"});
    EXPECT_EQ(dry.status, 0) << dry.err;
    EXPECT_NE(dry.err.find("dry run: would add 0 animals, 0 residences, 1 encounters"), std::string::npos) << dry.err;
    EXPECT_EQ(hierloom::core::ColonyStore::open(a).encounterCount(), 1);

    const CliResult merged = runCli({"merge", a, "--from", b, "--prefer", "theirs"});
    ASSERT_EQ(merged.status, 0) << merged.err;
    EXPECT_NE(merged.out.find("added,encounter,"), std::string::npos);
    EXPECT_NE(merged.out.find(",seq 2"), std::string::npos) << merged.out;
    EXPECT_NE(merged.out.find("taken from other,,,animal F1,"), std::string::npos) << merged.out;
    EXPECT_EQ(hierloom::core::ColonyStore::open(a).encounterCount(), 2);
    EXPECT_EQ(runCli({"merge", a, "--from", a}).status, 2);
    EXPECT_EQ(runCli({"merge", a, "--from", b, "--prefer", "mine"}).status, 2);

    // The history of F1 in a: inserted by the import, then taken from b by the merge.
    const CliResult h = runCli({"history", a, "--animal", "F1"});
    ASSERT_EQ(h.status, 0) << h.err;
    const auto rows = lines(h.out);
    ASSERT_EQ(rows.size(), 4U) << h.out;
    EXPECT_EQ(rows[0], "time,user,table,uid,action,old_values,new_values");
    EXPECT_NE(rows[1].find(",animal,"), std::string::npos);
    EXPECT_NE(rows[1].find(",insert,"), std::string::npos);
    EXPECT_NE(rows[2].find(",update,"), std::string::npos);
    EXPECT_NE(rows[2].find("Eve"), std::string::npos);
    EXPECT_NE(rows[3].find(",update,"), std::string::npos);
    EXPECT_NE(rows[3].find("Ada"), std::string::npos);
    EXPECT_EQ(runCli({"history", a, "--animal", "nobody"}).status, 2);
    EXPECT_EQ(runCli({"history", a}).status, 2);
}

namespace {

/// Two laptops' copies of the demo colony.
struct DemoCopies {
    CliTempDir dir;
    std::string a = dir.file("a.hierloom");
    std::string b = dir.file("b.hierloom");
    DemoCopies()
    {
        EXPECT_EQ(runCli({"demo", a}).status, 0);
        std::filesystem::copy_file(a, b);
    }
    /// The uid of the first encounter entered.
    static std::string firstUid(const std::string& colony)
    {
        const auto s = hierloom::core::ColonyStore::open(colony, hierloom::core::ColonyStore::Mode::ReadOnly);
        return s.loadEncounters().at(0).uid;
    }
};

std::int64_t encounters(const std::string& colony)
{
    return hierloom::core::ColonyStore::open(colony, hierloom::core::ColonyStore::Mode::ReadOnly).encounterCount();
}

} // namespace

// Issue 16 on copies of the demo colony: a deleted encounter came back after a
// merge, a one-sided edit was a conflict that --prefer theirs reverted, and
// the merge took no backup.
TEST(CliMergeDemo, DeletionsTravelOneSidedEditsAreTakenAndABackupIsTaken)
{
    DemoCopies d;
    const std::int64_t n = encounters(d.a);
    const std::string uid = DemoCopies::firstUid(d.a);
    {
        hierloom::core::ColonyStore s = hierloom::core::ColonyStore::open(d.a);
        s.exec(("DELETE FROM encounter WHERE uid = " + hierloom::core::uidSqlLiteral(uid)).c_str());
        s.exec("UPDATE animal SET name = 'edited on a' WHERE rowid = (SELECT min(rowid) FROM animal)");
    }
    // b into a, preferring b: the deletion stays, a's own edit stays.
    const CliResult here = runCli({"merge", d.a, "--from", d.b, "--prefer", "theirs"});
    ASSERT_EQ(here.status, 0) << here.err;
    EXPECT_NE(here.out.find("kept deleted,encounter," + uid + ","), std::string::npos) << here.out;
    EXPECT_EQ(here.out.find("conflict"), std::string::npos) << here.out;
    EXPECT_EQ(encounters(d.a), n - 1);
    EXPECT_NE(hierloom::core::ColonyStore::open(d.a, hierloom::core::ColonyStore::Mode::ReadOnly)
                  .loadAnimals()
                  .size(),
              0U);
    // a into b: the deletion is applied in b, with a backup first; the dry run before writes nothing.
    const CliResult dry = runCli({"merge", d.b, "--from", d.a, "--dry-run"});
    ASSERT_EQ(dry.status, 0) << dry.err;
    EXPECT_NE(dry.out.find("deleted,encounter," + uid + ","), std::string::npos) << dry.out;
    EXPECT_NE(dry.out.find("updated,animal,"), std::string::npos) << dry.out;
    EXPECT_EQ(encounters(d.b), n);
    EXPECT_TRUE(hierloom::core::listBackups(d.b).empty());
    const CliResult there = runCli({"merge", d.b, "--from", d.a});
    ASSERT_EQ(there.status, 0) << there.err;
    EXPECT_NE(there.err.find("backed up " + d.b), std::string::npos) << there.err;
    EXPECT_EQ(hierloom::core::listBackups(d.b).size(), 1U);
    EXPECT_EQ(encounters(d.b), n - 1);
    // Both agree now.
    const CliResult again = runCli({"merge", d.a, "--from", d.b});
    ASSERT_EQ(again.status, 0) << again.err;
    EXPECT_EQ(lines(again.out).size(), 1U) << again.out; // the header only: deleted on both sides now
    EXPECT_NE(again.err.find("nothing to merge"), std::string::npos) << again.err;
    EXPECT_TRUE(hierloom::core::listBackups(d.a).empty()); // no merge into a changed anything: no backup
}

// Two demo files made apart give the same records the same uids: nothing to merge.
TEST(CliMergeDemo, TwoDemoFilesMadeApartMergeWithoutConflicts)
{
    CliTempDir dir;
    ASSERT_EQ(runCli({"demo", dir.file("a.hierloom")}).status, 0);
    ASSERT_EQ(runCli({"demo", dir.file("b.hierloom")}).status, 0);
    const CliResult r = runCli({"merge", dir.file("a.hierloom"), "--from", dir.file("b.hierloom")});
    ASSERT_EQ(r.status, 0) << r.err;
    EXPECT_EQ(lines(r.out).size(), 1U) << r.out;
    EXPECT_NE(r.err.find("nothing to merge"), std::string::npos) << r.err;
}
