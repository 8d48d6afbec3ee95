// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// One row of a colony file's audit trail (schema version 2): who changed
/// which record when, with the values before and after as JSON text.
struct AuditEntry {
    std::int64_t id = 0;
    std::string time;   ///< UTC, `YYYY-MM-DDTHH:MM:SSZ`
    std::string user;   ///< the writing connection's user name; empty for changes made by other tools
    std::string table;  ///< animal, residence or encounter (empty for a restore)
    std::string uid;    ///< the record's uid; empty for a bulk import or a restore
    std::string action; ///< insert, update, delete, import (bulk, one row), restore
    std::string oldValues; ///< JSON object, empty for an insert
    std::string newValues; ///< JSON object, empty for a delete
};

/// The history of one record by uid, oldest first: its own audit rows and,
/// for an encounter loaded by a bulk import, the import's summary row whose
/// seq range covers it.
std::vector<AuditEntry> recordHistory(const ColonyStore& store, const std::string& uid);

/// The uid of the animal with this id now, or of the last animal that had it
/// according to the audit trail (a removed animal); empty when none.
std::optional<std::string> animalUid(const ColonyStore& store, const std::string& animalId);

} // namespace hierloom::core
