// SPDX-License-Identifier: GPL-3.0-or-later
// The matrix and hierarchy views on the demo colony against the core
// computations they show, the figure export and the main window's tabs.
#include "ui/analysis/hierarchy_plots_view.h"
#include "ui/analysis/matrix_view.h"

#include "core/ranks/encounter_selection.h"
#include "core/store/colony_store.h"
#include "core/research/export_tables.h"
#include "core/pedigree/hierarchy_series.h"
#include "core/pedigree/matriline.h"
#include "plot_test_support.h"
#include "ui/shell/main_window.h"
#include "ui/widgets/plot_export.h"
#include "ui/analysis/rank_timeline_view.h"
#include "ui/document/qt_convert.h"

#include <QApplication>
#include <QComboBox>
#include <QFontMetricsF>
#include <QStyledItemDelegate>
#include <QFile>
#include <QImage>
#include <QRegularExpression>

#include <gtest/gtest.h>
#include <qcustomplot.h>

using namespace hierloom;
using hierloom::test::DemoDocument;
using hierloom::test::finish;
using hierloom::test::TempDir;

namespace {

QStringList expectedOrder(const core::Colony& c, const core::ResidenceIndex& where, const core::SelectionOptions& o,
                          core::RankMethod method)
{
    const core::EncounterSelection sel = core::selectEncounters(c, where, o);
    QStringList out;
    core::EloSettings elo;
    elo.draws = o.draws;
    for (int i : core::orderByMethod(sel, method, elo)) out << ui::toQString(sel.ids[static_cast<size_t>(i)]);
    return out;
}

} // namespace

TEST(MatrixView, OrderedAsCoreOrdersWithMarksAndBoundaries)
{
    DemoDocument demo;
    ui::MatrixView view(demo.document());
    const core::Colony& c = demo.document()->colonyFor({});
    const core::ResidenceIndex& where = demo.document()->residences();
    const core::Matrilines lines(c);
    for (core::RankMethod m : {core::RankMethod::Elo, core::RankMethod::DavidsScore, core::RankMethod::Isi}) {
        view.setMethod(m);
        finish(view.runner());
        // Identity: the rows follow core::orderByMethod over the same window.
        const QStringList order = expectedOrder(c, where, {}, m);
        ASSERT_EQ(view.order(), order) << static_cast<int>(m);
        // Brute force over the shown matrix: marks below the diagonal, boundaries between lines.
        const core::WinMatrix& w = view.matrix();
        int below = 0, boundaries = 0;
        double total = 0;
        for (int i = 0; i < w.n; ++i)
            for (int j = 0; j < w.n; ++j) {
                below += (i > j && w.s(i, j) > 0) ? 1 : 0;
                total += w.s(i, j);
            }
        for (int i = 0; i + 1 < w.n; ++i) {
            const int a = lines.index(order[i].toStdString()), b = lines.index(order[i + 1].toStdString());
            boundaries += lines.matriarch(a) != lines.matriarch(b) ? 1 : 0;
        }
        EXPECT_EQ(view.markedCount(), below);
        EXPECT_GT(below, 0);
        EXPECT_EQ(view.boundaryCount(), boundaries);
        // Draws count half to each side, so the cells add up to the counted encounters.
        EXPECT_DOUBLE_EQ(total, static_cast<double>(core::selectEncounters(c, where, {}).bouts.size()));
    }
    // A window and the Elo order of that window.
    const core::Day from = core::dayFromCivil(2023, 5, 15), to = core::dayFromCivil(2023, 7, 31);
    view.setMethod(core::RankMethod::Elo);
    view.setWindow(from, to);
    finish(view.runner());
    core::SelectionOptions o;
    o.from = from;
    o.to = to;
    EXPECT_EQ(view.order(), expectedOrder(c, where, o, core::RankMethod::Elo));
    EXPECT_TRUE(view.describeCell(1, 0).contains(QStringLiteral("beat")));
}

TEST(HierarchyPlotsView, OnePointPerMonthInEveryPanel)
{
    DemoDocument demo;
    ui::HierarchyPlotsView view(demo.document());
    finish(view.runner());
    const core::Colony& c = demo.document()->colonyFor({});
    const core::ResidenceIndex& where = demo.document()->residences();
    const size_t months = core::selectionPeriods(c, where, {}, core::PeriodLength::Month).size();
    EXPECT_EQ(months, 84u); // 2019-01 .. 2025-12
    for (int p = 0; p < ui::HierarchyPlotsView::PanelCount; ++p)
        EXPECT_EQ(view.pointCount(static_cast<ui::HierarchyPlotsView::Panel>(p)), static_cast<int>(months)) << p;
    // The encounter bars add up to the record's counted encounters.
    double sum = 0;
    const auto* bars = qobject_cast<QCPBars*>(view.plottable(ui::HierarchyPlotsView::Encounters));
    ASSERT_NE(bars, nullptr);
    for (auto it = bars->data()->constBegin(); it != bars->data()->constEnd(); ++it) sum += it->value;
    EXPECT_DOUBLE_EQ(sum, static_cast<double>(core::selectEncounters(c, where, {}).bouts.size()));
}

