// SPDX-License-Identifier: GPL-3.0-or-later
// support: kin support over a window (docs/methods.md "Kin support"), the
// tables of core/research/support_tables.h.
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/commands.h"

#include "core/pedigree/inheritance_prediction.h"
#include "core/ranks/parallel_randomisation.h"
#include "core/research/support_tables.h"

#include <CLI/CLI.hpp>

#include <memory>
#include <ostream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

struct SupportCommandOptions {
    std::string colony;
    WindowOptions window;
    AnalysisOverrides analysis;
    std::string rule = "youngest";
    std::string table = "summary";
    int permutations = 1000;
    std::uint64_t seed = 1;
    unsigned threads = 0;
};

void runSupport(CommandContext& ctx, const SupportCommandOptions& o)
{
    // Only the group's encounters (its scope; every date: the Elo behind the
    // mothers' acts and the rank order runs from the start of the record), and
    // the record's last day in any group, which an open window ends on.
    EncounterScope scope;
    scope.group = o.window.group;
    const LoadedColony loaded = loadColony(ctx, o.colony, scope, true);
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.window.draws);
    const SelectionOptions selection = withDefaultWindow(selectionOf(o.window, loaded), settings, loaded);
    reportAnalysisSettings(ctx, "support", settings, &o.analysis, o.window.draws);
    SupportOptions s;
    s.group = selection.group;
    s.from = selection.from;
    // An open window ends on the record's last day, as it did when every
    // encounter was read (the group's scope holds the same rows up to it).
    s.to = selection.to ? selection.to : loaded.lastDay;
    s.iterations = o.permutations;
    s.seed = o.seed;
    s.threads = o.threads == 0 ? defaultThreadCount() : o.threads;
    s.rule = *parseSiblingRule(o.rule);
    s.maturityYears = settings.maturityYears;
    s.elo = settings.elo;
    const SupportAnalysis a = analyseSupport(loaded.colony, loaded.where, s);
    if (a.acts == 0) ctx.err << "support: no supporters recorded in this window; rates are 0 and the index is empty\n";
    else if (!a.nepotismIndex)
        ctx.err << "support: no support among pairs with r < 0.125 (or none of r >= 0.25 present); the index is empty\n";
    const ExportTable table = o.table == "pairs"       ? supportPairsTable(a)
                              : o.table == "daughters" ? supportDaughtersTable(a)
                              : o.table == "matrix"    ? supportMatrixTable(a)
                                                       : supportSummaryTable(a);
    emit(ctx, tableCsv(table, false));
}

} // namespace

void addSupportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("support", "kin support: who joins whose fights, by relatedness");
    cmd->footer("Opportunities, support given and rates per supporter and beneficiary, pooled per kin class\n"
                "(mother, r>=0.5, 0.25<=r<0.5, 0.125<=r<0.25, r<0.125); the nepotism index (rate r>=0.25 over\n"
                "rate r<0.125) with a permutation test, p = (1 + c)/(N + 1); mothers' support against females\n"
                "the inheritance rule puts below the daughter; daughters' rise with their mothers' support.\n"
                "Rank figures elsewhere stay computed on the winner and the loser only.");
    auto o = std::make_shared<SupportCommandOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    addWindowOptions(*cmd, o->window);
    addEloOptions(*cmd, o->analysis, "Elo of the rank order and the prediction: ");
    addMaturityOption(*cmd, o->analysis);
    cmd->add_option("--rule", o->rule, "sibling rule of the prediction: youngest (default) or eldest")
        ->check(CLI::IsMember({"youngest", "eldest"}));
    cmd->add_option("--table", o->table,
                    "table to print: summary (default), pairs, daughters or matrix")
        ->check(CLI::IsMember({"summary", "pairs", "daughters", "matrix"}));
    cmd->add_option("--permutations", o->permutations, "permutations of the index test (default: 1000; 0: no test)")
        ->check(CLI::Range(0, 10000000));
    cmd->add_option("--seed", o->seed, "seed of the permutation test (default: 1)");
    cmd->add_option("--threads", o->threads, "threads for the permutations (default: every core; same result)");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runSupport(ctx, *o); }; });
}

} // namespace hierloom::cli
