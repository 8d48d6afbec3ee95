// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/pedigree/rank_timeline.h"

#include "core/base/calendar_period.h"
#include "core/ranks/encounter_selection.h"

#include <algorithm>

namespace hierloom::core {

const char* toString(LifeEventKind kind)
{
    switch (kind) {
    case LifeEventKind::Birth: return "birth";
    case LifeEventKind::Maturity: return "maturity";
    case LifeEventKind::Death: return "death";
    case LifeEventKind::Removal: return "removal";
    case LifeEventKind::Introduction: return "introduction";
    }
    return "birth";
}

int RankTimeline::find(std::string_view id) const
{
    for (size_t i = 0; i < females.size(); ++i)
        if (females[i].animal == id) return static_cast<int>(i);
    return -1;
}

namespace {

std::vector<LifeEvent> lifeEvents(const Animal& a, int maturityYears)
{
    std::vector<LifeEvent> out;
    if (a.birth) {
        out.push_back({LifeEventKind::Birth, *a.birth});
        out.push_back({LifeEventKind::Maturity, anniversary(*a.birth, maturityYears)});
    }
    if (a.entryType == EntryType::Introduced && a.entry) out.push_back({LifeEventKind::Introduction, *a.entry});
    if (a.exit && a.exitType == ExitType::Died) out.push_back({LifeEventKind::Death, *a.exit});
    if (a.exit && a.exitType == ExitType::Removed) out.push_back({LifeEventKind::Removal, *a.exit});
    std::stable_sort(out.begin(), out.end(), [](const LifeEvent& x, const LifeEvent& y) { return x.day < y.day; });
    return out;
}

} // namespace

RankTimeline computeRankTimeline(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                                 const RankTimelineOptions& options, const std::atomic<bool>* cancel,
                                 const TimelineProgress& progress)
{
    RankTimeline out;
    const InheritanceOptions& o = options.inheritance;
    SelectionOptions s;
    s.group = o.group;
    s.draws = o.elo.draws;
    const EncounterSelection sel = selectEncounters(colony, where, s);
    if (!sel.firstDay) return out;
    const std::vector<CalendarPeriod> periods = periodsCovering(
        *sel.firstDay, *sel.lastDay, options.step == TimelineStep::Week ? PeriodLength::Week : PeriodLength::Month);
    std::vector<size_t> counts;
    for (const CalendarPeriod& p : periods) {
        out.checkpoints.push_back(p.end);
        counts.push_back(static_cast<size_t>(std::upper_bound(sel.days.begin(), sel.days.end(), p.end) - sel.days.begin()));
    }
    // One Elo pass for every checkpoint; only the snapshots are kept.
    const std::vector<EloRun> runs = eloAtCheckpoints(sel.size(), sel.bouts, counts, o.elo);

    std::vector<int> slot(static_cast<size_t>(lines.size()), -1); // node -> position in out.females
    std::vector<RankTimelineFemale> found;
    const int total = static_cast<int>(periods.size());
    for (int k = 0; k < total; ++k) {
        if (cancel && cancel->load(std::memory_order_relaxed)) {
            out.cancelled = true;
            out.checkpoints.resize(static_cast<size_t>(k));
            break;
        }
        const Day day = out.checkpoints[static_cast<size_t>(k)];
        const RankedFemales ranked = rankedFemalesOn(lines, where, day, o.group, o.maturityYears);
        const EloRun& run = runs[static_cast<size_t>(k)];
        ObservedScores elo;
        for (int i = 0; i < sel.size(); ++i)
            if (run.rated[static_cast<size_t>(i)]) elo.emplace(sel.ids[static_cast<size_t>(i)], run.rating[static_cast<size_t>(i)]);
        const InheritancePrediction p = predictOrder(lines, ranked, elo, o.rule, o.matrilineOrder);
        out.maxRank = std::max(out.maxRank, static_cast<int>(p.females.size()));
        for (const PredictedFemale& f : p.females) {
            const int node = lines.index(f.animal);
            int& at = slot[static_cast<size_t>(node)];
            if (at < 0) {
                at = static_cast<int>(found.size());
                RankTimelineFemale line;
                line.animal = f.animal;
                line.matriarch = f.matriarch;
                line.birth = lines.birth(node);
                const int a = colony.animalIndex(f.animal);
                if (a >= 0) {
                    line.name = colony.animals[static_cast<size_t>(a)].name;
                    line.events = lifeEvents(colony.animals[static_cast<size_t>(a)], o.maturityYears);
                }
                found.push_back(std::move(line));
            }
            RankTimelinePoint point;
            point.day = day;
            point.elo = f.observedScore;
            point.rank = f.observedRank;
            point.predictedRank = f.predictedRank;
            point.discordantDyads = f.discordantDyads;
            found[static_cast<size_t>(at)].points.push_back(point);
        }
        if (progress) progress(k + 1, total);
    }
    // A stable order for colours and legends: matriline, then id.
    std::sort(found.begin(), found.end(), [](const RankTimelineFemale& a, const RankTimelineFemale& b) {
        return a.matriarch != b.matriarch ? a.matriarch < b.matriarch : a.animal < b.animal;
    });
    out.females = std::move(found);
    return out;
}

} // namespace hierloom::core
