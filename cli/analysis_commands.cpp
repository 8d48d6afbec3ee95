// SPDX-License-Identifier: GPL-3.0-or-later
// ranks, matrix and metrics: the hierarchy figures of docs/methods.md as CSV.
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/code_help.h"
#include "cli/commands.h"

#include "core/ranks/compact_selection.h"
#include "core/ranks/hierarchy_metrics.h"
#include "core/base/number_format.h"
#include "core/ranks/parallel_randomisation.h"
#include "core/ranks/rank_method_registry.h"
#include "core/ranks/rank_table.h"
#include "core/ranks/win_matrix.h"
#include "core/research/data_health.h"

#include <CLI/CLI.hpp>

#include <map>
#include <ostream>
#include <sstream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

struct RanksOptions {
    std::string colony;
    WindowOptions window;
    std::string method = "elo";
    std::string at;
    AnalysisOverrides analysis;
    bool optimiseK = false;
    int randomise = 0;
    std::uint64_t seed = 1;
    bool corrected = false;
    std::string every;
    unsigned threads = 0;
    int minEncounters = kDefaultMinEncounters;
    bool health = false;
};

void runRanks(CommandContext& ctx, const RanksOptions& o)
{
    // Compact records (core/base/compact_encounters.h): every rank method works on the selection's bouts.
    const LoadedColony loaded = loadCompactColony(ctx, o.colony, scopeOf(o.window));
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.window.draws);
    const SelectionOptions sel = withDefaultWindow(selectionOf(o.window, loaded), settings, loaded);
    auto selected = [&] { return selectEncounters(loaded.compact, loaded.colony.animals, loaded.where, sel); };
    reportAnalysisSettings(ctx, "ranks", settings, &o.analysis, o.window.draws);
    RankOptions r;
    r.method = *parseRankMethod(o.method);
    r.elo = settings.elo;
    const bool takesRule = rankMethodInfo(r.method).takesStartRule;
    r.startRule = takesRule ? settings.startRule : EloStartRule::None;
    r.at = optionDate(o.at, "--at");
    r.optimiseK = o.optimiseK;
    r.randomise = o.randomise;
    r.seed = o.seed;
    r.correctedDs = o.corrected;
    r.threads = o.threads;
    if (r.method != RankMethod::Elo && (r.at || o.optimiseK || o.randomise > 0))
        throw BadInputError("--at, --optimise-k and --randomise go with --method elo");
    if (r.method != RankMethod::DavidsScore && o.corrected) throw BadInputError("--corrected goes with --method ds");
    if (!takesRule && !o.analysis.startRule.empty()) throw BadInputError("--start-rule goes with --method elo");
    if (r.startRule != EloStartRule::None && (o.optimiseK || o.randomise > 0))
        throw BadInputError(std::string("the start rule ") + toString(r.startRule) +
                            " cannot be combined with --optimise-k or --randomise (--start-rule none switches it off)");
    // Elo tables end with the start rule used (docs/file-formats.md); the other methods keep their columns.
    const bool elo = takesRule;
    const std::string ruleCell = std::string(",") + toString(r.startRule);
    std::ostringstream out;
    if (!o.every.empty()) {
        if (r.at || o.randomise > 0) throw BadInputError("--every cannot be combined with --at or --randomise");
        out << "period_start,period_end,animal,rank,score" << (elo ? ",start_rule" : "")
            << (o.health ? ",encounters,few_encounters" : "") << "\n";
        const std::vector<PeriodRankRow> rows =
            computeRanksByPeriod(selected(), loaded.colony, loaded.where, sel, r, *parsePeriodLength(o.every));
        // Data health per period (docs/methods.md, "Data health"): the encounters each row's
        // score rests on: Elo runs on from the window's start, the other methods use the period alone.
        std::vector<CalendarPeriod> periods;
        for (const PeriodRankRow& p : rows)
            if (periods.empty() || periods.back().start != p.period.start) periods.push_back(p.period);
        const auto flags = periodRankFlags(loaded.compact, periods, sel.from, sel.group, o.minEncounters, elo);
        size_t k = 0;
        int flagged = 0;
        for (const PeriodRankRow& p : rows) {
            while (periods[k].start != p.period.start) ++k;
            out << formatDate(p.period.start) << ',' << formatDate(p.period.end) << ',' << csvField(p.row.animal) << ','
                << p.row.rank << ',' << formatNumber(p.row.score) << (elo ? ruleCell : "");
            const auto it = flags[k].find(p.row.animal);
            const RankFlag flag = it != flags[k].end() ? it->second : RankFlag{0, tooFewEncounters(0, o.minEncounters), {}};
            flagged += flag.fewEncounters;
            if (o.health) out << ',' << flag.encounters << ',' << (flag.fewEncounters ? "yes" : "no");
            out << '\n';
        }
        if (flagged > 0)
            ctx.err << "ranks: " << flagged << " of " << rows.size() << " rows rank an animal with fewer than "
                    << o.minEncounters << " encounters behind it: those ranks are not stable (--health lists them)\n";
        emit(ctx, out.str());
        return;
    }
    const RankTable table = computeRanks(selected(), loaded.colony, loaded.where, sel, r);
    if (table.rows.empty()) ctx.err << "hierloom-cli: no animal could be ranked in this window\n";
    if (r.method == RankMethod::Elo && table.kUsed)
        ctx.err << "elo: k = " << formatNumber(*table.kUsed) << (o.optimiseK ? " (optimised)" : "")
                << ", start rule " << toString(r.startRule)
                << ", ranked among animals resident on " << (table.rankedOn ? formatDate(*table.rankedOn) : "-") << "\n";
    // Data health (docs/methods.md, "Data health"): the encounters behind each
    // rank and a flag below the threshold, added after the original columns.
    const std::map<std::string, RankFlag> flags = rankFlags(loaded.compact, sel.from, sel.to, sel.group, o.minEncounters);
    out << "animal,rank,score";
    if (o.randomise > 0) out << ",rating_low,rating_high,mean_rank";
    if (elo) out << ",start_rule";
    if (o.health) out << ",encounters,few_encounters";
    if (o.health && o.randomise > 0) out << ",interval_width";
    out << '\n';
    int flagged = 0;
    for (const RankRow& row : table.rows) {
        out << csvField(row.animal) << ',' << row.rank << ',' << formatNumber(row.score);
        if (o.randomise > 0)
            out << ',' << formatNumber(row.low) << ',' << formatNumber(row.high) << ',' << formatNumber(row.meanRank);
        if (elo) out << ruleCell;
        const auto it = flags.find(row.animal);
        const int n = it != flags.end() ? it->second.encounters : 0;
        const bool few = tooFewEncounters(n, o.minEncounters);
        flagged += few;
        if (o.health) out << ',' << n << ',' << (few ? "yes" : "no");
        if (o.health && o.randomise > 0)
            out << ',' << (row.low && row.high ? formatNumber(*row.high - *row.low) : std::string());
        out << '\n';
    }
    if (flagged > 0)
        ctx.err << "ranks: " << flagged << " of " << table.rows.size() << " ranked animals have fewer than "
                << o.minEncounters << " encounters in the window: their ranks are not stable (--health lists them)\n";
    emit(ctx, out.str());
}

} // namespace

void addRanksCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("ranks", "rank the animals by Elo rating, David's score or I&SI");
    auto o = std::make_shared<RanksOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    addWindowOptions(*cmd, o->window);
    cmd->add_option("--method", o->method, rankMethodChoicesText() + " (default: " + rankMethods().front().code + ")")
        ->check(CLI::IsMember(rankMethodCodes()));
    cmd->add_option("--at", o->at, "elo: ratings at this date, ranked among the animals resident that day "
                                      "(default: after the window's last encounter)");
    addEloOptions(*cmd, o->analysis, "elo: ");
    addStartRuleOption(*cmd, o->analysis, "elo: ");
    cmd->add_flag("--optimise-k", o->optimiseK, "elo: use the maximum-likelihood k (Foerster et al. 2016)");
    cmd->add_option("--randomise", o->randomise, "elo: randomised Elo over N random orders (default: off)")
        ->check(CLI::Range(1, 1000000));
    cmd->add_option("--seed", o->seed, "seed of --randomise (default: 1)");
    cmd->add_flag("--corrected", o->corrected, "ds: use the dyadic index corrected for chance (D) instead of P");
    cmd->add_option("--every", o->every, "a long table per day, week, month or year (default: one table for the whole window)")
        ->check(CLI::IsMember({"day", "week", "month", "year"}));
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->add_option("--threads", o->threads, "threads for randomisations (default: every core)");
    cmd->add_option("--min-encounters", o->minEncounters,
                    "flag animals with fewer encounters than this in the window (few_encounters; default: 10)")
        ->check(CLI::Range(0, 1000000));
    cmd->add_flag("--health", o->health,
                  "add the data-health columns encounters and few_encounters (and interval_width with --randomise)");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runRanks(ctx, *o); }; });
}

void addMatrixCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("matrix", "the win matrix (sociomatrix): rows are winners, columns losers");
    struct Options {
        std::string colony;
        WindowOptions window;
        AnalysisOverrides analysis;
        std::string order = rankMethodInfo(kDefaultMatrixOrder).code;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    addWindowOptions(*cmd, o->window);
    std::vector<std::string> orders = rankMethodCodes();
    orders.push_back("id");
    cmd->add_option("--order", o->order,
                    "order of rows and columns: " + rankMethodChoicesText() + ", or id (default: " +
                        rankMethodInfo(kDefaultMatrixOrder).code + ")")
        ->check(CLI::IsMember(orders));
    addEloOptions(*cmd, o->analysis, "--order elo: ");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            // Compact records: the matrix and its order come from the selection's bouts.
            const LoadedColony loaded = loadCompactColony(ctx, o->colony, scopeOf(o->window));
            const AnalysisSettings settings = analysisSettingsOf(loaded, o->analysis, o->window.draws);
            const SelectionOptions sel = withDefaultWindow(selectionOf(o->window, loaded), settings, loaded);
            reportAnalysisSettings(ctx, "matrix", settings, &o->analysis, o->window.draws);
            const EncounterSelection s = selectEncounters(loaded.compact, loaded.colony.animals, loaded.where, sel);
            std::vector<int> order;
            if (o->order == "id") {
                for (int i = 0; i < s.size(); ++i) order.push_back(i);
            } else {
                order = orderByMethod(s, *parseRankMethod(o->order), settings.elo);
            }
            const WinMatrix m = WinMatrix::fromBouts(s.size(), s.bouts, sel.draws);
            std::ostringstream out;
            out << "animal";
            for (int j : order) out << ',' << csvField(s.ids[static_cast<size_t>(j)]);
            out << '\n';
            for (int i : order) {
                out << csvField(s.ids[static_cast<size_t>(i)]);
                for (int j : order) out << ',' << (i == j ? std::string() : formatNumber(m.s(i, j)));
                out << '\n';
            }
            emit(ctx, out.str());
        };
    });
}

void addMetricsCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("metrics", "linearity, steepness, transitivity and other hierarchy figures");
    cmd->footer(codesHelp(core::CodeKind::Metric,
                          {"animals", "encounters", "dyads", "known_dyads", "unknown_share", "landau_h", "h_prime",
                           "h_prime_p", "dci", "steepness", "steepness_p", "ttri", "ttri_p", "elo_k_optimal",
                           "elo_loglik", "seed", "randomisations"}));
    struct Options {
        std::string colony;
        WindowOptions window;
        int randomisations = 10000;
        std::uint64_t seed = 1;
        unsigned threads = 0;
        bool residents = false;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    addWindowOptions(*cmd, o->window);
    cmd->add_option("--randomisations", o->randomisations, "iterations of each randomisation test (default: 10000)")
        ->check(CLI::Range(0, 10000000));
    cmd->add_option("--seed", o->seed, "seed of the randomisation tests (default: 1)");
    cmd->add_option("--threads", o->threads, "threads for randomisations (default: every core)");
    cmd->add_flag("--include-residents", o->residents,
                  "also analyse animals resident in the window without any encounter");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] {
            // Compact records (core/base/compact_encounters.h): the figures need only the selection's bouts.
            const LoadedColony loaded = loadCompactColony(ctx, o->colony, scopeOf(o->window));
            const AnalysisSettings settings = analysisSettingsOf(loaded, {}, o->window.draws);
            SelectionOptions sel = withDefaultWindow(selectionOf(o->window, loaded), settings, loaded);
            reportAnalysisSettings(ctx, "metrics", settings, nullptr, o->window.draws);
            sel.includeResidents = o->residents;
            const EncounterSelection s = selectEncounters(loaded.compact, loaded.colony.animals, loaded.where, sel);
            const unsigned threads = o->threads == 0 ? defaultThreadCount() : o->threads;
            const HierarchyMetrics m = computeHierarchyMetrics(s, sel.draws, o->randomisations, o->seed, threads);
            std::ostringstream out;
            out << "metric,value\n";
            for (const auto& [name, value] : metricRows(m)) out << name << ',' << value << '\n';
            emit(ctx, out.str());
        };
    });
}

} // namespace hierloom::cli
