// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/export_tables.h"

#include "core/base/csv_reader.h"
#include "core/pedigree/discordance.h"
#include "core/demo/demo_colony.h"
#include "core/ranks/hierarchy_metrics.h"
#include "core/base/number_format.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <charconv>

using namespace hierloom::core;

namespace {

/// The demo colony, loaded once for every test of this file.
struct Demo {
    Colony colony;
    ResidenceIndex where;
    Demo() : colony(generateDemoColony())
    {
        colony.reindex();
        where = ResidenceIndex(colony.animals, colony.residences);
    }
};

const Demo& demoData()
{
    static const Demo d;
    return d;
}

double parseDouble(std::string_view s)
{
    double v = 0;
    const auto [end, ec] = std::from_chars(s.data(), s.data() + s.size(), v);
    EXPECT_TRUE(ec == std::errc() && end == s.data() + s.size()) << s;
    return v;
}

/// Reads CSV text back into rows of strings.
std::vector<std::vector<std::string>> readBack(const std::string& text)
{
    CsvReader reader(text);
    std::vector<std::string_view> fields;
    std::vector<std::vector<std::string>> rows;
    while (reader.next(fields)) rows.emplace_back(fields.begin(), fields.end());
    EXPECT_EQ(reader.error(), "");
    return rows;
}

} // namespace

TEST(ExportTables, NeutralisingKeepsNumbersAndQuotesFormulas)
{
    // Numbers are data, not formulas: a David's score of -3.2 stays a number.
    EXPECT_EQ(neutraliseFormula("-3.2"), "-3.2");
    EXPECT_EQ(neutraliseFormula("1e-5"), "1e-5");
    EXPECT_EQ(neutraliseFormula("-1e-05"), "-1e-05");
    EXPECT_EQ(neutraliseFormula("1129.8002780893262"), "1129.8002780893262");
    // Common practice for CSV exports (OWASP "CSV injection"): text starting with
    // = + - @ gets a leading apostrophe.
    EXPECT_EQ(neutraliseFormula("=SUM(A1)"), "'=SUM(A1)");
    EXPECT_EQ(neutraliseFormula("+x"), "'+x");
    EXPECT_EQ(neutraliseFormula("@x"), "'@x");
    EXPECT_EQ(neutraliseFormula("-x"), "'-x");
    EXPECT_EQ(neutraliseFormula("-inf"), "'-inf"); // not a finite number: text
    EXPECT_EQ(neutraliseFormula("\t=1"), "'\t=1");
    // Anything else is left alone.
    EXPECT_EQ(neutraliseFormula(""), "");
    EXPECT_EQ(neutraliseFormula("NC001"), "NC001");
    EXPECT_EQ(neutraliseFormula("2020-01-01"), "2020-01-01");
    EXPECT_FALSE(isPlainNumber("=1"));
    EXPECT_TRUE(isPlainNumber("-0.5"));
}

TEST(ExportTables, CsvAppliesNeutralisingOnlyWhenAsked)
{
    ExportTable t{"t", {"animal", "score"}, {{"=cmd,1", "-3.2"}}};
    // RFC 4180 quoting of the comma after the apostrophe is added.
    EXPECT_EQ(tableCsv(t, true), "animal,score\n\"'=cmd,1\",-3.2\n");
    EXPECT_EQ(tableCsv(t, false), "animal,score\n\"=cmd,1\",-3.2\n");
}

TEST(ExportTables, RankTableRoundTripsTheSameDoubles)
{
    const Demo& d = demoData();
    SelectionOptions sel;
    RankOptions ro;
    for (RankMethod method : {RankMethod::Elo, RankMethod::DavidsScore}) {
        ro.method = method;
        const auto direct = computeRanksByPeriod(d.colony, d.where, sel, ro, PeriodLength::Year);
        const ExportTable t = rankTableByPeriod(d.colony, d.where, sel, ro, PeriodLength::Year);
        const auto rows = readBack(tableCsv(t, true));
        ASSERT_EQ(rows.size(), direct.size() + 1);
        EXPECT_EQ(rows[0], t.header);
        for (size_t i = 0; i < direct.size(); ++i) {
            const auto& r = rows[i + 1];
            EXPECT_EQ(r[0], formatDate(direct[i].period.start));
            EXPECT_EQ(r[2], direct[i].row.animal);
            EXPECT_EQ(std::stoi(r[3]), direct[i].row.rank);
            // Round-trip formatting: the re-read double is the very same double.
            EXPECT_EQ(parseDouble(r[4]), *direct[i].row.score) << r[2];
        }
    }
}