// Two groups with encounters counted by hand: 2020-01 has 6 in A and 3 in B,
// 2020-02 has 2 in A and 5 in B. All groups: 9 and 7; group B alone: 3 and 5.
TEST(HierarchyPlotsView, OneGroupOrAll)
{
    TempDir dir;
    const std::string path = dir.file("two-groups.hierloom");
    {
        core::ColonyStore store = core::ColonyStore::create(path);
        std::vector<core::Animal> animals;
        std::vector<core::Residence> stays;
        for (const char* id : {"A1", "A2", "A3", "B1", "B2", "B3"}) {
            core::Animal a;
            a.id = id;
            a.sex = core::Sex::Female;
            a.entry = core::dayFromCivil(2010, 1, 1);
            a.entryType = core::EntryType::Founder;
            animals.push_back(a);
            stays.push_back({id, id[0] == 'A' ? "A" : "B", *a.entry, std::nullopt, {}});
        }
        std::vector<core::Encounter> encounters;
        auto add = [&](int month, const char* group, int count) {
            for (int i = 0; i < count; ++i) {
                core::Encounter e;
                e.date = core::dayFromCivil(2020, month, 1 + i);
                e.winner = std::string(group) + "1";
                e.loser = std::string(group) + (i % 2 ? "2" : "3");
                e.group = group;
                encounters.push_back(e);
            }
        };
        add(1, "A", 6);
        add(1, "B", 3);
        add(2, "A", 2);
        add(2, "B", 5);
        store.append(animals, stays, encounters);
    }
    ui::ColonyDocument document;
    document.open(QString::fromStdString(path));
    ui::HierarchyPlotsView view(&document);
    finish(view.runner());
    ASSERT_EQ(view.groupBox()->count(), 3); // all groups, A, B
    auto counts = [&] {
        std::vector<long long> out;
        for (const core::HierarchyMonth& m : view.series().months) out.push_back(m.encounters);
        return out;
    };
    EXPECT_EQ(counts(), (std::vector<long long>{9, 7}));
    view.setGroup(QStringLiteral("B"));
    finish(view.runner());
    EXPECT_EQ(counts(), (std::vector<long long>{3, 5}));
    // The same figures as the core's for that group.
    core::InheritanceOptions options;
    options.group = "B";
    const core::Matrilines lines(document.colonyFor({}));
    const core::HierarchySeries expected = core::computeHierarchySeries(document.colonyFor({}), document.residences(), lines, options);
    ASSERT_EQ(view.series().months.size(), expected.months.size());
    for (size_t m = 0; m < expected.months.size(); ++m) {
        EXPECT_EQ(view.series().months[m].hPrime, expected.months[m].hPrime);
        EXPECT_EQ(view.series().months[m].steepness, expected.months[m].steepness);
    }
}

TEST(MainWindowViews, PlotTabsOpenByName)
{
    DemoDocument demo;
    ui::MainWindow window;
    ASSERT_TRUE(window.openColony(QString::fromStdString(demo.path())));
    for (const char* name : {"timeline", "prediction", "matrix", "hierarchy"}) EXPECT_TRUE(window.showView(name)) << name;
    EXPECT_FALSE(window.showView(QStringLiteral("nowhere")));
    const ui::AnalysisViews& v = window.analysisViews();
    finish(v.timeline->runner());
    finish(v.matrix->runner());
    EXPECT_GT(v.timeline->visibleLineCount(), 20);
    EXPECT_GT(v.matrix->order().size(), 20);
}

// 92 animals in 500 pixels: names thinned to one text line apart, more names
// when zoomed in, all of them back with Fit; the full name in the hover; the
// order list reads "I&SI" and opens on the command line's default order.
TEST(MatrixView, ReadableWithNinetyAnimals)
{
    DemoDocument demo;
    ui::MatrixView view(demo.document());
    view.resize(700, 500);
    view.show();
    view.setWindow(core::dayFromCivil(2019, 1, 1), core::dayFromCivil(2025, 12, 31));
    finish(view.runner());
    QApplication::processEvents();
    view.plot()->replot(QCustomPlot::rpImmediateRefresh);
    view.plot()->replot(QCustomPlot::rpImmediateRefresh);
    const int n = static_cast<int>(view.order().size());
    ASSERT_GE(n, 90);
    const int shown = static_cast<int>(view.rowLabels().size());
    EXPECT_LT(shown, n);
    EXPECT_GT(shown, 3);
    // Shown names are at least a text line apart on screen.
    QCPAxis* y = view.plot()->yAxis;
    const double perRow = std::abs(y->coordToPixel(1) - y->coordToPixel(0));
    const int step = (n + shown - 1) / shown;
    EXPECT_GE(step * perRow, QFontMetricsF(y->tickLabelFont()).height());
    view.zoomBy(0.25);
    view.plot()->replot(QCustomPlot::rpImmediateRefresh);
    view.plot()->replot(QCustomPlot::rpImmediateRefresh);
    EXPECT_GT(view.rowLabels().size(), shown);
    view.fitAll();
    view.plot()->replot(QCustomPlot::rpImmediateRefresh);
    view.plot()->replot(QCustomPlot::rpImmediateRefresh);
    EXPECT_EQ(view.rowLabels().size(), shown);
    // The hover names the animal in full, with its id.
    const QString first = view.order().front();
    EXPECT_TRUE(view.describeAnimal(0).contains(first));
    EXPECT_TRUE(view.describeCell(1, 0).contains(first));
    // "I&SI" drawn as plain text (no doubled ampersand), and the default order is the command line's.
    QComboBox* box = view.methodBox();
    EXPECT_EQ(box->currentData().toString(), QStringLiteral("isi"));
    EXPECT_EQ(box->currentText(), QStringLiteral("I&SI"));
    auto* delegate = qobject_cast<QStyledItemDelegate*>(box->itemDelegate());
    ASSERT_NE(delegate, nullptr);
    EXPECT_EQ(delegate->displayText(box->currentText(), QLocale()), QStringLiteral("I&SI"));
}
