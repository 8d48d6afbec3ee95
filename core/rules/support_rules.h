// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"
#include "core/base/residence_index.h"

namespace hierloom::core {

/// Every rule the supporters of an encounter obey (docs/file-formats.md,
/// "encounters.csv", columns winner_support and loser_support), in the order
/// their problems are reported. checkEncounterRow runs them, so the import,
/// the evening entry, the encounter editor and the merge check supporters
/// only here.
enum class SupportRule {
    SupporterKnown,  // winner_support, loser_support: each id an animal of the colony
    NotAParticipant, // ...: neither the winner nor the loser
    ListedOnce,      // ...: not listed twice on its side
    OneSide,         // loser_support: not also on the winner's side
    PresentInGroup,  // ...: alive and resident in the encounter's group that day
    Count
};

const char* ruleName(SupportRule rule);

/// Appends the problems of the supporters of `e` to `out`, building no text
/// while they pass. `group` is the group both animals were in that day, or
/// nullptr when the encounter's own rules failed (PresentInGroup is then left out).
void checkSupporters(const Encounter& e, const ResidenceIndex& where, const std::string* group, FieldProblems& out);

} // namespace hierloom::core
