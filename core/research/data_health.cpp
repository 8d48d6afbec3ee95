// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/data_health.h"
#include "core/base/analysis_order.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/parallel_randomisation.h"
#include "core/ranks/randomised_elo.h"
#include "core/stats/cohens_kappa.h"

#include <algorithm>
#include <cstdlib>
#include <limits>
#include <map>
#include <set>
#include <string_view>
#include <unordered_map>

namespace hierloom::core {

namespace {

bool inWindow(const Encounter& e, std::optional<Day> from, Day to, const std::string& group)
{
    return (!from || e.date >= *from) && e.date <= to && (group.empty() || e.group == group);
}

/// What data health reads of encounters held as a Colony's `Encounter`s:
/// encounter i's fields, texts by reference.
struct EncounterRows {
    const std::vector<Encounter>& encounters;

    size_t size() const { return encounters.size(); }
    Day date(size_t i) const { return encounters[i].date; }
    std::optional<int> time(size_t i) const { return encounters[i].time; }
    std::int64_t seq(size_t i) const { return encounters[i].seq; }
    bool draw(size_t i) const { return encounters[i].outcome == Outcome::Draw; }
    const std::string& winner(size_t i) const { return encounters[i].winner; }
    const std::string& loser(size_t i) const { return encounters[i].loser; }
    const std::string& group(size_t i) const { return encounters[i].group; }
    const std::string& observer(size_t i) const { return encounters[i].observer; }
};

/// The same fields of compact records, texts through their code tables.
struct CompactRows {
    const CompactEncounters& encounters;

    size_t size() const { return encounters.records.size(); }
    Day date(size_t i) const { return encounters.records[i].date; }
    std::optional<int> time(size_t i) const
    {
        const int t = encounters.records[i].time;
        return t < 0 ? std::nullopt : std::optional<int>(t);
    }
    std::int64_t seq(size_t i) const { return encounters.records[i].seq; }
    bool draw(size_t i) const { return encounters.records[i].draw; }
    const std::string& winner(size_t i) const { return encounters.animals.name(encounters.records[i].winner); }
    const std::string& loser(size_t i) const { return encounters.animals.name(encounters.records[i].loser); }
    const std::string& group(size_t i) const { return encounters.groups.name(encounters.records[i].group); }
    const std::string& observer(size_t i) const { return encounters.observers.name(encounters.records[i].observer); }
};

template <class Rows> bool inWindow(const Rows& rows, size_t i, std::optional<Day> from, Day to, const std::string& group)
{
    const Day d = rows.date(i);
    return (!from || d >= *from) && d <= to && (group.empty() || rows.group(i) == group);
}

/// Row i's place in the analysis order (core/base/analysis_order.h).
template <class Rows> AnalysisOrderKey orderKey(const Rows& rows, size_t i)
{
    return {rows.date(i), rows.time(i).value_or(24 * 60), rows.seq(i)};
}

/// Direction of an encounter seen from its dyad (ids in byte order): 0 the
/// first id won, 1 the second won, 2 a draw.
template <class Rows> int direction(const Rows& rows, size_t i)
{
    if (rows.draw(i)) return 2;
    return rows.winner(i) < rows.loser(i) ? 0 : 1;
}

/// The two ids of an encounter in byte order, viewed in place.
template <class Rows> std::pair<std::string_view, std::string_view> dyadOf(const Rows& rows, size_t i)
{
    const std::string& w = rows.winner(i);
    const std::string& l = rows.loser(i);
    return w < l ? std::make_pair(std::string_view(w), std::string_view(l))
                 : std::make_pair(std::string_view(l), std::string_view(w));
}

/// Matches two observers' encounters of one group and day: same dyad, times
/// at most `tolerance` minutes apart (closest first, then entry order); an
/// encounter without a time matches one of the same dyad without a time.
template <class Rows>
void matchDay(const Rows& rows, const std::vector<size_t>& a, const std::vector<size_t>& b, int tolerance,
              ObserverAgreement& out, std::vector<std::vector<int>>& table)
{
    std::vector<bool> used(b.size(), false);
    int matched = 0;
    for (const size_t x : a) {
        const auto dyad = dyadOf(rows, x);
        const std::optional<int> tx = rows.time(x);
        int best = -1;
        int bestGap = 0;
        for (size_t j = 0; j < b.size(); ++j) {
            if (used[j] || dyadOf(rows, b[j]) != dyad) continue;
            const std::optional<int> tb = rows.time(b[j]);
            if (tx.has_value() != tb.has_value()) continue;
            const int gap = tx ? std::abs(*tx - *tb) : 0;
            if (gap > tolerance) continue;
            if (best < 0 || gap < bestGap) {
                best = static_cast<int>(j);
                bestGap = gap;
            }
        }
        if (best < 0) continue;
        used[static_cast<size_t>(best)] = true;
        ++matched;
        const int da = direction(rows, x);
        const int db = direction(rows, b[static_cast<size_t>(best)]);
        ++table[static_cast<size_t>(da)][static_cast<size_t>(db)];
        if (da == db) ++out.agreeing;
    }
    out.matched += matched;
    out.onlyFirst += static_cast<int>(a.size()) - matched;
    out.onlySecond += static_cast<int>(b.size()) - matched;
}

/// Small integer ids for strings seen many times (animal ids, observer names),
/// viewed in place: the encounters outlive the tally.
class Interned {
public:
    int id(const std::string& text)
    {
        const auto [it, added] = ids_.try_emplace(text, static_cast<int>(texts_.size()));
        if (added) texts_.push_back(&text);
        return it->second;
    }
    int find(const std::string& text) const
    {
        const auto it = ids_.find(text);
        return it == ids_.end() ? -1 : it->second;
    }
    const std::string& text(int id) const { return *texts_[static_cast<size_t>(id)]; }
    int size() const { return static_cast<int>(texts_.size()); }

private:
    std::unordered_map<std::string_view, int> ids_;
    std::vector<const std::string*> texts_;
};

/// Encounters and the days they fell on, of one animal, observer or month.
struct Tally {
    int encounters = 0;
    std::vector<Day> days;
    std::vector<int> animals; ///< months only: interned animal ids

