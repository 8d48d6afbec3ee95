// SPDX-License-Identifier: GPL-3.0-or-later
// The data-health flag (too few encounters for a stable rank, docs/methods.md
// "Data health") in the Matrix, Timeline and Hierarchy views, on a hand-made
// colony whose encounters are counted by hand; the Data Health and Support
// views computing off the interface thread. Choices are made with keys.
#include "tests/ui/entry_test_support.h"
#include "tests/ui/plot_test_support.h"

#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"
#include "ui/analysis/prediction_view.h"
#include "ui/analysis/rank_flag_watch.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/analysis/research_export_dialog.h"
#include "ui/analysis/support_view.h"
#include "ui/document/animal_selection.h"
#include "ui/document/compute_runner.h"
#include "ui/planning/health_view.h"
#include "ui/widgets/progress_strip.h"

#include <QCheckBox>
#include <QLabel>
#include <QSlider>
#include <QSpinBox>
#include <QTableWidget>
#include <QToolTip>
#include <QTreeWidget>

#include <qcustomplot.h>

using namespace hierloom;
using namespace hierloom::test;

namespace {

/// Group A of the entry colony. Counted by hand: F1 (Ada) beat F2 (Bea) on
/// ten days of May 2021; F2 beat D1 (Cleo) on 1 and 2 June. By the end of
/// June: F1 10 encounters, F2 12, D1 2; D2 none. With the threshold of 10
/// only D1 is flagged (F1, with exactly 10, is not).
struct Flagged {
    TempDir dir;
    std::string path = makeColony(dir);
    ui::ColonyDocument document;
    ui::ColonyEditFacade facade{&document};
    Flagged()
    {
        document.open(ui::toQString(path));
        for (int d = 1; d <= 10; ++d) add(QStringLiteral("2021-05-%1").arg(d, 2, 10, QLatin1Char('0')), "F1", "F2");
        add(QStringLiteral("2021-06-01"), "F2", "D1");
        add(QStringLiteral("2021-06-02"), "F2", "D1");
    }
    void add(const QString& date, const char* w, const char* l)
    {
        core::Encounter e;
        e.date = *core::parseDate(ui::toStdString(date));
        e.time = core::parseTimeOfDay("09:00");
        e.winner = w;
        e.loser = l;
        e.group = "A";
        e.observer = "AB";
        const core::FieldProblems p = facade.addEncounter(e);
        EXPECT_TRUE(p.empty()) << (p.empty() ? "" : p.front().message);
    }
};

/// Chooses the combo box's item by pressing Down on it, as a person would.
void chooseNext(QWidget* window, QComboBox* box)
{
    box->setFocus();
    QTest::keyClick(focusIn(window), Qt::Key_Down);
}

QString mark() { return ui::RankFlagWatch::mark(); }

} // namespace

TEST(RankFlags, MatrixMarksTheAnimalWithTooFewEncounters)
{
    Flagged f;
    ui::MatrixView view(&f.document);
    view.resize(900, 700);
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    finish(view.flags()->runner());
    auto* group = view.findChild<QComboBox*>(QStringLiteral("matrixGroup"));
    ASSERT_NE(group, nullptr);
    chooseNext(&view, group); // "All groups" -> "A"
    ASSERT_EQ(group->currentData().toString(), QStringLiteral("A"));
    // The counts are there at once, the interval widths are still being computed.
    EXPECT_TRUE(view.flagLegend()->text().contains(QStringLiteral("being computed"))) << view.flagLegend()->text().toStdString();
    finish(view.runner());
    finish(view.flags()->runner());
    view.plot()->replot();

    const QStringList labels = view.rowLabels();
    EXPECT_TRUE(labels.contains(QStringLiteral("Cleo ") + mark())) << labels.join(',').toStdString();
    EXPECT_TRUE(labels.contains(QStringLiteral("Ada")));
    EXPECT_TRUE(labels.contains(QStringLiteral("Bea")));
    EXPECT_TRUE(view.flagLegend()->text().contains(QStringLiteral("fewer than 10 encounters")));
    EXPECT_TRUE(view.flagLegend()->text().contains(QStringLiteral("(flagged: 1)"))) << view.flagLegend()->text().toStdString();
    EXPECT_FALSE(view.flagLegend()->text().contains(QStringLiteral("being computed")));

    // Hovering the names: Cleo's encounters, the threshold and her interval width; Ada's count, no flag.
    const QStringList order = view.order();
    const int cleo = static_cast<int>(order.indexOf(QStringLiteral("D1")));
    const int ada = static_cast<int>(order.indexOf(QStringLiteral("F1")));
    ASSERT_GE(cleo, 0);
    auto hover = [&](int row) {
        const int y = static_cast<int>(view.plot()->yAxis->coordToPixel(row));
        QTest::mouseMove(view.plot(), QPoint(view.plot()->axisRect()->rect().left() - 15, y));
        return QToolTip::text();
    };
    const QString tipCleo = hover(cleo);
    EXPECT_TRUE(tipCleo.contains(QStringLiteral("Too few encounters for a stable rank: 2 in the window (threshold 10)")))
        << tipCleo.toStdString();
    EXPECT_TRUE(tipCleo.contains(QStringLiteral("Elo interval width "))) << tipCleo.toStdString();
    EXPECT_TRUE(tipCleo.contains(QStringLiteral(" points")));
    const QString tipAda = hover(ada);
    EXPECT_TRUE(tipAda.contains(QStringLiteral("Encounters in the window: 10 (threshold 10)"))) << tipAda.toStdString();
    EXPECT_FALSE(tipAda.contains(QStringLiteral("Too few")));
}

