// SPDX-License-Identifier: GPL-3.0-or-later
#include "ui/shell/main_window.h"

#include "core/store/colony_csv_export.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/demo/demo_colony_file.h"
#include "tests/core/import_test_support.h"
#include "ui/records/animal_table_model.h"
#include "ui/records/animal_view.h"
#include "ui/document/colony_document.h"
#include "ui/document/colony_edit_facade.h"
#include "ui/records/encounter_table_model.h"
#include "ui/records/encounter_view.h"
#include "ui/shell/import_dialog.h"
#include "ui/analysis/analysis_views.h"
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/widgets/plot_palette.h"

#include <qcustomplot.h>

#include <QAction>
#include <QApplication>
#include <QDate>
#include <QLineEdit>
#include <QStatusBar>
#include <QTest>

#include <gtest/gtest.h>

#include <sstream>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

// A small colony whose expected views are worked out by hand below.
const char* const animalsCsv = "id,name,sex,birth_date,mother,entry_type,exit_date,exit_type\n"
                               "F1,Ada,F,2010-03-01,,founder,,\n"
                               "F2,Bea,F,2012-05-02,,founder,,\n"
                               "D1,Cleo,F,2015-04-03,F1,born,,\n"
                               "D2,Dot,F,2017-06-04,D1,born,,\n"
                               "M1,Eli,M,2011-01-01,,founder,,\n"
                               "X1,Fox,M,2013-01-01,,founder,2020-01-01,died\n";

const char* const encountersCsv = "date,time,winner,loser,behaviour,observer\n"
                                  "2020-01-01,09:00,F1,F2,displace,AB\n"
                                  "2021-05-01,10:30,F1,D1,threat,AB\n"
                                  "2021-05-01,08:00,D1,D2,chase,CD\n"
                                  "2019-12-31,,M1,X1,bite,CD\n"
                                  "2022-02-02,12:00,F2,D2,displace,AB\n";

/// Writes the small colony above into a new colony file and returns its path.
std::string makeColony(const TempDir& dir)
{
    const std::string path = dir.file("small.hierloom");
    core::ColonyStore store = core::ColonyStore::create(path);
    core::ImportPaths paths{dir.write("animals.csv", animalsCsv), {}, dir.write("encounters.csv", encountersCsv)};
    const core::ImportResult plan = core::importFiles(store, paths, core::today());
    EXPECT_TRUE(plan.ok()) << plan.problems.text();
    return path;
}

/// Records errors instead of showing a modal box, so tests never block.
class TestWindow : public ui::MainWindow {
public:
    QStringList errors;

protected:
    void reportError(const QString& title, const QString& message) override
    {
        errors << title + QStringLiteral(": ") + message;
    }
};

std::string cell(const QAbstractItemModel* model, int row, int column)
{
    return model->index(row, column).data().toString().toStdString();
}

/// The row showing the animal with this id, or -1.
int rowOf(const QAbstractItemModel* model, const std::string& id)
{
    for (int r = 0; r < model->rowCount(); ++r)
        if (cell(model, r, ui::AnimalTableModel::Id) == id) return r;
    return -1;
}

} // namespace

TEST(MainWindow, OpeningAColonyShowsEveryAnimalAndEncounter)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    // Six animals and five encounters were written by makeColony.
    EXPECT_EQ(window.animalView()->visibleRowCount(), 6);
    EXPECT_EQ(window.encounterView()->visibleRowCount(), 5);
    EXPECT_EQ(window.encounterView()->model()->totalCount(), 5);
    EXPECT_TRUE(window.errors.isEmpty());
    window.document()->close();
    EXPECT_EQ(window.animalView()->visibleRowCount(), 0);
    EXPECT_EQ(window.encounterView()->visibleRowCount(), 0);
}

