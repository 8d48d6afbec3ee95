// SPDX-License-Identifier: GPL-3.0-or-later
// Rank dynamics in the desktop views: the prediction view's foresight table
// and plot against core::computeForesight, the timeline's colouring of rank
// changes against core::timelineRankChanges (docs/methods.md "Active and
// passive rank changes", "Foresight"), each switched by keys typed into the
// focused widget.
#include "core/pedigree/foresight.h"
#include "plot_test_support.h"
#include "ui/analysis/prediction_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/document/animal_selection.h"
#include "ui/document/document_settings.h"

#include <QApplication>
#include <QComboBox>
#include <QTableWidget>
#include <QTest>

#include <gtest/gtest.h>

#include <algorithm>
#include <qcustomplot.h>

using namespace hierloom;
using hierloom::test::DemoDocument;
using hierloom::test::finish;

namespace {

/// Shows `view`, makes it the active window and gives `widget` the keyboard focus.
bool focusIn(QWidget& view, QWidget* widget)
{
    view.show();
    QApplication::setActiveWindow(&view);
    if (!QTest::qWaitForWindowActive(&view)) return false;
    widget->setFocus();
    return QApplication::focusWidget() == widget;
}

core::Foresight expectedForesight(ui::ColonyDocument* document, core::SiblingRule rule)
{
    const core::AnalysisSettings settings = ui::documentAnalysisSettings(document);
    core::SelectionOptions record;
    record.draws = settings.elo.draws;
    core::ForesightOptions o;
    o.rule = rule;
    o.maturityYears = settings.maturityYears;
    o.elo = settings.elo;
    return core::computeForesight(document->colonyFor({}), document->residences(), record, o);
}

} // namespace

TEST(DynamicsViews, PredictionViewShowsTheForesightOfEachModel)
{
    DemoDocument demo;
    ui::AnimalSelection selection;
    ui::PredictionView view(demo.document(), &selection);
    finish(view.runner());
    const core::Foresight expected = expectedForesight(demo.document(), core::SiblingRule::Youngest);
    ASSERT_FALSE(expected.encounters.empty());
    EXPECT_EQ(view.foresight().comparable, expected.comparable);
    EXPECT_EQ(view.foresight().rule, core::SiblingRule::Youngest);
    // One table row per model with its whole-record figures, as computed in the core.
    const QTableWidget* table = view.foresightTable();
    ASSERT_EQ(table->rowCount(), 3);
    EXPECT_EQ(table->item(0, 0)->text(), QStringLiteral("Rule alone"));
    EXPECT_EQ(table->item(1, 0)->text(), QStringLiteral("Elo"));
    EXPECT_EQ(table->item(2, 0)->text(), QStringLiteral("Rule-informed Elo"));
    int row = 0;
    size_t years = 0;
    for (const core::ForesightRow& r : expected.rows) {
        if (r.year) {
            years += r.model == core::ForesightModel::Rule ? 1 : 0;
            continue;
        }
        EXPECT_EQ(table->item(row, 1)->text(), QString::number(r.score.logLikelihood, 'f', 0));
        EXPECT_EQ(table->item(row, 3)->text(), QString::number(*r.score.brier, 'f', 3));
        EXPECT_EQ(table->item(row, 4)->text(), QString::number(*r.score.sharePredicted * 100, 'f', 1) + QStringLiteral("%"));
        EXPECT_TRUE(table->item(row, 4)->toolTip().startsWith(QString::number(r.score.predicted) + QStringLiteral(" of ")));
        ++row;
    }
    // The plot: one line per model, one point per year (the share of winners predicted).
    ASSERT_EQ(view.foresightPlot()->graphCount(), 3);
    for (int g = 0; g < 3; ++g) EXPECT_EQ(static_cast<size_t>(view.foresightPlot()->graph(g)->data()->size()), years);
    const core::ForesightRow& firstElo = expected.rows[years + 1];
    ASSERT_EQ(firstElo.model, core::ForesightModel::Elo);
    EXPECT_DOUBLE_EQ(view.foresightPlot()->graph(1)->data()->constBegin()->value, *firstElo.score.sharePredicted);

    // Down in the focused rule box: the eldest-first rule, and the foresight follows it.
    auto* rule = view.findChild<QComboBox*>(QStringLiteral("rule"));
    ASSERT_NE(rule, nullptr);
    ASSERT_TRUE(focusIn(view, rule));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Down);
    finish(view.runner());
    EXPECT_EQ(view.foresight().rule, core::SiblingRule::Eldest);
    EXPECT_EQ(view.foresight().comparable, expectedForesight(demo.document(), core::SiblingRule::Eldest).comparable);
}

