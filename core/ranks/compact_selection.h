// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/compact_encounters.h"
#include "core/ranks/encounter_selection.h"

#include <vector>

namespace hierloom::core {

/// selectEncounters of encounter_selection.h on compact records: the same
/// ids, bouts, days and first and last day as on the same encounters held as
/// `Encounter`s; `source` indexes `encounters.records`. `animals` is the
/// colony's animal list (read only with options.includeResidents).
EncounterSelection selectEncounters(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                    const ResidenceIndex& where, const SelectionOptions& options);

} // namespace hierloom::core
