// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <string_view>

namespace hierloom::core {

/// Every rule an encounter obeys (docs/file-formats.md, "encounters.csv"), in the order
/// their problems are reported; the import (also its bulk checking thread),
/// the evening entry and the encounter editor check encounters only here.
enum class EncounterRule {
    DateNotInFuture, // date: not after today
    TimeOfDay,       // time: a time of day
    AnimalKnown,     // winner, loser: given, and an animal of the colony
    TwoAnimals,      // loser: not the winner
    OutcomeKnown,    // outcome: decided or draw
    AliveThatDay,    // winner, loser: alive and in the colony on the date
    InAGroup,        // winner, loser: in some group on the date
    SameGroup,       // loser: in the winner's group on the date
    GroupAsGiven,    // group: if given, the group both were in
    TextFields,      // behaviour, group, observer, note: no control character but tab
    Count
};

const char* ruleName(EncounterRule rule);

/// "'25:00' is not a time of day in the form HH:MM (24 h)": also the import's
/// message for a time it cannot read, so the two read the same.
std::string notATimeOfDay(std::string_view shown);
/// "'won' must be decided or draw": likewise for an outcome.
std::string notAnOutcome(std::string_view shown);

/// Appends the problems of `e` (its supporters' too, support_rules.h) to `out`
/// without building any text while the encounter passes; `dateRead` false (the import could not read the date)
/// leaves out the rules about that day. Returns the group both animals were
/// in when every rule about the day passed, else nullptr.
const std::string* checkEncounterRow(const Encounter& e, const ResidenceIndex& where, Day today, FieldProblems& out,
                                     bool dateRead = true);

/// Every encounter rule for one encounter typed or edited by hand; fills
/// `e.group` with the shared group when it passes.
FieldProblems checkEncounter(Encounter& e, const ResidenceIndex& where, Day today);

/// The message for one animal typed into an encounter of `group` on `date`
/// (unknown id, not alive that day, in no group or in another group), or
/// nothing when it fits; lets a form flag a wrong id before the other is typed.
std::optional<std::string> checkEncounterAnimal(const std::string& id, const std::string& group, Day date,
                                                const ResidenceIndex& where);

} // namespace hierloom::core
