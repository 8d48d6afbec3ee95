// SPDX-License-Identifier: GPL-3.0-or-later
// The Centre Overview tab on a hand-made centre of three groups: the values
// counted by hand, sorting by a click on a column's header, Enter on a row
// showing the group's hierarchy, and the same figures as `hierloom-cli
// overview` on the same file. Keys and clicks go to the widget a person would use.
#include "core/demo/demo_colony_file.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "tests/core/import_test_support.h"
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/document/colony_document.h"
#include "ui/document/qt_convert.h"
#include "ui/planning/centre_overview_view.h"
#include "ui/planning/stability_view.h"
#include "ui/shell/main_window.h"
#include "ui/widgets/figure_caption.h"
#include "ui/widgets/plot_export.h"

#include <QAbstractItemModel>
#include <QApplication>
#include <QComboBox>
#include <QHeaderView>
#include <QImage>
#include <QLabel>
#include <QLineEdit>
#include <QProcess>
#include <QTabWidget>
#include <QTableView>
#include <QTest>

#include <qcustomplot.h>

#include <gtest/gtest.h>

#include <cmath>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

// North: N1 and her daughter N3 (adult from 2023-06-01), N2, the male N4.
// South: S1, her immature daughter S2 (born 2021), the male S3, and W3, who
// moved from West on 2024-02-01. West: W1, W2, no encounters at all.
const char* const kAnimals = "id,sex,birth_date,mother,entry_type\n"
                             "N1,F,2010-01-01,,founder\n"
                             "N2,F,2012-01-01,,founder\n"
                             "N3,F,2019-06-01,N1,born\n"
                             "N4,M,2012-01-01,,founder\n"
                             "S1,F,2015-01-01,,founder\n"
                             "S2,F,2021-01-10,S1,born\n"
                             "S3,M,2014-01-01,,founder\n"
                             "W1,F,2016-01-01,,founder\n"
                             "W2,F,2016-01-01,,founder\n"
                             "W3,F,2013-01-01,,founder\n";
const char* const kResidences = "animal,group,from,to\n"
                                "N1,North,2019-01-01,\nN2,North,2019-01-01,\nN3,North,2019-06-01,\n"
                                "N4,North,2019-01-01,\nS1,South,2019-01-01,\nS2,South,2021-01-10,\n"
                                "S3,South,2019-01-01,\nW1,West,2019-01-01,\nW2,West,2019-01-01,\n"
                                "W3,West,2019-01-01,2024-01-31\nW3,South,2024-02-01,\n";
// The file's last encounter is 2024-03-31: the 30 days counted are 2024-03-02 to 2024-03-31.
// The two rows without a group count for the winner's group that day (N1: North; W3: South since 02-01).
const char* const kEncounters = "date,time,winner,loser,outcome,behaviour,group\n"
                                "2023-12-01,,S1,S3,decided,,South\n"
                                "2024-01-10,,N1,N2,decided,,North\n"
                                "2024-02-15,,W3,S1,decided,,\n"
                                "2024-03-01,,N1,N3,decided,,North\n"
                                "2024-03-02,,N2,N3,decided,,North\n"
                                "2024-03-20,,N1,N2,draw,,North\n"
                                "2024-03-25,,N1,N2,decided,,\n"
                                "2024-03-31,,S1,S2,decided,,South\n";

std::string makeCentre(const TempDir& dir)
{
    const std::string path = dir.file("centre.hierloom");
    core::ColonyStore store = core::ColonyStore::create(path);
    const core::ImportResult r = core::importFiles(
        store, {dir.write("a.csv", kAnimals), dir.write("r.csv", kResidences), dir.write("e.csv", kEncounters)},
        core::today());
    EXPECT_TRUE(r.ok()) << r.problems.text();
    return path;
}

class QuietWindow : public ui::MainWindow {
public:
    QStringList errors;

protected:
    void reportError(const QString& title, const QString& message) override { errors << title + ": " + message; }
};

/// A main window on `path`, shown and active, with the Centre Overview on screen by its shortcut.
struct Window {
    QuietWindow window;
    ui::CentreOverviewView* view = nullptr;
    explicit Window(const std::string& path)
    {
        EXPECT_TRUE(window.openColony(ui::toQString(path)));
        window.show();
        QApplication::setActiveWindow(&window);
        EXPECT_TRUE(QTest::qWaitForWindowActive(&window));
        QTest::keyClick(&window, Qt::Key_G, Qt::ControlModifier);
        view = window.managerViews().overview;
        view->waitForRows();
    }
    QTabWidget* tabs() const
    {
        for (QTabWidget* t : window.findChildren<QTabWidget*>())
            if (t->count() > 0 && t->widget(0)->objectName() == QLatin1String("animals")) return t;
        return nullptr;
    }
};

