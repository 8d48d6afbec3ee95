// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/check_cache.h"

#include <optional>
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

/// "Checked once, trusted until it changes", before a read-only open:
/// requireIntact, skipped when the checked-files cache
/// (CheckCache::fromEnvironment) vouches that the file at `path` passed a
/// check while it was in the state it is in now (device, inode, size,
/// modification and status-change times of the file and of its -wal, header
/// change counter, schema version; at most kCheckTrustSeconds ago). A pass is
/// recorded when the file did not change while it was checked and had settled
/// before (settledBefore); a damaged file's entry is forgotten.
void requireIntactOnce(sqlite3* db, const std::string& path);

/// Whether the checked-files cache vouches for the file at `path` as it lies
/// now: requireIntactOnce would skip its check.
bool checkVouchedFor(const std::string& path);

/// The same rule before a write, under the write lock (inside BEGIN
/// IMMEDIATE, so no other SQLite connection writes until the commit). When the
/// cache vouches for the file as it lies now, no check runs and that state is
/// returned: the caller carries the pass over to the state its commit leaves
/// (carryCheckOver). Otherwise the quick check runs unless `checkedAlready`
/// (it passed on this program's connections and no other connection has
/// committed since), the file's entry is forgotten, and nothing is returned.
std::optional<ColonyFileState> requireIntactBeforeWrite(sqlite3* db, const std::string& path, bool checkedAlready);

/// This program changed the file at `path` from `before`, which the cache
/// vouched for, to `after`, and no other program wrote meanwhile (the caller
/// knows it: the write lock, `PRAGMA data_version`): records the pass for
/// `after` (CheckCache::carryOver). False when the cache no longer vouches
/// for `before`.
bool carryCheckOver(const std::string& path, const ColonyFileState& before, const ColonyFileState& after);

/// SQLite's full `PRAGMA integrity_check` (the quick check plus every index
/// against its table) on the database behind `db`, whatever the cache says;
/// throws like requireIntact, and records a pass like requireIntactOnce.
void requireIntactFully(sqlite3* db, const std::string& path);

/// The newest backup of the colony file at `colonyPath` that opens and passes
/// the quick check; empty when there is none.
std::string newestGoodBackup(const std::string& colonyPath);

} // namespace hierloom::core