TEST(MainWindow, EncountersAreNewestFirst)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    const auto* model = window.encounterView()->model();
    using C = ui::EncounterTableModel;
    // Hand-sorted by date, time, entry order, descending.
    const std::vector<std::string> dates{"2022-02-02", "2021-05-01", "2021-05-01", "2020-01-01", "2019-12-31"};
    const std::vector<std::string> times{"12:00", "10:30", "08:00", "09:00", ""};
    const std::vector<std::string> winners{"F2", "F1", "D1", "F1", "M1"};
    ASSERT_EQ(model->rowCount(), 5);
    for (int r = 0; r < 5; ++r) {
        EXPECT_EQ(cell(model, r, C::Date), dates[size_t(r)]) << r;
        EXPECT_EQ(cell(model, r, C::Time), times[size_t(r)]) << r;
        EXPECT_EQ(cell(model, r, C::Winner), winners[size_t(r)]) << r;
    }
    EXPECT_EQ(cell(model, 0, C::Loser), "D2");
    EXPECT_EQ(cell(model, 0, C::Outcome), "decided");
    EXPECT_EQ(cell(model, 0, C::Observer), "AB");
}

TEST(MainWindow, EncounterFiltersKeepMatchingRows)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    ui::EncounterView* view = window.encounterView();
    // Counted by hand from encountersCsv.
    view->setAnimal("D2"); // D1-D2 and F2-D2
    EXPECT_EQ(view->visibleRowCount(), 2);
    view->setAnimal({});
    view->setObserver("AB");
    EXPECT_EQ(view->visibleRowCount(), 3);
    view->setObserver({});
    view->setDateRange(QDate(2021, 1, 1), QDate(2021, 12, 31)); // the two of 2021-05-01
    EXPECT_EQ(view->visibleRowCount(), 2);
    view->setAnimal("F1"); // F1-D1 only
    EXPECT_EQ(view->visibleRowCount(), 1);
    view->setDateRange({}, {});
    view->setAnimal({});
    EXPECT_EQ(view->visibleRowCount(), 5);
}

TEST(MainWindow, AnimalFilterNarrowsRows)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    ui::AnimalView* view = window.animalView();
    // By hand: D1 matches D1 (id) and D2 (mother D1).
    view->setFilterText("d1");
    EXPECT_EQ(view->visibleRowCount(), 2);
    // F1 matches F1 (id), D1 (mother) and D2 (matriarch, through D1).
    view->setFilterText("F1");
    EXPECT_EQ(view->visibleRowCount(), 3);
    view->setFilterText("cleo"); // by name
    EXPECT_EQ(view->visibleRowCount(), 1);
    view->setFilterText({});
    view->setPresentOnly(true); // X1 died in 2020
    EXPECT_EQ(view->visibleRowCount(), 5);
    view->setPresentOnly(false);
    EXPECT_EQ(view->visibleRowCount(), 6);
}

TEST(MainWindow, AnimalColumnsShowAgeMatriarchGroupAndStatus)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    ui::AnimalTableModel* model = window.animalView()->model();
    model->setReferenceDay(core::dayFromCivil(2022, 1, 1));
    using C = ui::AnimalTableModel;
    // Values worked out by hand from animalsCsv.
    ASSERT_EQ(model->rowCount(), 6);
    const int d2 = rowOf(model, "D2"), d1 = rowOf(model, "D1"), x1 = rowOf(model, "X1");
    ASSERT_GE(d2, 0);
    ASSERT_GE(d1, 0);
    ASSERT_GE(x1, 0);
    EXPECT_EQ(cell(model, d2, C::Founder), "F1");
    // A male without a recorded mother heads no matriline: no matriarch, not himself.
    EXPECT_EQ(cell(model, rowOf(model, "M1"), C::Founder), "");
    EXPECT_EQ(cell(model, rowOf(model, "F1"), C::Founder), "F1");
    EXPECT_EQ(cell(model, d2, C::Mother), "D1");
    EXPECT_EQ(cell(model, d1, C::Age), "6");      // born 2015-04-03, on 2022-01-01
    EXPECT_EQ(cell(model, d1, C::Group), "main"); // no residences.csv: one group 'main'
    EXPECT_EQ(cell(model, d1, C::Status), "present");
    EXPECT_EQ(cell(model, x1, C::Age), "7"); // born 2013-01-01, died 2020-01-01: age at exit
    EXPECT_EQ(cell(model, x1, C::Status), "died 2020-01-01");
    EXPECT_EQ(cell(model, x1, C::Group), "");
}

