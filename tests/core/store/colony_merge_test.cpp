// SPDX-License-Identifier: GPL-3.0-or-later
// Merging field laptops: two copies of one colony file edited apart, merged both ways.
#include "core/store/colony_merge.h"
#include "core/store/colony_backup.h"
#include "core/store/colony_edits.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/store/uid_storage.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>
#include <set>

using namespace hierloom::core;
using hierloom::test::fileBytes;
using hierloom::test::TempDir;

namespace {

Day day(const char* text) { return *parseDate(text); }

Encounter encounter(const char* date, const char* winner, const char* loser, const char* observer)
{
    Encounter e;
    e.date = day(date);
    e.winner = winner;
    e.loser = loser;
    e.group = "main";
    e.observer = observer;
    return e;
}

/// The shared base: three founders and a daughter in group main, three encounters.
void writeBase(const std::string& path)
{
    ColonyStore store = ColonyStore::create(path);
    auto animal = [](const char* id, Sex sex, const char* birth, const char* mother) {
        Animal a;
        a.id = id;
        a.sex = sex;
        a.birth = day(birth);
        a.entry = day(birth);
        a.entryType = *mother ? EntryType::Born : EntryType::Founder;
        a.mother = mother;
        return a;
    };
    std::vector<Residence> stays;
    for (const char* id : {"F1", "F2", "M1", "F3"})
        stays.push_back({id, "main", day(std::string(id) == "F3" ? "2012-03-01" : "2005-01-01"), std::nullopt, ""});
    store.append({animal("F1", Sex::Female, "2005-01-01", ""), animal("F2", Sex::Female, "2005-01-01", ""),
                  animal("M1", Sex::Male, "2005-01-01", ""), animal("F3", Sex::Female, "2012-03-01", "F1")},
                 std::move(stays),
                 {encounter("2013-01-01", "F1", "F2", "base"), encounter("2013-01-02", "M1", "F1", "base"),
                  encounter("2013-01-03", "F2", "F3", "base")});
}

std::set<std::string> encounterUids(const ColonyStore& s)
{
    std::set<std::string> out;
    for (const auto& u : s.encounterUids()) out.insert(u);
    return out;
}

std::string nameOf(const ColonyStore& s, const std::string& id)
{
    for (const Animal& a : s.loadAnimals())
        if (a.id == id) return a.name;
    return "?";
}

MergeOptions prefer(MergePreference p)
{
    MergeOptions o;
    o.prefer = p;
    o.today = day("2024-01-01");
    return o;
}

struct TwoLaptops {
    TempDir dir;
    std::string a = dir.file("laptop-a.hierloom");
    std::string b = dir.file("laptop-b.hierloom");
    TwoLaptops()
    {
        writeBase(a);
        std::filesystem::copy_file(a, b);
        {
            ColonyStore s = ColonyStore::open(a);
            s.append({}, {}, {encounter("2014-05-02", "F1", "M1", "ann"), encounter("2014-05-01", "F3", "F2", "ann")});
            s.exec("UPDATE animal SET name = 'Bea (ann)' WHERE id = 'F2'");
        }
        {
            ColonyStore s = ColonyStore::open(b);
            // Entered out of date order: the merge appends them in date order.
            s.append({}, {}, {encounter("2014-06-03", "M1", "F3", "bo"), encounter("2014-06-01", "F2", "F1", "bo"),
                              encounter("2014-06-02", "F1", "F3", "bo")});
            s.exec("UPDATE animal SET name = 'Bea (bo)' WHERE id = 'F2'");
        }
    }
};

} // namespace

