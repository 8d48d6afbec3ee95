// SPDX-License-Identifier: GPL-3.0-or-later
// The colony manager's screens: planner, stability view and badge, and the
// printable hierarchy report, on the demo colony (demo_colony.h scenario facts).
#include "ui/shell/main_window.h"

#include "core/store/colony_store.h"
#include "core/demo/demo_colony.h"
#include "core/demo/demo_colony_file.h"
#include "core/pedigree/matriline.h"
#include "core/planning/planning_caution.h"
#include "core/planning/scenario_file.h"
#include "report/hierarchy_report.h"
#include "tests/core/import_test_support.h"
#include "ui/widgets/caution_label.h"
#include "ui/document/colony_document.h"
#include "ui/planning/colony_manager_views.h"
#include "ui/planning/planner_view.h"
#include "ui/planning/report_dialog.h"
#include "ui/planning/scenario_composer.h"
#include "ui/planning/stability_badge.h"
#include "ui/planning/stability_view.h"

#include <QComboBox>
#include <QFile>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPdfWriter>
#include <QProcess>
#include <QRegularExpression>
#include <QStandardPaths>
#include <QTableWidget>
#include <QTreeWidget>

#include <gtest/gtest.h>

#include <set>

using namespace hierloom;
using hierloom::test::TempDir;

namespace {

class QuietWindow : public ui::MainWindow {
protected:
    void reportError(const QString&, const QString&) override {}
};

std::string demoFile(const TempDir& dir)
{
    const std::string path = dir.file("demo.hierloom");
    core::createDemoColonyFile(path);
    return path;
}

bool hasCaution(QWidget* w)
{
    auto* label = w->findChild<QLabel*>(QStringLiteral("planningCaution"));
    return label && label->text() == ui::planningCaution() && label->text().contains(QStringLiteral("veterinary"));
}

} // namespace

TEST(StabilityView, DemoRevoltMonthsAlertWithEvidenceAndCaution)
{
    TempDir dir;
    QuietWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(demoFile(dir))));
    ui::StabilityView* view = window.managerViews().stability;
    ASSERT_NE(view, nullptr);
    view->setGroup(QString::fromUtf8(core::demo::kGroup));
    view->setPeriodLength(core::PeriodLength::Month);
    // The generator's revolt (kRevoltStart..kRevoltEnd) touches May, June and July 2023: only they alert.
    std::set<core::Day> months;
    for (const core::StabilityAlert& a : view->series().alerts) months.insert(view->series().periods[a.period].period.start);
    EXPECT_EQ(months, (std::set<core::Day>{core::dayFromCivil(2023, 5, 1), core::dayFromCivil(2023, 6, 1),
                                           core::dayFromCivil(2023, 7, 1)}));
    EXPECT_EQ(view->alertList()->topLevelItemCount(), static_cast<int>(view->series().alerts.size()));
    // The record ends calm: no banner, no status-bar badge.
    EXPECT_TRUE(view->banner()->isHidden());
    window.managerViews().badge->waitForCheck(); // the check runs on a worker thread
    EXPECT_TRUE(window.managerViews().badge->alertedGroups().isEmpty());
    EXPECT_TRUE(hasCaution(view));
    // "Severe rate, times the median" is explained under the plot.
    const auto* key = view->findChild<QLabel*>(QStringLiteral("stabilityKey"));
    ASSERT_NE(key, nullptr);
    EXPECT_TRUE(key->text().contains(QStringLiteral("divided by the median")));
    EXPECT_TRUE(window.showView(QStringLiteral("stability")));
}

