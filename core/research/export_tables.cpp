// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/export_tables.h"
#include "core/research/support_tables.h"
#include "core/research/data_health.h"
#include "core/ranks/parallel_randomisation.h"

#include "core/research/dynamics_tables.h"

#include "core/base/csv_writer.h"
#include "core/pedigree/discordance.h"
#include "core/ranks/hierarchy_metrics.h"
#include "core/pedigree/matriline.h"
#include "core/base/number_format.h"
#include "core/ranks/parallel_randomisation.h"
#include "core/ranks/rank_method_registry.h"
#include "core/ranks/win_matrix.h"

#include <charconv>
#include <cmath>
#include <filesystem>
#include <map>
#include <fstream>
#include <sstream>
#include <stdexcept>

namespace hierloom::core {

namespace {

const std::vector<std::string> kRankHeader{"period_start", "period_end", "animal", "rank",      "score",     "matriline",
                                           "age_years",    "sex",        "group",  "start_rule"};

/// Adds the descriptive columns of one ranked animal on a period's last day.
class AnimalColumns {
public:
    AnimalColumns(const Colony& colony, const ResidenceIndex& where, const RankOptions& options)
        : colony_(colony), where_(where), lines_(colony),
          startRule_(rankMethodInfo(options.method).takesStartRule ? toString(options.startRule) : "")
    {
    }