    /// Distinct values of a list (sorts it).
    template <typename T>
    static int distinct(std::vector<T>& values)
    {
        std::sort(values.begin(), values.end());
        return static_cast<int>(std::unique(values.begin(), values.end()) - values.begin());
    }
};

/// Effort of the window's encounters per animal, observer and month.
struct EffortTallies {
    Interned animalIds;
    Interned observerIds;
    std::vector<Tally> animals;   ///< by interned animal id
    std::vector<Tally> observers; ///< by interned observer
    std::map<std::pair<int, unsigned>, Tally> months;

    template <class Rows> void add(const Rows& rows, size_t i)
    {
        const Day date = rows.date(i);
        const CivilDate c = civilFromDay(date);
        Tally& m = months[{c.year, c.month}];
        ++m.encounters;
        m.days.push_back(date);
        for (const std::string* id : {&rows.winner(i), &rows.loser(i)}) {
            const int a = animalIds.id(*id);
            if (a >= static_cast<int>(animals.size())) animals.resize(static_cast<size_t>(a) + 1);
            ++animals[static_cast<size_t>(a)].encounters;
            animals[static_cast<size_t>(a)].days.push_back(date);
            m.animals.push_back(a);
        }
        const int o = observerIds.id(rows.observer(i));
        if (o >= static_cast<int>(observers.size())) observers.resize(static_cast<size_t>(o) + 1);
        ++observers[static_cast<size_t>(o)].encounters;
        observers[static_cast<size_t>(o)].days.push_back(date);
    }
};

/// The last day each animal was seen, in any group, up to day `to`.
template <class Rows> std::unordered_map<std::string_view, Day> lastSeenBy(const Rows& rows, Day to)
{
    std::unordered_map<std::string_view, Day> lastSeen;
    for (size_t i = 0; i < rows.size(); ++i) {
        const Day date = rows.date(i);
        if (date > to) continue;
        for (const std::string* id : {&rows.winner(i), &rows.loser(i)}) {
            auto [it, added] = lastSeen.try_emplace(*id, date);
            if (!added && date > it->second) it->second = date;
        }
    }
    return lastSeen;
}

/// The window's last day, else the file's last encounter day up to today
/// (in any group: a group nobody recorded lately is unseen), else today.
template <class Rows> Day referenceDay(const Rows& rows, const HealthOptions& o, ReferenceDay& kind)
{
    kind = ReferenceDay::WindowEnd;
    if (o.to) return *o.to;
    std::optional<Day> last;
    for (size_t i = 0; i < rows.size(); ++i)
        if (rows.date(i) <= o.today && (!last || rows.date(i) > *last)) last = rows.date(i);
    kind = last ? ReferenceDay::LastRecord : ReferenceDay::Today;
    return last.value_or(o.today);
}

} // namespace

std::vector<std::pair<std::string, int>> encounterCounts(const Colony& colony, std::optional<Day> from,
                                                         std::optional<Day> to, const std::string& group)
{
    std::map<std::string, int> counts;
    for (const Encounter& e : colony.encounters) {
        if (!inWindow(e, from, to.value_or(ResidenceIndex::openEnd), group)) continue;
        ++counts[e.winner];
        ++counts[e.loser];
    }
    return {counts.begin(), counts.end()};
}

std::vector<std::pair<std::string, int>> encounterCounts(const CompactEncounters& encounters, std::optional<Day> from,
                                                         std::optional<Day> to, const std::string& group)
{
    const std::int32_t groupCode = group.empty() ? -1 : encounters.groups.find(group);
    if (!group.empty() && groupCode < 0) return {};
    const Day last = to.value_or(ResidenceIndex::openEnd);
    std::vector<int> counts(static_cast<size_t>(encounters.animals.size()), 0);
    for (const CompactEncounter& e : encounters.records) {
        if ((from && e.date < *from) || e.date > last || (groupCode >= 0 && e.group != groupCode)) continue;
        ++counts[static_cast<size_t>(e.winner)];
        ++counts[static_cast<size_t>(e.loser)];
    }
    std::vector<std::pair<std::string, int>> out;
    for (std::int32_t a = 0; a < encounters.animals.size(); ++a)
        if (counts[static_cast<size_t>(a)] > 0) out.emplace_back(encounters.animals.name(a), counts[static_cast<size_t>(a)]);
    std::sort(out.begin(), out.end());
    return out;
}

namespace {

/// One encounter as the per-period counts need it.
struct CountedEncounter {
    Day date = 0;
    const std::string* winner = nullptr;
    const std::string* loser = nullptr;
};

std::vector<std::map<std::string, RankFlag>> periodFlagsOf(std::vector<CountedEncounter> sorted,
                                                           const std::vector<CalendarPeriod>& periods,
                                                           int minEncounters, bool cumulative)
{
    std::vector<std::map<std::string, RankFlag>> out(periods.size());
    std::stable_sort(sorted.begin(), sorted.end(),
                     [](const CountedEncounter& x, const CountedEncounter& y) { return x.date < y.date; });
    std::map<std::string, int> counts;
    size_t next = 0;
    for (size_t k = 0; k < periods.size(); ++k) {
        const CalendarPeriod& p = periods[k];
        if (!cumulative) {
            counts.clear();
            while (next < sorted.size() && sorted[next].date < p.start) ++next;
        }
        for (; next < sorted.size() && sorted[next].date <= p.end; ++next) {
            ++counts[*sorted[next].winner];
            ++counts[*sorted[next].loser];
        }
        for (const auto& [id, n] : counts) out[k][id] = RankFlag{n, tooFewEncounters(n, minEncounters), std::nullopt};
    }
    return out;
}

std::map<std::string, RankFlag> flagsOf(const std::vector<std::pair<std::string, int>>& counts, int minEncounters)
{
    std::map<std::string, RankFlag> flags;
    for (const auto& [id, n] : counts) flags[id] = RankFlag{n, tooFewEncounters(n, minEncounters), std::nullopt};
    return flags;
}

} // namespace

std::vector<std::map<std::string, RankFlag>> periodRankFlags(const Colony& colony,
                                                             const std::vector<CalendarPeriod>& periods,
                                                             std::optional<Day> from, const std::string& group,
                                                             int minEncounters, bool cumulative)
{
    if (periods.empty()) return {};
    std::vector<CountedEncounter> rows;
    for (const Encounter& e : colony.encounters)
        if (inWindow(e, from, periods.back().end, group)) rows.push_back({e.date, &e.winner, &e.loser});
    return periodFlagsOf(std::move(rows), periods, minEncounters, cumulative);
}

std::vector<std::map<std::string, RankFlag>> periodRankFlags(const CompactEncounters& encounters,
                                                             const std::vector<CalendarPeriod>& periods,
                                                             std::optional<Day> from, const std::string& group,
                                                             int minEncounters, bool cumulative)
{
    if (periods.empty()) return {};
    const std::int32_t groupCode = group.empty() ? -1 : encounters.groups.find(group);
    if (!group.empty() && groupCode < 0) return std::vector<std::map<std::string, RankFlag>>(periods.size());
    const Day last = periods.back().end;
    std::vector<CountedEncounter> rows;
    for (const CompactEncounter& e : encounters.records) {
        if ((from && e.date < *from) || e.date > last || (groupCode >= 0 && e.group != groupCode)) continue;
        rows.push_back({e.date, &encounters.animals.name(e.winner), &encounters.animals.name(e.loser)});
    }
    return periodFlagsOf(std::move(rows), periods, minEncounters, cumulative);
}

std::map<std::string, RankFlag> rankFlags(const Colony& colony, std::optional<Day> from, std::optional<Day> to,
                                          const std::string& group, int minEncounters)
{
    return flagsOf(encounterCounts(colony, from, to, group), minEncounters);
}

std::map<std::string, RankFlag> rankFlags(const CompactEncounters& encounters, std::optional<Day> from,
                                          std::optional<Day> to, const std::string& group, int minEncounters)
{
    return flagsOf(encounterCounts(encounters, from, to, group), minEncounters);
}

namespace {

SelectionOptions intervalSelectionOptions(const HealthOptions& o)
{
    SelectionOptions sel;
    sel.from = o.from;
    sel.to = o.to.value_or(o.today);
    sel.group = o.group;
    sel.draws = o.elo.draws;
    return sel;
}

} // namespace

EncounterSelection eloIntervalSelection(const Colony& colony, const ResidenceIndex& where, const HealthOptions& o)
{
    return selectEncounters(colony, where, intervalSelectionOptions(o));
}

EncounterSelection eloIntervalSelection(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                        const ResidenceIndex& where, const HealthOptions& o)
{
    return selectEncounters(encounters, animals, where, intervalSelectionOptions(o));
}

std::map<std::string, double> eloIntervalWidths(const EncounterSelection& s, const HealthOptions& o,
                                                const std::atomic<bool>* cancel)
{
    std::map<std::string, double> widths;
    if (o.randomisations <= 0) return widths;
    const std::vector<RandomisedEloRow> rows = randomisedElo(s.size(), s.bouts, o.elo, o.randomisations, o.seed,
                                                                    o.threads == 0 ? defaultThreadCount() : o.threads, cancel);
    for (size_t i = 0; i < rows.size(); ++i)
        if (rows[i].rated) widths[s.ids[i]] = rows[i].high - rows[i].low;
    return widths;
}

std::map<std::string, double> eloIntervalWidths(const Colony& colony, const ResidenceIndex& where,
                                                const HealthOptions& o, const std::atomic<bool>* cancel)
{
    if (o.randomisations <= 0) return {};
    return eloIntervalWidths(eloIntervalSelection(colony, where, o), o, cancel);
}

namespace {

/// Data health of `rows` (either form of the same encounters); `select`
/// makes the randomised-Elo selection of the window from them.
template <class Rows, class Select>
DataHealth dataHealthOf(const Rows& rows, const std::vector<Animal>& colonyAnimals, const ResidenceIndex& where,
                        const HealthOptions& o, Select select, const std::atomic<bool>* cancel)
{
    DataHealth h;
    h.reference = referenceDay(rows, o, h.referenceKind);
    h.minEncounters = o.minEncounters;
    h.unseenDays = o.unseenDays;
    const Day to = h.reference;
    const int groupIndex = o.group.empty() ? -1 : where.group(o.group);

    // Effort per animal, observer and month.
    EffortTallies effort;
    for (size_t i = 0; i < rows.size(); ++i)
        if (inWindow(rows, i, o.from, to, o.group)) effort.add(rows, i);
    std::map<std::string, AnimalEffort> animals;
    for (int a = 0; a < effort.animalIds.size(); ++a) {
        Tally& t = effort.animals[static_cast<size_t>(a)];
        AnimalEffort& row = animals[effort.animalIds.text(a)];
        row.encounters = t.encounters;
        row.daysSeen = Tally::distinct(t.days);
    }
    // Residents of the window without any encounter are listed too (with none).
    const Day windowStart = o.from.value_or(std::numeric_limits<int>::min() / 2);
    for (const Animal& a : colonyAnimals) {
        const int i = where.animal(a.id);
        if (!o.group.empty() && groupIndex < 0) break; // no such group: nobody resident in it
        if (i >= 0 && where.residentDuring(i, windowStart, to, groupIndex)) animals[a.id];
    }
    // The last time each animal was seen, in any group, up to the reference day.
    const std::unordered_map<std::string_view, Day> lastSeen = lastSeenBy(rows, to);

    // Randomised-Elo interval widths over the window (docs/methods.md, "Randomised Elo").
    HealthOptions widthOptions = o;
    widthOptions.to = to;
    std::map<std::string, double> widths;
    if (widthOptions.randomisations > 0) widths = eloIntervalWidths(select(widthOptions), widthOptions, cancel);
    for (auto& [id, row] : animals) {
        row.animal = id;
        if (auto it = lastSeen.find(id); it != lastSeen.end()) row.lastSeen = it->second;
        row.fewEncounters = tooFewEncounters(row.encounters, o.minEncounters);
        if (auto it = widths.find(id); it != widths.end()) row.intervalWidth = it->second;
        h.animals.push_back(row);
    }
    std::map<std::string, ObserverEffort> observers;
    for (int k = 0; k < effort.observerIds.size(); ++k) {
        Tally& t = effort.observers[static_cast<size_t>(k)];
        observers[effort.observerIds.text(k)] = {effort.observerIds.text(k), t.encounters, Tally::distinct(t.days)};
    }
    for (const auto& [name, row] : observers) h.observers.push_back(row);
    for (auto& [ym, m] : effort.months)
        h.months.push_back({ym.first, ym.second, m.encounters, Tally::distinct(m.days), Tally::distinct(m.animals)});

    // Residents on the reference day unseen for more than unseenDays days.
    for (const Animal& a : colonyAnimals) {
        const int i = where.animal(a.id);
        if (i < 0 || !where.presentOn(i, to)) continue;
        const int g = where.groupOn(i, to);
        if (g < 0 || (groupIndex >= 0 && g != groupIndex) || (!o.group.empty() && groupIndex < 0)) continue;
        UnseenAnimal u;
        u.animal = a.id;
        if (auto it = lastSeen.find(a.id); it != lastSeen.end()) u.lastSeen = it->second;
        u.since = u.lastSeen ? *u.lastSeen : where.start(i);
        u.days = to - u.since;
        if (u.days > o.unseenDays) h.unseen.push_back(u);
    }
    std::stable_sort(h.unseen.begin(), h.unseen.end(),
                     [](const UnseenAnimal& x, const UnseenAnimal& y) { return x.days > y.days; });

    // Observer agreement: group-days both observers recorded.
    std::map<std::pair<std::string, Day>, std::map<std::string, std::vector<size_t>>> byDay;
    for (size_t i = 0; i < rows.size(); ++i)
        if (inWindow(rows, i, o.from, to, o.group) && !rows.observer(i).empty())
            byDay[{rows.group(i), rows.date(i)}][rows.observer(i)].push_back(i);
    std::map<std::pair<std::string, std::string>, std::pair<ObserverAgreement, std::vector<std::vector<int>>>> pairs;
    for (auto& [day, perObserver] : byDay) {
        for (auto a = perObserver.begin(); a != perObserver.end(); ++a) {
            for (auto b = std::next(a); b != perObserver.end(); ++b) {
                auto& [agreement, table] = pairs[{a->first, b->first}];
                if (table.empty()) table.assign(3, std::vector<int>(3, 0));
                agreement.first = a->first;
                agreement.second = b->first;
                ++agreement.sharedDays;
                for (auto* list : {&a->second, &b->second})
                    *list = analysisOrderOf(std::move(*list), [&rows](size_t i) { return orderKey(rows, i); });
                matchDay(rows, a->second, b->second, o.matchMinutes, agreement, table);
            }
        }
    }
    for (auto& [key, value] : pairs) {
        ObserverAgreement& a = value.first;
        if (a.matched > 0) a.share = static_cast<double>(a.agreeing) / a.matched;
        a.kappa = cohensKappa(value.second).kappa;
        h.agreement.push_back(a);
    }
    return h;
}

} // namespace

DataHealth dataHealth(const Colony& colony, const ResidenceIndex& where, const HealthOptions& o,
                      const std::atomic<bool>* cancel)
{
    return dataHealthOf(
        EncounterRows{colony.encounters}, colony.animals, where, o,
        [&](const HealthOptions& w) { return eloIntervalSelection(colony, where, w); }, cancel);
}

DataHealth dataHealth(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                      const ResidenceIndex& where, const HealthOptions& o, const std::atomic<bool>* cancel)
{
    return dataHealthOf(
        CompactRows{encounters}, animals, where, o,
        [&](const HealthOptions& w) { return eloIntervalSelection(encounters, animals, where, w); }, cancel);
}

} // namespace hierloom::core
