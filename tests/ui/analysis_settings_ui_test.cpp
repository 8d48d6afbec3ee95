// SPDX-License-Identifier: GPL-3.0-or-later
// Analysis > Analysis Settings... typed with keystrokes changes what a view
// shows; the View menu and its shortcuts come from the view registry.
#include "ui/shell/main_window.h"

#include "core/demo/demo_colony_file.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/rank_method_registry.h"
#include "core/ranks/rank_table.h"
#include "core/store/analysis_settings_store.h"
#include "tests/core/import_test_support.h"
#include "ui/analysis/matrix_view.h"
#include "ui/document/colony_document.h"
#include "ui/document/compute_runner.h"
#include "ui/document/qt_convert.h"
#include "ui/document/document_settings.h"
#include "ui/shell/view_registry.h"
#include "ui/planning/report_dialog.h"
#include "core/demo/demo_colony.h"

#include <QAction>
#include <QApplication>
#include <QDialog>
#include <QTabWidget>
#include <QTest>
#include <QTimer>

#include <gtest/gtest.h>

#include <set>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

class TestWindow : public ui::MainWindow {
public:
    QStringList errors;

protected:
    void reportError(const QString& title, const QString& message) override { errors << title + ": " + message; }
};

/// A writable demo colony open in a shown, active main window.
struct OpenWindow {
    TempDir dir;
    TestWindow window;
    OpenWindow()
    {
        const std::string path = dir.file("demo.hierloom");
        core::createDemoColonyFile(path);
        EXPECT_TRUE(window.openColony(QString::fromStdString(path)));
        window.show();
        QApplication::setActiveWindow(&window);
        EXPECT_TRUE(QTest::qWaitForWindowActive(&window));
    }
    QTabWidget* tabs()
    {
        for (QTabWidget* t : window.findChildren<QTabWidget*>())
            if (t->count() > 0 && t->widget(0)->objectName() == QLatin1String("animals")) return t;
        return nullptr;
    }
};

double matrixTotal(const core::WinMatrix& m)
{
    double total = 0;
    for (int i = 0; i < m.n; ++i)
        for (int j = 0; j < m.n; ++j) total += m.s(i, j);
    return total;
}

} // namespace

TEST(ViewRegistry, ViewMenuHasEveryViewWithItsShortcut)
{
    OpenWindow w;
    const std::vector<ui::ViewEntry>& views = ui::viewRegistry();
    ASSERT_EQ(views.size(), 13U);
    const QList<QAction*>& actions = w.window.viewActions();
    ASSERT_EQ(actions.size(), static_cast<qsizetype>(views.size()));
    std::set<QString> shortcuts, ids;
    for (size_t i = 0; i < views.size(); ++i) {
        const QAction* a = actions[static_cast<qsizetype>(i)];
        EXPECT_EQ(a->text(), ui::viewTitle(views[i], true));
        EXPECT_EQ(a->shortcut(), ui::viewShortcut(views[i]));
        shortcuts.insert(a->shortcut().toString());
        ids.insert(QString::fromLatin1(views[i].id));
    }
    EXPECT_EQ(shortcuts.size(), views.size());
    EXPECT_EQ(ids.size(), views.size());
    // The first ones keep the shortcuts they had; the tenth takes Ctrl+0.
    EXPECT_EQ(actions[0]->shortcut(), QKeySequence(Qt::CTRL | Qt::Key_1));
    EXPECT_EQ(actions[5]->shortcut(), QKeySequence(Qt::CTRL | Qt::Key_6));
    EXPECT_EQ(actions[9]->shortcut(), QKeySequence(Qt::CTRL | Qt::Key_0));
    EXPECT_EQ(actions[10]->shortcut(), QKeySequence(Qt::CTRL | Qt::Key_K)); // the eleventh, Support
    EXPECT_EQ(actions[11]->shortcut(), QKeySequence(Qt::CTRL | Qt::Key_D)); // the twelfth, Data Health
    EXPECT_EQ(actions[12]->shortcut(), QKeySequence(Qt::CTRL | Qt::Key_G)); // the thirteenth, Centre Overview
    EXPECT_EQ(QString::fromLatin1(views[2].id), QStringLiteral("timeline"));

    // Pressing each shortcut on the window shows that view, from the last view backwards.
    QTabWidget* tabs = w.tabs();
    ASSERT_NE(tabs, nullptr);
    ASSERT_EQ(tabs->count(), static_cast<int>(views.size()));
    for (size_t k = 0; k < views.size(); ++k) {
        const size_t i = views.size() - 1 - k;
        tabs->setCurrentIndex(static_cast<int>((i + 1) % views.size()));
        QTest::keyClick(&w.window, views[i].key, Qt::ControlModifier);
        EXPECT_EQ(tabs->currentWidget()->objectName(), QString::fromLatin1(views[i].id)) << views[i].id;
    }
    // Every id opens its view by name (hierloom --view NAME).
    for (const ui::ViewEntry& v : views) {
        tabs->setCurrentIndex(0);
        EXPECT_TRUE(w.window.showView(QString::fromLatin1(v.id))) << v.id;
        EXPECT_EQ(tabs->currentWidget()->objectName(), QString::fromLatin1(v.id));
    }
    EXPECT_TRUE(w.window.errors.isEmpty()) << w.window.errors.join('\n').toStdString();
}

TEST(ViewRegistry, MatrixOrderListIsTheMethodRegistryAndId)
{
    OpenWindow w;
    QStringList expected;
    for (const core::RankMethodInfo& m : core::rankMethods()) expected << QString::fromLatin1(m.code);
    expected << QStringLiteral("id");
    EXPECT_EQ(w.window.analysisViews().matrix->orderCodes(), expected);
}

