// SPDX-License-Identifier: GPL-3.0-or-later
// The edit facade as the desktop's one writer: every kind of write is one undo
// command whose redo() writes, followed by one changed(kind); undo and redo
// put the file back exactly (read by a fresh connection); an edit that
// changes nothing writes and pushes nothing; the writes outside the history
// clear it once, saying why.
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/document/record_equality.h"

#include "core/store/species_settings.h"
#include "tests/ui/facade_test_support.h"

#include <QSignalSpy>
#include <QUndoStack>

#include <gtest/gtest.h>

#include <filesystem>
#include <functional>

using namespace hierloom;
using hierloom::test::TempDir;
using hierloom::test::fileDump;
using Kind = ui::ColonyDocument::ChangeKind;

namespace {

struct Facade {
    TempDir dir;
    std::string path = test::makeFacadeColony(dir);
    ui::ColonyDocument document;
    ui::ColonyEditFacade facade{&document};

    Facade()
    {
        document.open(ui::toQString(path));
        facade.setToday(core::dayFromCivil(2024, 12, 31));
    }
    QUndoStack* stack() { return document.undoStack(); }

    /// The document's cached records are those of the file.
    void expectCacheIsTheFile()
    {
        const core::Colony file = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly).load();
        EXPECT_TRUE(ui::sameRecords(document.encounters().expand(), file.encounters));
        EXPECT_TRUE(ui::sameRecords(document.pedigree().animals, file.animals));
        EXPECT_TRUE(ui::sameRecords(document.pedigree().residences, file.residences));
    }
};

core::Encounter encounter(const char* date, const char* winner, const char* loser)
{
    core::Encounter e;
    e.date = *core::parseDate(date);
    e.winner = winner;
    e.loser = loser;
    return e;
}

std::string problemsText(const core::FieldProblems& p) { return p.empty() ? std::string() : p.front().message; }

/// Runs one write and checks it is one command, one changed(kind), a real
/// change of the file, and that undo and redo each restore the file exactly.
void checkUndoableWrite(Facade& f, Kind kind, const std::function<core::FieldProblems()>& write)
{
    const std::string before = fileDump(f.path);
    const int commands = f.stack()->count();
    QSignalSpy changed(&f.document, &ui::ColonyDocument::changed);
    const core::FieldProblems p = write();
    ASSERT_TRUE(p.empty()) << problemsText(p);
    ASSERT_EQ(changed.count(), 1);
    EXPECT_EQ(changed.at(0).at(0).value<Kind>(), kind);
    EXPECT_EQ(f.stack()->count(), commands + 1);
    const std::string after = fileDump(f.path);
    EXPECT_NE(after, before);
    f.expectCacheIsTheFile();

    f.stack()->undo();
    EXPECT_EQ(fileDump(f.path), before);
    EXPECT_EQ(changed.count(), 2);
    f.expectCacheIsTheFile();
    f.stack()->redo();
    EXPECT_EQ(fileDump(f.path), after);
    EXPECT_EQ(changed.count(), 3);
    EXPECT_EQ(changed.at(2).at(0).value<Kind>(), kind);
    f.expectCacheIsTheFile();
}

} // namespace

