// SPDX-License-Identifier: GPL-3.0-or-later
// The Sex Ratio tab and the research export dialog on the demo colony, against
// the core computations they call (one code path: the figures on screen and in
// the files are the core's figures).
#include "ui/analysis/sex_ratio_view.h"

#include "core/base/display_names.h"
#include "core/store/colony_store.h"
#include "core/research/export_tables.h"
#include "core/research/species_profile.h"
#include "core/store/species_settings.h"
#include "plot_test_support.h"
#include "ui/document/qt_convert.h"
#include "ui/analysis/research_export_dialog.h"

#include <QLabel>
#include <QTableWidget>
#include <QTreeWidget>

#include <gtest/gtest.h>
#include <qcustomplot.h>

#include <cmath>
#include <fstream>
#include <sstream>

using namespace hierloom;
using hierloom::test::DemoDocument;

namespace {

/// The core's own maternal ranks for the demo with the default species, as `sex-ratio` computes them.
std::vector<core::MaternalRankRow> coreBirths(ui::ColonyDocument* doc, int gestation, int maturity)
{
    core::MaternalRankOptions m;
    m.gestationDays = gestation;
    m.maturityYears = maturity;
    return core::computeMaternalRanks(doc->colonyFor({}), doc->residences(), m);
}

std::string readFile(const std::string& path)
{
    std::ifstream f(path, std::ios::binary);
    std::ostringstream s;
    s << f.rdbuf();
    return s.str();
}

} // namespace

TEST(SexRatioView, FiguresAreTheCoreFigures)
{
    DemoDocument demo;
    ui::SexRatioView view(demo.facade());
    const core::SpeciesProfile* rhesus = core::findSpecies(core::kDefaultSpeciesKey);
    ASSERT_NE(rhesus, nullptr);
    const auto births = coreBirths(demo.document(), rhesus->gestationDays, rhesus->maturityYears);
    const core::SexRatioAnalysis a = core::analyseSexRatio(births);
    const auto rows = core::sexRatioRows(a);
    // Identity (one code path): every shown row is the core's row, under its display name, the
    // exported value in the tooltip and at most four significant digits in the cell.
    ASSERT_EQ(view.figureTable()->rowCount(), static_cast<int>(rows.size()));
    for (size_t i = 0; i < rows.size(); ++i) {
        const QTableWidgetItem* name = view.figureTable()->item(static_cast<int>(i), 0);
        const QTableWidgetItem* value = view.figureTable()->item(static_cast<int>(i), 1);
        EXPECT_EQ(ui::toStdString(name->toolTip()), rows[i].first);
        EXPECT_EQ(ui::toStdString(name->text()), core::displayName(core::CodeKind::Metric, rows[i].first));
        EXPECT_EQ(ui::toStdString(value->toolTip()), rows[i].second);
        if (!rows[i].second.empty())
            EXPECT_NEAR(value->text().toDouble(), std::stod(rows[i].second), 1e-3 * std::abs(std::stod(rows[i].second)));
        EXPECT_LE(value->text().size(), 9) << ui::toStdString(value->text()); // no 16-digit values on screen
    }
    // The likelihood-ratio row reads as words, not as lr_chisq.
    EXPECT_EQ(view.figureTable()->item(11, 0)->text(), QStringLiteral("likelihood-ratio chi-square (1 df)"));
    EXPECT_GT(a.birthsUsed, 0); // the demo has ranked mothers, so the figures are not all empty
    EXPECT_EQ(rows[0].second, std::to_string(a.birthsUsed));

    // Every left-out birth is listed with its reason, as many as the core leaves out.
    int leftOut = 0;
    for (const core::MaternalRankRow& b : births) leftOut += b.exclusion != core::BirthExclusion::None;
    EXPECT_GT(leftOut, 0);
    EXPECT_EQ(view.leftOutList()->topLevelItemCount(), leftOut);
    EXPECT_EQ(leftOut, a.birthsLeftOut);
    for (int i = 0; i < view.leftOutList()->topLevelItemCount(); ++i)
        EXPECT_FALSE(view.leftOutList()->topLevelItem(i)->text(3).isEmpty());

    // The maternal rank table is the export's table, cell by cell.
    const core::ExportTable t = core::maternalRankTable(births);
    ASSERT_EQ(view.maternalTable()->rowCount(), static_cast<int>(t.rows.size()));
    for (size_t r = 0; r < t.rows.size(); r += 7)
        for (size_t c = 0; c < t.header.size(); ++c)
            EXPECT_EQ(ui::toStdString(view.maternalTable()->item(static_cast<int>(r), static_cast<int>(c))->toolTip()),
                      t.rows[r][c]);
    // Its headers are display names; the export's codes are their tooltips.
    for (size_t c = 0; c < t.header.size(); ++c) {
        const QTableWidgetItem* head = view.maternalTable()->horizontalHeaderItem(static_cast<int>(c));
        EXPECT_EQ(ui::toStdString(head->toolTip()), t.header[c]);
        EXPECT_EQ(ui::toStdString(head->text()), core::displayName(core::CodeKind::Column, t.header[c]));
    }

    // The plot: one point per third with births, at the core's proportion, bars to the Wilson bounds.
    QCPGraph* g = view.plot()->graph(0);
    auto* bars = qobject_cast<QCPErrorBars*>(view.plot()->plottable(1));
    ASSERT_NE(bars, nullptr);
    int k = 0;
    for (size_t third = 0; third < 3; ++third) {
        const core::RankThird& rt = a.thirds[third];
        if (!rt.proportion) continue;
        ASSERT_LT(k, g->dataCount());
        EXPECT_EQ(g->data()->at(k)->key, static_cast<double>(third + 1));
        EXPECT_DOUBLE_EQ(g->data()->at(k)->value, *rt.proportion);
        EXPECT_DOUBLE_EQ(g->data()->at(k)->value - bars->data()->at(static_cast<size_t>(k)).errorMinus, *rt.low);
        EXPECT_DOUBLE_EQ(g->data()->at(k)->value + bars->data()->at(static_cast<size_t>(k)).errorPlus, *rt.high);
        ++k;
    }
    EXPECT_EQ(g->dataCount(), k);
    EXPECT_GT(k, 0);
}

