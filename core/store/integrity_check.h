// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>

struct sqlite3;

namespace hierloom::core {

/// SQLite's `PRAGMA quick_check` on the database behind `db` (the page and
/// record structure, without comparing indexes to tables): the first problem
/// found, or an empty string when there is none.
std::string quickCheckProblem(sqlite3* db);

/// Throws ColonyFileError(Damaged) with a short message naming `path`, the
/// first problem, and the newest backup of `path` that passes its own check
/// (when there is one), unless the database behind `db` passes the quick check.
void requireIntact(sqlite3* db, const std::string& path);

/// The newest backup of the colony file at `colonyPath` that opens and passes
/// the quick check; empty when there is none.
std::string newestGoodBackup(const std::string& colonyPath);

} // namespace hierloom::core
