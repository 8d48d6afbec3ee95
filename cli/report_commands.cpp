// SPDX-License-Identifier: GPL-3.0-or-later
// stability and report: the stability watch as CSV, and the printable hierarchy report as PDF.
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/code_help.h"
#include "cli/commands.h"

#include "core/store/colony_store.h"
#include "core/pedigree/matriline.h"
#include "core/base/number_format.h"
#include "core/store/stability_settings.h"
#include "core/planning/stability_watch.h"

#include <CLI/CLI.hpp>

#include <memory>
#include <ostream>
#include <sstream>

#ifdef HIERLOOM_HAVE_REPORT
#include "report/hierarchy_report.h"

#include <QGuiApplication>

#include <filesystem>
// Qt's `emit` keyword macro would swallow the call of cli::emit below.
#undef emit
#endif

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

/// Thresholds and behaviour severities as the colony file stores them.
struct StoredStability {
    StabilityThresholds thresholds;
    std::map<std::string, int, std::less<>> severity;
};

StoredStability storedStability(CommandContext& ctx, const std::string& path)
{
    const ColonyStore store = openColony(ctx, path);
    return {readStabilityThresholds(store), behaviourSeverities(store)};
}

/// The group asked for, or the colony's only group when none is given.
std::string chosenGroup(const LoadedColony& loaded, const std::string& group)
{
    const std::vector<std::string>& groups = loaded.where.groups();
    if (group.empty()) {
        if (groups.size() == 1) return groups.front();
        std::string names;
        for (const std::string& g : groups) names += (names.empty() ? "" : ", ") + g;
        throw BadInputError(groups.empty() ? std::string("--group: the colony has no group")
                                           : "--group: the colony has " + std::to_string(groups.size()) +
                                                 " groups (" + names + "); choose one");
    }
    if (loaded.where.group(group) < 0) throw BadInputError("--group: no group '" + group + "' in the colony");
    return group;
}

struct StabilityCommandOptions {
    std::string colony;
    std::string group;
    std::string every = "month";
    std::string from, to;
    std::string draws; // empty: the colony's setting
    AnalysisOverrides analysis;
};

void runStability(CommandContext& ctx, const StabilityCommandOptions& o)
{
    // Elo runs over the group's whole record; --from and --to only choose the periods shown.
    const LoadedColony loaded = loadCompactColony(ctx, o.colony, EncounterScope{o.group, {}, {}});
    const std::string group = chosenGroup(loaded, o.group);
    const StoredStability stored = storedStability(ctx, o.colony);
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.draws);
    reportAnalysisSettings(ctx, "stability", settings, &o.analysis, o.draws);
    StabilityOptions so;
    so.elo = settings.elo;
    so.group = group;
    so.length = o.every == "week" ? PeriodLength::Week : PeriodLength::Month;
    so.from = optionDate(o.from, "--from");
    so.to = optionDate(o.to, "--to");
    so.severity = stored.severity;
    so.thresholds = stored.thresholds;
    const Matrilines lines(loaded.colony);
    const StabilitySeries s = stabilityWatch(loaded.compact, loaded.colony.animals, loaded.where, lines, so);
    std::vector<std::string> alerts(s.periods.size());
    for (const StabilityAlert& a : s.alerts) {
        alerts[a.period] += (alerts[a.period].empty() ? "" : " ") + std::string(toString(a.signal));
        ctx.err << "alert: " << describeAlert(s, a) << "\n";
    }
    std::ostringstream out;
    out << "period_start,period_end,encounters,decided,counter_dominant,counter_share,top_line_winner,top_line_loser,"
           "top_line_count,ranked_animals,rank_change_per_animal,severe,animal_days,severe_per_animal_day,alerts\n";
    for (size_t i = 0; i < s.periods.size(); ++i) {
        const StabilityPeriod& p = s.periods[i];
        out << formatDate(p.period.start) << ',' << formatDate(p.period.end) << ',' << p.encounters << ',' << p.decided
            << ',' << p.counterDominant << ',' << formatNumber(p.counterShare) << ','
            << csvField(p.topLinePair ? p.topLinePair->winnerLine : "") << ','
            << csvField(p.topLinePair ? p.topLinePair->loserLine : "") << ','
            << (p.topLinePair ? std::to_string(p.topLinePair->count) : "") << ',' << p.rankedAnimals << ','
            << formatNumber(p.rankChangePerAnimal) << ',' << p.severe << ',' << p.animalDays << ','
            << formatNumber(p.severePerAnimalDay) << ',' << alerts[i] << '\n';
    }
    emit(ctx, out.str());
}

