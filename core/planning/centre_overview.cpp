// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/planning/centre_overview.h"

#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"

namespace hierloom::core {

namespace {

/// The row's parts after the composition, from the group's selection up to the day.
template <typename WatchFn>
void fillActivity(GroupOverview& out, const EncounterSelection& sel, const std::string& group, Day at,
                  StabilityOptions stability, WatchFn watch)
{
    out.lastEncounter = sel.lastDay;
    for (Day d : sel.days)
        if (d > at - kRecentDays) ++out.recentEncounters;
    if (sel.days.empty()) return;
    stability.group = group;
    stability.to = at;
    stability.length = PeriodLength::Month;
    const StabilitySeries series = watch(stability);
    out.watched = !series.periods.empty();
    for (const StabilityAlert& a : series.latestAlerts()) {
        out.alerts.push_back(a.signal);
        out.evidence.push_back(describeAlert(series, a));
    }
}

SelectionOptions selectionOf(const std::string& group, Day at)
{
    SelectionOptions s;
    s.group = group;
    s.to = at;
    s.draws = DrawPolicy::Half; // every encounter counts here, draws included
    return s;
}

} // namespace

GroupOverview overviewOfGroup(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                              const std::string& group, Day at, StabilityOptions stability, int maturityYears)
{
    GroupOverview out;
    out.composition = groupComposition(colony, where, at, {group}, maturityYears).front();
    fillActivity(out, selectEncounters(colony, where, selectionOf(group, at)), group, at, std::move(stability),
                 [&](const StabilityOptions& o) { return stabilityWatch(colony, where, lines, o); });
    return out;
}

GroupOverview overviewOfGroup(const CompactEncounters& encounters, const Colony& colony, const ResidenceIndex& where,
                              const Matrilines& lines, const std::string& group, Day at, StabilityOptions stability,
                              int maturityYears)
{
    GroupOverview out;
    out.composition = groupComposition(colony, where, at, {group}, maturityYears).front();
    fillActivity(out, selectEncounters(encounters, colony.animals, where, selectionOf(group, at)), group, at,
                 std::move(stability),
                 [&](const StabilityOptions& o) { return stabilityWatch(encounters, colony.animals, where, lines, o); });
    return out;
}

} // namespace hierloom::core