TEST(ColonyMerge, ConflictingEditsAreListedAndNothingIsWritten)
{
    TwoLaptops t;
    const std::string before = fileBytes(t.a);
    ColonyStore a = ColonyStore::open(t.a);
    const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
    const MergeReport r = mergeColonies(a, b, prefer(MergePreference::None));
    ASSERT_EQ(r.conflicts.size(), 1U);
    EXPECT_EQ(r.conflicts[0].table, "animal");
    EXPECT_EQ(r.conflicts[0].record, "animal F2");
    EXPECT_EQ(r.conflicts[0].what, "name: 'Bea (ann)' here, 'Bea (bo)' in the other file");
    EXPECT_FALSE(r.written);
    EXPECT_TRUE(r.addedEncounters.empty());
    EXPECT_EQ(a.encounterCount(), 5);
    a = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly); // closes laptop-a
    EXPECT_EQ(fileBytes(t.a), before);
}

TEST(ColonyMerge, MergedBothWaysBothFilesReachTheUnion)
{
    TwoLaptops t;
    {
        ColonyStore a = ColonyStore::open(t.a);
        const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
        const MergeReport r = mergeColonies(a, b, prefer(MergePreference::Ours));
        EXPECT_TRUE(r.written);
        EXPECT_TRUE(r.conflicts.empty());
        EXPECT_TRUE(r.problems.empty()) << r.problems.text();
        // Base records are skipped (4 animals incl. F2 kept as ours, 4 stays, 3 encounters).
        EXPECT_EQ(r.skippedAnimals, 4U);
        EXPECT_EQ(r.skippedResidences, 4U);
        EXPECT_EQ(r.skippedEncounters, 3U);
        ASSERT_EQ(r.addedEncounters.size(), 3U);
        // After laptop-a's 5, in laptop-b's chronological order.
        EXPECT_EQ(r.addedEncounters[0].seq, 6);
        EXPECT_EQ(formatDate(r.addedEncounters[0].date), "2014-06-01");
        EXPECT_EQ(formatDate(r.addedEncounters[1].date), "2014-06-02");
        EXPECT_EQ(formatDate(r.addedEncounters[2].date), "2014-06-03");
        EXPECT_EQ(r.addedEncounters[2].seq, 8);
        EXPECT_EQ(nameOf(a, "F2"), "Bea (ann)");
        EXPECT_EQ(a.encounterCount(), 8);
    }
    {
        // The other way round, taking laptop-a's edit of F2.
        ColonyStore b = ColonyStore::open(t.b);
        const ColonyStore a = ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly);
        const MergeReport r = mergeColonies(b, a, prefer(MergePreference::Theirs));
        EXPECT_TRUE(r.written);
        ASSERT_EQ(r.takenFromOther.size(), 1U);
        EXPECT_EQ(r.takenFromOther[0], "animal F2");
        EXPECT_EQ(r.addedEncounters.size(), 2U); // laptop-a's own two; b's three came back as duplicates
        EXPECT_EQ(r.skippedEncounters, 6U);
        EXPECT_EQ(nameOf(b, "F2"), "Bea (ann)");
    }
    const ColonyStore a = ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly);
    const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(encounterUids(a), encounterUids(b));
    EXPECT_EQ(a.encounterCount(), 8); // 3 base + 2 + 3
    EXPECT_EQ(a.loadAnimals().size(), b.loadAnimals().size());
    // Merging again changes nothing: everything is already there.
    ColonyStore again = ColonyStore::open(t.a);
    const MergeReport r = mergeColonies(again, b, prefer(MergePreference::None));
    EXPECT_TRUE(r.conflicts.empty());
    EXPECT_TRUE(r.addedAnimals.empty() && r.addedResidences.empty() && r.addedEncounters.empty());
    EXPECT_EQ(r.skippedEncounters, 8U);
}

