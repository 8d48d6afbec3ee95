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

/// What a check before opening or writing is for.
enum class CheckPurpose {
    Reading, ///< a pass is recorded in the checked-files cache (check_cache.h)
    Writing, ///< the file is about to change: its cache entry is forgotten
};

/// "Checked once, trusted until it changes": requireIntact, skipped when the
/// checked-files cache (CheckCache::fromEnvironment) vouches that the file
/// at `path` passed a check while it was in the state it is in now (device,
/// inode, size, modification and status-change times of the file and of its
/// -wal, header change counter, schema version; at most kCheckTrustSeconds
/// ago). For Reading a pass is recorded when the file did not change while
/// it was checked and had settled before (settledBefore); for Writing, and
/// when the file is damaged, its entry is forgotten.
void requireIntactOnce(sqlite3* db, const std::string& path, CheckPurpose purpose);

/// SQLite's full `PRAGMA integrity_check` (the quick check plus every index
/// against its table) on the database behind `db`, whatever the cache says;
/// throws like requireIntact, and records a pass like requireIntactOnce.
void requireIntactFully(sqlite3* db, const std::string& path);

/// The newest backup of the colony file at `colonyPath` that opens and passes
/// the quick check; empty when there is none.
std::string newestGoodBackup(const std::string& colonyPath);

} // namespace hierloom::core
