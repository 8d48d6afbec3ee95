// SPDX-License-Identifier: GPL-3.0-or-later
// sex-ratio, maternal-ranks and export-tables: maternal rank against offspring
// sex (Trivers & Willard 1973) and the research tables, through the same core
// table functions the desktop program shows.
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/code_help.h"
#include "cli/commands.h"

#include "core/store/colony_store.h"
#include "core/research/data_health.h"
#include "core/research/export_tables.h"
#include "core/research/maternal_rank.h"
#include "core/ranks/rank_method_registry.h"
#include "core/base/number_format.h"
#include "core/research/sex_ratio_analysis.h"
#include "core/research/species_profile.h"
#include "core/store/species_settings.h"

#include <CLI/CLI.hpp>

#include <map>
#include <memory>
#include <ostream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

/// Options shared by sex-ratio and maternal-ranks.
struct BirthOptions {
    std::string colony;
    WindowOptions window;
    std::string species;
    int gestationDays = 0; // 0: the colony's setting
    int maturityYears = -1; // -1: the colony's setting
    AnalysisOverrides analysis; // Elo of the mothers' ranks
};

void addBirthOptions(CLI::App& cmd, BirthOptions& o, bool exportWindow = false)
{
    cmd.add_option("COLONY_FILE", o.colony, "the colony file")->required();
    const std::string also = exportWindow ? " and first day of the encounter window" : "";
    cmd.add_option("--from", o.window.from, "first birth date counted" + also + ", YYYY-MM-DD (default: all)");
    cmd.add_option("--to", o.window.to, "last birth date counted" + (exportWindow ? std::string(" and last day of the encounter window") : std::string()) + ", YYYY-MM-DD (default: all)");
    cmd.add_option("--group", o.window.group,
                   "births in this social group, mothers ranked among its females (default: every group)");
    addDrawsOption(cmd, o.window.draws);
    addEloOptions(cmd, o.analysis, "Elo of the mothers' ranks: ");
    std::string keys;
    for (const SpeciesProfile& p : knownSpecies()) keys += (keys.empty() ? "" : ", ") + p.key;
    cmd.add_option("--species", o.species, "species whose defaults apply for this run: " + keys +
                                               " (default: the colony's setting, else rhesus_macaque)");
    cmd.add_option("--gestation-days", o.gestationDays,
                   "gestation length in days (default: the colony's setting, else the species default)")
        ->check(CLI::Range(1, 1000));
    cmd.add_option("--maturity-years", o.maturityYears,
                   "age in whole years from which females are ranked (default: the colony's setting, else the "
                   "species default)")
        ->check(CLI::Range(0, 50));
}

/// The colony's species settings with this run's overrides.
SpeciesSettings speciesFor(const BirthOptions& o)
{
    const ColonyStore store = ColonyStore::open(o.colony, ColonyStore::Mode::ReadOnly);
    const std::string stored = store.setting(kSpeciesSettingKey);
    try {
        // A species chosen for this run brings its own defaults, not the file's overrides.
        SpeciesSettings s = o.species.empty() ? readSpeciesSettings(store) : resolveSpeciesSettings(o.species, "", "");
        if (o.gestationDays > 0) {
            s.gestationDays = o.gestationDays;
            s.gestationOverridden = true;
        }
        if (o.maturityYears >= 0) {
            s.maturityYears = o.maturityYears;
            s.maturityOverridden = true;
        }
        return s;
    } catch (const std::invalid_argument& e) {
        throw BadInputError(std::string(o.species.empty() ? "the colony's species setting: " : "--species: ") +
                            e.what());
    }
}

/// The colony's analysis settings with this run's overrides; the maturity age is the species settings' one.
AnalysisSettings birthSettings(CommandContext& ctx, const char* command, const BirthOptions& o,
                               const LoadedColony& loaded, const SpeciesSettings& species)
{
    AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.window.draws);
    settings.maturityYears = species.maturityYears;
    reportAnalysisSettings(ctx, command, settings, &o.analysis, o.window.draws);
    return settings;
}

MaternalRankOptions maternalOptions(const BirthOptions& o, const LoadedColony& loaded, const SpeciesSettings& s,
                                    const AnalysisSettings& settings)
{
    const SelectionOptions sel = selectionOf(o.window, loaded); // checks dates and group
    MaternalRankOptions m;
    m.from = sel.from;
    m.to = sel.to;
    m.group = sel.group;
    m.gestationDays = s.gestationDays;
    m.maturityYears = s.maturityYears;
    m.elo = settings.elo;
    return m;
}

void reportSettings(CommandContext& ctx, const char* command, const SpeciesSettings& s)
{
    ctx.err << command << ": species " << s.species << ", gestation " << s.gestationDays << " days"
            << (s.gestationOverridden ? "" : " (species default)") << ", maturity " << s.maturityYears << " years"
            << (s.maturityOverridden ? "" : " (species default)") << "\n";
}