TEST(EditFacade, EveryKindOfWriteIsOneCommandAndOneChangeAndUndoRestoresTheFile)
{
    Facade f;
    core::Encounter e = encounter("2020-05-01", "F1", "D1");
    e.observer = "ZZ"; // not on the observer list yet: the write adds it, the undo takes it off again
    {
        SCOPED_TRACE("add encounter");
        checkUndoableWrite(f, Kind::EncountersAppended, [&] { return f.facade.addEncounter(e); });
    }
    ASSERT_FALSE(e.uid.empty()); // the entered record carries its uid and seq
    {
        SCOPED_TRACE("edit encounter");
        core::Encounter changed = f.document.encounters().expand().front();
        changed.note = "bit on the tail";
        checkUndoableWrite(f, Kind::EncountersChanged, [&] { return f.facade.editEncounter(changed); });
    }
    {
        SCOPED_TRACE("delete encounter");
        checkUndoableWrite(f, Kind::EncountersChanged,
                           [&] { return f.facade.deleteEncounters({f.document.encounters().expand().front()}); });
    }
    {
        SCOPED_TRACE("add animal");
        core::Animal a;
        a.id = "N1";
        a.sex = core::Sex::Female;
        a.entry = core::parseDate("2019-01-01");
        a.entryType = core::EntryType::Founder;
        checkUndoableWrite(f, Kind::AnimalsChanged, [&] { return f.facade.addAnimal(a, "B"); });
    }
    {
        SCOPED_TRACE("edit animal");
        core::Animal a = f.document.pedigree().animals[static_cast<size_t>(f.document.pedigree().animalIndex("F2"))];
        a.name = "Beatrix";
        checkUndoableWrite(f, Kind::AnimalsChanged, [&] { return f.facade.editAnimal(a); });
    }
    {
        SCOPED_TRACE("move animal");
        checkUndoableWrite(f, Kind::AnimalsChanged,
                           [&] { return f.facade.moveAnimal("G1", "A", *core::parseDate("2022-02-02")); });
    }
    {
        SCOPED_TRACE("exit");
        checkUndoableWrite(f, Kind::AnimalsChanged,
                           [&] { return f.facade.recordExit("M1", *core::parseDate("2023-03-03"), core::ExitType::Died); });
    }
    {
        SCOPED_TRACE("observers");
        checkUndoableWrite(f, Kind::ListsChanged, [&] { return f.facade.setObservers({"GW", "HK"}); });
    }
    {
        SCOPED_TRACE("behaviour codes");
        checkUndoableWrite(f, Kind::ListsChanged, [&] { return f.facade.setBehaviourCodes({{"bite", 4, "a bite"}}); });
    }
    {
        SCOPED_TRACE("stability thresholds");
        core::StabilityThresholds t;
        t.counterShare = 0.45;
        t.minSevere = 7;
        checkUndoableWrite(f, Kind::SettingsChanged, [&] { return f.facade.setStabilityThresholds(t); });
        EXPECT_DOUBLE_EQ(core::readStabilityThresholds(*f.document.store()).counterShare, 0.45);
    }
    {
        SCOPED_TRACE("species");
        const core::SpeciesProfile& other = core::knownSpecies().at(1);
        checkUndoableWrite(f, Kind::SettingsChanged,
                           [&] { return f.facade.setSpeciesSetting(other.key, std::nullopt, other.maturityYears + 2); });
        EXPECT_EQ(core::readSpeciesSettings(*f.document.store()).maturityYears, other.maturityYears + 2);
    }
    {
        SCOPED_TRACE("save scenario");
        checkUndoableWrite(f, Kind::SettingsChanged, [&] { return f.facade.saveScenario("plan b", "remove F2\n"); });
        EXPECT_EQ(core::savedScenarioNames(*f.document.store()), std::vector<std::string>{"plan b"});
    }
    {
        SCOPED_TRACE("delete scenario");
        checkUndoableWrite(f, Kind::SettingsChanged, [&] { return f.facade.deleteScenario("plan b"); });
        EXPECT_TRUE(core::savedScenarioNames(*f.document.store()).empty());
    }
    EXPECT_EQ(f.stack()->count(), 13);
}

TEST(EditFacade, AnEditThatChangesNothingWritesAndPushesNothing)
{
    Facade f;
    core::Encounter e = encounter("2020-05-01", "F1", "D1");
    ASSERT_TRUE(f.facade.addEncounter(e).empty());
    ASSERT_TRUE(f.facade.saveScenario("plan b", "remove F2\n").empty());
    ASSERT_TRUE(f.facade.setObservers({"GW"}).empty());
    ASSERT_EQ(f.stack()->count(), 3);
    const std::string before = fileDump(f.path);
    QSignalSpy changed(&f.document, &ui::ColonyDocument::changed);

    EXPECT_TRUE(f.facade.editEncounter(f.document.encounters().expand().front()).empty());
    EXPECT_TRUE(f.facade.editAnimal(f.document.pedigree().animals.front()).empty());
    EXPECT_TRUE(f.facade.setObservers({"GW"}).empty());
    EXPECT_TRUE(f.facade.setBehaviourCodes(f.document.store()->behaviourCodes()).empty());
    // Thresholds and species as in effect (the defaults; nothing stored yet).
    EXPECT_TRUE(f.facade.setStabilityThresholds(core::StabilityThresholds{}).empty());
    EXPECT_TRUE(f.facade.setSpeciesSetting(core::kDefaultSpeciesKey, std::nullopt, std::nullopt).empty());
    EXPECT_TRUE(f.facade.saveScenario("plan b", "remove F2\n").empty());
    EXPECT_TRUE(f.facade.deleteScenario("no such plan").empty());
    EXPECT_TRUE(f.facade.deleteEncounters({}).empty());

    EXPECT_EQ(f.stack()->count(), 3);
    EXPECT_EQ(changed.count(), 0);
    EXPECT_EQ(fileDump(f.path), before);
    // A real change after them is still taken.
    core::StabilityThresholds t;
    t.minDecided += 1;
    EXPECT_TRUE(f.facade.setStabilityThresholds(t).empty());
    EXPECT_EQ(f.stack()->count(), 4);
    EXPECT_EQ(changed.count(), 1);
}

