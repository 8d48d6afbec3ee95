// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/planning/centre_overview.h"

#include "core/ranks/encounter_selection.h"

namespace hierloom::core {

GroupOverview overviewOfGroup(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                              const std::string& group, Day at, StabilityOptions stability, int maturityYears)
{
    GroupOverview out;
    out.composition = groupComposition(colony, where, at, {group}, maturityYears).front();
    SelectionOptions s;
    s.group = group;
    s.to = at;
    s.draws = DrawPolicy::Half; // every encounter counts here, draws included
    const EncounterSelection sel = selectEncounters(colony, where, s);
    out.lastEncounter = sel.lastDay;
    for (Day d : sel.days)
        if (d > at - kRecentDays) ++out.recentEncounters;
    if (sel.days.empty()) return out;
    stability.group = group;
    stability.to = at;
    stability.length = PeriodLength::Month;
    const StabilitySeries series = stabilityWatch(colony, where, lines, stability);
    out.watched = !series.periods.empty();
    for (const StabilityAlert& a : series.latestAlerts()) {
        out.alerts.push_back(a.signal);
        out.evidence.push_back(describeAlert(series, a));
    }
    return out;
}

} // namespace hierloom::core
