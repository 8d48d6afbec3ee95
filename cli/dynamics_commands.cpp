// SPDX-License-Identifier: GPL-3.0-or-later
// dynamics: active and passive rank changes per period and the foresight of the
// inheritance rule, plain Elo and rule-informed Elo (docs/methods.md).
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/commands.h"

#include "core/base/number_format.h"
#include "core/research/dynamics_tables.h"

#include <CLI/CLI.hpp>

#include <ostream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

struct DynamicsOptions {
    std::string colony;
    WindowOptions window;
    AnalysisOverrides analysis;
    std::string every = "month";
    std::string rule = "youngest";
    std::string foresightFile;
    std::string encountersFile;
};

void runDynamics(CommandContext& ctx, const DynamicsOptions& o)
{
    // Only the window's encounters (a group's scope, its dates): both tables
    // select from them (selectEncounters), as `ranks` does.
    const LoadedColony loaded = loadColony(ctx, o.colony, scopeOf(o.window));
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.window.draws);
    const SelectionOptions sel = withDefaultWindow(selectionOf(o.window, loaded), settings, loaded);
    reportAnalysisSettings(ctx, "dynamics", settings, &o.analysis, o.window.draws);
    RankOptions ranks;
    ranks.elo = settings.elo;
    ranks.startRule = settings.startRule;
    const ExportTable changes = rankChangesTable(
        rankChangesByPeriod(loaded.colony, loaded.where, sel, ranks, *parsePeriodLength(o.every)), settings.startRule);

    ForesightOptions f;
    f.rule = *parseSiblingRule(o.rule);
    f.maturityYears = settings.maturityYears;
    f.elo = settings.elo;
    const Foresight foresight = computeForesight(loaded.colony, loaded.where, sel, f);
    ctx.err << "dynamics: rank changes of Elo ranks (start rule " << toString(settings.startRule) << ") per "
            << o.every << "; foresight with the " << o.rule << " rule: win probability "
            << (foresight.ruleWinProbability ? formatNumber(*foresight.ruleWinProbability) : std::string("-"))
            << " fitted on " << foresight.comparable << " comparable of " << foresight.encounters.size()
            << " decided encounters\n";
    for (const ForesightRow& r : foresight.rows)
        if (!r.year)
            ctx.err << "dynamics: " << toString(r.model) << ": log-likelihood "
                    << (r.score.encounters > 0 ? formatNumber(r.score.logLikelihood) : std::string("-")) << ", Brier "
                    << formatNumber(r.score.brier) << ", winners predicted " << r.score.predicted << " of "
                    << r.score.encounters << "\n";
    // The side files first, all or nothing, so a failure leaves standard output untouched.
    passCheck(ctx);
    std::vector<std::pair<std::string, std::string>> side;
    if (!o.foresightFile.empty()) side.emplace_back(o.foresightFile, tableCsv(foresightTable(foresight), false));
    if (!o.encountersFile.empty())
        side.emplace_back(o.encountersFile, tableCsv(foresightEncountersTable(foresight), false));
    if (!ctx.outFile.empty()) {
        side.emplace_back(ctx.outFile, tableCsv(changes, false));
        writeFilesTogether(side);
        return;
    }
    if (!side.empty()) writeFilesTogether(side);
    emit(ctx, tableCsv(changes, false));
}

} // namespace

void addDynamicsCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("dynamics", "active and passive rank changes per period, and how well the "
                                               "inheritance rule, Elo and rule-informed Elo foresaw each encounter");
    cmd->footer("Rank changes: between the Elo ranks at consecutive period ends, the active part (order among the\n"
                "animals ranked at both ends) and the passive part (animals above that left or entered); active +\n"
                "passive = total. Foresight: the chance each model gave every decided encounter's winner beforehand.");
    auto o = std::make_shared<DynamicsOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    addWindowOptions(*cmd, o->window);
    cmd->add_option("--every", o->every, "period of the rank changes: month or year (default: month)")
        ->check(CLI::IsMember({"month", "year"}));
    addEloOptions(*cmd, o->analysis, "Elo: ");
    addStartRuleOption(*cmd, o->analysis, "rank changes: ");
    cmd->add_option("--rule", o->rule,
                    "sibling rule of the foresight's rule and rule-informed Elo models: youngest or eldest "
                    "(default: youngest)")
        ->check(CLI::IsMember({"youngest", "eldest"}));
    addMaturityOption(*cmd, o->analysis);
    cmd->add_option("--foresight", o->foresightFile,
                    "also write the foresight per model and year (and the whole window) to this CSV file");
    cmd->add_option("--encounters", o->encountersFile,
                    "also write every decided encounter with each model's chance for its winner to this CSV file");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runDynamics(ctx, *o); }; });
}

} // namespace hierloom::cli
