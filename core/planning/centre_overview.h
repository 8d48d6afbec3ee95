// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/base/residence_index.h"
#include "core/pedigree/group_composition.h"
#include "core/pedigree/matriline.h"
#include "core/planning/stability_watch.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Days counted as "recent" in a group's row of the centre overview: the day
/// of the overview and the 29 before it.
inline constexpr int kRecentDays = 30;

/// One group's row of the centre overview on a day.
struct GroupOverview {
    GroupComposition composition;        ///< residents on the day (group_composition.h)
    std::optional<Day> lastEncounter;    ///< the group's last encounter up to the day
    int recentEncounters = 0;            ///< its encounters in the kRecentDays up to the day
    bool watched = false;                ///< the stability watch has at least one month
    std::vector<StabilitySignal> alerts; ///< alerts of the watch's last month (up to the day)
    std::vector<std::string> evidence;   ///< one describeAlert sentence per alert, in the same order
};

/// The overview row of `group` on day `at`. `colony` needs only the group's
/// encounters up to `at` (more do no harm); every animal and residence. An
/// encounter belongs to the group as in docs/methods.md (its group, or the
/// winner's group that day when it has none); draws count. The stability watch
/// runs monthly with `stability` (its group and `to` are set here).
GroupOverview overviewOfGroup(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                              const std::string& group, Day at, StabilityOptions stability, int maturityYears);
/// The same row from compact records (core/base/compact_encounters.h): the
/// group's encounters in `encounters`, every animal and residence in `colony`
/// (its own encounters are not read).
GroupOverview overviewOfGroup(const CompactEncounters& encounters, const Colony& colony, const ResidenceIndex& where,
                              const Matrilines& lines, const std::string& group, Day at, StabilityOptions stability,
                              int maturityYears);

} // namespace hierloom::core
