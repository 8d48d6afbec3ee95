// SPDX-License-Identifier: GPL-3.0-or-later
// Model-based test of the rank timeline's results kept by (group, step,
// document revision): a seeded random run enters, edits and deletes
// encounters, undoes and redoes, changes the analysis settings, lets another
// program write, opens the file again and turns the view between groups and
// steps, on a file opened whole, in steps with a background load, and kept
// one group at a time. After every step the timeline the view shows (from its
// kept results or a new computation) equals a fresh computation on the file
// read by a new connection, never on the document's cache.
#include "ui/analysis/rank_timeline_view.h"
#include "ui/document/animal_selection.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/document/compute_runner.h"
#include "ui/document/document_settings.h"
#include "ui/document/qt_convert.h"

#include "core/pedigree/matriline.h"
#include "core/store/analysis_settings_store.h"
#include "core/store/colony_edits.h"

#include "tests/ui/facade_test_support.h"
#include "tests/ui/two_group_encounters.h"

#include <QCoreApplication>

#include <qcustomplot.h>

#include <gtest/gtest.h>

#include <random>
#include <sstream>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {


/// Every figure of a timeline as one comparable text (numbers exact).
std::string timelineText(const core::RankTimeline& t)
{
    std::ostringstream out;
    out.precision(17);
    out << "max " << t.maxRank << (t.cancelled ? " cancelled" : "") << "\ncheckpoints";
    for (core::Day d : t.checkpoints) out << ' ' << d;
    for (const core::RankTimelineFemale& f : t.females) {
        out << "\n" << f.animal << '|' << f.name << '|' << f.matriarch << '|' << f.birth.value_or(-1) << " events";
        for (const core::LifeEvent& e : f.events) out << ' ' << static_cast<int>(e.kind) << '@' << e.day;
        for (const core::RankTimelinePoint& p : f.points)
            out << "\n  " << p.day << ' ' << (p.elo ? std::to_string(*p.elo) : "-") << ' ' << p.rank.value_or(0) << ' '
                << p.predictedRank << ' ' << p.discordantDyads;
    }
    return out.str();
}

enum class Opening { Whole, InSteps, OneGroupKept };

class TimelineCacheRun {
public:
    TimelineCacheRun(unsigned seed, Opening opening) : random_(seed)
    {
        facade_.setToday(today_);
        core::ColonyStore other = core::ColonyStore::open(path_);
        std::vector<core::Encounter> rows;
        for (int i = 0; i < 80; ++i) rows.push_back(randomEncounter());
        const core::FieldProblems p = core::insertEncounters(other, rows, today_);
        EXPECT_TRUE(p.empty()) << p.front().message;
        if (opening != Opening::Whole) document_.setProgressiveFrom(1);
        if (opening == Opening::OneGroupKept) {
            document_.setReadEverythingUpTo(0);
            document_.setHeldGroupLimit(1);
        }
        document_.open(ui::toQString(path_));
        view_ = std::make_unique<ui::RankTimelineView>(&document_, &selection_);
    }

    void step()
    {
        const int pick = uniform(0, 99);
        if (pick < 25) turn();
        else if (pick < 35) view_->setStep(uniform(0, 3) ? core::TimelineStep::Month : core::TimelineStep::Week);
        else if (pick < 50) enter();
        else if (pick < 56) edit();
        else if (pick < 61) remove();
        else if (pick < 70) document_.undo();
        else if (pick < 76) document_.redo();
        else if (pick < 81) settings();
        else if (pick < 87) outsideWrite();
        else if (pick < 90) document_.open(ui::toQString(path_));
        else if (pick < 95) QCoreApplication::processEvents(); // the background load may arrive
        else {
            document_.readEverything();
            document_.finishLoading();
        }
        check();
    }

    int compared() const { return compared_; }
    int reused() const { return view_->resultsReused(); }

private:
    int uniform(int lo, int hi) { return std::uniform_int_distribution<int>(lo, hi)(random_); }

    core::Encounter randomEncounter()
    {
        const auto& group = uniform(0, 2) ? test::kGroupA : test::kGroupB;
        return test::randomEncounterIn(random_, group, core::dayFromCivil(2019, 1, 1), 2000);
    }

    void turn()
    {
        const int g = uniform(0, 4);
        const QString group = g < 2 ? QStringLiteral("A") : g < 4 ? QStringLiteral("B") : QString();
        view_->setGroup(group);
        if (!group.isEmpty() && uniform(0, 1)) document_.showGroup(group); // as the centre overview does
    }

    void enter()
    {
        core::Encounter e = randomEncounter();
        const core::FieldProblems p = facade_.addEncounter(e);
        ASSERT_TRUE(p.empty()) << p.front().message;
    }

    /// A cached row (of a group the document holds), or nothing.
    std::optional<core::Encounter> pickRow()
    {
        const std::vector<core::Encounter> rows = document_.encounters().expand();
        if (rows.empty()) return std::nullopt;
        return rows[static_cast<size_t>(uniform(0, static_cast<int>(rows.size()) - 1))];
    }

    void edit()
    {
        std::optional<core::Encounter> e = pickRow();
        if (!e) return;
        std::swap(e->winner, e->loser);
        e->date += uniform(-30, 30);
        const core::FieldProblems p = facade_.editEncounter(*e);
        ASSERT_TRUE(p.empty()) << p.front().message;
    }

    void remove()
    {
        const std::optional<core::Encounter> e = pickRow();
        if (!e) return;
        const core::FieldProblems p = facade_.deleteEncounters({*e});
        ASSERT_TRUE(p.empty()) << p.front().message;
    }