/// The table as shown: one list of cell texts per row, in the order on screen.
std::vector<QStringList> shown(const QTableView* table)
{
    const QAbstractItemModel* m = table->model();
    std::vector<QStringList> rows;
    for (int r = 0; r < m->rowCount(); ++r) {
        QStringList cells;
        for (int c = 0; c < m->columnCount(); ++c) cells << m->data(m->index(r, c)).toString();
        rows.push_back(cells);
    }
    return rows;
}

QStringList column(const QTableView* table, int c)
{
    QStringList out;
    for (const QStringList& row : shown(table)) out << row[c];
    return out;
}

void clickHeader(QTableView* table, int section)
{
    QHeaderView* header = table->horizontalHeader();
    const QPoint at(header->sectionViewportPosition(section) + header->sectionSize(section) / 2, header->height() / 2);
    QTest::mouseClick(header->viewport(), Qt::LeftButton, {}, at);
}

} // namespace

TEST(CentreOverview, HandCountedRowsOfThreeGroups)
{
    TempDir dir;
    Window w(makeCentre(dir));
    ASSERT_NE(w.view, nullptr);
    EXPECT_EQ(w.tabs()->currentWidget(), w.view); // Ctrl+G shows it
    // Counted by hand on 2024-03-31 (maturity 4 years, the default):
    // North: N1-N4; adult females N1, N2, N3 (4 on 2023-06-01); lines N1 (N1, N3) and N2;
    //   last 2024-03-25 (no group, winner N1 of North); in 03-02..03-31: 03-02, the draw of 03-20, 03-25.
    // South: S1, S2, S3, W3; adult females S1, W3 (S2 is 3); lines S1 and W3; only 03-31 in the 30 days.
    // West: W1, W2 (W3 left); two adult females, two lines; no encounter (W3's of 02-15 is South's).
    const std::vector<QStringList> expected{
        {"North", "4", "3", "2", "2024-03-25", "3", "calm", ""},
        {"South", "4", "2", "2", "2024-03-31", "1", "calm", ""},
        {"West", "2", "2", "2", "", "0", "no encounters", ""},
    };
    EXPECT_EQ(shown(w.view->table()), expected);
    EXPECT_EQ(w.view->findChild<QLabel*>(QStringLiteral("overviewSummary"))->text(),
              QStringLiteral("2024-03-31: groups 3, with alerts in their last month 0"));
    EXPECT_TRUE(w.view->caution()->isHidden()); // no alert, nothing that concerns animals
    // The picture: one bar per group in the table's order, coloured by state.
    auto* plot = w.view->plot();
    int bars = 0;
    for (int i = 0; i < plot->plottableCount(); ++i)
        if (auto* b = qobject_cast<QCPBars*>(plot->plottable(i))) bars += b->data()->size();
    EXPECT_EQ(bars, 3);
    EXPECT_TRUE(w.window.errors.isEmpty()) << w.window.errors.join('\n').toStdString();
}

TEST(CentreOverview, ClickingAHeaderSortsByThatColumn)
{
    TempDir dir;
    Window w(makeCentre(dir));
    QTableView* table = w.view->table();
    // Counts first with the most; a second click turns the order round.
    clickHeader(table, ui::CentreOverviewModel::Recent);
    EXPECT_EQ(column(table, 0), (QStringList{"North", "South", "West"}));
    clickHeader(table, ui::CentreOverviewModel::Recent);
    EXPECT_EQ(column(table, 0), (QStringList{"West", "South", "North"}));
    // Dates by day, the group never met first (the longest unobserved).
    clickHeader(table, ui::CentreOverviewModel::LastEncounter);
    EXPECT_EQ(column(table, 0), (QStringList{"West", "North", "South"}));
    // Most adult females first; the tie (South and West, two each) keeps the order it had.
    clickHeader(table, ui::CentreOverviewModel::AdultFemales);
    EXPECT_EQ(column(table, 0), (QStringList{"North", "West", "South"}));
    clickHeader(table, ui::CentreOverviewModel::Group);
    EXPECT_EQ(column(table, 0), (QStringList{"North", "South", "West"}));
    clickHeader(table, ui::CentreOverviewModel::Group);
    EXPECT_EQ(column(table, 0), (QStringList{"West", "South", "North"}));
    // The picture follows the table's order: its top bar is the first row's group.
    EXPECT_EQ(w.view->groupAt(0), QStringLiteral("West"));
}