TEST(ExportTables, SpreadsheetSetHasByteOrderMarkAndSameNumbers)
{
    const Demo& d = demoData();
    hierloom::test::TempDir dir;
    const ExportTable t = rankTableByPeriod(d.colony, d.where, {}, {}, PeriodLength::Year);
    writeTableSet({t}, dir.file("set"), true);
    const std::string bytes = hierloom::test::fileBytes(dir.file("set/ranks_by_period.csv"));
    ASSERT_GE(bytes.size(), 3U);
    EXPECT_EQ(bytes.substr(0, 3), "\xEF\xBB\xBF"); // UTF-8 byte-order mark
    const auto rows = readBack(bytes);             // the reader skips the mark
    ASSERT_EQ(rows.size(), t.rows.size() + 1);
    EXPECT_EQ(rows[0][0], "period_start");
    for (size_t i = 0; i < t.rows.size(); ++i) EXPECT_EQ(rows[i + 1], t.rows[i]);
    writeTableSet({t}, dir.file("plain"), false);
    EXPECT_EQ(hierloom::test::fileBytes(dir.file("plain/ranks_by_period.csv")), tableCsv(t, true));
}

TEST(ExportTables, AddedColumnsMatchThePedigreeAndLifeHistory)
{
    const Demo& d = demoData();
    const DemoColonyFacts facts = demoColonyFacts();
    const ExportTable t = rankTableByPeriod(d.colony, d.where, {}, {}, PeriodLength::Year);
    ASSERT_EQ(t.header[5], "matriline");
    int checked = 0;
    for (const auto& row : t.rows) {
        const Animal& a = d.colony.animals[static_cast<size_t>(d.colony.animalIndex(row[2]))];
        // Matriline: the demo scenario's own record of each animal's line.
        if (const auto it = facts.lineOf.find(row[2]); it != facts.lineOf.end()) {
            EXPECT_EQ(row[5], facts.matriarchs.at(it->second)) << row[2];
            ++checked;
        }
        // Age in whole years on the period's last day (docs/methods.md "Age").
        const Day end = *parseDate(row[1]);
        EXPECT_EQ(row[6], a.birth ? std::to_string(ageInYears(*a.birth, end)) : std::string());
        EXPECT_EQ(row[7], toString(a.sex));
        EXPECT_EQ(row[8], demo::kGroup); // one group in the demo
    }
    EXPECT_GT(checked, 20);
}

TEST(ExportTables, CustomWindowsEqualToCalendarPeriodsGiveTheSameTable)
{
    // Identity: custom windows that coincide with the calendar years reproduce
    // the per-year table, for Elo (read at each window's end) and for David's score.
    const Demo& d = demoData();
    SelectionOptions sel;
    for (RankMethod m : {RankMethod::Elo, RankMethod::DavidsScore}) {
        RankOptions ro;
        ro.method = m;
        const auto years = selectionPeriods(d.colony, d.where, sel, PeriodLength::Year);
        ASSERT_EQ(years.size(), 7U); // 2019..2025
        const ExportTable a = rankTableByPeriod(d.colony, d.where, sel, ro, PeriodLength::Year);
        const ExportTable b = rankTableByWindows(d.colony, d.where, sel, ro, years);
        EXPECT_EQ(a.rows, b.rows);
    }
}

TEST(ExportTables, WinMatrixCellsAddUpToTheEncounters)
{
    // Identity: with draws at 1/2 each, the cells of the win matrix sum to the encounters.
    const Demo& d = demoData();
    const ExportTable t = winMatrixTable(d.colony, d.where, {}, RankMethod::Elo);
    ASSERT_EQ(t.rows.size() + 1, t.header.size());
    double sum = 0;
    for (size_t i = 0; i < t.rows.size(); ++i) {
        EXPECT_EQ(t.rows[i][0], t.header[i + 1]); // same order for rows and columns
        EXPECT_EQ(t.rows[i][i + 1], "");          // empty diagonal
        for (size_t j = 1; j < t.rows[i].size(); ++j)
            if (!t.rows[i][j].empty()) sum += parseDouble(t.rows[i][j]);
    }
    EXPECT_EQ(sum, static_cast<double>(d.colony.encounters.size()));
}