// A record that stops inside the revolt (2023-06-30) ends on an alerting month:
// the badge names the group, the view shows its banner.
TEST(StabilityView, AlertInTheLatestPeriodShowsTheBadge)
{
    TempDir dir;
    core::Colony demo = core::generateDemoColony();
    const core::Day stop = core::dayFromCivil(2023, 6, 30);
    std::erase_if(demo.encounters, [&](const core::Encounter& e) { return e.date > stop; });
    const std::string path = dir.file("cut.hierloom");
    {
        core::ColonyStore store = core::ColonyStore::create(path);
        store.append(demo.animals, demo.residences, demo.encounters);
    }
    QuietWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(path)));
    ui::StabilityBadge* badge = window.managerViews().badge;
    badge->waitForCheck(); // the check runs on a worker thread
    EXPECT_EQ(badge->alertedGroups(), QStringList{QString::fromUtf8(core::demo::kGroup)});
    EXPECT_FALSE(badge->isHidden());
    EXPECT_TRUE(badge->toolTip().contains(QStringLiteral("veterinary")));
    ui::StabilityView* view = window.managerViews().stability;
    view->setPeriodLength(core::PeriodLength::Month);
    EXPECT_FALSE(view->banner()->isHidden());
    // Raising the thresholds beyond reach (stored in the file) clears the badge.
    core::StabilityThresholds high;
    high.counterShare = 0.99;
    high.severeFactor = 100;
    view->applyThresholds(high);
    badge->waitForCheck();
    EXPECT_TRUE(badge->alertedGroups().isEmpty());
    EXPECT_TRUE(view->banner()->isHidden());
}

// Splitting by matrilines with the widgets keeps every matriline whole; the
// scenario saved in the colony file reopens identical; the records stay as they were.
TEST(PlannerView, SplitByMatrilinesSaveAndReopen)
{
    TempDir dir;
    QuietWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(demoFile(dir))));
    const size_t encounters = window.document()->encounters().size();
    ui::PlannerView* planner = window.managerViews().planner;
    ASSERT_NE(planner, nullptr);
    EXPECT_TRUE(hasCaution(planner));
    ui::ScenarioComposer* c = planner->composer();
    const core::DemoColonyFacts facts = core::demoColonyFacts();
    const std::set<std::string> moving{facts.matriarchs.at('C'), facts.matriarchs.at('D')};
    c->kindBox()->setCurrentIndex(ui::ScenarioComposer::SplitMatrilines);
    int checked = 0;
    for (int i = 0; i < c->matriarchList()->count(); ++i) {
        QListWidgetItem* item = c->matriarchList()->item(i);
        if (moving.count(item->data(Qt::UserRole).toString().toStdString())) {
            item->setCheckState(Qt::Checked);
            ++checked;
        }
    }
    ASSERT_EQ(checked, 2);
    c->newGroupEdit()->setText(QStringLiteral("South Pen"));
    ASSERT_TRUE(c->addComposedChange());
    c->kindBox()->setCurrentIndex(ui::ScenarioComposer::IntroduceFemale);
    ASSERT_TRUE(c->addComposedChange());
    ASSERT_TRUE(planner->result()) << planner->problems().toStdString();
    const core::ScenarioResult& r = *planner->result();
    ASSERT_EQ(r.groups.size(), 2u);
    // Every matriline's ranked females end in one group: the moved lines in South Pen.
    std::map<std::string, std::set<std::string>> groupsOfLine;
    for (const core::ScenarioMove& m : r.moves)
        if (!m.groupAfter.empty()) groupsOfLine[m.matriarch].insert(m.groupAfter);
    for (const auto& [line, groups] : groupsOfLine) {
        EXPECT_EQ(groups.size(), 1u) << line;
        if (moving.count(line)) {
            EXPECT_EQ(*groups.begin(), "South Pen");
        }
    }
    const auto composition = planner->findChildren<QLabel*>(QStringLiteral("composition"));
    EXPECT_EQ(composition.size(), 2);
    // The tables say they list adult females only, name the animals as the Prediction view
    // does ("Name (ID)"), and show the window behind the observed wins (180 days, scenario.h).
    EXPECT_EQ(planner->findChildren<QLabel*>(QStringLiteral("adultFemalesOnly")).size(), 2);
    const QTableWidget* moves = planner->movesTable();
    ASSERT_GT(moves->rowCount(), 0);
    const core::Colony& colony = window.document()->colonyFor({});
    const std::string& first = r.moves.front().animal;
    const std::string& name = colony.animals[static_cast<size_t>(colony.animalIndex(first))].name;
    EXPECT_EQ(moves->item(0, 0)->text().toStdString(), name + " (" + first + ")");
    const QString header = planner->reversalsTable()->horizontalHeaderItem(3)->text();
    EXPECT_TRUE(header.contains(QStringLiteral("180 days"))) << header.toStdString();

    const std::string text = core::formatScenarioText(c->scenario());
    ASSERT_TRUE(planner->saveScenario(QStringLiteral("split C and D")));
    c->reset();
    EXPECT_TRUE(c->scenario().changes.empty());
    ASSERT_TRUE(planner->openScenario(QStringLiteral("split C and D")));
    EXPECT_EQ(core::formatScenarioText(c->scenario()), text);
    EXPECT_EQ(planner->savedNames(), QStringList{QStringLiteral("split C and D")});
    planner->compare(QStringLiteral("split C and D"), QString());
    EXPECT_GT(planner->compareTable()->rowCount(), 0);
    // Never a change to the records.
    window.document()->reload();
    EXPECT_EQ(window.document()->encounters().size(), encounters);
    EXPECT_EQ(window.document()->residences().group("South Pen"), -1);
}

