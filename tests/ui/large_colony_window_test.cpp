// SPDX-License-Identifier: GPL-3.0-or-later
// The main window over a colony that opens in steps (ColonyDocument's
// progressiveFrom lowered so a small file counts as large): the status bar's
// load progress, the first group shown at once, and showGroup followed by
// the view on screen at once and by a hidden view when its tab is shown.
#include "ui/analysis/analysis_views.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"
#include "ui/shell/main_window.h"

#include "core/store/colony_edits.h"

#include "tests/ui/facade_test_support.h"

#include <QApplication>
#include <QComboBox>
#include <QLabel>
#include <QProgressBar>
#include <QStatusBar>

#include <gtest/gtest.h>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

/// The facade colony (group A: F1 F2 D1 D2, group B: M1 G1) with 20 encounters in A and 10 in B.
std::string makeColony(const TempDir& dir)
{
    const std::string path = test::makeFacadeColony(dir);
    core::ColonyStore store = core::ColonyStore::open(path);
    std::vector<core::Encounter> rows;
    for (int i = 0; i < 30; ++i) {
        core::Encounter e;
        e.date = core::dayFromCivil(2019, 1, 1) + i;
        e.winner = i % 3 ? "F1" : "M1";
        e.loser = i % 3 ? "F2" : "G1";
        rows.push_back(e);
    }
    EXPECT_TRUE(core::insertEncounters(store, rows, core::dayFromCivil(2026, 1, 15)).empty());
    return path;
}

/// The group a view shows: the value of its combo box with an "All groups" first item.
QString groupShownBy(QWidget* view)
{
    for (QComboBox* box : view->findChildren<QComboBox*>())
        if (box->count() > 0 && box->itemData(0).toString().isEmpty() && box->findData(QStringLiteral("A")) >= 0)
            return box->currentData().toString();
    return QStringLiteral("(no group choice)");
}

class QuietWindow : public ui::MainWindow {
protected:
    void reportError(const QString& title, const QString& message) override
    {
        ADD_FAILURE() << title.toStdString() << ": " << message.toStdString();
    }
};

} // namespace

TEST(LargeColonyWindow, OpensWithTheFirstGroupShowsProgressAndFollowsShowGroup)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    QuietWindow window;
    window.document()->setProgressiveFrom(10);
    window.show();
    window.showView(QStringLiteral("timeline"));
    ASSERT_TRUE(window.openColony(ui::toQString(path)));

    auto* progress = window.statusBar()->findChild<QWidget*>(QStringLiteral("loadProgress"));
    ASSERT_NE(progress, nullptr);
    EXPECT_TRUE(progress->isVisible()) << "the rest is still being read";
    EXPECT_FALSE(window.document()->isComplete());
    // The timeline on screen shows group A (the first by name), not "All groups" of a partial cache.
    window.analysisViews().timeline->runner()->wait();
    EXPECT_EQ(groupShownBy(window.analysisViews().timeline), QStringLiteral("A"));

    window.document()->finishLoading();
    QApplication::processEvents();
    EXPECT_FALSE(progress->isVisible());
    EXPECT_EQ(window.document()->encounters().size(), 30u);
    bool countShown = false;
    for (QLabel* label : window.statusBar()->findChildren<QLabel*>())
        countShown = countShown || label->text() == QStringLiteral("Encounters: 30");
    EXPECT_TRUE(countShown);

    // The group a centre overview would go to: the timeline on screen turns at once,
    // the matrix on its hidden tab when it is shown.
    window.document()->showGroup(QStringLiteral("B"));
    window.analysisViews().timeline->runner()->wait();
    EXPECT_EQ(groupShownBy(window.analysisViews().timeline), QStringLiteral("B"));
    EXPECT_NE(groupShownBy(window.analysisViews().matrix), QStringLiteral("B")) << "a hidden view waits until shown";
    window.showView(QStringLiteral("matrix"));
    window.analysisViews().matrix->runner()->wait();
    EXPECT_EQ(groupShownBy(window.analysisViews().matrix), QStringLiteral("B"));
    QStringList ids = window.analysisViews().matrix->order();
    ids.sort();
    EXPECT_EQ(ids, (QStringList{QStringLiteral("G1"), QStringLiteral("M1")})) << "group B's two animals";
}

TEST(LargeColonyWindow, ClosingWhileLoadingStopsTheLoadAndHidesTheProgress)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    QuietWindow window;
    window.document()->setProgressiveFrom(10);
    window.show();
    ASSERT_TRUE(window.openColony(ui::toQString(path)));
    EXPECT_TRUE(window.document()->isLoading());
    window.document()->close();
    EXPECT_FALSE(window.document()->isLoading());
    QApplication::processEvents();
    auto* progress = window.statusBar()->findChild<QWidget*>(QStringLiteral("loadProgress"));
    ASSERT_NE(progress, nullptr);
    EXPECT_FALSE(progress->isVisible());
    EXPECT_TRUE(window.document()->encounters().empty());
}