TEST(CentreOverview, EnterOnARowShowsThatGroupsHierarchy)
{
    TempDir dir;
    Window w(makeCentre(dir));
    QTableView* table = w.view->table();
    table->setFocus();
    QApplication::processEvents();
    ASSERT_EQ(QApplication::focusWidget(), table);
    // Down to the second row (South), then Enter.
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Home, Qt::ControlModifier);
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Down);
    ASSERT_EQ(w.view->groupAt(table->currentIndex().row()), QStringLiteral("South"));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Return);
    EXPECT_EQ(w.tabs()->currentWidget()->objectName(), QStringLiteral("hierarchy"));
    EXPECT_EQ(w.window.analysisViews().hierarchy->groupBox()->currentData().toString(), QStringLiteral("South"));
    // Every view with a group choice follows when it is next shown (the document's showGroup).
    QTest::keyClick(&w.window, Qt::Key_0, Qt::ControlModifier);
    ASSERT_EQ(w.tabs()->currentWidget(), w.window.managerViews().stability);
    EXPECT_EQ(w.window.managerViews().stability->series().group, "South");

    // Back to the overview; a double-click on North's row.
    QTest::keyClick(&w.window, Qt::Key_G, Qt::ControlModifier);
    ASSERT_EQ(w.tabs()->currentWidget(), w.view);
    const QRect north = table->visualRect(table->model()->index(0, ui::CentreOverviewModel::Animals));
    // The first click of the two (QTest's double-click alone comes as a second press).
    QTest::mouseClick(table->viewport(), Qt::LeftButton, {}, north.center());
    QTest::mouseDClick(table->viewport(), Qt::LeftButton, {}, north.center());
    EXPECT_EQ(w.tabs()->currentWidget()->objectName(), QStringLiteral("hierarchy"));
    EXPECT_EQ(w.window.analysisViews().hierarchy->groupBox()->currentData().toString(), QStringLiteral("North"));
}

TEST(CentreOverview, ClickOnAGroupsBarShowsItsHierarchy)
{
    TempDir dir;
    Window w(makeCentre(dir));
    QCustomPlot* plot = w.view->plot();
    plot->replot();
    // South is the second row: its bar is at key 1, one encounter long.
    const double x = plot->xAxis->coordToPixel(0.5);
    const double y = plot->yAxis->coordToPixel(1.0);
    QTest::mouseClick(plot, Qt::LeftButton, {}, QPoint(static_cast<int>(x), static_cast<int>(y)));
    EXPECT_EQ(w.tabs()->currentWidget()->objectName(), QStringLiteral("hierarchy"));
    EXPECT_EQ(w.window.analysisViews().hierarchy->groupBox()->currentData().toString(), QStringLiteral("South"));
    // Every view with a group choice follows when it is next shown (the document's showGroup).
    QTest::keyClick(&w.window, Qt::Key_0, Qt::ControlModifier);
    ASSERT_EQ(w.tabs()->currentWidget(), w.window.managerViews().stability);
    EXPECT_EQ(w.window.managerViews().stability->series().group, "South");
}

TEST(CentreOverview, SameFiguresAsTheCommandLine)
{
    TempDir dir;
    const std::string path = makeCentre(dir);
    Window w(path);
    QProcess cli;
    cli.start(QString::fromUtf8(HIERLOOM_CLI_PATH), {QStringLiteral("overview"), ui::toQString(path)});
    ASSERT_TRUE(cli.waitForFinished(60000));
    ASSERT_EQ(cli.exitCode(), 0) << cli.readAllStandardError().toStdString();
    QStringList lines = QString::fromUtf8(cli.readAllStandardOutput()).split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    ASSERT_EQ(lines.takeFirst(),
              QStringLiteral("group,animals,adult_females,matrilines,last_encounter,encounters_30_days,stability,alerts"));
    const std::vector<QStringList> table = shown(w.view->table());
    ASSERT_EQ(static_cast<size_t>(lines.size()), table.size());
    for (size_t i = 0; i < table.size(); ++i) {
        const QStringList csv = lines[static_cast<qsizetype>(i)].split(QLatin1Char(','));
        ASSERT_EQ(csv.size(), 8);
        // Group, counts and dates alike; the state in words ("" = no encounters).
        for (int c = 0; c < 6; ++c) EXPECT_EQ(table[i][c], csv[c]) << i << ", " << c;
        EXPECT_EQ(table[i][6], csv[6].isEmpty() ? QStringLiteral("no encounters") : csv[6]);
        EXPECT_EQ(table[i][7].isEmpty(), csv[7].isEmpty());
    }
    // And on a typed day, to the command line's --at.
    w.view->dayField()->setFocus();
    QApplication::processEvents();
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("2024-03-01"));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Return);
    w.view->waitForRows();
    cli.start(QString::fromUtf8(HIERLOOM_CLI_PATH), {QStringLiteral("overview"), ui::toQString(path), QStringLiteral("--at"),
                                                 QStringLiteral("2024-03-01")});
    ASSERT_TRUE(cli.waitForFinished(60000));
    lines = QString::fromUtf8(cli.readAllStandardOutput()).split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    lines.removeFirst();
    // Hand-counted too: on 2024-03-01 North's last is that day, 3 in the 30 days (01-10 is older).
    EXPECT_EQ(lines.value(0), QStringLiteral("North,4,3,2,2024-03-01,1,calm,"));
    const std::vector<QStringList> at = shown(w.view->table());
    ASSERT_EQ(static_cast<size_t>(lines.size()), at.size());
    for (size_t i = 0; i < at.size(); ++i) {
        const QStringList csv = lines[static_cast<qsizetype>(i)].split(QLatin1Char(','));
        for (int c = 0; c < 6; ++c) EXPECT_EQ(at[i][c], csv[c]) << i << ", " << c;
    }
}

