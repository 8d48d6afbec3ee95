// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_store.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// Prefix of the `setting` keys that hold named import mappings: the value
/// is the mapping file's text (import_mapping.h), so no schema change is needed.
inline constexpr const char* kMappingKeyPrefix = "import_mapping:";

/// Names of the import mappings saved in a colony file, ascending.
std::vector<std::string> savedMappingNames(const ColonyStore& store);
/// The mapping file text saved under `name`, or nothing.
std::optional<std::string> savedMappingText(const ColonyStore& store, const std::string& name);

} // namespace hierloom::core
