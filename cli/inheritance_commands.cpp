// SPDX-License-Identifier: GPL-3.0-or-later
// inherit and scenario: matrilineal rank prediction against observed ranks, and what-if changes.
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/code_help.h"
#include "cli/commands.h"

#include "core/pedigree/discordance.h"
#include "core/pedigree/inheritance_prediction.h"
#include "core/pedigree/matriline.h"
#include "core/base/number_format.h"
#include "core/pedigree/rank_acquisition.h"
#include "core/planning/scenario.h"
#include "core/planning/scenario_file.h"

#include <CLI/CLI.hpp>

#include <ostream>
#include <sstream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

struct InheritOptions {
    std::string colony;
    std::string at;
    std::string rule = "youngest";
    std::string group;
    std::string matrilineOrder;
    std::string draws; // empty: the colony's setting
    AnalysisOverrides analysis;
    bool dyads = false;
    bool monthly = false;
    bool acquisition = false;
};

std::vector<std::string> commaList(const std::string& text)
{
    std::vector<std::string> out;
    std::string cur;
    auto flush = [&] {
        const size_t a = cur.find_first_not_of(" \t"), b = cur.find_last_not_of(" \t");
        if (a != std::string::npos) out.push_back(cur.substr(a, b - a + 1));
        cur.clear();
    };
    for (char c : text) {
        if (c == ',') flush();
        else cur += c;
    }
    flush();
    return out;
}

std::string joined(const std::vector<std::string>& ids)
{
    std::string out;
    for (const std::string& id : ids) out += (out.empty() ? "" : " ") + id;
    return out;
}

std::string rankText(const std::optional<int>& r) { return r ? std::to_string(*r) : std::string(); }