TEST(ColonyMerge, NewRecordsAreCheckedWithTheImportRulesAllOrNothing)
{
    TempDir dir;
    const std::string target = dir.file("t.hierloom");
    const std::string other = dir.file("o.hierloom");
    writeBase(target);
    std::filesystem::copy_file(target, other);
    {
        // The other laptop records a newborn and an encounter of hers; and one of F3 late in 2016.
        ColonyStore o = ColonyStore::open(other);
        Animal baby;
        baby.id = "F4";
        baby.sex = Sex::Female;
        baby.birth = baby.entry = day("2015-04-01");
        baby.entryType = EntryType::Born;
        baby.mother = "F3";
        o.append({baby}, {{"F4", "main", day("2015-04-01"), std::nullopt, ""}},
                 {encounter("2016-01-01", "F3", "F4", "bo")});
    }
    {
        // Here F3 is recorded as having died in 2015 (edited in this file only).
        ColonyStore t = ColonyStore::open(target);
        t.exec("UPDATE residence SET to_date = '2015-06-01' WHERE animal = 'F3'");
        t.exec("UPDATE animal SET exit_date = '2015-06-01', exit_type = 'died' WHERE id = 'F3'");
    }
    ColonyStore t = ColonyStore::open(target);
    const ColonyStore o = ColonyStore::open(other, ColonyStore::Mode::ReadOnly);
    const MergeReport r = mergeColonies(t, o, prefer(MergePreference::Ours));
    EXPECT_FALSE(r.written);
    ASSERT_FALSE(r.problems.empty());
    EXPECT_NE(r.problems.text().find("'F3' was not alive in the colony on 2016-01-01"), std::string::npos)
        << r.problems.text();
    // All or nothing: not even the newborn was added.
    EXPECT_EQ(t.loadAnimals().size(), 4U);
    EXPECT_EQ(t.encounterCount(), 3);
}

TEST(ColonyMerge, TheSameIdForTwoDifferentAnimalsIsAConflict)
{
    TempDir dir;
    const std::string target = dir.file("t.hierloom");
    const std::string other = dir.file("o.hierloom");
    writeBase(target);
    std::filesystem::copy_file(target, other);
    for (const std::string& p : {target, other}) {
        // Each laptop names its newcomer N1: two animals (two uids), one id.
        ColonyStore s = ColonyStore::open(p);
        Animal n;
        n.id = "N1";
        n.sex = p == target ? Sex::Female : Sex::Male;
        n.entry = day("2016-02-02");
        n.entryType = EntryType::Introduced;
        s.append({n}, {{"N1", "main", day("2016-02-02"), std::nullopt, ""}}, {});
    }
    ColonyStore t = ColonyStore::open(target);
    const ColonyStore o = ColonyStore::open(other, ColonyStore::Mode::ReadOnly);
    const MergeReport r = mergeColonies(t, o, prefer(MergePreference::None));
    ASSERT_EQ(r.conflicts.size(), 1U) << (r.conflicts.size() > 1 ? r.conflicts[1].what : "");
    EXPECT_EQ(r.conflicts[0].record, "animal N1");
    EXPECT_NE(r.conflicts[0].what.find("same identity"), std::string::npos);
    EXPECT_NE(r.conflicts[0].what.find("sex: 'F' here, 'M' in the other file"), std::string::npos);
}

