// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_store.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Prefix of the `setting` keys that hold named what-if scenarios: the value
/// is the scenario file text (scenario_file.h), so no schema change is needed.
inline constexpr const char* kScenarioKeyPrefix = "scenario:";

/// Names of the scenarios saved in a colony file, ascending.
std::vector<std::string> savedScenarioNames(const ColonyStore& store);

/// The text of a saved scenario, or empty when there is none of that name.
std::optional<std::string> savedScenarioText(const ColonyStore& store, const std::string& name);

/// Saves (or replaces) a named scenario's text. Throws std::invalid_argument for an empty name.
void saveScenarioText(ColonyStore& store, const std::string& name, const std::string& text);

/// Deletes a saved scenario; nothing happens when there is none of that name.
void deleteSavedScenario(ColonyStore& store, const std::string& name);

} // namespace hierloom::core