TEST(CentreOverview, AlertsExplainThemselvesWithTheCaution)
{
    TempDir dir;
    const std::string path = dir.file("demo.hierloom");
    core::createDemoColonyFile(path);
    Window w(path);
    // The demo's revolt alerts in June 2023 (tests of the Stability view); on 2023-06-30 it is the last month.
    w.view->dayField()->setFocus();
    QApplication::processEvents();
    QTest::keyClicks(QApplication::focusWidget(), QStringLiteral("20230630"));
    QTest::keyClick(QApplication::focusWidget(), Qt::Key_Return);
    w.view->waitForRows();
    const QAbstractItemModel* m = w.view->table()->model();
    ASSERT_EQ(m->rowCount(), 1);
    EXPECT_EQ(m->data(m->index(0, ui::CentreOverviewModel::Stability)).toString(), QStringLiteral("alert"));
    const QString alerts = m->data(m->index(0, ui::CentreOverviewModel::Alerts)).toString();
    EXPECT_TRUE(alerts.contains(QStringLiteral("Counter-dominance"))) << alerts.toStdString();
    const QString tip = m->data(m->index(0, ui::CentreOverviewModel::Alerts), Qt::ToolTipRole).toString();
    EXPECT_TRUE(tip.contains(QStringLiteral("veterinary"))) << tip.toStdString();
    EXPECT_FALSE(w.view->caution()->isHidden());
}

// The picture exports like every other plot (the same Export button), and in a
// narrow window its legend wraps to the plot's width instead of being cut.
TEST(CentreOverview, ThePictureExportsAndItsLegendFitsANarrowWindow)
{
    TempDir dir;
    Window w(makeCentre(dir));
    auto* button = w.view->findChild<ui::FigureExportButton*>();
    ASSERT_NE(button, nullptr);
    const ui::PlotFigure& figure = button->figure();
    EXPECT_EQ(figure.plot, w.view->plot());
    EXPECT_TRUE(ui::figureCaption(figure).startsWith(QStringLiteral("on 2024-03-31 · "))) << ui::figureCaption(figure).toStdString();
    for (const bool doubleColumn : {false, true}) {
        const QString png = QString::fromStdString(dir.file(doubleColumn ? "double.png" : "single.png"));
        ASSERT_TRUE(ui::exportFigure(figure, png, figure.size(doubleColumn, 150)));
        const QImage image(png);
        EXPECT_NEAR(image.width(), (doubleColumn ? 175 : 85) / 25.4 * 150, 1.0);
    }
    QCustomPlot* plot = w.view->plot();
    for (const int width : {1600, 1024, 800}) {
        w.window.resize(width, 700);
        QApplication::processEvents();
        plot->replot();
        const QRect legend = plot->legend->outerRect();
        EXPECT_GE(legend.left(), 0) << width;
        EXPECT_LE(legend.right(), plot->viewport().right()) << width << " px: legend " << legend.width()
                                                             << " px wide in a plot of " << plot->width();
    }
    ui::fitLegendToWidth(plot->legend, 120); // narrower than any two entries side by side
    EXPECT_EQ(plot->legend->wrap(), 1);
    plot->replot(); // the view fits it to the plot's width again
    EXPECT_GT(plot->legend->wrap(), 1);
    EXPECT_LE(plot->legend->outerRect().right(), plot->viewport().right());
}