    void settings()
    {
        core::AnalysisSettings s = ui::documentAnalysisSettings(&document_);
        s.elo.k = uniform(0, 1) ? 100 : 50 + uniform(0, 100);
        const core::FieldProblems p = facade_.setAnalysisSettings(s);
        ASSERT_TRUE(p.empty()) << p.front().message;
    }

    void outsideWrite()
    {
        core::ColonyStore other = core::ColonyStore::open(path_);
        std::vector<core::Encounter> one{randomEncounter()};
        const core::FieldProblems p = core::insertEncounters(other, one, today_);
        ASSERT_TRUE(p.empty()) << p.front().message;
    }

    void check()
    {
        // As the window's activation does: another program's writes are read now.
        document_.catchUpWithFile();
        view_->runner()->wait();
        ASSERT_FALSE(view_->runner()->busy());
        const std::string group = ui::toStdString(view_->timelineGroup());
        // "All groups" of a file not read whole covers the groups held only.
        if (group.empty() && !document_.isComplete()) return;
        const core::ColonyStore fresh = core::ColonyStore::open(path_, core::ColonyStore::Mode::ReadOnly);
        const core::Colony colony = fresh.load();
        const core::ResidenceIndex where(colony.animals, colony.residences);
        const core::AnalysisSettings settings = core::readAnalysisSettings(fresh);
        core::RankTimelineOptions options;
        options.inheritance.elo = settings.elo;
        options.inheritance.maturityYears = settings.maturityYears;
        options.inheritance.group = group;
        options.step = view_->step();
        const core::RankTimeline expected = core::computeRankTimeline(colony, where, core::Matrilines(colony), options);
        ASSERT_FALSE(view_->isComputing());
        ASSERT_EQ(timelineText(view_->timeline()), timelineText(expected)) << "group '" << group << "'";
        ++compared_;
    }

    std::mt19937 random_;
    TempDir dir_;
    std::string path_ = test::makeFacadeColony(dir_);
    core::Day today_ = core::dayFromCivil(2026, 1, 15);
    ui::ColonyDocument document_;
    ui::ColonyEditFacade facade_{&document_};
    ui::AnimalSelection selection_;
    std::unique_ptr<ui::RankTimelineView> view_;
    int compared_ = 0;
};

} // namespace

TEST(TimelineCacheModel, TheTimelineShownAlwaysEqualsAFreshComputationOnTheFile)
{
    int reused = 0;
    for (unsigned seed = 1; seed <= 9; ++seed) {
        const Opening opening = static_cast<Opening>(seed % 3);
        SCOPED_TRACE("seed " + std::to_string(seed) + " opening " + std::to_string(seed % 3));
        TimelineCacheRun run(seed, opening);
        for (int i = 0; i < 150; ++i) {
            SCOPED_TRACE("step " + std::to_string(i));
            run.step();
            if (::testing::Test::HasFatalFailure()) return;
        }
        EXPECT_GT(run.compared(), 60);
        reused += run.reused();
    }
    // The kept results were shown, not only computed again.
    EXPECT_GT(reused, 50);
}

TEST(TimelineCacheModel, TurningBackToAGroupShowsItsTimelineAtOnce)
{
    TempDir dir;
    const std::string path = test::makeFacadeColony(dir);
    {
        core::ColonyStore other = core::ColonyStore::open(path);
        std::vector<core::Encounter> rows;
        for (int i = 0; i < 40; ++i) {
            core::Encounter e;
            e.date = core::dayFromCivil(2022, 1, 1) + 7 * i;
            e.winner = i % 2 ? "F1" : "G1";
            e.loser = i % 2 ? "D1" : "M1";
            rows.push_back(e);
        }
        ASSERT_TRUE(core::insertEncounters(other, rows, core::dayFromCivil(2026, 1, 15)).empty());
    }
    ui::ColonyDocument document;
    document.open(ui::toQString(path));
    ui::AnimalSelection selection;
    ui::RankTimelineView view(&document, &selection);
    view.setGroup(QStringLiteral("A"));
    EXPECT_TRUE(view.isComputing()) << "another group: the plot says it is computing until the result arrives";
    // Its empty axes show no ticks of a range that is not the group's (dates of 1970 before any result).
    EXPECT_FALSE(view.plot()->xAxis->tickLabels());
    EXPECT_FALSE(view.plot()->yAxis->tickLabels());
    view.runner()->wait();
    EXPECT_FALSE(view.isComputing());
    EXPECT_TRUE(view.plot()->xAxis->tickLabels());
    const std::string a = timelineText(view.timeline());
    view.setGroup(QStringLiteral("B"));
    EXPECT_TRUE(view.isComputing());
    EXPECT_FALSE(view.plot()->xAxis->tickLabels()) << "nor group A's dates while B is computed";
    view.runner()->wait();
    const std::string b = timelineText(view.timeline());
    EXPECT_NE(a, b);
    view.setGroup(QStringLiteral("A"));
    EXPECT_FALSE(view.runner()->busy()) << "nothing computed again";
    EXPECT_FALSE(view.isComputing());
    EXPECT_EQ(timelineText(view.timeline()), a);
    EXPECT_EQ(view.resultsReused(), 1);
    // An edit is a new revision: the kept result is not shown again.
    ui::ColonyEditFacade facade(&document);
    core::Encounter e;
    e.date = core::dayFromCivil(2023, 6, 1);
    e.winner = "D1";
    e.loser = "F1";
    ASSERT_TRUE(facade.addEncounter(e).empty());
    view.runner()->wait();
    EXPECT_NE(timelineText(view.timeline()), a);
    view.setGroup(QStringLiteral("B"));
    EXPECT_TRUE(view.runner()->busy());
    view.runner()->wait();
    EXPECT_EQ(timelineText(view.timeline()), b) << "B's encounters did not change, but its result is computed again";
    EXPECT_EQ(view.resultsReused(), 1);
}