    std::vector<std::string> row(const CalendarPeriod& p, const RankRow& r) const
    {
        std::vector<std::string> out{formatDate(p.start), formatDate(p.end), r.animal, std::to_string(r.rank),
                                     formatNumber(r.score)};
        const int node = lines_.index(r.animal);
        out.push_back(node >= 0 ? lines_.id(lines_.matriarch(node)) : std::string());
        const int k = colony_.animalIndex(r.animal);
        const Animal* a = k >= 0 ? &colony_.animals[static_cast<size_t>(k)] : nullptr;
        out.push_back(a && a->birth && *a->birth <= p.end ? std::to_string(ageInYears(*a->birth, p.end)) : std::string());
        out.push_back(a ? toString(a->sex) : "");
        const int w = where_.animal(r.animal);
        const int g = w >= 0 ? where_.groupOn(w, p.end) : -1;
        out.push_back(g >= 0 ? where_.groups()[static_cast<size_t>(g)] : std::string());
        out.push_back(startRule_); // Elo's start rule (docs/methods.md); empty for the other methods
        return out;
    }

private:
    const Colony& colony_;
    const ResidenceIndex& where_;
    Matrilines lines_;
    std::string startRule_;
};

std::string cellOf(const std::optional<int>& v) { return v ? std::to_string(*v) : std::string(); }

void writeFileAtomically(const std::filesystem::path& path, const std::string& bytes)
{
    const std::filesystem::path tmp = path.string() + ".part";
    {
        std::ofstream f(tmp, std::ios::binary | std::ios::trunc);
        if (!f) throw std::runtime_error("cannot write " + path.string());
        f << bytes;
        f.flush();
        if (!f) throw std::runtime_error("writing " + path.string() + " failed (disk full?)");
    }
    std::error_code ec;
    std::filesystem::rename(tmp, path, ec);
    if (ec) throw std::runtime_error("cannot write " + path.string() + ": " + ec.message());
}

} // namespace

ExportTable rankTableByPeriod(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                              const RankOptions& options, PeriodLength every)
{
    ExportTable t{"ranks_by_period", kRankHeader, {}};
    const AnimalColumns columns(colony, where, options);
    for (const PeriodRankRow& p : computeRanksByPeriod(colony, where, selection, options, every))
        t.rows.push_back(columns.row(p.period, p.row));
    return t;
}

ExportTable rankTableByWindows(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                               const RankOptions& options, const std::vector<CalendarPeriod>& windows)
{
    ExportTable t{"ranks_by_period", kRankHeader, {}};
    const AnimalColumns columns(colony, where, options);
    for (const CalendarPeriod& w : windows) {
        SelectionOptions s = selection;
        RankOptions o = options;
        if (o.method == RankMethod::Elo) {
            o.at = w.end; // Elo keeps running over the selection, as with regular periods
        } else {
            s.from = w.start;
            s.to = w.end;
        }
        for (const RankRow& r : computeRanks(colony, where, s, o).rows) t.rows.push_back(columns.row(w, r));
    }
    return t;
}

ExportTable winMatrixTable(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                           RankMethod order, const EloSettings& elo)
{
    const EncounterSelection s = selectEncounters(colony, where, selection);
    EloSettings e = elo;
    e.draws = selection.draws;
    const std::vector<int> ord = orderByMethod(s, order, e);
    const WinMatrix m = WinMatrix::fromBouts(s.size(), s.bouts, selection.draws);
    ExportTable t{"win_matrix", {"animal"}, {}};
    for (int j : ord) t.header.push_back(s.ids[static_cast<size_t>(j)]);
    for (int i : ord) {
        std::vector<std::string> row{s.ids[static_cast<size_t>(i)]};
        for (int j : ord) row.push_back(i == j ? std::string() : formatNumber(m.s(i, j)));
        t.rows.push_back(std::move(row));
    }
    return t;
}

ExportTable metricsByPeriodTable(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                                 const std::vector<CalendarPeriod>& periods, int randomisations, std::uint64_t seed,
                                 unsigned threads)
{
    ExportTable t{"metrics_by_period", {"period_start", "period_end"}, {}};
    for (const auto& [name, value] : metricRows(HierarchyMetrics{})) t.header.push_back(name);
    const unsigned nThreads = threads == 0 ? defaultThreadCount() : threads;
    for (const CalendarPeriod& p : periods) {
        SelectionOptions s = selection;
        s.from = p.start;
        s.to = p.end;
        const EncounterSelection sel = selectEncounters(colony, where, s);
        std::vector<std::string> row{formatDate(p.start), formatDate(p.end)};
        for (auto& [name, value] : metricRows(computeHierarchyMetrics(sel, s.draws, randomisations, seed, nThreads)))
            row.push_back(std::move(value));
        t.rows.push_back(std::move(row));
    }
    return t;
}

ExportTable discordanceByMonthTable(const Colony& colony, const ResidenceIndex& where, const SelectionOptions& selection,
                                    const EloSettings& elo, int maturityYears)
{
    ExportTable t{"discordance_by_month",
                  {"method", "period_start", "period_end", "ranked", "observed", "comparable", "discordant",
                   "conformity", "tau_b"},
                  {}};
    InheritanceOptions o;
    o.group = selection.group;
    o.maturityYears = maturityYears;
    o.elo = elo;
    o.elo.draws = selection.draws;
    const Matrilines lines(colony);
    const ConformitySeries series = monthlyConformity(colony, where, lines, o);
    auto add = [&](const char* method, const std::vector<ConformityPoint>& points) {
        for (const ConformityPoint& p : points) {
            if ((selection.from && p.periodEnd < *selection.from) || (selection.to && p.periodStart > *selection.to))
                continue;
            t.rows.push_back({method, formatDate(p.periodStart), formatDate(p.periodEnd), std::to_string(p.ranked),
                              std::to_string(p.observed), std::to_string(p.comparable), std::to_string(p.discordant),
                              formatNumber(p.conformity), formatNumber(p.tauB)});
        }
    };
    add("elo", series.elo);
    add("ds", series.davidsScore);
    return t;
}

ExportTable maternalRankTable(const std::vector<MaternalRankRow>& births)
{
    ExportTable t{"maternal_ranks",
                  {"offspring", "mother", "sex", "birth_date", "conception_date", "mother_rank_at_conception",
                   "ranked_females_at_conception", "relative_rank_at_conception", "mother_rank_at_birth",
                   "ranked_females_at_birth", "relative_rank_at_birth", "used", "left_out_reason"},
                  {}};
    for (const MaternalRankRow& b : births) {
        const bool used = b.exclusion == BirthExclusion::None;
        t.rows.push_back({b.offspring, b.mother, toString(b.sex), formatDate(b.birth), formatDate(b.atConception.day),
                          cellOf(b.atConception.rank), cellOf(b.atConception.rankedFemales),
                          formatNumber(b.atConception.relativeRank), cellOf(b.atBirth.rank),
                          cellOf(b.atBirth.rankedFemales), formatNumber(b.atBirth.relativeRank), used ? "1" : "0",
                          toString(b.exclusion)});
    }
    return t;
}

ExportTable sexRatioTable(const SexRatioAnalysis& analysis)
{
    ExportTable t{"sex_ratio", {"metric", "value"}, {}};
    for (auto& [name, value] : sexRatioRows(analysis)) t.rows.push_back({name, value});
    return t;
}

ExportTable rankThirdsTable(const SexRatioAnalysis& analysis)
{
    ExportTable t{"sex_ratio_by_rank_third",
                  {"third", "relative_rank_from", "relative_rank_to", "births", "sons", "proportion_sons",
                   "wilson_low", "wilson_high"},
                  {}};
    for (const RankThird& r : analysis.thirds)
        t.rows.push_back({r.name, formatNumber(r.lower), formatNumber(r.upper), std::to_string(r.births),
                          std::to_string(r.sons), formatNumber(r.proportion), formatNumber(r.low),
                          formatNumber(r.high)});
    return t;
}

std::vector<CalendarPeriod> selectionPeriods(const Colony& colony, const ResidenceIndex& where,
                                             const SelectionOptions& selection, PeriodLength every)
{
    const EncounterSelection s = selectEncounters(colony, where, selection);
    const std::optional<Day> from = selection.from ? selection.from : s.firstDay;
    const std::optional<Day> to = selection.to ? selection.to : s.lastDay;
    if (!from || !to || *from > *to) return {};
    return periodsCovering(*from, *to, every);
}

void appendHealthColumns(ExportTable& t, const Colony& colony, const SelectionOptions& selection, RankMethod method,
                         const std::vector<CalendarPeriod>& periods, int minEncounters)
{
    const bool cumulative = rankMethodInfo(method).takesStartRule; // Elo runs on over the selection
    // Regular periods follow each other: one pass; custom windows may overlap: one count each.
    bool ordered = true;
    for (size_t k = 1; k < periods.size(); ++k) ordered = ordered && periods[k - 1].end < periods[k].start;
    std::vector<std::map<std::string, RankFlag>> flags;
    if (ordered) {
        flags = periodRankFlags(colony, periods, selection.from, selection.group, minEncounters, cumulative);
    } else {
        for (const CalendarPeriod& p : periods)
            flags.push_back(rankFlags(colony, cumulative ? selection.from : std::optional<Day>(p.start), p.end,
                                      selection.group, minEncounters));
    }
    std::map<std::pair<std::string, std::string>, size_t> index;
    for (size_t k = 0; k < periods.size(); ++k) index.emplace(std::pair{formatDate(periods[k].start), formatDate(periods[k].end)}, k);
    t.header.push_back("encounters");
    t.header.push_back("few_encounters");
    for (std::vector<std::string>& row : t.rows) {
        int n = 0;
        if (const auto k = index.find({row[0], row[1]}); k != index.end()) {
            const auto& m = flags[k->second];
            if (const auto it = m.find(row[2]); it != m.end()) n = it->second.encounters;
        }
        row.push_back(std::to_string(n));
        row.push_back(tooFewEncounters(n, minEncounters) ? "yes" : "no");
    }
}

std::vector<ExportTable> researchTables(const Colony& colony, const ResidenceIndex& where,
                                        const ResearchExportOptions& o)
{
    std::vector<ExportTable> out;
    std::vector<CalendarPeriod> periods;
    if (!o.windows.empty()) {
        periods = o.windows;
        out.push_back(rankTableByWindows(colony, where, o.selection, o.ranks, periods));
    } else if (o.every) {
        periods = selectionPeriods(colony, where, o.selection, *o.every);
        out.push_back(rankTableByPeriod(colony, where, o.selection, o.ranks, *o.every));
    } else {
        // The whole window as one period.
        const EncounterSelection s = selectEncounters(colony, where, o.selection);
        const std::optional<Day> from = o.selection.from ? o.selection.from : s.firstDay;
        const std::optional<Day> to = o.selection.to ? o.selection.to : s.lastDay;
        if (from && to && *from <= *to) periods.push_back({*from, *to});
        out.push_back(rankTableByWindows(colony, where, o.selection, o.ranks, periods));
    }
    if (o.healthMinEncounters)
        appendHealthColumns(out.back(), colony, o.selection, o.ranks.method, periods, *o.healthMinEncounters);
    out.push_back(winMatrixTable(colony, where, o.selection, o.ranks.method, o.ranks.elo));
    out.push_back(metricsByPeriodTable(colony, where, o.selection, periods, o.randomisations, o.seed, o.threads));
    MaternalRankOptions m;
    m.from = o.selection.from;
    m.to = o.selection.to;
    m.group = o.selection.group;
    m.gestationDays = o.gestationDays;
    m.maturityYears = o.maturityYears;
    m.elo = o.ranks.elo;
    m.elo.draws = o.selection.draws;
    const std::vector<MaternalRankRow> births = computeMaternalRanks(colony, where, m);
    const SexRatioAnalysis analysis = analyseSexRatio(births);
    out.push_back(maternalRankTable(births));
    out.push_back(sexRatioTable(analysis));
    out.push_back(rankThirdsTable(analysis));
    out.push_back(discordanceByMonthTable(colony, where, o.selection, o.ranks.elo, o.maturityYears));
    // Rank dynamics (docs/methods.md): Elo ranks with the chosen start rule, changes per period of
    // --every (months when the export has custom windows or one period), and the models' foresight.
    RankOptions elo = o.ranks;
    elo.method = RankMethod::Elo;
    elo.optimiseK = false;
    elo.randomise = 0;
    const PeriodLength changeEvery = o.every && o.windows.empty() ? *o.every : PeriodLength::Month;
    out.push_back(rankChangesTable(rankChangesByPeriod(colony, where, o.selection, elo, changeEvery), elo.startRule));
    ForesightOptions f;
    f.rule = o.foresightRule;
    f.maturityYears = o.maturityYears;
    f.elo = o.ranks.elo;
    out.push_back(foresightTable(computeForesight(colony, where, o.selection, f)));
    // The kin-support tables only for a record that has supporters, so older exports keep their files.
    if (hasSupporters(colony.encounters)) {
        SupportOptions so;
        so.group = o.selection.group;
        so.from = o.selection.from;
        so.to = o.selection.to;
        so.iterations = o.randomisations;
        so.seed = o.seed;
        so.threads = o.threads == 0 ? defaultThreadCount() : o.threads;
        so.maturityYears = o.maturityYears;
        so.elo = o.ranks.elo;
        so.elo.draws = o.selection.draws;
        const SupportAnalysis support = analyseSupport(colony, where, so);
        out.push_back(supportPairsTable(support));
        out.push_back(supportSummaryTable(support));
        out.push_back(supportDaughtersTable(support));
        out.push_back(supportMatrixTable(support));
    }
    return out;
}

bool isPlainNumber(std::string_view cell)
{
    if (cell.empty()) return false;
    double v = 0;
    const auto [end, ec] = std::from_chars(cell.data(), cell.data() + cell.size(), v);
    return ec == std::errc() && end == cell.data() + cell.size() && std::isfinite(v);
}

std::string neutraliseFormula(std::string_view cell)
{
    if (cell.empty() || isPlainNumber(cell)) return std::string(cell);
    switch (cell.front()) {
    case '=':
    case '+':
    case '-':
    case '@':
    case '\t':
    case '\r': return "'" + std::string(cell);
    default: return std::string(cell);
    }
}

std::string tableCsv(const ExportTable& table, bool neutralise)
{
    std::ostringstream out;
    CsvWriter w(out);
    auto write = [&](const std::vector<std::string>& cells) {
        if (!neutralise) {
            w.writeRow(cells);
            return;
        }
        std::vector<std::string> safe;
        safe.reserve(cells.size());
        for (const std::string& c : cells) safe.push_back(neutraliseFormula(c));
        w.writeRow(safe);
    };
    write(table.header);
    for (const auto& row : table.rows) write(row);
    return out.str();
}

void writeTableSet(const std::vector<ExportTable>& tables, const std::string& dir, bool spreadsheet)
{
    std::error_code ec;
    std::filesystem::create_directories(dir, ec);
    if (ec) throw std::runtime_error("cannot create the folder " + dir + ": " + ec.message());
    for (const ExportTable& t : tables) {
        const std::string bom = spreadsheet ? "\xEF\xBB\xBF" : "";
        writeFileAtomically(std::filesystem::path(dir) / (t.name + ".csv"), bom + tableCsv(t, true));
    }
}

} // namespace hierloom::core
