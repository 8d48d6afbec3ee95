// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/planning/stability_watch.h"

#include <map>
#include <optional>
#include <string>

namespace hierloom::core {

class ColonyStore;

/// Values of some `setting` keys: a missing value means the key is absent
/// from the file. Lets a caller (the desktop's undo history) know what a
/// settings write replaces before it writes, and put it back exactly.
using SettingValues = std::map<std::string, std::optional<std::string>>;

/// The current values of the keys of `keys` (their values are ignored).
SettingValues readSettingValues(const ColonyStore& store, const SettingValues& keys);

/// Sets every key to its value, or removes the key when the value is empty
/// (std::nullopt), all in one transaction.
void writeSettingValues(ColonyStore& store, const SettingValues& values);

/// The keys and values writeStabilityThresholds stores.
SettingValues stabilityThresholdValues(const StabilityThresholds& thresholds);

/// The keys a species setting is stored under; an override left empty is
/// removed, so the species default applies. Throws std::invalid_argument for
/// an unknown species or an override out of range.
SettingValues speciesSettingValues(const std::string& species, std::optional<int> gestationDays,
                                   std::optional<int> maturityYears);

/// The key a saved scenario is stored under, with its text (std::nullopt
/// deletes it). Throws std::invalid_argument for an empty name.
SettingValues savedScenarioValue(const std::string& name, std::optional<std::string> text);

} // namespace hierloom::core
