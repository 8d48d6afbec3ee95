// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/maternal_rank.h"

#include "core/base/display_names.h"
#include "core/ranks/compact_selection.h"
#include "core/ranks/encounter_selection.h"
#include "core/ranks/ordinal_ranks.h"

#include <algorithm>
#include <map>

namespace hierloom::core {

const char* toString(BirthExclusion reason)
{
    switch (reason) {
    case BirthExclusion::None: return "";
    case BirthExclusion::UnknownMother: return "unknown_mother";
    case BirthExclusion::UnknownSex: return "unknown_sex";
    case BirthExclusion::MotherNotResident: return "mother_not_resident";
    case BirthExclusion::MotherNotMature: return "mother_not_mature";
    case BirthExclusion::MotherNotRated: return "no_rating";
    case BirthExclusion::FewerThanTwoRanked: return "fewer_than_two_ranked";
    }
    return "";
}

const char* describe(BirthExclusion reason)
{
    if (reason == BirthExclusion::None) return "used";
    for (const CodeName& c : codeNames())
        if (c.kind == CodeKind::Reason && std::string_view(c.code) == toString(reason)) return c.name;
    return toString(reason);
}

namespace {

/// The ranked females of one day: ordinal ranks (0 = not ranked) and m.
struct DayRanking {
    std::vector<int> rank;
    int m = 0;
};

std::optional<Day> firstEncounterDay(const Colony& colony)
{
    std::optional<Day> first;
    for (const Encounter& e : colony.encounters)
        if (!first || e.date < *first) first = e.date;
    return first;
}

std::optional<Day> firstEncounterDay(const CompactEncounters& encounters)
{
    std::optional<Day> first;
    for (const CompactEncounter& e : encounters.records)
        if (!first || e.date < *first) first = e.date;
    return first;
}

/// The selection the mothers' Elo runs over: the whole record (in the group, if any).
SelectionOptions maternalSelection(const MaternalRankOptions& o)
{
    SelectionOptions all;
    all.group = o.group;
    all.draws = o.elo.draws;
    return all;
}

/// In the window and (with a group) the group: the offspring, else its mother, there on the birth day.
bool inBirthSelection(const Animal& a, const ResidenceIndex& where, const MaternalRankOptions& o, int group)
{
    if ((o.from && *a.birth < *o.from) || (o.to && *a.birth > *o.to)) return false;
    if (o.group.empty()) return true;
    int g = -1;
    if (const int k = where.animal(a.id); k >= 0) g = where.groupOn(k, *a.birth);
    if (g < 0 && !a.mother.empty())
        if (const int k = where.animal(a.mother); k >= 0) g = where.groupOn(k, *a.birth);
    return group >= 0 && g == group;
}

/// What happened when the mother was not resident (in the group) on `day`.
std::string notResidentDetail(const std::string& mother, const ResidenceIndex& where, Day day, int group,
                              std::optional<Day> recordStart)
{
    if (recordStart && day < *recordStart)
        return "conceived on " + formatDate(day) + ", before the record began on " + formatDate(*recordStart);
    const int k = where.animal(mother);
    if (k < 0 || where.stints(k).empty()) return "the mother " + mother + " has no stay in the colony's record";
    const auto& stints = where.stints(k);
    if (day < stints.front().from)
        return "the mother " + mother + " arrived on " + formatDate(stints.front().from) + ", after conception";
    if (day > stints.back().to)
        return "the mother " + mother + " had left on " + formatDate(stints.back().to) + ", before conception";
    const int on = where.groupOn(k, day);
    if (on >= 0 && group >= 0 && on != group)
        return "the mother " + mother + " was in group " + where.groups()[static_cast<size_t>(on)] + " at conception";
    return "the mother " + mother + " was away from the colony at conception";
}

} // namespace

namespace {

/// countNonBirths with the record's first encounter day given.
BirthCounting nonBirthsOf(const std::vector<Animal>& animals, std::optional<Day> recordStart,
                          const ResidenceIndex& where, const MaternalRankOptions& o)
{
    BirthCounting c;
    c.recordStart = recordStart;
    const int group = o.group.empty() ? -1 : where.group(o.group);
    for (const Animal& a : animals) {
        if (!a.birth || !inBirthSelection(a, where, o, group)) continue;
        if (a.entryType == EntryType::Founder) ++c.founders;
        else if (c.recordStart && *a.birth < *c.recordStart) ++c.bornBefore;
    }
    return c;
}

/// computeMaternalRanks of the selection maternalSelection(o) made from the
/// colony's encounters in either form; `colony`'s animals are read, not its
/// encounters.
std::vector<MaternalRankRow> maternalRanksOf(const Colony& colony, std::optional<Day> recordStart,
                                             const EncounterSelection& sel, const ResidenceIndex& where,
                                             const MaternalRankOptions& o)
{
    const int group = o.group.empty() ? -1 : where.group(o.group);
    std::vector<MaternalRankRow> rows;
    for (const Animal& a : colony.animals) {
        if (!a.birth) continue; // without a birth date there is no birth to place in time
        // Founders and animals born before the record began are not births of the record.
        if (a.entryType == EntryType::Founder || (recordStart && *a.birth < *recordStart)) continue;
        if (!inBirthSelection(a, where, o, group)) continue;
        MaternalRankRow r;
        r.offspring = a.id;
        r.mother = a.mother;
        r.sex = a.sex;
        r.birth = *a.birth;
        r.atConception.day = *a.birth - o.gestationDays;
        r.atBirth.day = *a.birth;
        rows.push_back(std::move(r));
    }
    std::sort(rows.begin(), rows.end(), [](const MaternalRankRow& x, const MaternalRankRow& y) {
        return x.birth != y.birth ? x.birth < y.birth : x.offspring < y.offspring;
    });

    // Elo over the whole record (in the group, if any), read once at every
    // day some mother is ranked on: one pass through the encounters.
    std::map<Day, size_t> dayIndex;
    for (const MaternalRankRow& r : rows) {
        if (r.mother.empty()) continue;
        dayIndex.emplace(r.atConception.day, 0);
        dayIndex.emplace(r.atBirth.day, 0);
    }
    std::vector<Day> days;
    std::vector<size_t> counts;
    for (auto& [d, idx] : dayIndex) {
        idx = days.size();
        days.push_back(d);
        counts.push_back(static_cast<size_t>(std::upper_bound(sel.days.begin(), sel.days.end(), d) - sel.days.begin()));
    }
    const std::vector<EloRun> runs = eloAtCheckpoints(sel.size(), sel.bouts, counts, o.elo);

    auto mature = [&](const std::string& id, Day d) {
        const int k = colony.animalIndex(id);
        if (k < 0) return true;
        const Animal& a = colony.animals[static_cast<size_t>(k)];
        return !a.birth || d >= anniversary(*a.birth, o.maturityYears); // unknown birth date counts as mature
    };
    std::vector<DayRanking> rankings(days.size());
    for (size_t c = 0; c < days.size(); ++c) {
        std::vector<bool> include = residentMask(sel.ids, where, days[c], o.group);
        for (size_t i = 0; i < include.size(); ++i) {
            const int k = colony.animalIndex(sel.ids[i]);
            include[i] = include[i] && runs[c].rated[i] && k >= 0 &&
                         colony.animals[static_cast<size_t>(k)].sex == Sex::Female && mature(sel.ids[i], days[c]);
        }
        rankings[c].rank = ordinalRanks(runs[c].rating, include);
        rankings[c].m = static_cast<int>(std::count(include.begin(), include.end(), true));
    }

    auto rankAt = [&](const std::string& mother, MaternalRankAt& at) {
        const DayRanking& day = rankings[dayIndex.at(at.day)];
        at.rankedFemales = day.m;
        const int k = where.animal(mother);
        const int on = k >= 0 ? where.groupOn(k, at.day) : -1;
        if (on < 0 || (group >= 0 && on != group)) {
            at.problem = BirthExclusion::MotherNotResident;
            return;
        }
        if (!mature(mother, at.day)) {
            at.problem = BirthExclusion::MotherNotMature;
            return;
        }
        const int i = sel.indexOf(mother);
        if (i < 0 || day.rank[static_cast<size_t>(i)] == 0) {
            at.problem = BirthExclusion::MotherNotRated;
            return;
        }
        at.rank = day.rank[static_cast<size_t>(i)];
        if (day.m < 2) {
            at.problem = BirthExclusion::FewerThanTwoRanked;
            return;
        }
        at.relativeRank = 1.0 - static_cast<double>(*at.rank - 1) / static_cast<double>(day.m - 1);
    };
    for (MaternalRankRow& r : rows) {
        if (r.mother.empty()) {
            r.atConception.problem = r.atBirth.problem = r.exclusion = BirthExclusion::UnknownMother;
            continue;
        }
        rankAt(r.mother, r.atConception);
        rankAt(r.mother, r.atBirth);
        r.exclusion = r.sex == Sex::Unknown ? BirthExclusion::UnknownSex : r.atConception.problem;
        if (r.exclusion == BirthExclusion::MotherNotResident) {
            r.detail = notResidentDetail(r.mother, where, r.atConception.day, group, recordStart);
            r.conceivedBeforeRecord = recordStart && r.atConception.day < *recordStart;
        }
    }
    return rows;
}

} // namespace

BirthCounting countNonBirths(const Colony& colony, const ResidenceIndex& where, const MaternalRankOptions& o)
{
    return nonBirthsOf(colony.animals, firstEncounterDay(colony), where, o);
}

BirthCounting countNonBirths(const CompactEncounters& encounters, const Colony& pedigree, const ResidenceIndex& where,
                             const MaternalRankOptions& o)
{
    return nonBirthsOf(pedigree.animals, firstEncounterDay(encounters), where, o);
}

std::vector<MaternalRankRow> computeMaternalRanks(const Colony& colony, const ResidenceIndex& where,
                                                  const MaternalRankOptions& o)
{
    return maternalRanksOf(colony, firstEncounterDay(colony), selectEncounters(colony, where, maternalSelection(o)),
                           where, o);
}

std::vector<MaternalRankRow> computeMaternalRanks(const CompactEncounters& encounters, const Colony& pedigree,
                                                  const ResidenceIndex& where, const MaternalRankOptions& o)
{
    return maternalRanksOf(pedigree, firstEncounterDay(encounters),
                           selectEncounters(encounters, pedigree.animals, where, maternalSelection(o)), where, o);
}

} // namespace hierloom::core
