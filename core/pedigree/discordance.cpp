// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/discordance.h"

#include "core/base/calendar_period.h"
#include "core/ranks/davids_score.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"
#include "core/stats/kendall_tau.h"
#include "core/ranks/win_matrix.h"

#include <algorithm>

namespace hierloom::core {

const char* toString(DiscordanceCategory c)
{
    switch (c) {
    case DiscordanceCategory::DaughterOverMother: return "daughter_over_mother";
    case DiscordanceCategory::SiblingOrder: return "sibling_order";
    case DiscordanceCategory::WithinMatriline: return "within_matriline";
    case DiscordanceCategory::CrossMatriline: return "cross_matriline";
    }
    return "cross_matriline";
}

DiscordanceCategory discordanceCategory(const Matrilines& lines, int above, int below)
{
    if (lines.mother(above) == below) return DiscordanceCategory::DaughterOverMother;
    if (lines.mother(above) >= 0 && lines.mother(above) == lines.mother(below)) return DiscordanceCategory::SiblingOrder;
    if (lines.matriarch(above) == lines.matriarch(below)) return DiscordanceCategory::WithinMatriline;
    return DiscordanceCategory::CrossMatriline;
}

DiscordanceSummary summariseDiscordance(const Matrilines& lines, const InheritancePrediction& p)
{
    DiscordanceSummary s;
    s.ranked = static_cast<int>(p.females.size());
    std::vector<double> predicted, observed;
    for (size_t i = 0; i < p.females.size(); ++i) {
        const PredictedFemale& hi = p.females[i];
        if (!hi.observedRank) continue;
        ++s.observed;
        predicted.push_back(hi.predictedRank);
        observed.push_back(*hi.observedRank);
        for (size_t j = i + 1; j < p.females.size(); ++j) {
            const PredictedFemale& lo = p.females[j];
            if (!lo.observedRank) continue;
            ++s.comparable;
            if (*lo.observedRank > *hi.observedRank) continue;
            ++s.discordant;
            s.dyads.push_back({lo.animal, hi.animal,
                               discordanceCategory(lines, lines.index(lo.animal), lines.index(hi.animal))});
        }
    }
    if (s.comparable > 0) s.conformity = 1.0 - static_cast<double>(s.discordant) / s.comparable;
    s.tauB = kendallTauB(predicted, observed);
    return s;
}

namespace {

ConformityPoint pointOf(const Matrilines& lines, const InheritancePrediction& p, const CalendarPeriod& period)
{
    const DiscordanceSummary s = summariseDiscordance(lines, p);
    return ConformityPoint{period.start, period.end, s.ranked, s.observed, s.comparable, s.discordant,
                           s.conformity, s.tauB};
}

SelectionOptions monthlySelection(const InheritanceOptions& o)
{
    SelectionOptions s;
    s.group = o.group;
    s.draws = o.elo.draws;
    return s;
}

ConformitySeries conformityByMonth(const EncounterSelection& sel, const ResidenceIndex& where, const Matrilines& lines,
                                   const InheritanceOptions& o)
{
    ConformitySeries out;
    if (!sel.firstDay) return out;
    const std::vector<CalendarPeriod> months = periodsCovering(*sel.firstDay, *sel.lastDay, PeriodLength::Month);
    auto boutIndex = [&](Day d) {
        return static_cast<size_t>(std::upper_bound(sel.days.begin(), sel.days.end(), d) - sel.days.begin());
    };
    std::vector<size_t> counts;
    for (const CalendarPeriod& m : months) counts.push_back(boutIndex(m.end));
    const std::vector<EloRun> runs = eloAtCheckpoints(sel.size(), sel.bouts, counts, o.elo);
    for (size_t k = 0; k < months.size(); ++k) {
        const RankedFemales ranked = rankedFemalesOn(lines, where, months[k].end, o.group, o.maturityYears);
        ObservedScores elo;
        for (int i = 0; i < sel.size(); ++i)
            if (runs[k].rated[static_cast<size_t>(i)])
                elo.emplace(sel.ids[static_cast<size_t>(i)], runs[k].rating[static_cast<size_t>(i)]);
        out.elo.push_back(pointOf(lines, predictOrder(lines, ranked, elo, o.rule, o.matrilineOrder), months[k]));

        // David's score over the month's own encounters, its animals re-indexed.
        const size_t lo = boutIndex(months[k].start - 1), hi = counts[k];
        std::vector<int> local(static_cast<size_t>(sel.size()), -1);
        std::vector<int> members;
        for (size_t b = lo; b < hi; ++b)
            for (int a : {sel.bouts[b].winner, sel.bouts[b].loser})
                if (local[static_cast<size_t>(a)] < 0) {
                    local[static_cast<size_t>(a)] = 0;
                    members.push_back(a);
                }
        std::sort(members.begin(), members.end());
        for (size_t i = 0; i < members.size(); ++i) local[static_cast<size_t>(members[i])] = static_cast<int>(i);
        std::vector<Bout> bouts;
        for (size_t b = lo; b < hi; ++b)
            bouts.push_back({local[static_cast<size_t>(sel.bouts[b].winner)], local[static_cast<size_t>(sel.bouts[b].loser)],
                             sel.bouts[b].draw});
        ObservedScores ds;
        if (!members.empty()) {
            const std::vector<double> score = davidsScores(
                WinMatrix::fromBouts(static_cast<int>(members.size()), bouts, o.elo.draws), DyadicIndex::Proportion);
            for (size_t i = 0; i < members.size(); ++i) ds.emplace(sel.ids[static_cast<size_t>(members[i])], score[i]);
        }
        out.davidsScore.push_back(pointOf(lines, predictOrder(lines, ranked, ds, o.rule, o.matrilineOrder), months[k]));
    }
    return out;
}

} // namespace

ConformitySeries monthlyConformity(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                   const InheritanceOptions& o)
{
    return conformityByMonth(selectEncounters(colony, where, monthlySelection(o)), where, lines, o);
}

ConformitySeries monthlyConformity(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                   const ResidenceIndex& where, const Matrilines& lines, const InheritanceOptions& o)
{
    return conformityByMonth(selectEncounters(encounters, animals, where, monthlySelection(o)), where, lines, o);
}

} // namespace hierloom::core
