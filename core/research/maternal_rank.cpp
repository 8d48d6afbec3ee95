// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/maternal_rank.h"

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
    switch (reason) {
    case BirthExclusion::None: return "used";
    case BirthExclusion::UnknownMother: return "the mother is not recorded";
    case BirthExclusion::UnknownSex: return "the offspring's sex is unknown";
    case BirthExclusion::MotherNotResident: return "the mother was not resident (in the group) at conception";
    case BirthExclusion::MotherNotMature: return "the mother was younger than the maturity age at conception";
    case BirthExclusion::MotherNotRated: return "the mother had no Elo rating at conception";
    case BirthExclusion::FewerThanTwoRanked: return "fewer than two females were ranked at conception";
    }
    return "";
}

namespace {

/// The ranked females of one day: ordinal ranks (0 = not ranked) and m.
struct DayRanking {
    std::vector<int> rank;
    int m = 0;
};

} // namespace

std::vector<MaternalRankRow> computeMaternalRanks(const Colony& colony, const ResidenceIndex& where,
                                                  const MaternalRankOptions& o)
{
    const int group = o.group.empty() ? -1 : where.group(o.group);
    std::vector<MaternalRankRow> rows;
    for (const Animal& a : colony.animals) {
        if (!a.birth) continue; // without a birth date there is no birth to place in time
        if ((o.from && *a.birth < *o.from) || (o.to && *a.birth > *o.to)) continue;
        if (!o.group.empty()) {
            int g = -1;
            if (const int k = where.animal(a.id); k >= 0) g = where.groupOn(k, *a.birth);
            if (g < 0 && !a.mother.empty())
                if (const int k = where.animal(a.mother); k >= 0) g = where.groupOn(k, *a.birth);
            if (group < 0 || g != group) continue;
        }
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
    SelectionOptions all;
    all.group = o.group;
    all.draws = o.elo.draws;
    const EncounterSelection sel = selectEncounters(colony, where, all);
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
    }
    return rows;
}

} // namespace hierloom::core