// An encounter without a group takes the group both animals shared that day
// when it is written; the copy still without one in the other file is the same
// record, not a conflict, and preferring the other file keeps the group.
TEST(ColonyMerge, AnEmptyGroupFilledOnImportIsNotAConflict)
{
    TwoLaptops t;
    Encounter loose = encounter("2014-07-01", "F1", "F2", "cy");
    loose.group.clear();
    loose.uid = newUid();
    {
        ColonyStore b = ColonyStore::open(t.b);
        b.append({}, {}, {loose});
    }
    {
        ColonyStore a = ColonyStore::open(t.a);
        const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
        const MergeReport r = mergeColonies(a, b, prefer(MergePreference::Ours));
        EXPECT_TRUE(r.problems.empty()) << r.problems.text();
        ASSERT_EQ(r.addedEncounters.size(), 4U);
        EXPECT_EQ(r.addedEncounters.back().group, "main"); // filled on the way in
    }
    ColonyStore a = ColonyStore::open(t.a);
    {
        // Merged again: the filled group here against the empty one there is no conflict.
        const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
        const MergeReport r = mergeColonies(a, b, prefer(MergePreference::None));
        ASSERT_EQ(r.conflicts.size(), 1U); // only the fixture's edit of F2's name on both laptops
        EXPECT_EQ(r.conflicts[0].table, "animal");
        EXPECT_TRUE(r.addedEncounters.empty());
    }
    {
        // A real difference in the same record, preferring the other file: its note is
        // taken, the group filled here stays.
        ColonyStore b = ColonyStore::open(t.b);
        b.exec(("UPDATE encounter SET note = 'seen twice' WHERE uid = " + uidSqlLiteral(loose.uid)).c_str());
    }
    const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
    const MergeReport r = mergeColonies(a, b, prefer(MergePreference::Theirs));
    // The note was edited in the other file only: taken as an update, not a settled conflict.
    EXPECT_EQ(r.takenFromOther, (std::vector<std::string>{"animal F2"}));
    ASSERT_EQ(r.updated.size(), 1U);
    EXPECT_EQ(r.updated[0].record, "encounter of 2014-07-01 F1 beat F2");
    EXPECT_EQ(r.updated[0].detail, "note: '' here, 'seen twice' in the other file");
    for (const Encounter& e : a.loadEncounters())
        if (e.uid == loose.uid) {
            EXPECT_EQ(e.note, "seen twice");
            EXPECT_EQ(e.group, "main");
        }
}

// ---- Merging by identity with tombstones and the common state (issue 16) ----

namespace {

std::string uidOfEncounter(const ColonyStore& s, const char* date)
{
    for (const Encounter& e : s.loadEncounters())
        if (formatDate(e.date) == date) return e.uid;
    return {};
}

bool hasAnimal(const ColonyStore& s, const std::string& id)
{
    for (const Animal& a : s.loadAnimals())
        if (a.id == id) return true;
    return false;
}

/// The base with a newcomer N9 (no encounters), copied to a second laptop.
struct TwoCopies {
    TempDir dir;
    std::string a = dir.file("a.hierloom");
    std::string b = dir.file("b.hierloom");
    TwoCopies()
    {
        writeBase(a);
        {
            ColonyStore s = ColonyStore::open(a);
            Animal n;
            n.id = "N9";
            n.sex = Sex::Male;
            n.entry = day("2013-02-01");
            n.entryType = EntryType::Introduced;
            s.append({n}, {{"N9", "main", day("2013-02-01"), std::nullopt, ""}}, {});
        }
        std::filesystem::copy_file(a, b);
    }
};

MergeReport mergeInto(const std::string& target, const std::string& from, MergePreference p = MergePreference::None,
                      bool dryRun = false)
{
    ColonyStore t = ColonyStore::open(target);
    const ColonyStore o = ColonyStore::open(from, ColonyStore::Mode::ReadOnly);
    MergeOptions options = prefer(p);
    options.dryRun = dryRun;
    return mergeColonies(t, o, options);
}

} // namespace

// Issue 16: an encounter and an animal deleted on laptop a came back after
// merging laptop b's file. Now the deletion is a fact that travels both ways.
TEST(MergeTombstones, ADeletionHereStaysAndADeletionThereIsApplied)
{
    TwoCopies t;
    std::string gone;
    {
        ColonyStore a = ColonyStore::open(t.a);
        gone = uidOfEncounter(a, "2013-01-02");
        ASSERT_EQ(deleteEncounters(a, {gone}).size(), 1U);
        a.exec("DELETE FROM animal WHERE id = 'N9'"); // its stay goes with it
    }
    // b merged into a: nothing comes back.
    MergeReport r = mergeInto(t.a, t.b);
    EXPECT_TRUE(r.conflicts.empty());
    EXPECT_TRUE(r.addedAnimals.empty() && r.addedResidences.empty() && r.addedEncounters.empty());
    std::set<std::string> kept;
    for (const MergeChange& c : r.keptDeleted) kept.insert(c.record);
    EXPECT_EQ(kept, (std::set<std::string>{"animal N9", "stay of N9 in main from 2013-02-01",
                                           "encounter of 2013-01-02 M1 beat F1"}));
    {
        const ColonyStore a = ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly);
        EXPECT_EQ(a.encounterCount(), 2);
        EXPECT_FALSE(hasAnimal(a, "N9"));
    }
    // a merged into b: b deletes them too.
    r = mergeInto(t.b, t.a);
    EXPECT_TRUE(r.conflicts.empty());
    EXPECT_TRUE(r.problems.empty()) << r.problems.text();
    EXPECT_EQ(r.deleted.size(), 3U);
    EXPECT_TRUE(r.written);
    const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
    EXPECT_EQ(b.encounterCount(), 2);
    EXPECT_TRUE(b.encounterUids().count(gone) == 0);
    EXPECT_FALSE(hasAnimal(b, "N9"));
}