TEST(RankFlags, TimelineRingsTheFlaggedFemaleAtTheChosenDate)
{
    Flagged f;
    ui::AnimalSelection selection;
    ui::RankTimelineView view(&f.document, &selection);
    view.resize(1200, 700);
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    finish(view.flags()->runner());
    auto* slider = view.findChild<QSlider*>(QStringLiteral("timelineDate"));
    ASSERT_NE(slider, nullptr);
    slider->setFocus();

    // The last checkpoint (after 2 June): F1 10, F2 12, D1 2 encounters: D1 alone is ringed.
    QTest::keyClick(focusIn(&view), Qt::Key_End);
    finish(view.flags()->runner());
    const core::Day last = view.timeline().checkpoints.back();
    ASSERT_GE(last, *core::parseDate("2021-06-02"));
    ASSERT_NE(view.flagMarks(), nullptr);
    ASSERT_EQ(view.flagMarks()->data()->size(), 1);
    const double ringed = view.flagMarks()->data()->begin()->value;
    const auto* cleo = view.lineOf(QStringLiteral("D1"));
    ASSERT_NE(cleo, nullptr);
    EXPECT_EQ(ringed, (cleo->data()->end() - 1)->value); // on her line at that date
    EXPECT_TRUE(view.plot()->legend->hasItemWithPlottable(view.flagMarks()));
    EXPECT_TRUE(view.flagLegend()->text().contains(QStringLiteral("1 of 3 females shown have fewer than 10")))
        << view.flagLegend()->text().toStdString();
    EXPECT_TRUE(view.describe(QStringLiteral("D1"), last).contains(QStringLiteral("2 in the window (threshold 10)")));
    EXPECT_TRUE(view.describe(QStringLiteral("F1"), last).contains(QStringLiteral("Encounters in the window: 10")));

    // The first checkpoint (end of May): D1 not yet ranked, F1 and F2 with 10 each: no ring.
    QTest::keyClick(focusIn(&view), Qt::Key_Home);
    finish(view.flags()->runner());
    ASSERT_LT(view.timeline().checkpoints.front(), *core::parseDate("2021-06-01"));
    EXPECT_EQ(view.flagMarks()->data()->size(), 0);
    EXPECT_FALSE(view.plot()->legend->hasItemWithPlottable(view.flagMarks())); // the key only while a female is ringed
    EXPECT_TRUE(view.flagLegend()->text().contains(QStringLiteral("0 of 2 females shown")))
        << view.flagLegend()->text().toStdString();
}