TEST(ExportTables, MetricsPerPeriodAreTheMetricsOfEachPeriod)
{
    const Demo& d = demoData();
    const auto years = selectionPeriods(d.colony, d.where, {}, PeriodLength::Year);
    const ExportTable t = metricsByPeriodTable(d.colony, d.where, {}, years, 0, 1, 1);
    ASSERT_EQ(t.rows.size(), years.size());
    // One code path: the row equals metricRows of that period's own selection.
    SelectionOptions s;
    s.from = years[2].start;
    s.to = years[2].end;
    const auto m = metricRows(computeHierarchyMetrics(selectEncounters(d.colony, d.where, s), s.draws, 0, 1, 1));
    ASSERT_EQ(t.header.size(), m.size() + 2);
    for (size_t i = 0; i < m.size(); ++i) {
        EXPECT_EQ(t.header[i + 2], m[i].first);
        EXPECT_EQ(t.rows[2][i + 2], m[i].second);
    }
}

TEST(ExportTables, ResearchTablesHoldEveryTable)
{
    const Demo& d = demoData();
    ResearchExportOptions o;
    o.every = PeriodLength::Year;
    const auto tables = researchTables(d.colony, d.where, o);
    std::vector<std::string> names;
    for (const ExportTable& t : tables) names.push_back(t.name);
    // The demo records supporters, so the four kin-support tables follow (docs/file-formats.md).
    EXPECT_EQ(names, (std::vector<std::string>{"ranks_by_period", "win_matrix", "metrics_by_period", "maternal_ranks",
                                                "sex_ratio", "sex_ratio_by_rank_third", "discordance_by_month",
                                                "rank_changes", "foresight", "support_pairs", "support_summary",
                                                "support_daughters", "support_matrix"}));
    // Without supporters the export holds nine tables (no kin-support tables).
    Colony bare = d.colony;
    for (Encounter& e : bare.encounters) e.winnerSupport.clear(), e.loserSupport.clear();
    EXPECT_EQ(researchTables(bare, d.where, o).size(), 9U);
    // The maternal table and the sex-ratio figures agree: used births = births_used.
    int used = 0;
    for (const auto& row : tables[3].rows) used += row[11] == "1";
    EXPECT_EQ(tables[4].rows[0][0], "births_used");
    EXPECT_EQ(tables[4].rows[0][1], std::to_string(used));
    // Every demo animal has a birth date; founders and those born before the first
    // encounter are not births of the record (docs/methods.md, "Births").
    const BirthCounting nonBirths = countNonBirths(d.colony, d.where, MaternalRankOptions{});
    EXPECT_GT(nonBirths.founders, 0);
    EXPECT_EQ(tables[3].rows.size(), d.colony.animals.size() - static_cast<size_t>(nonBirths.founders + nonBirths.bornBefore));
}

TEST(ExportTables, DiscordanceByMonthEqualsTheMonthlyConformitySeries)
{
    const Demo& d = demoData();
    const ExportTable t = discordanceByMonthTable(d.colony, d.where, {}, EloSettings{}, 4);
    // One code path: every row is the monthlyConformity point printed, Elo months first, then David's score.
    InheritanceOptions o;
    o.maturityYears = 4;
    const ConformitySeries s = monthlyConformity(d.colony, d.where, Matrilines(d.colony), o);
    ASSERT_FALSE(s.elo.empty());
    ASSERT_EQ(t.rows.size(), s.elo.size() + s.davidsScore.size());
    int withConformity = 0;
    for (size_t i = 0; i < t.rows.size(); ++i) {
        const bool isElo = i < s.elo.size();
        const ConformityPoint& p = isElo ? s.elo[i] : s.davidsScore[i - s.elo.size()];
        const auto& row = t.rows[i];
        EXPECT_EQ(row[0], isElo ? "elo" : "ds");
        EXPECT_EQ(row[1], formatDate(p.periodStart));
        EXPECT_EQ(row[2], formatDate(p.periodEnd));
        EXPECT_EQ(row[6], std::to_string(p.discordant));
        EXPECT_EQ(row[5], std::to_string(p.comparable));
        ASSERT_EQ(row[7].empty(), !p.conformity);
        if (p.conformity) {
            ++withConformity;
            EXPECT_EQ(parseDouble(row[7]), *p.conformity); // round-trip form: the same double
        }
        ASSERT_EQ(row[8].empty(), !p.tauB);
        if (p.tauB) {
            EXPECT_EQ(parseDouble(row[8]), *p.tauB);
        }
    }
    EXPECT_GT(withConformity, 0);
    // A window keeps only the months it touches.
    SelectionOptions sel;
    sel.from = s.elo[2].periodStart;
    sel.to = s.elo[3].periodEnd;
    const ExportTable w = discordanceByMonthTable(d.colony, d.where, sel, EloSettings{}, 4);
    ASSERT_EQ(w.rows.size(), 4U); // two months, two methods
    EXPECT_EQ(w.rows[0][1], formatDate(s.elo[2].periodStart));
}
