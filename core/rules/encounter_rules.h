// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/field_problem.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>

namespace hierloom::core {

/// Checks one encounter typed or edited by hand under the import's encounter
/// rules (interfaces.md, "Encounters"), with the import's message wording:
/// a real date not in the future, two different animals of the colony, both
/// alive and in the same group that day, and a group (if given) equal to that
/// group. Fills `e.group` with the shared group when the check passes.
FieldProblems checkEncounter(Encounter& e, const ResidenceIndex& where, Day today);

/// The message for one animal typed into an encounter of `group` on `date`
/// (unknown id, not alive that day, in no group or in another group), or
/// nothing when it fits; lets a form flag a wrong id before the other is typed.
std::optional<std::string> checkEncounterAnimal(const std::string& id, const std::string& group, Day date,
                                                const ResidenceIndex& where);

} // namespace hierloom::core
