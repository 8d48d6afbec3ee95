// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/pedigree/rank_timeline.h"
#include "core/ranks/rank_changes.h"

#include <vector>

namespace hierloom::core {

/// One step of a female's timeline line, split into its active and passive
/// parts (docs/methods.md "Active and passive rank changes"): her observed
/// rank at checkpoint k against checkpoint k - 1, among the ranked females
/// with a rank at each.
struct TimelineRankChange {
    int female = 0;     ///< index in RankTimeline::females
    int point = 0;      ///< index of her point at the later checkpoint
    int checkpoint = 0; ///< the later checkpoint (>= 1)
    RankChange change;
};

/// Every step between consecutive checkpoints of females ranked at both
/// (changes of 0 included), checkpoint order, then by rank at the later one.
std::vector<TimelineRankChange> timelineRankChanges(const RankTimeline& timeline);

} // namespace hierloom::core