TEST(AnalysisSettingsDialog, KeystrokesChangeTheMatrixView)
{
    OpenWindow w;
    ui::MatrixView* matrix = w.window.analysisViews().matrix;
    matrix->setMethod(core::RankMethod::Elo); // it opens in I&SI order, as `matrix`; Elo shows the k
    ASSERT_TRUE(w.window.showView(QStringLiteral("matrix")));
    matrix->runner()->wait();
    const core::Colony& colony = w.window.document()->colonyFor({});
    const core::ResidenceIndex& where = w.window.document()->residences();
    // Draws count half to each side: the cells add up to every counted encounter.
    const core::EncounterSelection all = core::selectEncounters(colony, where, {});
    size_t draws = 0;
    for (const core::Bout& b : all.bouts) draws += b.draw ? 1 : 0;
    ASSERT_GT(draws, 0U);
    EXPECT_DOUBLE_EQ(matrixTotal(matrix->matrix()), static_cast<double>(all.bouts.size()));

    // A person opens the dialog, types k = 40, tabs to the draw policy and picks "Ignore", presses Enter.
    std::string typed;
    QTimer::singleShot(0, [&typed] {
        auto* dialog = qobject_cast<QDialog*>(QApplication::activeModalWidget());
        if (!dialog) {
            typed = "no dialog";
            return;
        }
        // Whatever happens below, the dialog must not stay open and block the test.
        QTimer::singleShot(5000, dialog, [dialog] { dialog->reject(); });
        QApplication::setActiveWindow(dialog); // as the window manager does for a new dialog
        if (!QTest::qWaitForWindowActive(dialog) || !QApplication::focusWidget()) {
            typed = "the dialog has no focus";
            return;
        }
        std::string trail;
        auto where = [&trail] {
            QWidget* f = QApplication::focusWidget();
            trail += std::string(" ") + (f ? f->metaObject()->className() : "none");
        };
        where();
        QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("40"));
        for (int i = 0; i < 3; ++i) {
            QTest::keyClick(QApplication::focusWidget(), Qt::Key_Tab); // start, curve, draws
            where();
        }
        QTest::keyClick(QApplication::focusWidget(), Qt::Key_Down);
        QTest::keyClick(QApplication::focusWidget(), Qt::Key_Return);
        where();
        typed = dialog->isVisible() ? "Enter left the dialog open:" + trail : "ok";
    });
    w.window.analysisSettingsAction()->trigger();
    ASSERT_EQ(typed, "ok");
    EXPECT_TRUE(w.window.errors.isEmpty()) << w.window.errors.join('\n').toStdString();

    // Stored in the file ...
    const core::AnalysisSettings stored = ui::documentAnalysisSettings(w.window.document());
    EXPECT_EQ(stored.elo.k, 40);
    EXPECT_EQ(stored.elo.draws, core::DrawPolicy::Ignore);
    EXPECT_EQ(stored.elo.start, 1000);
    // ... and the matrix now leaves the draws out and orders by Elo with k = 40.
    matrix->runner()->wait();
    QApplication::processEvents();
    matrix->runner()->wait();
    EXPECT_DOUBLE_EQ(matrixTotal(matrix->matrix()), static_cast<double>(all.bouts.size() - draws));
    core::SelectionOptions o;
    o.draws = core::DrawPolicy::Ignore;
    const core::EncounterSelection decided = core::selectEncounters(colony, where, o);
    QStringList order;
    for (int i : core::orderByMethod(decided, core::RankMethod::Elo, stored.elo))
        order << ui::toQString(decided.ids[static_cast<size_t>(i)]);
    EXPECT_EQ(matrix->order(), order);
}

TEST(AnalysisSettingsDialog, StartRuleTypedReachesTheReport)
{
    OpenWindow w;
    // A person opens the dialog, tabs to the daughters' Elo start (k, start,
    // curve, draws, start rule), picks the next choice and presses Enter.
    std::string typed;
    QTimer::singleShot(0, [&typed] {
        auto* dialog = qobject_cast<QDialog*>(QApplication::activeModalWidget());
        if (!dialog) {
            typed = "no dialog";
            return;
        }
        QTimer::singleShot(5000, dialog, [dialog] { dialog->reject(); });
        QApplication::setActiveWindow(dialog);
        if (!QTest::qWaitForWindowActive(dialog) || !QApplication::focusWidget()) {
            typed = "the dialog has no focus";
            return;
        }
        for (int i = 0; i < 4; ++i) QTest::keyClick(QApplication::focusWidget(), Qt::Key_Tab);
        const QString at = QApplication::focusWidget()->objectName();
        QTest::keyClick(QApplication::focusWidget(), Qt::Key_Down);
        QTest::keyClick(QApplication::focusWidget(), Qt::Key_Return);
        typed = dialog->isVisible() ? "Enter left the dialog open" : at.toStdString();
    });
    w.window.analysisSettingsAction()->trigger();
    ASSERT_EQ(typed, "eloStartRule");
    EXPECT_TRUE(w.window.errors.isEmpty()) << w.window.errors.join('\n').toStdString();
    const core::AnalysisSettings stored = ui::documentAnalysisSettings(w.window.document());
    EXPECT_EQ(stored.startRule, core::EloStartRule::Youngest);
    EXPECT_EQ(stored.elo.k, 100); // the rest unchanged
    // The report takes it for its observed order, as the command line does.
    EXPECT_EQ(ui::documentReportOptions(w.window.document(), core::demo::kGroup, std::nullopt).startRule,
              core::EloStartRule::Youngest);
}