void runInherit(CommandContext& ctx, const InheritOptions& o)
{
    if (o.dyads + o.monthly + o.acquisition > 1) throw BadInputError("choose one of --dyads, --monthly, --acquisition");
    // The encounters of the group (every group without --group) up to --at;
    // without --at the file's last encounter day is the date.
    EncounterScope scope;
    scope.group = o.group;
    if (!o.monthly) scope.to = parseDate(o.at);
    // Compact records (core/base/compact_encounters.h) for every form: the
    // prediction, the monthly series and rank acquisition select from them.
    const LoadedColony loaded = loadCompactColony(ctx, o.colony, scope, !o.monthly && !o.acquisition && o.at.empty());
    WindowOptions window;
    window.group = o.group;
    window.draws = o.draws;
    selectionOf(window, loaded); // checks the group name
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.draws);
    reportAnalysisSettings(ctx, "inherit", settings, &o.analysis, o.draws);
    InheritanceOptions opt;
    opt.at = optionDate(o.at, "--at");
    opt.rule = *parseSiblingRule(o.rule);
    opt.maturityYears = settings.maturityYears;
    opt.group = o.group;
    opt.matrilineOrder = commaList(o.matrilineOrder);
    opt.elo = settings.elo;
    const Matrilines lines(loaded.colony);
    for (const PedigreeProblem& p : lines.problems())
        ctx.err << "hierloom-cli: pedigree: " << p.animal << ": " << p.message << "\n";
    std::ostringstream out;
    if (o.acquisition) {
        out << "daughter,older_sister,mother,first_above,age_years,age_days,above_at_last_comparison\n";
        for (const SisterOvertaking& r : rankAcquisition(loaded.compact, loaded.colony.animals, loaded.where, lines, opt.elo, o.group, opt.at))
            out << csvField(r.daughter) << ',' << csvField(r.olderSister) << ',' << csvField(r.mother) << ','
                << (r.firstAbove ? formatDate(*r.firstAbove) : "") << ',' << rankText(r.ageYears) << ','
                << rankText(r.ageDays) << ',' << (r.compared ? (r.aboveAtLastComparison ? "yes" : "no") : "") << '\n';
        emit(ctx, out.str());
        return;
    }
    if (o.monthly) {
        ConformitySeries series;
        try {
            series = monthlyConformity(loaded.compact, loaded.colony.animals, loaded.where, lines, opt);
        } catch (const std::invalid_argument& e) {
            throw BadInputError(std::string("--matriline-order: ") + e.what());
        }
        out << "method,period_start,period_end,ranked,observed,comparable,discordant,conformity,tau_b\n";
        auto rows = [&](const char* method, const std::vector<ConformityPoint>& points) {
            for (const ConformityPoint& p : points)
                out << method << ',' << formatDate(p.periodStart) << ',' << formatDate(p.periodEnd) << ',' << p.ranked
                    << ',' << p.observed << ',' << p.comparable << ',' << p.discordant << ','
                    << formatNumber(p.conformity) << ',' << formatNumber(p.tauB) << '\n';
        };
        rows("elo", series.elo);
        rows("ds", series.davidsScore);
        emit(ctx, out.str());
        return;
    }
    if (!opt.at) opt.at = loaded.lastDay;
    InheritancePrediction p;
    try {
        p = predictInheritance(loaded.compact, loaded.colony.animals, loaded.where, lines, opt);
    } catch (const std::invalid_argument& e) {
        throw BadInputError(e.what());
    }
    const DiscordanceSummary s = summariseDiscordance(lines, p);
    ctx.err << "inherit: " << formatDate(p.at) << ", rule " << toString(p.rule) << ", maturity " << opt.maturityYears
            << " years: " << s.ranked << " ranked females, " << s.observed << " with an Elo rating; conformity "
            << (s.conformity ? formatNumber(*s.conformity) : "undefined") << " (" << s.discordant << " of "
            << s.comparable << " dyads discordant), tau-b " << (s.tauB ? formatNumber(*s.tauB) : "undefined") << "\n";
    ctx.err << "matriline order: " << joined(p.matrilineOrder) << "\n";
    if (!p.unknownBirthCountedMature.empty())
        ctx.err << "birth date unknown, counted as mature: " << joined(p.unknownBirthCountedMature) << "\n";
    if (!p.unorderable.empty())
        ctx.err << "cannot be ordered among their sisters (birth date unknown), placed as the eldest: "
                << joined(p.unorderable) << "\n";
    if (o.dyads) {
        out << "above,below,category\n";
        for (const DiscordantDyad& d : s.dyads)
            out << csvField(d.above) << ',' << csvField(d.below) << ',' << toString(d.category) << '\n';
    } else {
        out << "animal,matriline,predicted_rank,observed_rank,discordant_dyads\n";
        for (const PredictedFemale& f : p.females)
            out << csvField(f.animal) << ',' << csvField(f.matriarch) << ',' << f.predictedRank << ','
                << rankText(f.observedRank) << ',' << f.discordantDyads << '\n';
    }
    emit(ctx, out.str());
}

void runScenarioCommand(CommandContext& ctx, const std::string& colonyPath, const std::string& file, bool dyads)
{
    const LoadedColony loaded = loadColony(ctx, colonyPath);
    // The colony's settings stand unless the scenario file gives its own (maturity).
    Scenario defaults;
    defaults.maturityYears = loaded.settings.maturityYears;
    defaults.elo = loaded.settings.elo;
    const ScenarioFileResult parsed = readScenarioFile(file, loaded.colony, defaults);
    if (!parsed.scenario) {
        for (const std::string& e : parsed.errors) ctx.err << e << "\n";
        throw BadInputError("the scenario was not run (" + std::to_string(parsed.errors.size()) + " problem" +
                            (parsed.errors.size() == 1 ? "" : "s") + "); nothing was written");
    }
    AnalysisSettings used = loaded.settings;
    used.maturityYears = parsed.scenario->maturityYears;
    reportAnalysisSettings(ctx, "scenario", used, nullptr, {});
    const ScenarioResult r = runScenario(loaded.colony, *parsed.scenario);
    ctx.err << "scenario at " << formatDate(r.at) << ":";
    for (const ScenarioGroup& g : r.groups)
        ctx.err << " " << g.group << " " << g.before.females.size() << " -> " << g.after.females.size()
                << " ranked females;";
    ctx.err << " " << r.reversals.size() << " observed dyads would have to reverse\n";
    std::ostringstream out;
    if (dyads) {
        out << "group,predicted_above,predicted_below,wins_predicted_above,wins_predicted_below,"
               "against_prediction_before\n";
        for (const ScenarioReversal& v : r.reversals)
            out << csvField(v.group) << ',' << csvField(v.predictedAbove) << ',' << csvField(v.predictedBelow) << ','
                << v.winsPredictedAbove << ',' << v.winsPredictedBelow << ','
                << (v.againstPredictionBefore ? "yes" : "no") << '\n';
    } else {
        out << "group,animal,rank_before,rank_after,matriline,group_before,status\n";
        for (const ScenarioMove& m : r.moves)
            out << csvField(m.groupAfter.empty() ? m.groupBefore : m.groupAfter) << ',' << csvField(m.animal) << ','
                << rankText(m.rankBefore) << ',' << rankText(m.rankAfter) << ',' << csvField(m.matriarch) << ','
                << csvField(m.groupBefore) << ',' << m.status << '\n';
    }
    emit(ctx, out.str());
}

} // namespace

void addInheritCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("inherit", "predicted (matrilineal inheritance) against observed ranks of the females");
    cmd->footer(
        "Matrilines are named after their matriarch (the end of the mother links); within a line each mother\n"
        "comes directly before her daughters, youngest first by default; lines are ordered by their best\n"
        "observed rank. Females with an unknown birth date count as mature and are placed as the eldest of\n"
        "their sisters; both are reported on standard error with conformity and Kendall's tau-b.\n" +
        codesHelp(core::CodeKind::Category, codesOf(core::CodeKind::Category)));
    auto o = std::make_shared<InheritOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    cmd->add_option("--at", o->at, "the date of the prediction (default: the date of the last encounter)");
    cmd->add_option("--rule", o->rule, "sibling rule: youngest (default, youngest ascendancy) or eldest")
        ->check(CLI::IsMember({"youngest", "eldest"}));
    addMaturityOption(*cmd, o->analysis);
    cmd->add_option("--group", o->group, "rank only the females resident in this social group (default: every group)");
    cmd->add_option("--matriline-order", o->matrilineOrder,
                    "explicit order of the matrilines, matriarch ids top first, comma-separated "
                    "(lines not listed follow in the observed order)");
    addDrawsOption(*cmd, o->draws);
    addEloOptions(*cmd, o->analysis, "observed ranks by Elo: ");
    cmd->add_flag("--dyads", o->dyads, "list the discordant dyads instead: above,below,category (above = observed above)");
    cmd->add_flag("--monthly", o->monthly,
                  "conformity month by month instead: method (elo, ds),period_start,period_end,ranked,observed,"
                  "comparable,discordant,conformity,tau_b");
    cmd->add_flag("--acquisition", o->acquisition,
                  "rank acquisition instead: the first day each daughter's Elo rating placed her above each older "
                  "sister, with her age then");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runInherit(ctx, *o); }; });
}

void addScenarioCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("scenario", "what-if: the predicted order after removals, births, introductions, splits");
    cmd->footer(
        "Changes are read from a scenario file (docs/scenario-files.md);\n"
        "the colony file is never changed. CSV: group,animal,rank_before,rank_after,matriline,group_before,status\n"
        "(group: the group after the change; status: removed, new, moved, rises, falls, unchanged, joined, left).\n"
        "With --dyads: group,predicted_above,predicted_below,wins_predicted_above,wins_predicted_below,\n"
        "against_prediction_before - observed dyads of the recent window that would have to reverse.\n"
        "Newborns are placed as if adult (unless 'newborns infant'); an introduced female founds a new\n"
        "matriline at the bottom of her group.");
    struct Options {
        std::string colony;
        std::string file;
        bool dyads = false;
    };
    auto o = std::make_shared<Options>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    cmd->add_option("--file", o->file, "the scenario file")->required();
    cmd->add_flag("--dyads", o->dyads, "list the observed dyads that would have to reverse instead");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] {
        action = [&ctx, o] { runScenarioCommand(ctx, o->colony, o->file, o->dyads); };
    });
}

} // namespace hierloom::cli