// Issue 16: an edit made on one side only was reported as a conflict and
// `--prefer theirs` reverted it. Only fields changed on both sides conflict.
TEST(MergeTombstones, AnEditOnOneSideIsTakenAndPreferTheirsDoesNotRevertIt)
{
    TwoCopies t;
    {
        ColonyStore a = ColonyStore::open(t.a);
        a.exec("UPDATE animal SET name = 'Ada' WHERE id = 'F1'");
    }
    {
        ColonyStore b = ColonyStore::open(t.b);
        b.exec("UPDATE animal SET name = 'Moss' WHERE id = 'M1'");
    }
    // Preferring b's version decides nothing here: no field changed on both sides.
    MergeReport r = mergeInto(t.a, t.b, MergePreference::Theirs);
    EXPECT_TRUE(r.conflicts.empty());
    EXPECT_TRUE(r.takenFromOther.empty());
    ASSERT_EQ(r.updated.size(), 1U);
    EXPECT_EQ(r.updated[0].record, "animal M1");
    EXPECT_EQ(nameOf(ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly), "F1"), "Ada");
    EXPECT_EQ(nameOf(ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly), "M1"), "Moss");
    // The other way, without any preference: no conflict either.
    r = mergeInto(t.b, t.a);
    EXPECT_TRUE(r.conflicts.empty()) << r.conflicts.front().what;
    EXPECT_EQ(nameOf(ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly), "F1"), "Ada");
    EXPECT_EQ(nameOf(ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly), "M1"), "Moss");
    // Both files now agree; merging again changes nothing.
    r = mergeInto(t.a, t.b);
    EXPECT_FALSE(r.changes());
    EXPECT_FALSE(r.written);
}

// A field changed on both sides is a conflict shown with both values and the
// common one; another field of the same record changed on one side is taken.
TEST(MergeTombstones, ATwoSidedEditIsAConflictFieldByField)
{
    TwoCopies t;
    {
        ColonyStore a = ColonyStore::open(t.a);
        a.exec("UPDATE animal SET name = 'Ada' WHERE id = 'F1'");
    }
    {
        ColonyStore b = ColonyStore::open(t.b);
        b.exec("UPDATE animal SET name = 'Ida', entry_type = 'introduced' WHERE id = 'F1'");
    }
    MergeReport r = mergeInto(t.a, t.b);
    ASSERT_EQ(r.conflicts.size(), 1U);
    ASSERT_EQ(r.conflicts[0].fields.size(), 1U);
    const FieldConflict& f = r.conflicts[0].fields[0];
    EXPECT_EQ(f.field, "name");
    EXPECT_EQ(f.ours, "Ada");
    EXPECT_EQ(f.theirs, "Ida");
    ASSERT_TRUE(f.base.has_value());
    EXPECT_EQ(*f.base, "");
    EXPECT_FALSE(r.written);
    // Settled for ours: our name stays, their one-sided entry type is taken.
    r = mergeInto(t.a, t.b, MergePreference::Ours);
    EXPECT_TRUE(r.written);
    for (const Animal& a : ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly).loadAnimals())
        if (a.id == "F1") {
            EXPECT_EQ(a.name, "Ada");
            EXPECT_EQ(a.entryType, EntryType::Introduced);
        }
}