TEST(RankFlags, PredictionMarksTheObservedOrder)
{
    Flagged f;
    ui::AnimalSelection selection;
    ui::PredictionView view(&f.document, &selection);
    view.resize(1200, 800);
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    finish(view.flags()->runner());
    // The rule chosen with the keyboard: the observed order and its marks stay (2 June: D1 2 encounters).
    auto* rule = view.findChild<QComboBox*>(QStringLiteral("rule"));
    ASSERT_NE(rule, nullptr);
    chooseNext(&view, rule);
    finish(view.runner());
    finish(view.flags()->runner());
    const QStringList labels = view.observedLabels();
    EXPECT_TRUE(labels.contains(QStringLiteral("Cleo ") + mark())) << labels.join(',').toStdString();
    EXPECT_TRUE(labels.contains(QStringLiteral("Ada")));
    EXPECT_TRUE(labels.contains(QStringLiteral("Bea")));
    EXPECT_TRUE(view.flagLegend()->text().contains(QStringLiteral("(flagged: 1)"))) << view.flagLegend()->text().toStdString();
}

TEST(RankFlags, HierarchyNamesTheFlaggedAnimals)
{
    Flagged f;
    ui::HierarchyPlotsView view(&f.document);
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    chooseNext(&view, view.groupBox()); // "all groups" -> "A"
    ASSERT_EQ(view.groupBox()->currentData().toString(), QStringLiteral("A"));
    finish(view.runner());
    EXPECT_TRUE(view.flagLine()->text().contains(QStringLiteral("being computed"))) << view.flagLine()->text().toStdString();
    finish(view.flags()->runner());
    const QString text = view.flagLine()->text();
    EXPECT_TRUE(text.contains(mark() + QStringLiteral(" Too few encounters for a stable rank (under 10 up to 2021-06-02)")))
        << text.toStdString();
    EXPECT_TRUE(text.contains(QStringLiteral(": Cleo (D1) 2, width "))) << text.toStdString();
    EXPECT_FALSE(text.contains(QStringLiteral("Ada")));
    EXPECT_FALSE(text.contains(QStringLiteral("Bea")));
    EXPECT_TRUE(view.flagLine()->toolTip().contains(QStringLiteral("threshold 10")));
}

TEST(RankFlags, DataHealthViewShowsPendingThenTheFigures)
{
    Flagged f;
    ui::HealthView view(&f.document);
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    auto* to = view.findChild<QLineEdit*>(QStringLiteral("healthTo"));
    to->setFocus();
    QTest::keyClicks(focusIn(&view), QStringLiteral("2021-06-30"));
    QTest::keyClick(focusIn(&view), Qt::Key_Return);
    // Pending: the work runs on its own thread, the interface answers and says so.
    EXPECT_TRUE(view.runner()->busy());
    EXPECT_TRUE(view.progressStrip()->isVisible());
    EXPECT_EQ(view.animalList()->topLevelItemCount(), 0);
    finish(view.runner());
    EXPECT_FALSE(view.progressStrip()->isVisible());
    // Sorted by id: D1 2 (flagged), D2 0, F1 10 (not flagged), F2 12, M1, G1 of group B 0 each.
    QTreeWidget* animals = view.animalList();
    ASSERT_GE(animals->topLevelItemCount(), 4);
    auto row = [&](const char* id) -> QTreeWidgetItem* {
        for (int i = 0; i < animals->topLevelItemCount(); ++i)
            if (animals->topLevelItem(i)->text(0) == QLatin1String(id)) return animals->topLevelItem(i);
        return nullptr;
    };
    ASSERT_NE(row("D1"), nullptr);
    EXPECT_EQ(row("D1")->text(1), QStringLiteral("2"));
    EXPECT_EQ(row("D1")->text(4), QStringLiteral("too few"));
    EXPECT_EQ(row("F1")->text(1), QStringLiteral("10"));
    EXPECT_TRUE(row("F1")->text(4).isEmpty());
    EXPECT_EQ(row("F2")->text(1), QStringLiteral("12"));
}

TEST(RankFlags, SupportViewShowsPendingThenTheFigures)
{
    DemoDocument demo;
    ui::SupportView view(demo.document());
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    const int pairs = view.pairTable()->rowCount();
    ASSERT_GT(pairs, 0);
    auto* permutations = view.findChild<QSpinBox*>();
    ASSERT_NE(permutations, nullptr);
    permutations->setFocus();
    permutations->selectAll();
    QTest::keyClicks(focusIn(&view), QStringLiteral("20"));
    QTest::keyClick(focusIn(&view), Qt::Key_Return);
    EXPECT_TRUE(view.runner()->busy());
    EXPECT_TRUE(view.progressStrip()->isVisible());
    EXPECT_EQ(view.pairTable()->rowCount(), 0);
    finish(view.runner());
    EXPECT_FALSE(view.progressStrip()->isVisible());
    EXPECT_EQ(view.pairTable()->rowCount(), pairs);
    EXPECT_EQ(view.analysis().test.iterations, 20);
}

