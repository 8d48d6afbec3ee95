// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/base/field_problem.h"

#include <string>
#include <string_view>

namespace hierloom::core {

// Wording shared by the rules of several record kinds, so that the same fault
// reads the same in an animal, a stay or an encounter.

/// "'2030-01-01' is in the future"
std::string inTheFuture(Day d);

/// "'X1' is not an animal of <known>"; `known` names where the id was looked
/// for ("the colony", or with an import's own animals file).
std::string notAnAnimalOf(std::string_view id, std::string_view known);

/// The text rule every free-text field obeys (names, notes, observers,
/// behaviour codes, group names): no control character but tab. Appends
/// "holds the control character \x01 (only tab may appear in text)" for
/// `column` to `out` when `value` breaks it.
void checkPlainText(std::string_view value, const char* column, FieldProblems& out);

} // namespace hierloom::core