// Deleted on one side, edited on the other since: a conflict, not a silent choice.
TEST(MergeTombstones, DeletedAgainstEditedIsAConflict)
{
    TwoCopies t;
    std::string uid;
    {
        ColonyStore a = ColonyStore::open(t.a);
        uid = uidOfEncounter(a, "2013-01-03");
        deleteEncounters(a, {uid});
    }
    {
        ColonyStore b = ColonyStore::open(t.b);
        b.exec(("UPDATE encounter SET note = 'bleeding ear' WHERE uid = " + uidSqlLiteral(uid)).c_str());
    }
    MergeReport r = mergeInto(t.a, t.b);
    ASSERT_EQ(r.conflicts.size(), 1U);
    EXPECT_EQ(r.conflicts[0].uid, uid);
    ASSERT_EQ(r.conflicts[0].fields.size(), 1U);
    EXPECT_EQ(r.conflicts[0].fields[0].field, "note");
    EXPECT_EQ(r.conflicts[0].fields[0].ours, "(deleted)");
    EXPECT_EQ(r.conflicts[0].fields[0].theirs, "bleeding ear");
    // The other way round, too.
    r = mergeInto(t.b, t.a);
    ASSERT_EQ(r.conflicts.size(), 1U);
    EXPECT_EQ(r.conflicts[0].fields[0].theirs, "(deleted)");
    // Preferring the other file brings the edited record back here.
    r = mergeInto(t.a, t.b, MergePreference::Theirs);
    EXPECT_TRUE(r.written);
    EXPECT_EQ(ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly).encounterUids().count(uid), 1U);
}

// Issue 16: two files set up from the same animals.csv failed with "19
// records were edited differently" (each gave the same animal its own uid).
TEST(MergeTombstones, TheSameImportIntoTwoNewFilesGivesTheSameIdentities)
{
    TempDir dir;
    const std::string animals = dir.write("animals.csv", hierloom::test::kBaseAnimals);
    const std::string residences = dir.write("residences.csv", hierloom::test::kBaseResidences);
    const std::string encounters =
        dir.write("encounters.csv", "date,winner,loser,note\n2021-01-01,MA,D1,\n2021-01-01,MA,D1,\n2021-01-02,D1,MA,x\n");
    for (const char* name : {"a.hierloom", "b.hierloom"}) {
        ColonyStore s = ColonyStore::create(dir.file(name));
        const ImportResult r = importFiles(s, {animals, residences, encounters}, day("2024-06-30"));
        ASSERT_TRUE(r.ok()) << r.problems.text();
    }
    const ColonyStore a = ColonyStore::open(dir.file("a.hierloom"), ColonyStore::Mode::ReadOnly);
    const ColonyStore b = ColonyStore::open(dir.file("b.hierloom"), ColonyStore::Mode::ReadOnly);
    auto uids = [](const ColonyStore& s) {
        std::set<std::string> out;
        for (const Animal& x : s.loadAnimals()) out.insert(x.uid);
        for (const Residence& x : s.loadResidences()) out.insert(x.uid);
        for (const Encounter& x : s.loadEncounters()) out.insert(x.uid);
        return out;
    };
    EXPECT_EQ(uids(a), uids(b));
    EXPECT_EQ(uids(a).size(), a.loadAnimals().size() + a.loadResidences().size() + 3U); // the twin rows differ
    const MergeReport r = mergeInto(dir.file("a.hierloom"), dir.file("b.hierloom"));
    EXPECT_TRUE(r.conflicts.empty());
    EXPECT_FALSE(r.changes());
    EXPECT_TRUE(r.matched.empty());
    // Importing the same encounters again into one file gives new records, new uids.
    ColonyStore again = ColonyStore::open(dir.file("a.hierloom"));
    ASSERT_TRUE(importFiles(again, {"", "", encounters}, day("2024-06-30")).ok());
    EXPECT_EQ(again.encounterUids().size(), 6U);
}