TEST(MainWindow, FailedImportListsProblemsAndChangesNothing)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    const std::string bad = dir.write("bad.csv", "date,winner,loser\n"
                                                 "2021-06-01,F1,ZZ\n"   // unknown loser
                                                 "2021-06-02,F2,F2\n"); // winner is loser
    ui::ImportDialog dialog(window.editFacade(), &window);
    dialog.setEncountersPath(QString::fromStdString(bad));
    EXPECT_FALSE(dialog.runImport());
    EXPECT_GE(dialog.problemCount(), 2);
    EXPECT_TRUE(dialog.problemText().contains("bad.csv:2")) << dialog.problemText().toStdString();
    EXPECT_TRUE(dialog.problemText().contains("bad.csv:3")) << dialog.problemText().toStdString();
    EXPECT_TRUE(dialog.resultText().contains("Nothing was imported"));
    // All or nothing: the counts stay as makeColony left them.
    EXPECT_EQ(window.encounterView()->visibleRowCount(), 5);
    EXPECT_EQ(window.animalView()->visibleRowCount(), 6);
    EXPECT_EQ(window.document()->store()->encounterCount(), 5);
}

TEST(MainWindow, SuccessfulImportUpdatesTheViews)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    const std::string more = dir.write("more.csv", "date,time,winner,loser\n2023-03-03,07:15,D2,F2\n");
    ui::ImportDialog dialog(window.editFacade(), &window);
    dialog.setEncountersPath(QString::fromStdString(more));
    EXPECT_TRUE(dialog.runImport()) << dialog.problemText().toStdString();
    EXPECT_EQ(dialog.problemCount(), 0);
    EXPECT_EQ(window.encounterView()->visibleRowCount(), 6);
    // The new encounter is the newest, so it heads the table.
    EXPECT_EQ(cell(window.encounterView()->model(), 0, ui::EncounterTableModel::Date), "2023-03-03");
}

TEST(MainWindow, OpeningATextFileReportsAnErrorAndKeepsTheColony)
{
    TempDir dir;
    TestWindow window;
    const QString text = QString::fromStdString(dir.write("notes.txt", "just some notes\nnot a database\n"));
    EXPECT_FALSE(window.openColony(text));
    ASSERT_EQ(window.errors.size(), 1);
    EXPECT_TRUE(window.errors.front().contains("not a colony file")) << window.errors.front().toStdString();
    EXPECT_FALSE(window.document()->isOpen());

    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    EXPECT_FALSE(window.openColony(text));
    EXPECT_EQ(window.errors.size(), 2);
    EXPECT_TRUE(window.document()->isOpen()); // the colony already open stays open
    EXPECT_EQ(window.animalView()->visibleRowCount(), 6);
    EXPECT_FALSE(window.openColony(QString::fromStdString(dir.file("missing.hierloom"))));
    EXPECT_EQ(window.errors.size(), 3);
}

TEST(MainWindow, ReadOnlyColonyRefusesImport)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir)), true));
    EXPECT_TRUE(window.document()->isReadOnly());
    ui::ImportDialog dialog(window.editFacade(), &window);
    dialog.setEncountersPath(QString::fromStdString(dir.write("more.csv", "date,winner,loser\n2023-03-03,D2,F2\n")));
    EXPECT_FALSE(dialog.runImport());
    EXPECT_EQ(window.document()->store()->encounterCount(), 5);
}

TEST(MainWindow, DemoColonyShowsAllItsRecords)
{
    TempDir dir;
    const std::string path = dir.file("demo.hierloom");
    const core::Colony demo = core::createDemoColonyFile(path).load();

    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    EXPECT_EQ(window.animalView()->visibleRowCount(), static_cast<int>(demo.animals.size()));
    EXPECT_EQ(window.encounterView()->visibleRowCount(), static_cast<int>(demo.encounters.size()));
    EXPECT_GT(demo.encounters.size(), 1000u);
}

