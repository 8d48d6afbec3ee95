// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/planning/stability_watch.h"

#include "core/ranks/compact_selection.h"
#include "core/ranks/elo_kernel.h"
#include "core/ranks/encounter_selection.h"
#include "core/base/number_format.h"

#include <algorithm>
#include <limits>
#include <map>
#include <numeric>
#include <utility>

namespace hierloom::core {

const char* toString(StabilitySignal signal)
{
    switch (signal) {
    case StabilitySignal::CounterDominance: return "counter_dominance";
    case StabilitySignal::RankChanges: return "rank_changes";
    case StabilitySignal::SevereAggression: return "severe_aggression";
    }
    return "";
}

std::vector<StabilityAlert> StabilitySeries::latestAlerts() const
{
    std::vector<StabilityAlert> out;
    if (periods.empty()) return out;
    for (const StabilityAlert& a : alerts)
        if (a.period + 1 == periods.size()) out.push_back(a);
    return out;
}

namespace {

/// Mean |rank change| per animal between two rating snapshots, over the
/// animals rated in both; each snapshot is re-ranked among those common
/// animals so that arrivals and departures do not count as changes.
std::pair<int, std::optional<double>> rankChange(const std::vector<double>& before, const std::vector<bool>& inBefore,
                                                 const std::vector<double>& after, const std::vector<bool>& inAfter)
{
    std::vector<int> common;
    for (size_t i = 0; i < before.size(); ++i)
        if (inBefore[i] && inAfter[i]) common.push_back(static_cast<int>(i));
    if (common.size() < 2) return {static_cast<int>(common.size()), std::nullopt};
    auto ranks = [&](const std::vector<double>& r) {
        std::vector<int> order = common;
        std::stable_sort(order.begin(), order.end(), [&](int a, int b) { return r[a] > r[b]; });
        std::map<int, int> rank;
        for (size_t k = 0; k < order.size(); ++k) rank[order[k]] = static_cast<int>(k);
        return rank;
    };
    const auto rb = ranks(before), ra = ranks(after);
    long sum = 0;
    for (int i : common) sum += std::abs(rb.at(i) - ra.at(i));
    return {static_cast<int>(common.size()), static_cast<double>(sum) / static_cast<double>(common.size())};
}

std::optional<double> median(std::vector<double> v)
{
    if (v.empty()) return std::nullopt;
    std::sort(v.begin(), v.end());
    const size_t n = v.size();
    return n % 2 ? v[n / 2] : (v[n / 2 - 1] + v[n / 2]) / 2;
}

/// The selection of the watch: Elo runs over the group's whole record so that
/// ratings at the window's start carry their history; the window only
/// chooses the periods shown.
SelectionOptions watchSelection(const StabilityOptions& o)
{
    SelectionOptions so;
    so.group = o.group;
    so.draws = o.elo.draws;
    return so;
}

/// The watch over a selection made by watchSelection; `behaviourOf(i)` is the
/// behaviour code of the selection's source encounter i.
template <typename BehaviourOf>
StabilitySeries watch(const EncounterSelection& sel, const BehaviourOf& behaviourOf, const ResidenceIndex& where,
                      const Matrilines& lines, const StabilityOptions& o)
{
    StabilitySeries series;
    series.group = o.group;
    series.length = o.length;
    if (sel.bouts.empty()) return series;
    const Day from = std::max(o.from.value_or(*sel.firstDay), *sel.firstDay);
    const Day to = std::min(o.to.value_or(*sel.lastDay), *sel.lastDay);
    if (from > to) return series;
    const std::vector<CalendarPeriod> periods = periodsCovering(from, to, o.length);
    series.periods.resize(periods.size());
    for (size_t p = 0; p < periods.size(); ++p) series.periods[p].period = periods[p];

    const int n = sel.size();
    // Each animal's matriline (its matriarch's id), as an index into lineNames.
    std::vector<std::string> lineNames;
    std::vector<int> lineOf(static_cast<size_t>(n));
    {
        std::map<std::string, int> known;
        for (int i = 0; i < n; ++i) {
            const int node = lines.index(sel.ids[static_cast<size_t>(i)]);
            const std::string name = node >= 0 ? lines.id(lines.matriarch(node)) : sel.ids[static_cast<size_t>(i)];
            const auto [it, added] = known.emplace(name, static_cast<int>(lineNames.size()));
            if (added) lineNames.push_back(name);
            lineOf[static_cast<size_t>(i)] = it->second;
        }
    }
    std::vector<int> whereOf(static_cast<size_t>(n));
    for (int i = 0; i < n; ++i) whereOf[static_cast<size_t>(i)] = where.animal(sel.ids[static_cast<size_t>(i)]);
    const int groupIndex = o.group.empty() ? -1 : where.group(o.group);
    auto residentOn = [&](int whereIndex, Day d) {
        if (whereIndex < 0) return false;
        const int g = where.groupOn(whereIndex, d);
        return g >= 0 && (groupIndex < 0 || g == groupIndex);
    };

    // Only animals that ever lived in the group can be resident on a day (a
    // centre's other groups' animals would be asked once per watched day each).
    std::vector<int> everResident;
    for (int a = 0; a < where.animalCount(); ++a)
        if (groupIndex < 0 || where.residentDuring(a, std::numeric_limits<Day>::min(), std::numeric_limits<Day>::max(),
                                                   groupIndex))
            everResident.push_back(a);

    std::vector<double> rating(static_cast<size_t>(n), o.elo.start);
    std::vector<unsigned char> rated(static_cast<size_t>(n), 0);
    const bool ignoreDraws = o.elo.draws == DrawPolicy::Ignore;
    detail::EloTally tally;
    std::vector<double> prevRating;
    std::vector<bool> prevIn;
    const int severeAt = o.thresholds.severeAtLeast;
    using DyadKey = std::pair<int, int>;
    size_t b = 0;
    for (size_t p = 0; p < periods.size(); ++p) {
        StabilityPeriod& sp = series.periods[p];
        std::map<DyadKey, CounterDominantDyad> dyads;
        std::map<std::pair<int, int>, int> linePairs; // (winner's line, loser's line) -> count
        std::vector<Day> observedDays;
        for (; b < sel.bouts.size() && sel.days[b] <= periods[p].end; ++b) {
            const Bout& bout = sel.bouts[b];
            const Day d = sel.days[b];
            const auto w = static_cast<size_t>(bout.winner), l = static_cast<size_t>(bout.loser);
            const bool inWindow = d >= periods[p].start;
            if (inWindow) {
                const std::string& behaviour = behaviourOf(sel.source[b]);
                ++sp.encounters;
                if (observedDays.empty() || observedDays.back() != d) observedDays.push_back(d);
                if (const auto it = o.severity.find(behaviour); it != o.severity.end() && it->second >= severeAt) {
                    ++sp.severe;
                    sp.severeEncounters.push_back({d, sel.ids[w], sel.ids[l], behaviour});
                }
                // Ranked just before the encounter: both rated and not tied.
                if (!bout.draw && rated[w] && rated[l] && rating[w] != rating[l]) {
                    ++sp.decided;
                    if (rating[w] < rating[l]) {
                        ++sp.counterDominant;
                        CounterDominantDyad& dy = dyads[{bout.winner, bout.loser}];
                        if (dy.count++ == 0) {
                            dy.winner = sel.ids[w];
                            dy.loser = sel.ids[l];
                            dy.winnerLine = lineNames[static_cast<size_t>(lineOf[w])];
                            dy.loserLine = lineNames[static_cast<size_t>(lineOf[l])];
                        }
                        if (dy.dates.empty() || dy.dates.back() != d) dy.dates.push_back(d);
                        ++linePairs[{lineOf[w], lineOf[l]}];
                    }
                }
            }
            // The shared Elo kernel, one bout at a time: the watch reads ratings between bouts.
            detail::eloStepsFor<false>(o.elo.curve, &bout, &bout + 1, rating.data(), rated.data(), o.elo.k,
                                       ignoreDraws, tally);
        }
        if (sp.decided > 0) sp.counterShare = static_cast<double>(sp.counterDominant) / sp.decided;
        sp.dyads.reserve(dyads.size());
        for (auto& [key, dy] : dyads) sp.dyads.push_back(std::move(dy));
        // In line-name order, as before the lines were numbered (the sorts below are stable).
        std::map<std::pair<std::string, std::string>, int> pairs;
        for (const auto& [key, count] : linePairs)
            pairs.emplace(std::make_pair(lineNames[static_cast<size_t>(key.first)],
                                         lineNames[static_cast<size_t>(key.second)]),
                          count);
        std::stable_sort(sp.dyads.begin(), sp.dyads.end(),
                         [](const CounterDominantDyad& x, const CounterDominantDyad& y) { return x.count > y.count; });
        for (const auto& [key, count] : pairs) sp.matrilinePairs.push_back({key.first, key.second, count});
        std::stable_sort(sp.matrilinePairs.begin(), sp.matrilinePairs.end(),
                         [](const MatrilinePairCount& x, const MatrilinePairCount& y) { return x.count > y.count; });
        {
            std::map<std::pair<std::string, std::string>, int> both;
            for (const auto& [key, count] : pairs)
                if (key.first != key.second) both[std::minmax(key.first, key.second)] += count;
            for (const auto& [key, count] : both) {
                if (sp.topLinePair && sp.topLinePair->count >= count) continue;
                const auto forward = pairs.find(key), backward = pairs.find({key.second, key.first});
                const int f = forward == pairs.end() ? 0 : forward->second;
                const int r = backward == pairs.end() ? 0 : backward->second;
                sp.topLinePair = f >= r ? MatrilinePairCount{key.first, key.second, count}
                                        : MatrilinePairCount{key.second, key.first, count};
            }
        }

        // Animal-days count the residents of the days someone watched the group.
        for (Day d : observedDays)
            for (int a : everResident)
                if (residentOn(a, d)) ++sp.animalDays;
        if (sp.animalDays > 0) sp.severePerAnimalDay = static_cast<double>(sp.severe) / static_cast<double>(sp.animalDays);

        std::vector<bool> in(static_cast<size_t>(n), false);
        for (int i = 0; i < n; ++i)
            in[static_cast<size_t>(i)] = rated[static_cast<size_t>(i)] && residentOn(whereOf[static_cast<size_t>(i)], periods[p].end);
        if (!prevRating.empty()) {
            const auto [count, change] = rankChange(prevRating, prevIn, rating, in);
            sp.rankedAnimals = count;
            sp.rankChangePerAnimal = change;
        }
        prevRating = rating;
        prevIn = std::move(in);
    }

    std::vector<double> rates;
    for (const StabilityPeriod& sp : series.periods)
        if (sp.severePerAnimalDay) rates.push_back(*sp.severePerAnimalDay);
    series.medianSevereRate = median(rates);

    const StabilityThresholds& t = o.thresholds;
    for (size_t p = 0; p < series.periods.size(); ++p) {
        const StabilityPeriod& sp = series.periods[p];
        const double days = static_cast<double>(sp.period.end - sp.period.start + 1);
        if (sp.counterShare && sp.decided >= t.minDecided && *sp.counterShare > t.counterShare && sp.topLinePair &&
            sp.topLinePair->count >= t.linePairPerWeek * days / 7.0)
            series.alerts.push_back({p, StabilitySignal::CounterDominance, *sp.counterShare, t.counterShare});
        if (t.rankChangePerAnimal > 0 && sp.rankChangePerAnimal && *sp.rankChangePerAnimal > t.rankChangePerAnimal)
            series.alerts.push_back({p, StabilitySignal::RankChanges, *sp.rankChangePerAnimal, t.rankChangePerAnimal});
        if (series.medianSevereRate && *series.medianSevereRate > 0 && sp.severePerAnimalDay &&
            sp.severe >= t.minSevere && *sp.severePerAnimalDay > t.severeFactor * *series.medianSevereRate)
            series.alerts.push_back({p, StabilitySignal::SevereAggression, *sp.severePerAnimalDay,
                                     t.severeFactor * *series.medianSevereRate});
    }
    return series;
}

} // namespace

StabilitySeries stabilityWatch(const Colony& colony, const ResidenceIndex& where, const Matrilines& lines,
                               const StabilityOptions& o)
{
    const EncounterSelection sel = selectEncounters(colony, where, watchSelection(o));
    return watch(sel, [&](size_t i) -> const std::string& { return colony.encounters[i].behaviour; }, where, lines, o);
}

StabilitySeries stabilityWatch(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                               const ResidenceIndex& where, const Matrilines& lines, const StabilityOptions& o)
{
    const EncounterSelection sel = selectEncounters(encounters, animals, where, watchSelection(o));
    return watch(
        sel,
        [&](size_t i) -> const std::string& { return encounters.behaviours.name(encounters.records[i].behaviour); },
        where, lines, o);
}

std::string describeAlert(const StabilitySeries& series, const StabilityAlert& alert)
{
    const StabilityPeriod& sp = series.periods.at(alert.period);
    const std::string when = formatDate(sp.period.start) + " to " + formatDate(sp.period.end);
    auto pct = [](double v) { return formatNumber(static_cast<double>(static_cast<long>(v * 1000 + 0.5)) / 10) + "%"; };
    std::string text;
    switch (alert.signal) {
    case StabilitySignal::CounterDominance: {
        text = when + ": " + pct(alert.value) + " of " + std::to_string(sp.decided) +
               " decided encounters won by the lower-ranked animal (threshold " + pct(alert.threshold) + ")";
        if (sp.topLinePair)
            text += "; " + std::to_string(sp.topLinePair->count) + " between the matrilines of " +
                    sp.topLinePair->winnerLine + " and " + sp.topLinePair->loserLine;
        // Dyads of the busiest pair of lines first: they carry the alert.
        std::vector<const CounterDominantDyad*> shown;
        for (int pass = 0; pass < 2; ++pass)
            for (const CounterDominantDyad& d : sp.dyads) {
                const bool inPair = sp.topLinePair && ((d.winnerLine == sp.topLinePair->winnerLine &&
                                                        d.loserLine == sp.topLinePair->loserLine) ||
                                                       (d.winnerLine == sp.topLinePair->loserLine &&
                                                        d.loserLine == sp.topLinePair->winnerLine));
                if (inPair == (pass == 0)) shown.push_back(&d);
            }
        if (!shown.empty()) {
            text += "; dyads";
            for (size_t i = 0; i < std::min<size_t>(4, shown.size()); ++i) {
                const CounterDominantDyad& d = *shown[i];
                text += std::string(i ? "," : "") + " " + d.winner + " over " + d.loser + " " +
                        std::to_string(d.count) + "x (" + formatDate(d.dates.front()) +
                        (d.dates.size() > 1 ? ".." + formatDate(d.dates.back()) : "") + ")";
            }
        }
        break;
    }
    case StabilitySignal::RankChanges:
        text = when + ": mean rank change " + formatNumber(static_cast<double>(static_cast<long>(alert.value * 100 + 0.5)) / 100) +
               " places per animal over " + std::to_string(sp.rankedAnimals) + " animals (threshold " +
               formatNumber(alert.threshold) + ")";
        break;
    case StabilitySignal::SevereAggression: {
        text = when + ": " + std::to_string(sp.severe) + " severe encounters in " + std::to_string(sp.animalDays) +
               " animal-days, " + formatNumber(static_cast<double>(static_cast<long>(alert.value / series.medianSevereRate.value_or(alert.value) * 10 + 0.5)) / 10) +
               " times the record's median rate";
        std::vector<Day> dates;
        for (const SevereEncounter& e : sp.severeEncounters)
            if (dates.empty() || dates.back() != e.date) dates.push_back(e.date);
        text += "; dates";
        for (size_t i = 0; i < std::min<size_t>(5, dates.size()); ++i) text += (i ? ", " : " ") + formatDate(dates[i]);
        if (dates.size() > 5) text += ", ...";
        break;
    }
    }
    return text;
}

} // namespace hierloom::core
