// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/calendar_period.h"
#include "core/base/colony.h"
#include "core/ranks/analysis_settings.h"
#include "core/ranks/encounter_selection.h"
#include "core/research/maternal_rank.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/ranks/rank_table.h"
#include "core/base/residence_index.h"
#include "core/research/sex_ratio_analysis.h"

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// A research table as plain text cells: what the desktop shows and what the
/// exports write are the same strings (numbers in round-trip form, empty
/// where undefined), so screen and files cannot disagree.
struct ExportTable {
    std::string name; ///< file stem, e.g. "ranks_by_period"
    std::vector<std::string> header;
    std::vector<std::vector<std::string>> rows;
};

/// Long rank table (one row per animal per period) of docs/methods.md's rank
/// methods, as `ranks --every` computes it (Elo continues over the window and
/// is read at each period's last day; David's score and I&SI per period), with
/// the animal's matriline (its matriarch; Kawamura 1958), age in whole years,
/// sex and group on the period's last day and the Elo start rule (empty for the other methods) added at the end.
ExportTable rankTableByPeriod(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                              const RankOptions& options, PeriodLength every);

/// The same long table over custom windows [start, end] (may overlap): Elo
/// over the selection read at each window's last day; David's score and I&SI
/// over each window's own encounters.
ExportTable rankTableByWindows(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                               const RankOptions& options, const std::vector<CalendarPeriod>& windows);

/// The win matrix of the selection (rows winners, columns losers, diagonal
/// empty), animals ordered by `order` over the window as the `matrix` command does.
ExportTable winMatrixTable(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                           RankMethod order, const EloSettings& elo = EloSettings{});

/// Hierarchy metrics (computeHierarchyMetrics) per period: one row per
/// period, columns period_start, period_end and the `metrics` names in order.
ExportTable metricsByPeriodTable(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                                 const std::vector<CalendarPeriod>& periods, int randomisations, std::uint64_t seed,
                                 unsigned threads);

/// Discordance from the matrilineal inheritance prediction per month
/// (monthlyConformity; Kawamura 1958 for the prediction, Kendall 1945 for
/// tau-b): long format, one row per method (elo, ds) and month, columns as
/// `inherit --monthly`. Months outside the selection's from/to are left out;
/// group and draws come from the selection.
ExportTable discordanceByMonthTable(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                                    const EloSettings& elo, int maturityYears);

/// The per-birth maternal rank table (Trivers & Willard 1973; docs/methods.md):
/// rank, ranked females and relative rank at conception and at birth,
/// whether the birth is used and, if not, the reason code.
ExportTable maternalRankTable(const std::vector<MaternalRankRow>& births);

/// The `sex-ratio` figures as metric,value rows (sexRatioRows).
ExportTable sexRatioTable(const SexRatioAnalysis& analysis);

/// Proportion of sons with its Wilson 95 % interval per maternal rank third.
ExportTable rankThirdsTable(const SexRatioAnalysis& analysis);

/// The calendar periods of a selection: those covering [from, to], where
/// from/to default to the window's first and last counted encounter.
std::vector<CalendarPeriod> selectionPeriods(const Colony& colony, const ResidenceIndex& where,
                                             const SelectionOptions& selection, PeriodLength every);

/// Everything one research export holds, with the defaults of docs/methods.md.
struct ResearchExportOptions {
    SelectionOptions selection;         ///< window, group, draws (from/to also select births)
    RankOptions ranks;                  ///< method and Elo settings
    std::optional<PeriodLength> every;  ///< regular periods ...
    std::vector<CalendarPeriod> windows; ///< ... or custom windows; neither: the whole window
    int randomisations = 0;             ///< per-period tests in the metrics table (0: skipped, p empty)
    std::uint64_t seed = 1;
    unsigned threads = 0;
    int gestationDays = 165;
    int maturityYears = kDefaultMaturityYears;
    /// Sibling rule of the foresight table's rule and rule-informed Elo models.
    SiblingRule foresightRule = SiblingRule::Youngest;
    /// With a threshold, ranks_by_period ends with `encounters,few_encounters`
    /// (docs/methods.md, "Data health"); empty: the table keeps its columns.
    std::optional<int> healthMinEncounters;
};

/// Appends `encounters,few_encounters` to a ranks_by_period table: the
/// encounters each row's score rests on (Elo: from the selection's start to the
/// period's last day; the other methods: the period alone), flagged below
/// `minEncounters` (core/research/data_health.h).
void appendHealthColumns(ExportTable& ranks, const Colony& colony, const SelectionOptions& selection,
                         RankMethod method, const std::vector<CalendarPeriod>& periods, int minEncounters);

/// Every research table: ranks by period, win matrix, metrics by period,
/// maternal ranks, sex-ratio figures, rank thirds, discordance by month, rank
/// changes (active and passive) and foresight (docs/methods.md); with supporters
/// in the record also the four kin-support tables (support_tables.h).
std::vector<ExportTable> researchTables(const Colony& colony, const ResidenceIndex& where,
                                        const ResearchExportOptions& options);

/// True when a cell is a finite decimal number as from_chars reads it
/// ("-3.2", "1e-5"): such cells are data, not formulas, and stay as they are.
bool isPlainNumber(std::string_view cell);

/// Spreadsheet formula neutralising (common practice for CSV exports, as the
/// OWASP "CSV injection" guidance describes): a text cell beginning with =, +,
/// -, @, a tab or a carriage return gets a leading apostrophe so a spreadsheet
/// shows it as text; numbers (isPlainNumber) and every other cell are unchanged.
std::string neutraliseFormula(std::string_view cell);

/// The table as RFC 4180 CSV text with a header row and `\n` line ends;
/// `neutralise` applies neutraliseFormula to every cell (exports do, the
/// command line's standard output keeps the cells as they are).
std::string tableCsv(const ExportTable& table, bool neutralise);

/// Writes each table to DIR/NAME.csv (formulas neutralised; each file
/// written to a temporary name first, then renamed), creating DIR. With
/// `spreadsheet`, each file starts with a UTF-8 byte-order mark, the one sign
/// by which common spreadsheet programs recognise UTF-8 in a CSV file (without
/// it they assume a legacy code page and garble non-ASCII names). Throws
/// std::runtime_error naming the file on failure.
void writeTableSet(const std::vector<ExportTable>& tables, const std::string& dir, bool spreadsheet);

} // namespace hierloom::core