// The search box over encounters and notes, typed into as a person would.
TEST(MainWindow, SearchBoxFindsEncountersByTextAndNote)
{
    TempDir dir;
    const std::string path = makeColony(dir);
    {
        // One encounter with a note (counted by hand: the fifth of the file).
        core::ColonyStore store = core::ColonyStore::open(path);
        core::Encounter e;
        e.date = core::dayFromCivil(2022, 3, 1);
        e.winner = "F1";
        e.loser = "M1";
        e.behaviour = "threat";
        e.group = "main";
        e.note = "Limping after the Storm";
        store.append({}, {}, {e});
    }
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    window.show();
    ASSERT_TRUE(window.showView(QStringLiteral("encounters")));
    ui::EncounterView* view = window.encounterView();
    view->searchBox()->setFocus();
    QApplication::setActiveWindow(&window);
    ASSERT_EQ(QApplication::focusWidget(), view->searchBox());
    EXPECT_EQ(view->visibleRowCount(), 6);
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("storm")); // in the note, other case
    EXPECT_EQ(view->visibleRowCount(), 1);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("d2")); // D1-D2 and F2-D2
    EXPECT_EQ(view->visibleRowCount(), 2);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("THREAT")); // F1-D1 and the new one
    EXPECT_EQ(view->visibleRowCount(), 2);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_A, Qt::ControlModifier);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Delete);
    EXPECT_EQ(view->visibleRowCount(), 6);
}

// Undo and Redo, by their keys, say in the status bar what they took back or
// did again; the Edit menu names the edit after "Undo".
TEST(MainWindow, UndoAndRedoNameTheEditInTheStatusBar)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    window.show();
    QApplication::setActiveWindow(&window);
    core::Animal a;
    a.id = "N1";
    a.sex = core::Sex::Female;
    a.entry = core::dayFromCivil(2022, 1, 1);
    a.entryType = core::EntryType::Founder;
    ASSERT_TRUE(window.editFacade()->addAnimal(a, "main").empty());
    EXPECT_TRUE(window.statusBar()->currentMessage().isEmpty() ||
                !window.statusBar()->currentMessage().startsWith(QStringLiteral("Undone")));
    QWidget* target = QApplication::focusWidget() ? QApplication::focusWidget() : &window;
    QTest::keyClick(target, Qt::Key_Z, Qt::ControlModifier);
    EXPECT_EQ(window.statusBar()->currentMessage(), QStringLiteral("Undone: Add animal N1."));
    target = QApplication::focusWidget() ? QApplication::focusWidget() : &window;
    QTest::keyClick(target, Qt::Key_Z, Qt::ControlModifier | Qt::ShiftModifier);
    EXPECT_EQ(window.statusBar()->currentMessage(), QStringLiteral("Redone: Add animal N1."));
    // The menu's wording: "Undo" and the edit's name, never "Undo Take back".
    for (QAction* action : window.findChildren<QAction*>())
        EXPECT_FALSE(action->text().contains(QStringLiteral("Take back"))) << action->text().toStdString();
}

// View > Plot Background: plots on screen follow the choice.
TEST(MainWindow, PlotBackgroundMenuTurnsPlotsDark)
{
    TempDir dir;
    TestWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(makeColony(dir))));
    auto* dark = window.findChild<QAction*>(QStringLiteral("plot-palette-dark"));
    auto* light = window.findChild<QAction*>(QStringLiteral("plot-palette-light"));
    ASSERT_NE(dark, nullptr);
    ASSERT_NE(light, nullptr);
    QCustomPlot* plot = window.analysisViews().hierarchy->plot();
    dark->trigger();
    plot->replot(QCustomPlot::rpImmediateRefresh);
    EXPECT_EQ(plot->axisRect(0)->axis(QCPAxis::atLeft)->tickLabelColor(), ui::plotColours(ui::PlotPalette::Dark).text);
    light->trigger();
    plot->replot(QCustomPlot::rpImmediateRefresh);
    EXPECT_EQ(plot->axisRect(0)->axis(QCPAxis::atLeft)->tickLabelColor(), QColor(Qt::black));
}