// Files set up apart by an older version (random uids for the same animals
// and encounters): matched by content and said so, not conflicts or duplicates.
TEST(MergeTombstones, RecordsUnderDifferentUidsAreMatchedByContent)
{
    TempDir dir;
    writeBase(dir.file("a.hierloom"));
    writeBase(dir.file("b.hierloom")); // the same records, fresh random uids
    const MergeReport r = mergeInto(dir.file("a.hierloom"), dir.file("b.hierloom"));
    EXPECT_TRUE(r.conflicts.empty()) << r.conflicts.front().what;
    EXPECT_FALSE(r.changes());
    EXPECT_EQ(r.matched.size(), 4U + 4U + 3U);
    EXPECT_NE(r.matched[0].detail.find("uid in the other file: "), std::string::npos);
    EXPECT_EQ(ColonyStore::open(dir.file("a.hierloom"), ColonyStore::Mode::ReadOnly).encounterCount(), 3);
}

// A merge that changes the file takes a backup first; a dry run and a merge
// with nothing to do write nothing, not even a backup.
TEST(MergeTombstones, ABackupBeforeEveryMergeThatChangesSomething)
{
    TwoCopies t;
    {
        ColonyStore b = ColonyStore::open(t.b);
        b.exec("UPDATE animal SET name = 'Moss' WHERE id = 'M1'");
    }
    const std::string before = fileBytes(t.a);
    MergeReport r = mergeInto(t.a, t.b, MergePreference::None, true);
    EXPECT_EQ(r.updated.size(), 1U); // what would change
    EXPECT_FALSE(r.written);
    EXPECT_TRUE(r.backup.empty());
    EXPECT_EQ(fileBytes(t.a), before);
    EXPECT_TRUE(listBackups(t.a).empty());
    r = mergeInto(t.a, t.b);
    EXPECT_TRUE(r.written);
    ASSERT_FALSE(r.backup.empty());
    ASSERT_EQ(listBackups(t.a).size(), 1U);
    EXPECT_EQ(listBackups(t.a)[0].path, r.backup);
    // The backup holds the state before the merge.
    EXPECT_EQ(nameOf(ColonyStore::open(r.backup, ColonyStore::Mode::ReadOnly), "M1"), "");
    r = mergeInto(t.a, t.b);
    EXPECT_FALSE(r.changes());
    EXPECT_TRUE(r.backup.empty());
    EXPECT_EQ(listBackups(t.a).size(), 1U);
}

// An encounter corrected in the other file to name an animal that file added:
// the animal is added before the correction is written.
TEST(MergeTombstones, AnEditNamingANewAnimalOfTheOtherFileIsWrittenAfterIt)
{
    TwoCopies t;
    {
        ColonyStore b = ColonyStore::open(t.b);
        Animal n;
        n.id = "N2";
        n.sex = Sex::Female;
        n.entry = day("2013-01-01");
        n.entryType = EntryType::Introduced;
        b.append({n}, {{"N2", "main", day("2013-01-01"), std::nullopt, ""}}, {});
        b.exec("UPDATE encounter SET loser = 'N2' WHERE date = '2013-01-03'");
    }
    const MergeReport r = mergeInto(t.a, t.b);
    EXPECT_TRUE(r.conflicts.empty());
    EXPECT_TRUE(r.problems.empty()) << r.problems.text();
    ASSERT_TRUE(r.written);
    EXPECT_EQ(r.addedAnimals.size(), 1U);
    ASSERT_EQ(r.updated.size(), 1U);
    EXPECT_EQ(r.updated[0].detail, "loser: 'F3' here, 'N2' in the other file");
    for (const Encounter& e : ColonyStore::open(t.a, ColonyStore::Mode::ReadOnly).loadEncounters())
        if (formatDate(e.date) == "2013-01-03") EXPECT_EQ(e.loser, "N2");
}
