// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>

namespace hierloom::core {

/// `PRAGMA application_id` of a colony file ("HRLM"), telling it from other SQLite files.
constexpr int colonyApplicationId = 0x48524C4D;

/// The schema version this build writes (`PRAGMA user_version`).
constexpr int currentSchemaVersion = 5;

/// SQL creating the version-1 schema.
const char* schemaVersion1Sql();

/// SQL taking a version-1 schema to version 2: the `audit` table and the
/// triggers that record every insert, update and delete of animals,
/// residences and encounters (old and new values as JSON via json_object).
const char* schemaVersion2Sql();

/// SQL taking a version-2 schema to version 3: the `encounter_support`
/// table (one row per supporter of an encounter: the encounter's uid, the
/// animal and its side) and its audit triggers, which file each row under
/// the encounter's uid. Self-contained: it needs nothing but version 2.
const char* schemaVersion3Sql();

/// Version 4 changes how uids are stored (16 bytes for a canonical uid,
/// core/store/uid_storage.h), not the tables: its step is C++
/// (core/store/uid_migration.h), and the audit triggers the functions below
/// write turn a stored uid back into text.

/// Version 5 keeps the encounters in `encounter_row` (day numbers, 0/1
/// outcomes, behaviour, group and observer as codes into `encounter_term`)
/// behind a view `encounter` with the columns and texts of versions 1-4; its
/// step is C++ too (core/store/encounter_row_migration.h).

/// The audit trigger of one table ("animal", "residence", "encounter"
/// from version 2, "encounter_support" from version 3) and action ("insert", "update", "delete"), exactly as the
/// schema of `schemaVersion` creates it (from version 5 the encounter's
/// trigger sits on `encounter_row` and writes the same JSON as before), and
/// the statement dropping it.
std::string auditTriggerSql(const std::string& table, const std::string& action,
                            int schemaVersion = currentSchemaVersion);
std::string auditTriggerDropSql(const std::string& table, const std::string& action);

/// The indexes that let a question about one group read only that group's
/// encounters (docs/file-formats.md, "Indexes"). Not a schema version of its
/// own: an index changes nothing an older program reads or writes, so a file
/// of any version gets it when this program first opens it for writing.
const char* encounterIndexSql();
/// The same index on the text columns of versions 1-4.
const char* encounterIndexSqlBeforeVersion5();
/// Whether the file already has them.
constexpr const char* kEncounterIndexName = "encounter_by_group";

/// Version 5's new tables: `encounter_term`, `encounter_row` and
/// `encounter_support_v5` (renamed `encounter_support` by the migration once
/// the old table is gone; its key now points at `encounter_row`).
const char* encounterRowTablesSql();
/// The view `encounter` over `encounter_row` and the INSTEAD OF triggers
/// that let a statement written for versions 1-4 (the merge's updates, the
/// shell) change it.
const char* encounterViewSql();

/// SQL expressions: the ISO date of a day number, the day number of an ISO
/// date (NULL unless it is a real date written as YYYY-MM-DD), the outcome
/// text of a 0/1 draw column.
std::string dateOfDaySql(const std::string& day);
std::string dayOfDateSql(const std::string& date);
std::string outcomeOfDrawSql(const std::string& draw);

/// SQL run on every connection to a version-2 file: the per-connection
/// `session_user` (who is writing) and the TEMP trigger that stamps it on
/// each new audit row. TEMP objects because a trigger stored in the file
/// cannot read a connection's TEMP table.
const char* sessionSql();

} // namespace hierloom::core
