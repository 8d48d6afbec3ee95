// SPDX-License-Identifier: GPL-3.0-or-later
// Merging field laptops: two copies of one colony file edited apart, merged both ways.
#include "core/store/colony_merge.h"
#include "core/store/colony_store.h"
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
        b.exec(("UPDATE encounter SET note = 'seen twice' WHERE uid = '" + loose.uid + "'").c_str());
    }
    const ColonyStore b = ColonyStore::open(t.b, ColonyStore::Mode::ReadOnly);
    const MergeReport r = mergeColonies(a, b, prefer(MergePreference::Theirs));
    EXPECT_EQ(r.takenFromOther, (std::vector<std::string>{"animal F2", "encounter of 2014-07-01 F1 beat F2"}));
    for (const Encounter& e : a.loadEncounters())
        if (e.uid == loose.uid) {
            EXPECT_EQ(e.note, "seen twice");
            EXPECT_EQ(e.group, "main");
        }
}