/// Says from which day births are counted and what is not a birth.
void reportBirthCounting(CommandContext& ctx, const char* command, const LoadedColony& loaded,
                         const MaternalRankOptions& m)
{
    const BirthCounting c = countNonBirths(loaded.colony, loaded.where, m);
    if (!c.recordStart) return;
    ctx.err << command << ": births counted from the record's first encounter, " << formatDate(*c.recordStart)
            << "; not counted as births: " << c.founders << " founders, " << c.bornBefore
            << " animals born before then\n";
}

/// Clear messages for the cases in which figures are left empty.
void reportSexRatio(CommandContext& ctx, const std::vector<MaternalRankRow>& births, const SexRatioAnalysis& a)
{
    if (births.empty()) {
        ctx.err << "sex-ratio: no births in this window; every figure is empty\n";
        return;
    }
    if (a.birthsLeftOut > 0) {
        std::map<std::string, int> reasons;
        for (const MaternalRankRow& b : births)
            if (b.exclusion != BirthExclusion::None)
                ++reasons[b.conceivedBeforeRecord ? std::string("conceived before the record began")
                                                  : std::string(describe(b.exclusion))];
        ctx.err << "sex-ratio: " << a.birthsLeftOut << " of " << births.size() << " births left out";
        for (const auto& [why, n] : reasons) ctx.err << "; " << n << ": " << why;
        ctx.err << " (--births FILE lists each birth and its reason)\n";
    }
    if (a.birthsUsed == 0) {
        ctx.err << "sex-ratio: no birth could be used; every figure is empty\n";
        return;
    }
    if (!a.fit.slope) {
        if (a.sons == 0 || a.daughters == 0)
            ctx.err << "sex-ratio: the offspring are all of one sex; the logistic regression is undefined\n";
        else
            ctx.err << "sex-ratio: the logistic regression is undefined (fewer than two births, one maternal rank "
                       "only, or complete separation)\n";
    }
}

void runSexRatio(CommandContext& ctx, const BirthOptions& o, const std::string& birthsFile,
                 const std::string& thirdsFile)
{
    const SpeciesSettings species = speciesFor(o);
    const LoadedColony loaded = loadColony(ctx, o.colony);
    const AnalysisSettings settings = birthSettings(ctx, "sex-ratio", o, loaded, species);
    const MaternalRankOptions m = maternalOptions(o, loaded, species, settings);
    const std::vector<MaternalRankRow> births = computeMaternalRanks(loaded.colony, loaded.where, m);
    const SexRatioAnalysis a = analyseSexRatio(births);
    reportSettings(ctx, "sex-ratio", species);
    reportBirthCounting(ctx, "sex-ratio", loaded, m);
    reportSexRatio(ctx, births, a);
    // The side files first, so a failure leaves standard output untouched.
    auto side = [&](const std::string& path, const ExportTable& t, const char* option) {
        if (path.empty()) return;
        CommandContext file{ctx.out, ctx.err, path, ctx.checked};
        try {
            emit(file, tableCsv(t, false));
        } catch (const BadInputError&) {
            throw BadInputError(std::string(option) + ": cannot write " + path);
        }
    };
    side(birthsFile, maternalRankTable(births), "--births");
    side(thirdsFile, rankThirdsTable(a), "--thirds");
    emit(ctx, tableCsv(sexRatioTable(a), false));
}

void runMaternalRanks(CommandContext& ctx, const BirthOptions& o)
{
    const SpeciesSettings species = speciesFor(o);
    const LoadedColony loaded = loadColony(ctx, o.colony);
    const AnalysisSettings settings = birthSettings(ctx, "maternal-ranks", o, loaded, species);
    const MaternalRankOptions m = maternalOptions(o, loaded, species, settings);
    const std::vector<MaternalRankRow> births = computeMaternalRanks(loaded.colony, loaded.where, m);
    reportSettings(ctx, "maternal-ranks", species);
    reportBirthCounting(ctx, "maternal-ranks", loaded, m);
    if (births.empty()) ctx.err << "maternal-ranks: no births in this window\n";
    emit(ctx, tableCsv(maternalRankTable(births), false));
}

struct ExportTablesOptions {
    BirthOptions births;
    std::string dir;
    std::string every;
    std::vector<std::string> windows;
    std::string method = "elo";
    int randomisations = 0;
    std::uint64_t seed = 1;
    unsigned threads = 0;
    bool spreadsheet = false;
    bool health = false;
    int minEncounters = kDefaultMinEncounters;
};

CalendarPeriod parseWindow(const std::string& text)
{
    const auto comma = text.find(',');
    const auto from = comma == std::string::npos ? std::nullopt : parseDate(text.substr(0, comma));
    const auto to = comma == std::string::npos ? std::nullopt : parseDate(text.substr(comma + 1));
    if (!from || !to || *from > *to)
        throw BadInputError("--window: '" + text + "' is not FROM,TO with two dates YYYY-MM-DD, FROM not after TO");
    return {*from, *to};
}

