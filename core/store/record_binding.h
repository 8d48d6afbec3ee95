// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/derived_uid.h"
#include "core/store/encounter_terms.h"
#include "core/store/sqlite_statement.h"

#include <optional>
#include <string>

namespace hierloom::core {

// The one way records are written to the colony file's tables, shared by the
// bulk append (import, merge) and the single-record edits.

inline constexpr const char* kInsertAnimalSql =
    "INSERT INTO animal(uid, id, name, sex, birth_date, mother, father, entry_date, entry_type, exit_date, exit_type) "
    "VALUES (?,?,?,?,?,?,?,?,?,?,?)";
inline constexpr const char* kInsertResidenceSql =
    "INSERT INTO residence(uid, animal, grp, from_date, to_date) VALUES (?,?,?,?,?)";
inline constexpr const char* kInsertEncounterSql =
    "INSERT INTO encounter_row(seq, uid, day, time, winner, loser, draw, behaviour, grp, observer, note) "
    "VALUES (?,?,?,?,?,?,?,?,?,?,?)";

/// The columns of an encounter row (`encounter_row`, schema version 5) in the order readEncounterRow expects.
inline constexpr const char* kEncounterColumnsSql =
    "seq, uid, day, time, winner, loser, draw, behaviour, grp, observer, note";

/// A stored date: ISO text, or NULL when unknown.
std::optional<std::string> storedDate(const std::optional<Day>& d);

/// Binds parameters 1-11 of kInsertAnimalSql (an UPDATE may use the same order).
void bindAnimalColumns(SqliteStatement& q, const Animal& a);
/// Binds parameters 1-5 of kInsertResidenceSql.
void bindResidenceColumns(SqliteStatement& q, const Residence& r);
/// Binds parameters 1-11 of kInsertEncounterSql without copying: `e` must
/// stay unchanged until the statement runs. `terms` gives (and adds) the codes.
void bindEncounterColumns(SqliteStatement& q, const Encounter& e, EncounterTermCodes& terms);
/// The same for row `row` (from 0) of insertEncountersSql (its parameters
/// 11 row + 1 to 11 row + 11), with the bytes of `derivedUid` as the uid when
/// `e` has none; they too must stay alive until the statement runs.
void bindEncounterColumns(SqliteStatement& q, const Encounter& e, const UidBytes& derivedUid,
                          EncounterTermCodes& terms, int row = 0);

/// The parameters of one row of kInsertEncounterSql.
inline constexpr int kEncounterColumnCount = 11;
/// kInsertEncounterSql for `rows` rows in one statement.
std::string insertEncountersSql(int rows);

/// The same columns with an empty text in place of the uid (same positions).
inline constexpr const char* kEncounterColumnsWithoutUidSql =
    "seq, '', day, time, winner, loser, draw, behaviour, grp, observer, note";

/// The encounter in the current row of a query that selected kEncounterColumnsSql.
/// A day or code the file cannot hold means it was changed outside the program:
/// throws ColonyFileError (Damaged) naming `path`.
Encounter readEncounterRow(const SqliteStatement& q, const EncounterTermTexts& terms, const std::string& path);

/// The highest encounter seq in the file (0 when there is none): new encounters
/// continue after it, whichever path writes them.
std::int64_t highestEncounterSeq(sqlite3* db);

} // namespace hierloom::core
