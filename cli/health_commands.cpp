// SPDX-License-Identifier: GPL-3.0-or-later
// health: is the record of a group and window trustworthy (docs/methods.md, "Data health").
#include "cli/analysis_options.h"
#include "cli/colony_loading.h"
#include "cli/commands.h"

#include "core/base/number_format.h"
#include "core/research/data_health.h"

#include <CLI/CLI.hpp>

#include <cstdio>
#include <sstream>

namespace hierloom::cli {

using namespace hierloom::core;

namespace {

struct HealthCommandOptions {
    std::string colony;
    WindowOptions window;
    AnalysisOverrides analysis;
    std::string table = "animals";
    int unseenDays = kDefaultUnseenDays;
    int minEncounters = kDefaultMinEncounters;
    int matchMinutes = kDefaultMatchMinutes;
    int randomise = 1000;
    std::uint64_t seed = 1;
    unsigned threads = 0;
};

std::string yesNo(bool b) { return b ? "yes" : "no"; }

/// What the day "not seen" is counted to is (docs/methods.md, "Data health").
std::string referenceNote(const DataHealth& health, Day today)
{
    switch (health.referenceKind) {
    case ReferenceDay::WindowEnd: return " (the window's last day)";
    case ReferenceDay::Today: return " (today)";
    case ReferenceDay::LastRecord: break;
    }
    const int behind = today - health.reference;
    if (behind <= 0) return " (the file's last day of records, today)";
    return " (the file's last day of records, " + std::to_string(behind) + (behind == 1 ? " day" : " days") +
           " before today)";
}

void runHealth(CommandContext& ctx, const HealthCommandOptions& o)
{
    const LoadedColony loaded = loadColony(ctx, o.colony);
    const AnalysisSettings settings = analysisSettingsOf(loaded, o.analysis, o.window.draws);
    const SelectionOptions sel = selectionOf(o.window, loaded);
    HealthOptions h;
    h.from = sel.from;
    h.to = sel.to;
    h.group = sel.group;
    h.today = today();
    h.unseenDays = o.unseenDays;
    h.minEncounters = o.minEncounters;
    h.matchMinutes = o.matchMinutes;
    h.elo = settings.elo;
    h.randomisations = o.table == "animals" ? o.randomise : 0;
    h.seed = o.seed;
    h.threads = o.threads;
    const DataHealth health = dataHealth(loaded.colony, loaded.where, h);
    std::ostringstream out;
    CsvWriter w(out);
    auto date = [](const std::optional<Day>& d) { return formatDate(d); };
    if (o.table == "animals") {
        w.writeRow({"animal", "encounters", "days_seen", "last_seen", "few_encounters", "interval_width"});
        for (const AnimalEffort& a : health.animals)
            w.writeRow({a.animal, std::to_string(a.encounters), std::to_string(a.daysSeen), date(a.lastSeen),
                        yesNo(a.fewEncounters), formatNumber(a.intervalWidth)});
    } else if (o.table == "observers") {
        w.writeRow({"observer", "encounters", "days"});
        for (const ObserverEffort& e : health.observers)
            w.writeRow({e.observer, std::to_string(e.encounters), std::to_string(e.days)});
    } else if (o.table == "months") {
        w.writeRow({"month", "encounters", "days", "animals"});
        for (const MonthEffort& m : health.months) {
            char month[16];
            std::snprintf(month, sizeof month, "%04d-%02u", m.year, m.month);
            w.writeRow({month, std::to_string(m.encounters), std::to_string(m.days), std::to_string(m.animals)});
        }
    } else if (o.table == "unseen") {
        w.writeRow({"animal", "last_seen", "since", "days_unseen"});
        for (const UnseenAnimal& u : health.unseen)
            w.writeRow({u.animal, date(u.lastSeen), formatDate(u.since), std::to_string(u.days)});
        if (!health.unseen.empty())
            ctx.err << "health: " << health.unseen.size() << " resident animals not seen for more than "
                    << health.unseenDays << " days on " << formatDate(health.reference) << referenceNote(health, h.today)
                    << ". " << kUnseenCaution << "\n";
    } else {
        w.writeRow({"first_observer", "second_observer", "shared_days", "matched", "only_first", "only_second",
                    "agreeing", "agreement_share", "kappa"});
        for (const ObserverAgreement& a : health.agreement)
            w.writeRow({a.first, a.second, std::to_string(a.sharedDays), std::to_string(a.matched),
                        std::to_string(a.onlyFirst), std::to_string(a.onlySecond), std::to_string(a.agreeing),
                        formatNumber(a.share), formatNumber(a.kappa)});
    }
    emit(ctx, out.str());
}

} // namespace

void addHealthCommand(CLI::App& app, CommandContext& ctx, CommandAction& action)
{
    auto* cmd = app.add_subcommand("health", "data health of a group and window: observation effort, animals not "
                                             "seen, too few encounters for a stable rank, observer agreement");
    auto o = std::make_shared<HealthCommandOptions>();
    cmd->add_option("COLONY_FILE", o->colony, "the colony file")->required();
    addWindowOptions(*cmd, o->window);
    cmd->add_option("--table", o->table,
                    "animals (effort, flags, interval widths), observers, months, unseen or agreement "
                    "(default: animals)")
        ->check(CLI::IsMember({"animals", "observers", "months", "unseen", "agreement"}));
    cmd->add_option("--unseen-days", o->unseenDays, "list residents not seen for more than this many days (default: 14)")
        ->check(CLI::Range(0, 100000));
    cmd->add_option("--min-encounters", o->minEncounters,
                    "flag animals with fewer encounters than this in the window (default: 10)")
        ->check(CLI::Range(0, 1000000));
    cmd->add_option("--match-minutes", o->matchMinutes,
                    "agreement: two observers' encounters of a dyad match when at most this many minutes apart "
                    "(default: 5)")
        ->check(CLI::Range(0, 1440));
    cmd->add_option("--randomise", o->randomise,
                    "animals: random orders of randomised Elo for the interval widths, 0 for none (default: 1000)")
        ->check(CLI::Range(0, 1000000));
    cmd->add_option("--seed", o->seed, "seed of --randomise (default: 1)");
    cmd->add_option("--threads", o->threads, "threads for randomisations (default: every core)");
    addEloOptions(*cmd, o->analysis);
    cmd->callback([&ctx, &action, o] { action = [&ctx, o] { runHealth(ctx, *o); }; });
}

} // namespace hierloom::cli
