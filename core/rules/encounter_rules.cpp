// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/rules/encounter_rules.h"

#include "core/rules/record_messages.h"
#include "core/rules/support_rules.h"

namespace hierloom::core {

const char* ruleName(EncounterRule rule)
{
    switch (rule) {
    case EncounterRule::DateNotInFuture: return "encounter date not in the future";
    case EncounterRule::TimeOfDay: return "encounter time of day";
    case EncounterRule::AnimalKnown: return "encounter animals known";
    case EncounterRule::TwoAnimals: return "encounter of two animals";
    case EncounterRule::OutcomeKnown: return "encounter outcome decided or draw";
    case EncounterRule::AliveThatDay: return "animals alive that day";
    case EncounterRule::InAGroup: return "animals in a group that day";
    case EncounterRule::SameGroup: return "animals in the same group";
    case EncounterRule::GroupAsGiven: return "group as given";
    case EncounterRule::TextFields: return "encounter text without control characters";
    case EncounterRule::Count: break;
    }
    return "?";
}

std::string notATimeOfDay(std::string_view shown)
{
    return quotedValue(shown) + " is not a time of day in the form HH:MM (24 h)";
}

std::string notAnOutcome(std::string_view shown) { return quotedValue(shown) + " must be decided or draw"; }

namespace {

constexpr std::string_view kColony = "the colony";

std::string unknownAnimal(const std::string& id) { return id.empty() ? std::string("is empty") : notAnAnimalOf(id, kColony); }

std::string notAlive(std::string_view id, Day d) { return quotedValue(id) + " was not alive in the colony on " + formatDate(d); }

std::string inNoGroup(std::string_view id, Day d) { return quotedValue(id) + " was in no group on " + formatDate(d); }

/// Minutes shown as the clock would (25:00 for 1500), so that the form and an import file name a bad time alike.
std::string shownTime(int minutes) { return minutes < 0 ? std::to_string(minutes) : formatTimeOfDay(minutes); }

} // namespace

namespace {

/// The rules about the winner and the loser (EncounterRule).
const std::string* checkPair(const Encounter& e, const ResidenceIndex& where, Day today, FieldProblems& out,
                             bool dateRead)
{
    // EncounterRule::DateNotInFuture, TimeOfDay
    const bool dateOk = dateRead && e.date <= today;
    if (dateRead && !dateOk) out.push_back({"date", inTheFuture(e.date)});
    if (e.time && (*e.time < 0 || *e.time > 1439)) out.push_back({"time", notATimeOfDay(shownTime(*e.time))});

    // EncounterRule::AnimalKnown, TwoAnimals
    const int wi = where.animal(e.winner);
    const int li = where.animal(e.loser);
    if (wi < 0) out.push_back({"winner", unknownAnimal(e.winner)});
    if (li < 0) out.push_back({"loser", unknownAnimal(e.loser)});
    if (wi >= 0 && wi == li) out.push_back({"loser", quotedValue(e.loser) + " is also the winner; an encounter needs two animals"});

    // EncounterRule::TextFields (reported with the other rules of the record itself)
    checkPlainText(e.behaviour, "behaviour", out);
    checkPlainText(e.group, "group", out);
    checkPlainText(e.observer, "observer", out);
    checkPlainText(e.note, "note", out);

    // EncounterRule::OutcomeKnown (an Outcome holding another value)
    if (e.outcome != Outcome::Decided && e.outcome != Outcome::Draw)
        out.push_back({"outcome", notAnOutcome(std::to_string(static_cast<int>(e.outcome)))});
    if (!dateOk || wi < 0 || li < 0 || wi == li) return nullptr;

    // EncounterRule::AliveThatDay, InAGroup
    bool bad = false;
    int groups[2] = {-1, -1};
    const int who[2] = {wi, li};
    const char* column[2] = {"winner", "loser"};
    for (int k = 0; k < 2; ++k) {
        const std::string& id = k == 0 ? e.winner : e.loser;
        if (!where.presentOn(who[k], e.date)) {
            out.push_back({column[k], notAlive(id, e.date)});
            bad = true;
        } else if ((groups[k] = where.groupOn(who[k], e.date)) < 0) {
            out.push_back({column[k], inNoGroup(id, e.date)});
            bad = true;
        }
    }
    if (bad) return nullptr;

    // EncounterRule::SameGroup, GroupAsGiven
    const std::string& winnerGroup = where.groups()[static_cast<std::size_t>(groups[0])];
    if (groups[0] != groups[1]) {
        out.push_back({"loser", quotedValue(e.loser) + " was in group " +
                                    quotedValue(where.groups()[static_cast<std::size_t>(groups[1])]) + " on " +
                                    formatDate(e.date) + ", not with " + e.winner + " in " + quotedValue(winnerGroup)});
        return nullptr;
    }
    if (!e.group.empty() && e.group != winnerGroup) {
        out.push_back({"group", quotedValue(e.group) + " differs from the group both animals were in on " +
                                    formatDate(e.date) + " (" + quotedValue(winnerGroup) + ")"});
        return nullptr;
    }
    return &winnerGroup;
}

} // namespace

const std::string* checkEncounterRow(const Encounter& e, const ResidenceIndex& where, Day today, FieldProblems& out,
                                     bool dateRead)
{
    const std::string* shared = checkPair(e, where, today, out, dateRead);
    // The supporters' rules (core/rules/support_rules.h), after the pair's.
    if (!e.winnerSupport.empty() || !e.loserSupport.empty()) checkSupporters(e, where, shared, out);
    return shared;
}

FieldProblems checkEncounter(Encounter& e, const ResidenceIndex& where, Day today)
{
    FieldProblems out;
    const std::string* shared = checkEncounterRow(e, where, today, out);
    if (shared && out.empty()) e.group = *shared;
    return out;
}

std::optional<std::string> checkEncounterAnimal(const std::string& id, const std::string& group, Day date,
                                                const ResidenceIndex& where)
{
    const int a = where.animal(id);
    if (a < 0) return notAnAnimalOf(id, kColony);
    if (!where.presentOn(a, date)) return notAlive(id, date);
    const int g = where.groupOn(a, date);
    if (g < 0) return inNoGroup(id, date);
    const std::string& actual = where.groups()[static_cast<std::size_t>(g)];
    if (!group.empty() && actual != group)
        return quotedValue(id) + " was in group " + quotedValue(actual) + " on " + formatDate(date) + ", not in " + quotedValue(group);
    return std::nullopt;
}

} // namespace hierloom::core
