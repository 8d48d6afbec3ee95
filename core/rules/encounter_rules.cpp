// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/encounter_rules.h"

namespace hierloom::core {

// The wording below is the import's (core/store/colony_import.cpp, planEncounters),
// so a row refused by the form reads as it would in an import report.
FieldProblems checkEncounter(Encounter& e, const ResidenceIndex& where, Day today)
{
    FieldProblems out;
    bool dateOk = true;
    if (e.date > today) {
        out.push_back({"date", quotedValue(formatDate(e.date)) + " is in the future"});
        dateOk = false;
    }
    if (e.time && (*e.time < 0 || *e.time > 1439)) {
        out.push_back({"time", quotedValue(std::to_string(*e.time)) + " is not a time of day in the form HH:MM (24 h)"});
    }
    const std::string& w = e.winner;
    const std::string& l = e.loser;
    const int wi = where.animal(w);
    const int li = where.animal(l);
    if (wi < 0) out.push_back({"winner", w.empty() ? std::string("is empty") : quotedValue(w) + " is not an animal of the colony"});
    if (li < 0) out.push_back({"loser", l.empty() ? std::string("is empty") : quotedValue(l) + " is not an animal of the colony"});
    if (wi >= 0 && wi == li) out.push_back({"loser", quotedValue(l) + " is also the winner; an encounter needs two animals"});
    if (!dateOk || wi < 0 || li < 0 || wi == li) return out;

    bool bad = false;
    int groups[2] = {-1, -1};
    const int who[2] = {wi, li};
    const char* column[2] = {"winner", "loser"};
    for (int k = 0; k < 2; ++k) {
        const std::string& id = k == 0 ? w : l;
        if (!where.presentOn(who[k], e.date)) {
            out.push_back({column[k], quotedValue(id) + " was not alive in the colony on " + formatDate(e.date)});
            bad = true;
        } else if ((groups[k] = where.groupOn(who[k], e.date)) < 0) {
            out.push_back({column[k], quotedValue(id) + " was in no group on " + formatDate(e.date)});
            bad = true;
        }
    }
    if (bad) return out;
    if (groups[0] != groups[1]) {
        out.push_back({"loser", quotedValue(l) + " was in group " + quotedValue(where.groups()[static_cast<size_t>(groups[1])]) +
                                    " on " + formatDate(e.date) + ", not with " + w + " in " +
                                    quotedValue(where.groups()[static_cast<size_t>(groups[0])])});
        return out;
    }
    const std::string& shared = where.groups()[static_cast<size_t>(groups[0])];
    if (!e.group.empty() && e.group != shared) {
        out.push_back({"group", quotedValue(e.group) + " differs from the group both animals were in on " +
                                    formatDate(e.date) + " (" + quotedValue(shared) + ")"});
        return out;
    }
    if (out.empty()) e.group = shared;
    return out;
}

std::optional<std::string> checkEncounterAnimal(const std::string& id, const std::string& group, Day date,
                                                const ResidenceIndex& where)
{
    const int a = where.animal(id);
    if (a < 0) return quotedValue(id) + " is not an animal of the colony";
    if (!where.presentOn(a, date)) return quotedValue(id) + " was not alive in the colony on " + formatDate(date);
    const int g = where.groupOn(a, date);
    if (g < 0) return quotedValue(id) + " was in no group on " + formatDate(date);
    const std::string& actual = where.groups()[static_cast<size_t>(g)];
    if (!group.empty() && actual != group)
        return quotedValue(id) + " was in group " + quotedValue(actual) + " on " + formatDate(date) + ", not in " + quotedValue(group);
    return std::nullopt;
}

} // namespace hierloom::core
