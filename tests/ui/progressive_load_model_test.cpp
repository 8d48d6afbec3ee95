// SPDX-License-Identifier: GPL-3.0-or-later
// Model-based test of opening a large colony in steps (ColonyDocument: one
// group first, the rest on a thread of its own, other groups read when a view
// turns to them). The document is told that every file is large, so the small
// facade colony opens in steps. A seeded random run opens the file again,
// turns to a group, enters an encounter, undoes and redoes, lets another
// program write, and lets the background load arrive (or not yet) between
// steps. After every step, once the document has caught up with the file as
// the window's activation does: for each group the document says it holds,
// its cached rows of that group equal what a fresh connection reads for that
// group's scope, and once the load is complete the whole cache equals the file.
// The reference is the file itself, read by a new connection, never the cache.
// A second run does the same for a centre too large to be read whole by
// itself: one group kept at a time (the other dropped), every group read only
// when asked (readEverything).
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/qt_convert.h"
#include "ui/document/record_equality.h"

#include "core/store/colony_edits.h"

#include "tests/ui/facade_test_support.h"
#include "tests/ui/two_group_encounters.h"

#include <QCoreApplication>
#include <QSignalSpy>
#include <QUndoStack>

#include <gtest/gtest.h>

#include <random>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {


core::EncounterScope groupScope(const std::string& group)
{
    core::EncounterScope scope;
    scope.group = group;
    return scope;
}

std::string rowText(const core::Encounter& e)
{
    return std::to_string(e.seq) + "|" + e.uid + "|" + std::to_string(e.date) + "|" + std::to_string(e.time.value_or(-1)) +
           "|" + e.winner + "|" + e.loser + "|" + e.group + "|" + e.observer + "|" + e.note;
}

std::vector<std::string> rowsOf(const std::vector<core::Encounter>& rows, const std::string& group)
{
    std::vector<std::string> out;
    for (const core::Encounter& e : rows)
        if (group.empty() || e.group == group) out.push_back(rowText(e));
    return out;
}

class ProgressiveRun {
public:
    ProgressiveRun(unsigned seed, bool capped) : random_(seed), capped_(capped)
    {
        facade_.setToday(today_);
        // Some history before the desktop opens the file: both groups.
        core::ColonyStore other = core::ColonyStore::open(path_);
        for (int i = 0; i < 60; ++i) {
            std::vector<core::Encounter> one{randomEncounter()};
            const core::FieldProblems p = core::insertEncounters(other, one, today_);
            EXPECT_TRUE(p.empty()) << p.front().message;
        }
        document_.setProgressiveFrom(1);
        if (capped_) {
            document_.setReadEverythingUpTo(0);
            document_.setHeldGroupLimit(1);
        }
        document_.open(ui::toQString(path_));
    }

    void step()
    {
        const int pick = uniform(0, 99);
        if (pick < 8) reopen();
        else if (pick < 28) turnTo();
        else if (pick < 55) enter();
        else if (pick < 67) document_.undo();
        else if (pick < 74) document_.redo();
        else if (pick < 84) outsideWrite();
        else if (pick < 94) QCoreApplication::processEvents(); // the background load may arrive
        else {
            document_.readEverything(); // nothing when already complete or loading
            document_.finishLoading();
        }
        check();
    }

    int partialChecks() const { return partialChecks_; }
    int completeChecks() const { return completeChecks_; }
    int enteredBeforeComplete() const { return enteredBeforeComplete_; }

private:
    int uniform(int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(random_); }

    core::Encounter randomEncounter()
    {
        const auto& group = uniform(0, 1) ? test::kGroupA : test::kGroupB;
        return test::randomEncounterIn(random_, group, core::dayFromCivil(2018, 1, 1), 2500);
    }

    void reopen()
    {
        document_.open(ui::toQString(path_));
        EXPECT_FALSE(document_.isComplete()) << "a file of at least progressiveFrom() encounters opens in steps";
    }