struct ReportOptions {
    std::string colony;
    std::string group;
    std::string at;
    std::string out;
    std::string draws; // empty: the colony's setting
    AnalysisOverrides analysis;
};

void runReport(CommandContext& ctx, const ReportOptions& o)
{
#ifdef HIERLOOM_HAVE_REPORT
    const LoadedColony loaded = loadColony(ctx, o.colony, EncounterScope{o.group, {}, {}});
    const std::string group = chosenGroup(loaded, o.group);
    const StoredStability stored = storedStability(ctx, o.colony);
    report::HierarchyReportOptions ro;
    ro.group = group;
    ro.at = optionDate(o.at, "--at");
    ro.colonyName = std::filesystem::path(o.colony).filename().string();
    ro.thresholds = stored.thresholds;
    ro.severity = stored.severity;
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.draws);
    reportAnalysisSettings(ctx, "report", settings, &o.analysis, o.draws);
    ro.elo = settings.elo;
    ro.startRule = settings.startRule;
    ro.maturityYears = settings.maturityYears;
    // QPdfWriter needs a GUI application; without a display the offscreen platform serves.
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) qputenv("QT_QPA_PLATFORM", "offscreen");
    std::unique_ptr<QGuiApplication> app;
    static int argc = 1;
    static char name[] = "hierloom-cli";
    static char* argv[] = {name, nullptr};
    if (!QCoreApplication::instance()) app = std::make_unique<QGuiApplication>(argc, argv);
    int pages = 0;
    passCheck(ctx);
    try {
        pages = report::writeHierarchyReportPdf(QString::fromStdString(o.out), loaded.colony, ro);
    } catch (const std::invalid_argument& e) {
        throw BadInputError(e.what());
    }
    ctx.err << "report: " << o.out << ", " << pages << " page" << (pages == 1 ? "" : "s") << "\n";
#else
    (void)ctx;
    (void)o;
    throw BadInputError("this hierloom-cli was built without the desktop libraries, so it cannot write PDF reports");
#endif
}

} // namespace

void addStabilityCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("stability", "counter-dominance, severe aggression and rank changes per period, with alerts");
    cmd->footer(
        "The stability watch of one group per week or month: counter-dominance (decided encounters won by the\n"
        "lower-rated animal, Elo just before each encounter), the busiest pair of matrilines among them, mean rank\n"
        "change per animal, severe encounters per animal-day; alerts (thresholds from the colony file's settings)\n"
        "are described on standard error with their evidence.\n" +
        codesHelp(CodeKind::Metric, {"counter_share", "rank_change_per_animal", "severe_per_animal_day"}) +
        codesHelp(CodeKind::Signal, codesOf(CodeKind::Signal)));
    auto o = std::make_shared<StabilityCommandOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    cmd->add_option("--group", o->group, "the social group (default: the colony's group when it has only one)");
    cmd->add_option("--every", o->every, "week or month (default)")->check(CLI::IsMember({"week", "month"}));
    cmd->add_option("--from", o->from, "first day shown (default: the group's first encounter)");
    cmd->add_option("--to", o->to, "last day shown (default: its last encounter)");
    addDrawsOption(*cmd, o->draws);
    addEloOptions(*cmd, o->analysis);
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runStability(ctx, *o); }; });
}

void addReportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("report", "the printable hierarchy report of one group at one date, as a PDF");
    cmd->footer(
        "Contents: observed order with matrilines,\n"
        "predicted order, discordances, recent rank changes, stability figures and plots, data window and methods.");
    auto o = std::make_shared<ReportOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    cmd->add_option("--group", o->group, "the social group (default: the colony's group when it has only one)");
    cmd->add_option("--at", o->at, "the date of the report (default: the group's last encounter)");
    cmd->add_option("--out", o->out, "the PDF file to write")->required();
    addDrawsOption(*cmd, o->draws);
    addEloOptions(*cmd, o->analysis);
    addStartRuleOption(*cmd, o->analysis, "observed order and recent changes: ");
    addMaturityOption(*cmd, o->analysis);
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runReport(ctx, *o); }; });
}

} // namespace hierloom::cli