TEST(SexRatioView, SpeciesSettingChangesTheFiguresAndIsSaved)
{
    DemoDocument demo;
    ui::SexRatioView view(demo.facade());
    // Another species brings its own defaults (species_profile.h), and the figures follow.
    const core::SpeciesProfile& other = core::knownSpecies().at(1);
    view.setSpecies(ui::toQString(other.key));
    const auto births = coreBirths(demo.document(), other.gestationDays, other.maturityYears);
    EXPECT_EQ(view.births().size(), births.size());
    EXPECT_EQ(view.analysis().birthsUsed, core::analyseSexRatio(births).birthsUsed);
    ASSERT_FALSE(view.births().empty());
    EXPECT_EQ(view.births()[0].atConception.day, births[0].birth - other.gestationDays);

    // An override differing from the default is stored as such.
    view.setMaturityYears(other.maturityYears + 1);
    ASSERT_TRUE(view.saveSpeciesSetting());
    const core::SpeciesSettings s = core::readSpeciesSettings(*demo.document()->store());
    EXPECT_EQ(s.species, other.key);
    EXPECT_EQ(s.gestationDays, other.gestationDays);
    EXPECT_FALSE(s.gestationOverridden);
    EXPECT_EQ(s.maturityYears, other.maturityYears + 1);
    EXPECT_TRUE(s.maturityOverridden);
}

TEST(ResearchExportDialog, WritesTheCoreTables)
{
    DemoDocument demo;
    test::TempDir out;
    ui::ResearchExportDialog dialog(demo.document());
    dialog.setPeriod(QStringLiteral("year"));
    dialog.setMethod(QStringLiteral("ds"));
    dialog.setFolder(QString::fromStdString(out.file("tables")));
    dialog.setSpreadsheet(true);
    ASSERT_TRUE(dialog.exportTables()) << ui::toStdString(dialog.report());
    const std::vector<std::string> names{"ranks_by_period", "win_matrix", "metrics_by_period", "maternal_ranks",
                                         "sex_ratio", "sex_ratio_by_rank_third", "discordance_by_month",
                                         "rank_changes", "foresight",
                                         // the demo records supporters: the kin-support tables too
                                         "support_pairs", "support_summary", "support_daughters", "support_matrix"};
    ASSERT_EQ(dialog.writtenFiles().size(), static_cast<int>(names.size()));
    for (const std::string& n : names) {
        const std::string text = readFile(out.file("tables/" + n + ".csv"));
        ASSERT_GE(text.size(), 3U) << n;
        EXPECT_EQ(text.substr(0, 3), "\xEF\xBB\xBF") << n; // spreadsheet-friendly: byte-order mark
        EXPECT_TRUE(dialog.report().contains(ui::toQString(n + ".csv"))) << n;
    }
    // The rank table is the core's rankTableByPeriod output, byte for byte after the mark.
    core::RankOptions ranks;
    ranks.method = core::RankMethod::DavidsScore;
    const core::ExportTable expected = core::rankTableByPeriod(demo.document()->colonyFor({}), demo.document()->residences(),
                                                               {}, ranks, core::PeriodLength::Year);
    ASSERT_FALSE(expected.rows.empty());
    EXPECT_EQ(readFile(out.file("tables/ranks_by_period.csv")).substr(3), core::tableCsv(expected, true));
}

TEST(ResearchExportDialog, CustomWindowsAndBadEntries)
{
    DemoDocument demo;
    test::TempDir out;
    ui::ResearchExportDialog dialog(demo.document());
    dialog.setFolder(QString::fromStdString(out.file("w")));
    dialog.setPeriod(QStringLiteral("custom"));
    dialog.setCustomWindows(QStringLiteral("2021-13-01,2021-02-01"));
    EXPECT_FALSE(dialog.exportTables()); // not a date: a message, no files
    EXPECT_TRUE(dialog.writtenFiles().isEmpty());
    EXPECT_TRUE(dialog.report().contains(QStringLiteral("2021-13-01")));

    const auto periods = core::selectionPeriods(demo.document()->colonyFor({}), demo.document()->residences(), {},
                                                core::PeriodLength::Month);
    ASSERT_GE(periods.size(), 2U);
    const QString window = ui::toQString(core::formatDate(periods[0].start) + "," + core::formatDate(periods[1].end));
    dialog.setCustomWindows(window);
    ASSERT_TRUE(dialog.exportTables()) << ui::toStdString(dialog.report());
    const core::ExportTable expected = core::rankTableByWindows(demo.document()->colonyFor({}), demo.document()->residences(),
                                                                {}, {}, {{periods[0].start, periods[1].end}});
    EXPECT_EQ(readFile(out.file("w/ranks_by_period.csv")), core::tableCsv(expected, true)); // no mark without the option
}