TEST(DynamicsViews, TimelineColoursEachRankChangeActiveOrPassive)
{
    DemoDocument demo;
    ui::AnimalSelection selection;
    ui::RankTimelineView view(demo.document(), &selection);
    finish(view.runner());
    using Kind = ui::RankTimelineView::ChangeKind;
    EXPECT_FALSE(view.changeColouring());
    EXPECT_EQ(view.changesOf(Kind::Active), nullptr);
    // The steps of the timeline split exactly (docs/methods.md identity).
    const auto& changes = view.rankChanges();
    ASSERT_FALSE(changes.empty());
    int expected[3] = {0, 0, 0};
    for (const core::TimelineRankChange& c : changes) {
        EXPECT_EQ(c.change.active + c.change.passive, c.change.total);
        if (c.change.total != 0) ++expected[static_cast<int>(ui::RankTimelineView::kindOf(c.change))];
    }
    EXPECT_GT(expected[static_cast<int>(Kind::Active)], 0);
    EXPECT_GT(expected[static_cast<int>(Kind::Passive)], 0);

    // Down in the focused rank-change box switches the colouring on.
    auto* box = view.findChild<QComboBox*>(QStringLiteral("changeColouring"));
    ASSERT_NE(box, nullptr);
    ASSERT_TRUE(focusIn(view, box));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Down);
    EXPECT_TRUE(view.changeColouring());
    // Every line is shown, so every change of rank carries one marker of its kind.
    ASSERT_EQ(view.visibleLineCount(), static_cast<int>(view.timeline().females.size()));
    for (Kind k : {Kind::Active, Kind::Passive, Kind::Both}) {
        ASSERT_NE(view.changesOf(k), nullptr);
        EXPECT_EQ(view.changesOf(k)->data()->size(), expected[static_cast<int>(k)]);
    }
    // One passive step checked at its place: the marker sits on her line at that checkpoint.
    for (const core::TimelineRankChange& c : changes) {
        if (c.change.total == 0 || ui::RankTimelineView::kindOf(c.change) != Kind::Passive) continue;
        const auto& pt = view.timeline().females[static_cast<size_t>(c.female)].points[static_cast<size_t>(c.point)];
        bool found = false;
        const QCPGraph* g = view.changesOf(Kind::Passive);
        for (auto it = g->data()->constBegin(); it != g->data()->constEnd(); ++it)
            found = found || (it->key == ui::RankTimelineView::keyOf(pt.day) && it->value == *pt.rank);
        EXPECT_TRUE(found);
        break;
    }
    // With a female selected, only her changes are marked.
    const core::TimelineRankChange& first = *std::find_if(changes.begin(), changes.end(), [](const auto& c) {
        return c.change.total != 0;
    });
    const std::string& who = view.timeline().females[static_cast<size_t>(first.female)].animal;
    int hers = 0;
    for (const core::TimelineRankChange& c : changes)
        hers += c.change.total != 0 && view.timeline().females[static_cast<size_t>(c.female)].animal == who;
    selection.setAnimal(QString::fromStdString(who));
    int marked = 0;
    for (Kind k : {Kind::Active, Kind::Passive, Kind::Both}) marked += view.changesOf(k)->data()->size();
    EXPECT_EQ(marked, hers);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Up);
    EXPECT_FALSE(view.changeColouring());
    EXPECT_EQ(view.changesOf(Kind::Active), nullptr);
}
