// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/calendar_period.h"
#include "core/base/colony.h"
#include "core/base/residence_index.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/rank_table.h"

#include <string>
#include <vector>

namespace hierloom::core {

/// One animal's change of ordinal rank between two rankings, split into an
/// active and a passive part (docs/methods.md "Active and passive rank
/// changes", after Strauss & Holekamp 2019). Changes count places gained:
/// positive = she rose.
struct RankChange {
    std::string animal;
    int rankBefore = 0;   ///< 1 = top, in the earlier ranking
    int rankAfter = 0;    ///< in the later ranking
    int total = 0;        ///< rankBefore - rankAfter
    int active = 0;       ///< places gained among the animals ranked in both
    int passive = 0;      ///< leftAbove - enteredAbove; active + passive = total
    int leftAbove = 0;    ///< animals above her before that are not ranked after
    int enteredAbove = 0; ///< animals above her after that were not ranked before
};

/// Splits the changes of every animal ranked in both orders (ids, top first;
/// each order without repeats). Rows follow the later order.
std::vector<RankChange> splitRankChanges(const std::vector<std::string>& before, const std::vector<std::string>& after);

/// The changes of one period: from the ranking at the previous period's end to the ranking at this one's.
struct PeriodRankChanges {
    CalendarPeriod period;
    std::vector<RankChange> changes;
};

/// Active and passive rank changes per calendar period (docs/methods.md): the
/// Elo ranks of `ranks --every` (options.method must be Elo; its start rule
/// applies) read at each period's end, compared with the previous period's
/// end. The first period of the window has no earlier ranking and no row.
std::vector<PeriodRankChanges> rankChangesByPeriod(const Colony& colony, const ResidenceIndex& where,
                                                   const SelectionOptions& selection, const RankOptions& options,
                                                   PeriodLength every);

} // namespace hierloom::core