// The hierarchy report is a valid PDF with the number of pages the painter made.
TEST(HierarchyReport, DemoReportIsAValidPdf)
{
    TempDir dir;
    ui::ColonyDocument document;
    document.open(QString::fromStdString(demoFile(dir)));
    const QString pdf = QString::fromStdString(dir.file("report.pdf"));
    const int pages = report::writeHierarchyReportPdf(
        pdf, document.colonyFor({}), ui::documentReportOptions(&document, core::demo::kGroup, std::nullopt));
    EXPECT_GE(pages, 3);
    QFile file(pdf);
    ASSERT_TRUE(file.open(QIODevice::ReadOnly));
    const QByteArray bytes = file.readAll();
    EXPECT_TRUE(bytes.startsWith("%PDF"));
    int counted = -1;
    if (!QStandardPaths::findExecutable(QStringLiteral("pdfinfo")).isEmpty()) {
        QProcess info;
        info.start(QStringLiteral("pdfinfo"), {pdf});
        ASSERT_TRUE(info.waitForFinished(30000));
        const auto m = QRegularExpression(QStringLiteral("Pages:\\s+(\\d+)")).match(QString::fromUtf8(info.readAllStandardOutput()));
        ASSERT_TRUE(m.hasMatch());
        counted = m.captured(1).toInt();
    } else {
        // The page tree's /Count (the root /Pages object holds the largest).
        auto it = QRegularExpression(QStringLiteral("/Count (\\d+)")).globalMatch(QString::fromLatin1(bytes));
        while (it.hasNext()) counted = std::max(counted, it.next().captured(1).toInt());
    }
    EXPECT_EQ(counted, pages);
    EXPECT_THROW(report::writeHierarchyReportPdf(pdf, document.colonyFor({}),
                                                 ui::documentReportOptions(&document, "No Such Group", std::nullopt)),
                 std::invalid_argument);
}

// The report has the foresight section ("how much does inheritance explain"), after the recent changes.
TEST(HierarchyReport, HasTheForesightSection)
{
    TempDir dir;
    ui::ColonyDocument document;
    document.open(QString::fromStdString(demoFile(dir)));
    QPdfWriter writer(QString::fromStdString(dir.file("r.pdf")));
    QStringList headings;
    report::paintHierarchyReport(writer, document.colonyFor({}),
                                 ui::documentReportOptions(&document, core::demo::kGroup, std::nullopt), &headings);
    const qsizetype changes = headings.indexOf(QStringLiteral("Recent rank changes"));
    const qsizetype foresight = headings.indexOf(QStringLiteral("How much does inheritance explain"));
    ASSERT_GE(changes, 0) << headings.join(QStringLiteral(" | ")).toStdString();
    EXPECT_EQ(foresight, changes + 1);
}