    void turnTo()
    {
        const QString group = uniform(0, 1) ? QStringLiteral("A") : QStringLiteral("B");
        QSignalSpy shown(&document_, &ui::ColonyDocument::groupShown);
        document_.showGroup(group);
        ASSERT_EQ(shown.count(), 1);
        EXPECT_EQ(shown.front().front().toString(), group);
        EXPECT_TRUE(document_.holdsGroup(ui::toStdString(group)));
    }

    void enter()
    {
        if (!document_.isComplete()) ++enteredBeforeComplete_;
        core::Encounter e = randomEncounter();
        const core::FieldProblems p = facade_.addEncounter(e);
        ASSERT_TRUE(p.empty()) << p.front().message;
        // The new row is in the cache at once, whether or not its group was read yet.
        const std::vector<core::Encounter> cache = document_.encounters().expand();
        ASSERT_FALSE(cache.empty());
        EXPECT_EQ(rowText(cache.back()), rowText(e));
    }

    void outsideWrite()
    {
        core::ColonyStore other = core::ColonyStore::open(path_);
        core::Encounter e = randomEncounter();
        if (uniform(0, 2) == 0) {
            const std::vector<core::Encounter> all = other.loadEncounters();
            if (!all.empty()) {
                core::deleteEncounters(other, {all[static_cast<size_t>(uniform(0, static_cast<int>(all.size()) - 1))].uid});
                return;
            }
        }
        std::vector<core::Encounter> one{e};
        const core::FieldProblems p = core::insertEncounters(other, one, today_);
        ASSERT_TRUE(p.empty()) << p.front().message;
    }

    void check()
    {
        // As the window's activation does: another program's writes are read now.
        document_.catchUpWithFile();
        const core::ColonyStore fresh = core::ColonyStore::open(path_, core::ColonyStore::Mode::ReadOnly);
        const std::vector<core::Encounter> cache = document_.encounters().expand();
        ASSERT_TRUE(std::is_sorted(cache.begin(), cache.end(),
                                   [](const auto& a, const auto& b) { return a.seq < b.seq; }));
        if (document_.isComplete()) {
            ++completeChecks_;
            ASSERT_EQ(rowsOf(cache, ""), rowsOf(fresh.loadEncounters(), ""));
            return;
        }
        ++partialChecks_;
        if (capped_ && !document_.isLoading())
            EXPECT_LE(document_.heldGroups().size(), 1u) << "the least recently asked-for group is dropped";
        if (capped_ && !document_.isLoading()) EXPECT_FALSE(document_.holdsGroup("A") && document_.holdsGroup("B"));
        for (const std::string g : {"A", "B"}) {
            if (!document_.holdsGroup(g)) continue;
            ASSERT_EQ(rowsOf(cache, g), rowsOf(fresh.loadEncounters(groupScope(g)), g)) << "group " << g;
        }
    }

    std::mt19937 random_;
    bool capped_;
    TempDir dir_;
    std::string path_ = test::makeFacadeColony(dir_);
    core::Day today_ = core::dayFromCivil(2026, 1, 15);
    ui::ColonyDocument document_;
    ui::ColonyEditFacade facade_{&document_};
    int partialChecks_ = 0;
    int completeChecks_ = 0;
    int enteredBeforeComplete_ = 0;
};

} // namespace

TEST(ProgressiveLoadModel, HeldGroupsAlwaysEqualAFreshReadOfTheFile)
{
    for (unsigned seed : {1u, 2u, 3u, 4u, 5u, 6u, 7u, 8u}) {
        const bool capped = seed > 4;
        SCOPED_TRACE("seed " + std::to_string(seed) + (capped ? ", one group kept at a time" : ""));
        ProgressiveRun run(seed, capped);
        for (int i = 0; i < 120; ++i) {
            SCOPED_TRACE("step " + std::to_string(i));
            run.step();
            if (::testing::Test::HasFatalFailure()) return;
        }
        // The run reached both states and wrote while a load was still running.
        EXPECT_GT(run.partialChecks(), 5);
        EXPECT_GT(run.completeChecks(), 5);
        EXPECT_GT(run.enteredBeforeComplete(), 2);
    }
}