TEST(EditFacade, RefusedAndReadOnlyWritesPushNothing)
{
    Facade f;
    core::Encounter across = encounter("2020-05-01", "F1", "M1"); // different groups
    EXPECT_FALSE(f.facade.addEncounter(across).empty());
    EXPECT_FALSE(f.facade.setSpeciesSetting("no_such_species", std::nullopt, std::nullopt).empty());
    EXPECT_FALSE(f.facade.saveScenario("", "remove F2\n").empty());
    EXPECT_EQ(f.stack()->count(), 0);

    const std::string before = fileDump(f.path);
    f.document.open(ui::toQString(f.path), true);
    core::Encounter e = encounter("2020-05-01", "F1", "D1");
    EXPECT_FALSE(f.facade.addEncounter(e).empty());
    EXPECT_FALSE(f.facade.setStabilityThresholds(core::StabilityThresholds{0.5}).empty());
    EXPECT_EQ(f.stack()->count(), 0);
    EXPECT_EQ(fileDump(f.path), before);
}

TEST(EditFacade, ImportClearsTheHistoryOnceAndSaysWhy)
{
    Facade f;
    core::Encounter e = encounter("2020-05-01", "F1", "D1");
    ASSERT_TRUE(f.facade.addEncounter(e).empty());
    ASSERT_EQ(f.stack()->count(), 1);
    QSignalSpy cleared(&f.document, &ui::ColonyDocument::historyCleared);
    QSignalSpy changed(&f.document, &ui::ColonyDocument::changed);

    // An import stopped by a problem writes nothing and keeps the history.
    const std::string bad = f.dir.write("bad.csv", "date,winner,loser\n2020-06-01,F1,NOBODY\n");
    const core::ImportResult refused = f.facade.importFiles({{}, {}, bad});
    EXPECT_FALSE(refused.ok());
    EXPECT_EQ(f.stack()->count(), 1);
    EXPECT_EQ(cleared.count(), 0);
    EXPECT_EQ(changed.count(), 0);

    const std::string good = f.dir.write("good.csv", "date,winner,loser\n2020-06-01,F1,F2\n2020-06-02,M1,G1\n");
    QString readBack;
    const core::ImportResult done = f.facade.importFiles({{}, {}, good}, &readBack);
    ASSERT_TRUE(done.ok()) << done.problems.text();
    EXPECT_EQ(done.encounters, 2u);
    EXPECT_TRUE(readBack.isEmpty());
    EXPECT_EQ(f.stack()->count(), 0);
    ASSERT_EQ(cleared.count(), 1);
    EXPECT_TRUE(cleared.at(0).at(0).toString().contains(QStringLiteral("import"))) << cleared.at(0).at(0).toString().toStdString();
    ASSERT_EQ(changed.count(), 1);
    EXPECT_EQ(changed.at(0).at(0).value<Kind>(), Kind::Reset);
    EXPECT_EQ(f.document.encounters().size(), 3u);
    f.expectCacheIsTheFile();
}

TEST(EditFacade, MergeChecksWithoutWritingThenClearsTheHistoryOnceAndSaysWhy)
{
    Facade f;
    // The other file: a copy of this one (same uids) with one more encounter.
    const std::string other = f.dir.file("other.hierloom");
    std::filesystem::copy_file(f.path, other);
    core::Encounter theirs = encounter("2021-01-01", "M1", "G1");
    theirs.group = "B";
    core::ColonyStore::open(other).append({}, {}, {theirs});
    core::Encounter e = encounter("2020-05-01", "F1", "D1");
    ASSERT_TRUE(f.facade.addEncounter(e).empty());
    const std::string before = fileDump(f.path);
    QSignalSpy cleared(&f.document, &ui::ColonyDocument::historyCleared);

    const core::MergeReport dry = f.facade.checkMerge(ui::toQString(other));
    EXPECT_FALSE(dry.written);
    EXPECT_EQ(dry.addedEncounters.size(), 1u);
    EXPECT_EQ(fileDump(f.path), before);
    EXPECT_EQ(f.stack()->count(), 1);
    EXPECT_EQ(cleared.count(), 0);

    const core::MergeReport done = f.facade.merge(ui::toQString(other), core::MergePreference::None);
    ASSERT_TRUE(done.written);
    EXPECT_EQ(f.stack()->count(), 0);
    ASSERT_EQ(cleared.count(), 1);
    EXPECT_TRUE(cleared.at(0).at(0).toString().contains(QStringLiteral("merge")));
    EXPECT_EQ(f.document.encounters().size(), 2u);
    f.expectCacheIsTheFile();
}

TEST(EditFacade, OpeningAnotherFileClearsTheHistoryAndSaysWhyOnlyWhenThereWasOne)
{
    Facade f;
    QSignalSpy cleared(&f.document, &ui::ColonyDocument::historyCleared);
    f.document.open(ui::toQString(f.path)); // nothing to lose: nothing said
    EXPECT_EQ(cleared.count(), 0);
    core::Encounter e = encounter("2020-05-01", "F1", "D1");
    ASSERT_TRUE(f.facade.addEncounter(e).empty());
    f.document.close();
    EXPECT_EQ(f.stack()->count(), 0);
    ASSERT_EQ(cleared.count(), 1);
    EXPECT_TRUE(cleared.at(0).at(0).toString().contains(QStringLiteral("closed")));
}
