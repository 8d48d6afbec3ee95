// SPDX-License-Identifier: GPL-3.0-or-later
// overview: every group of a centre in one table, each read from the file on its own.
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/commands.h"

#include "core/planning/planning_caution.h"
#include "core/store/analysis_settings_store.h"
#include "core/store/centre_overview_reader.h"
#include "core/store/colony_store.h"

#include <CLI/CLI.hpp>

#include <ostream>
#include <sstream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

struct OverviewOptions {
    std::string colony;
    std::string at;
    AnalysisOverrides analysis;
};

void runOverview(CommandContext& ctx, const OverviewOptions& o)
{
    const std::optional<Day> asked = optionDate(o.at, "--at");
    // One connection (its integrity check alongside, openColony); each group's
    // encounters are read in turn (core/store/centre_overview_reader.h), so
    // memory follows the largest group, not the centre.
    const ColonyStore store = openColony(ctx, o.colony);
    LoadedColony loaded;
    loaded.settings = readAnalysisSettings(store);
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, {});
    reportAnalysisSettings(ctx, "overview", settings, &o.analysis, {});
    CentreOverviewReader reader(store, settings.elo, settings.maturityYears);
    const std::optional<Day> at = asked ? asked : reader.lastEncounterDay();
    if (!at) throw BadInputError("the colony has no encounters; give a date with --at");
    std::ostringstream out;
    out << "group,animals,adult_females,matrilines,last_encounter,encounters_30_days,stability,alerts\n";
    int alerting = 0;
    const std::vector<std::string>& groups = reader.groups();
    for (const std::string& group : groups) {
        const GroupOverview g = reader.read(group, *at);
        std::string alerts;
        for (StabilitySignal s : g.alerts) alerts += (alerts.empty() ? "" : " ") + std::string(toString(s));
        alerting += g.alerts.empty() ? 0 : 1;
        out << csvField(group) << ',' << g.composition.animals << ',' << g.composition.adultFemales << ','
            << g.composition.matrilines << ',' << (g.lastEncounter ? formatDate(*g.lastEncounter) : "") << ','
            << g.recentEncounters << ',' << (!g.watched ? "" : g.alerts.empty() ? "calm" : "alert") << ',' << alerts
            << '\n';
    }
    ctx.err << "overview: " << formatDate(*at) << ", " << groups.size() << " groups, " << alerting
            << " with alerts in their last month\n";
    if (alerting > 0) ctx.err << kPlanningCaution << "\n";
    emit(ctx, out.str());
}

} // namespace

void addOverviewCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("overview", "every group of the colony in one table: residents, matrilines, "
                                               "recent encounters, stability");
    cmd->footer(
        "CSV: group,animals,adult_females,matrilines,last_encounter,encounters_30_days,stability,alerts.\n"
        "On the day (--at, default: the colony's last encounter): animals resident, adult females and\n"
        "matrilines among the resident females; the group's last encounter up to the day and its encounters\n"
        "in the 30 days ending on it; the monthly stability watch up to the day: calm or alert in its last\n"
        "month, with the alerts (empty without encounters).");
    auto o = std::make_shared<OverviewOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    cmd->add_option("--at", o->at, "the day of the overview (default: the date of the last encounter)");
    addMaturityOption(*cmd, o->analysis);
    addEloOptions(*cmd, o->analysis, "stability watch: ");
    cmd->add_option("--out", ctx.outFile, "write the CSV to this file instead of standard output");
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runOverview(ctx, *o); }; });
}

} // namespace hierloom::cli
