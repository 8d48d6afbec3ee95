// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/research/species_profile.h"

#include <optional>
#include <string>

namespace hierloom::core {

class ColonyStore;

/// Reads the species settings of a colony file (defaults where unset).
SpeciesSettings readSpeciesSettings(const ColonyStore& store);

/// Stores the species and its overrides; an empty optional removes the
/// override, so the species default applies again.
void writeSpeciesSettings(ColonyStore& store, const std::string& species, std::optional<int> gestationDays,
                          std::optional<int> maturityYears);

} // namespace hierloom::core
