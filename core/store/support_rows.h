// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/derived_uid.h"
#include "core/base/encounter_records.h"
#include "core/store/sqlite_statement.h"

#include <vector>

struct sqlite3;

namespace hierloom::core {

// The supporters of encounters in the colony file (table encounter_support,
// schema version 3): one row per supporter, keyed by the encounter's uid,
// read back in the order they were written.

/// Writes the supporter rows of encounters already inserted; one prepared
/// statement for a whole load.
class SupportWriter {
public:
    explicit SupportWriter(sqlite3* db);
    /// Inserts the rows of `e` (nothing when it has no supporters).
    void add(const Encounter& e);
    /// The same for an encounter whose uid is the derived `uid` (e.uid empty).
    void add(const Encounter& e, const UidBytes& uid);

private:
    void addSide(const Encounter& e, const UidBytes* uid, const std::vector<std::string>& ids, const char* side);
    SqliteStatement insert_;
};

/// Removes the supporter rows of the encounter with this uid.
void deleteSupportRows(sqlite3* db, const std::string& encounterUid);

/// Replaces the supporter rows of `e` (by uid) with its current supporters.
void replaceSupportRows(sqlite3* db, const Encounter& e);

/// Fills the supporters of `encounters`, which are in seq order (as loaded).
void loadSupportRows(sqlite3* db, std::vector<Encounter>& encounters);

/// The same for compact records without supporters yet (in seq order).
void loadSupportRows(sqlite3* db, EncounterRecords& records);

/// Fills the supporters of one encounter, found by its uid.
void loadSupportRowsOf(sqlite3* db, Encounter& e);

} // namespace hierloom::core