TEST(RankFlags, SupportMatrixMarksTheFlaggedAnimal)
{
    Flagged f;
    ui::SupportView view(&f.document);
    view.show();
    QApplication::setActiveWindow(&view);
    finish(view.runner());
    auto* group = view.findChild<QComboBox*>();
    ASSERT_NE(group, nullptr);
    chooseNext(&view, group); // "every group" -> "A"
    ASSERT_EQ(group->currentData().toString(), QStringLiteral("A"));
    finish(view.runner());
    finish(view.flags()->runner());
    // The matrix in rank order: D1 (2 encounters) marked, F1 (10) and F2 (12) not.
    QStringList rows;
    for (int i = 1; i < view.matrixTable()->rowCount(); ++i) rows << view.matrixTable()->verticalHeaderItem(i)->text();
    EXPECT_TRUE(rows.contains(QStringLiteral("D1 ") + mark())) << rows.join(',').toStdString();
    EXPECT_TRUE(rows.contains(QStringLiteral("F1")));
    EXPECT_TRUE(rows.contains(QStringLiteral("F2")));
    const int d1 = static_cast<int>(rows.indexOf(QStringLiteral("D1 ") + mark()));
    ASSERT_GE(d1, 0);
    EXPECT_EQ(view.matrixTable()->horizontalHeaderItem(d1 + 1)->text(), QStringLiteral("D1 ") + mark());
    EXPECT_TRUE(view.matrixTable()->verticalHeaderItem(d1 + 1)->toolTip().contains(QStringLiteral("2 in the window")));
    EXPECT_TRUE(view.findChild<QLabel*>(QStringLiteral("supportFlagLegend"))->text().contains(QStringLiteral("(flagged: 1)")));
}

TEST(RankFlags, ResearchExportEndsTheRankTableWithTheFlagWhenTicked)
{
    Flagged f;
    TempDir out;
    ui::ResearchExportDialog dialog(&f.document);
    dialog.show();
    dialog.setPeriod(QStringLiteral("month"));
    dialog.setFolder(QString::fromStdString(out.file("tables")));
    auto* health = dialog.findChild<QCheckBox*>(QStringLiteral("exportHealth"));
    ASSERT_NE(health, nullptr);
    EXPECT_FALSE(health->isChecked()); // off: the table keeps its columns
    QTest::mouseClick(health, Qt::LeftButton, {}, QPoint(8, health->height() / 2));
    ASSERT_TRUE(health->isChecked());
    ASSERT_TRUE(dialog.exportTables()) << ui::toStdString(dialog.report());
    std::ifstream in(out.file("tables/ranks_by_period.csv"));
    std::vector<std::string> rows;
    for (std::string line; std::getline(in, line);) rows.push_back(line);
    ASSERT_FALSE(rows.empty());
    EXPECT_EQ(rows[0].substr(rows[0].size() - 26), ",encounters,few_encounters");
    // Elo runs on over the record: June (to 2 June) F1 10, F2 12, D1 2 (flagged); May F1 and F2 10 each.
    auto row = [&](const std::string& start, const std::string& id) {
        for (const std::string& r : rows)
            if (r.rfind(start, 0) == 0 && r.find(',' + id + ',') != std::string::npos) return r;
        return std::string();
    };
    EXPECT_EQ(row("2021-06-01", "D1").substr(row("2021-06-01", "D1").size() - 6), ",2,yes");
    EXPECT_EQ(row("2021-06-01", "F2").substr(row("2021-06-01", "F2").size() - 6), ",12,no");
    EXPECT_EQ(row("2021-05-", "F1").substr(row("2021-05-", "F1").size() - 6), ",10,no");
    EXPECT_TRUE(row("2021-05-", "D1").empty()); // not yet ranked in May
}
