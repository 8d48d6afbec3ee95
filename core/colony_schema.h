// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once

namespace hierloom::core {

/// `PRAGMA application_id` of a colony file ("HRLM"), telling it from other SQLite files.
constexpr int colonyApplicationId = 0x48524C4D;

/// The schema version this build writes (`PRAGMA user_version`).
constexpr int currentSchemaVersion = 1;

/// SQL creating the version-1 schema.
const char* schemaVersion1Sql();

} // namespace hierloom::core