TEST(ProgressiveLoad, OpensWithOneGroupThenReadsEveryEncounterInTheBackground)
{
    TempDir dir;
    const std::string path = test::makeFacadeColony(dir);
    {
        core::ColonyStore other = core::ColonyStore::open(path);
        std::vector<core::Encounter> rows;
        for (int i = 0; i < 30; ++i) {
            core::Encounter e;
            e.date = core::dayFromCivil(2019, 1, 1) + i;
            e.winner = i % 3 ? "F1" : "M1";
            e.loser = i % 3 ? "F2" : "G1";
            rows.push_back(e);
        }
        ASSERT_TRUE(core::insertEncounters(other, rows, core::dayFromCivil(2026, 1, 15)).empty());
    }
    ui::ColonyDocument document;
    document.setProgressiveFrom(10);
    QSignalSpy shown(&document, &ui::ColonyDocument::groupShown);
    QSignalSpy progress(&document, &ui::ColonyDocument::loadProgress);
    QSignalSpy finished(&document, &ui::ColonyDocument::loadFinished);
    document.open(ui::toQString(path));
    // The first group by name (A: 20 of the 30 rows) is shown at once; B is not read yet.
    ASSERT_EQ(shown.count(), 1);
    EXPECT_EQ(shown.front().front().toString(), QStringLiteral("A"));
    EXPECT_FALSE(document.isComplete());
    EXPECT_TRUE(document.isLoading());
    EXPECT_EQ(document.encounters().size(), 20u);
    EXPECT_FALSE(document.holdsGroup("B"));
    document.finishLoading();
    EXPECT_TRUE(document.isComplete());
    EXPECT_FALSE(document.isLoading());
    EXPECT_EQ(document.encounters().size(), 30u);
    EXPECT_EQ(finished.count(), 1);
    // One report per part: 30 rows are one part, "1 of 1".
    ASSERT_EQ(progress.count(), 1);
    EXPECT_EQ(progress.back().at(0).toInt(), 1);
    EXPECT_EQ(progress.back().at(1).toInt(), 1);

    // Closing while a load runs stops it: nothing arrives afterwards.
    document.open(ui::toQString(path));
    EXPECT_TRUE(document.isLoading());
    document.close();
    EXPECT_FALSE(document.isLoading());
    QCoreApplication::processEvents();
    EXPECT_EQ(finished.count(), 1);
    EXPECT_TRUE(document.encounters().empty());
}

TEST(ProgressiveLoad, ACentreTooLargeToReadWholeKeepsTheGroupsInUseUntilAskedForEveryGroup)
{
    TempDir dir;
    const std::string path = test::makeFacadeColony(dir);
    {
        core::ColonyStore other = core::ColonyStore::open(path);
        std::vector<core::Encounter> rows;
        for (int i = 0; i < 30; ++i) {
            core::Encounter e;
            e.date = core::dayFromCivil(2019, 1, 1) + i;
            e.winner = i % 3 ? "F1" : "M1";
            e.loser = i % 3 ? "F2" : "G1";
            rows.push_back(e);
        }
        ASSERT_TRUE(core::insertEncounters(other, rows, core::dayFromCivil(2026, 1, 15)).empty());
    }
    ui::ColonyDocument document;
    document.setProgressiveFrom(10);
    document.setReadEverythingUpTo(29); // the file's 30 are too many
    document.setHeldGroupLimit(1);
    document.open(ui::toQString(path));
    EXPECT_FALSE(document.isComplete());
    EXPECT_FALSE(document.isLoading()) << "nothing more is read by itself";
    EXPECT_EQ(document.encounters().size(), 20u); // group A
    document.showGroup(QStringLiteral("B"));
    EXPECT_EQ(document.heldGroups(), std::vector<std::string>{"B"});
    EXPECT_EQ(document.encounters().size(), 10u) << "A was dropped for B";
    QSignalSpy progress(&document, &ui::ColonyDocument::loadProgress);
    document.readEverything();
    EXPECT_TRUE(document.isLoading());
    document.finishLoading();
    EXPECT_TRUE(document.isComplete());
    EXPECT_EQ(document.encounters().size(), 30u);
    ASSERT_GE(progress.count(), 2);
    EXPECT_EQ(progress.front().at(0).toInt(), 0); // the bar appears before the first group is read
}