void runExportTables(CommandContext& ctx, const ExportTablesOptions& o)
{
    if (!o.every.empty() && !o.windows.empty()) throw BadInputError("--every and --window cannot be combined");
    const SpeciesSettings species = speciesFor(o.births);
    const LoadedColony loaded = loadColony(ctx, o.births.colony);
    const AnalysisSettings settings = birthSettings(ctx, "export-tables", o.births, loaded, species);
    ResearchExportOptions r;
    r.selection = selectionOf(o.births.window, loaded);
    r.ranks.method = *parseRankMethod(o.method);
    r.ranks.elo = settings.elo;
    if (r.ranks.method == RankMethod::Elo) r.ranks.startRule = settings.startRule;
    if (settings.startRule == EloStartRule::Eldest) r.foresightRule = SiblingRule::Eldest;
    if (!o.every.empty()) r.every = parsePeriodLength(o.every);
    for (const std::string& w : o.windows) r.windows.push_back(parseWindow(w));
    r.randomisations = o.randomisations;
    r.seed = o.seed;
    r.threads = o.threads;
    r.gestationDays = species.gestationDays;
    r.maturityYears = species.maturityYears;
    if (o.health) r.healthMinEncounters = o.minEncounters;
    reportSettings(ctx, "export-tables", species);
    const std::vector<ExportTable> tables = researchTables(loaded.colony, loaded.where, r);
    passCheck(ctx);
    try {
        writeTableSet(tables, o.dir, o.spreadsheet);
    } catch (const std::runtime_error& e) {
        throw BadInputError(std::string("--dir: ") + e.what());
    }
    for (const ExportTable& t : tables)
        ctx.err << "export-tables: wrote " << t.name << ".csv (" << t.rows.size() << " rows)\n";
}

} // namespace

void addSexRatioCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("sex-ratio", "maternal rank at conception against offspring sex");
    cmd->footer("Trivers & Willard (1973): logistic regression of male offspring on the mother's relative Elo rank\n"
                "at conception, Fisher's exact test on high against low mothers, sons per rank third.\n"
                "Births are counted from the record's first encounter; founders are not births.\n" +
                codesHelp(CodeKind::Metric, sexRatioCodes()) + codesHelp(CodeKind::Reason, reasonCodes()));
    auto o = std::make_shared<BirthOptions>();
    auto births = std::make_shared<std::string>();
    auto thirds = std::make_shared<std::string>();
    addBirthOptions(*cmd, *o);
    cmd->add_option("--births", *births, "also write every birth, used or left out with its reason, to this CSV file");
    cmd->add_option("--thirds", *thirds,
                    "also write the proportion of sons with Wilson 95 % intervals per maternal rank third to this file");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o, births, thirds] {
        action = [&ctx, o, births, thirds] { runSexRatio(ctx, *o, *births, *thirds); };
    });
}

void addMaternalRanksCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("maternal-ranks", "every birth with the mother's rank at conception and at birth");
    cmd->footer("Births are counted from the record's first encounter; founders are not births.\n" +
                codesHelp(CodeKind::Reason, reasonCodes()));
    auto o = std::make_shared<BirthOptions>();
    addBirthOptions(*cmd, *o);
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runMaternalRanks(ctx, *o); }; });
}

void addExportTablesCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("export-tables", "write the research tables as CSV files into a folder");
    cmd->footer("Tables: ranks by period, win matrix, metrics by period, maternal ranks, sex ratio, discordance\n"
                "by month, rank changes (active and passive) and foresight; with supporters in the record also the kin-support tables of `support`. In the files, "
                "text cells starting with = + - @ get a leading ' so a spreadsheet cannot run them.");
    auto o = std::make_shared<ExportTablesOptions>();
    addBirthOptions(*cmd, o->births, true);
    addStartRuleOption(*cmd, o->births.analysis, "ranks_by_period and rank_changes (elo): ");
    cmd->add_option("--dir", o->dir, "folder to write the tables into (created if missing)")->required();
    cmd->add_option("--every", o->every, "periods of the rank and metrics tables: day, week, month or year "
                                         "(default: the whole window as one period)")
        ->check(CLI::IsMember({"day", "week", "month", "year"}));
    cmd->add_option("--window", o->windows, "a custom period FROM,TO (repeat for several)");
    cmd->add_option("--method", o->method,
                    "rank method: " + rankMethodChoicesText() + " (default: " + rankMethods().front().code + ")")
        ->check(CLI::IsMember(rankMethodCodes()));
    cmd->add_option("--randomisations", o->randomisations,
                    "iterations of each test in the metrics table (default: 0, tests skipped and their p empty)")
        ->check(CLI::Range(0, 10000000));
    cmd->add_option("--seed", o->seed, "seed of the randomisation tests (default: 1)");
    cmd->add_option("--threads", o->threads, "threads for randomisations (default: every core)");
    cmd->add_flag("--spreadsheet", o->spreadsheet,
                  "start each file with a UTF-8 byte-order mark so spreadsheet programs read names correctly");
    cmd->add_flag("--health", o->health,
                  "end ranks_by_period with the data-health columns encounters and few_encounters");
    cmd->add_option("--min-encounters", o->minEncounters,
                    "with --health: flag animals with fewer encounters than this behind their rank (default: 10)")
        ->check(CLI::Range(0, 1000000));
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runExportTables(ctx, *o); }; });
}

} // namespace hierloom::cli
