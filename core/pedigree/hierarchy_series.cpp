// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/hierarchy_series.h"

#include "core/ranks/davids_score.h"
#include "core/pedigree/discordance.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/linearity.h"
#include "core/ranks/triangle_transitivity.h"
#include "core/ranks/win_matrix.h"

#include <algorithm>

namespace hierloom::core {

HierarchySeries computeHierarchySeries(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                       const InheritanceOptions& options, const std::atomic<bool>* cancel,
                                       const std::function<void(int, int)>& progress)
{
    HierarchySeries out;
    SelectionOptions s;
    s.group = options.group;
    s.draws = options.elo.draws;
    const EncounterSelection all = selectEncounters(colony, where, s);
    if (!all.firstDay) return out;
    const std::vector<CalendarPeriod> months = periodsCovering(*all.firstDay, *all.lastDay, PeriodLength::Month);
    const int total = static_cast<int>(months.size()) + 1; // + the conformity series
    auto stopped = [&] { return cancel && cancel->load(std::memory_order_relaxed); };

    for (size_t k = 0; k < months.size(); ++k) {
        if (stopped()) {
            out.cancelled = true;
            return out;
        }
        // The month's own bouts, re-indexed to the animals taking part in them.
        const auto lo = static_cast<size_t>(std::lower_bound(all.days.begin(), all.days.end(), months[k].start) - all.days.begin());
        const auto hi = static_cast<size_t>(std::upper_bound(all.days.begin(), all.days.end(), months[k].end) - all.days.begin());
        std::vector<int> local(static_cast<size_t>(all.size()), -1);
        int n = 0;
        std::vector<Bout> bouts;
        for (size_t b = lo; b < hi; ++b) {
            Bout bout = all.bouts[b];
            for (int* a : {&bout.winner, &bout.loser}) {
                int& l = local[static_cast<size_t>(*a)];
                if (l < 0) l = n++;
                *a = l;
            }
            bouts.push_back(bout);
        }
        HierarchyMonth month;
        month.period = months[k];
        month.encounters = static_cast<long long>(bouts.size());
        month.animals = n;
        const WinMatrix m = WinMatrix::fromBouts(n, bouts, s.draws);
        month.hPrime = linearity(m).hPrime;
        month.steepness = steepness(m);
        month.tTri = triangleTransitivity(m).tTri;
        out.months.push_back(month);
        if (progress) progress(static_cast<int>(k) + 1, total);
    }
    if (stopped()) {
        out.cancelled = true;
        return out;
    }
    const ConformitySeries conformity = monthlyConformity(colony, where, lines, options);
    // Both series run over the same calendar months of the same selection.
    for (size_t k = 0; k < out.months.size() && k < conformity.elo.size(); ++k)
        out.months[k].conformity = conformity.elo[k].conformity;
    if (progress) progress(total, total);
    return out;
}

} // namespace hierloom::core
