// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <chrono>
#include <string>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// How many backups the rotation keeps when the colony sets no `backup_keep`.
constexpr int defaultBackupsKept = 10;
/// Hours between scheduled backups when the colony sets no `backup_interval_hours`.
constexpr double defaultBackupIntervalHours = 24.0;

/// One backup file found beside a colony file.
struct BackupFile {
    std::string path;
    std::chrono::system_clock::time_point taken; ///< from the name (UTC, whole seconds)
    /// Named with a time after "now" (a clock that was wrong): listed after the
    /// others, never used to order or schedule backups, never rotated away.
    bool future = false;
};

/// The folder holding a colony file's backups: `NAME.hierloom-backups` beside `NAME.hierloom`.
std::string backupFolder(const std::string& colonyPath);

/// The backups of a colony file, newest first (files named `NAME-YYYYMMDD-HHMMSS[-N].hierloom`),
/// then those named with a time later than `now` (see BackupFile::future).
std::vector<BackupFile> listBackups(const std::string& colonyPath,
                                    std::chrono::system_clock::time_point now = std::chrono::system_clock::now());

/// Writes a consistent copy of the open colony through SQLite's online backup
/// interface (sqlite3_backup_*, a single read snapshot, so concurrent writers
/// never tear it) into the backup folder, checks it with `PRAGMA
/// integrity_check` under a partial name unique to this process and call
/// (partial_files.h) and only then gives it its final name; then deletes the
/// oldest backups beyond `keep`, never the one just taken nor one named with
/// a future time. The live file passes `PRAGMA quick_check` first, else
/// ColonyFileError(Damaged) names the newest good backup. Partial files
/// abandoned by a killed backup are removed. Returns the new backup's path.
std::string backupColony(const ColonyStore& store, std::chrono::system_clock::time_point now,
                         int keep = defaultBackupsKept);

/// The colony's `backup_keep` setting, or defaultBackupsKept.
int backupsToKeep(const ColonyStore& store);

/// Takes a backup when the newest one is older than the colony's
/// `backup_interval_hours` setting (24 when unset; 0 or less turns scheduled
/// backups off), keeping `backup_keep` (10 when unset). True when one was taken.
bool backupIfDue(const ColonyStore& store, std::chrono::system_clock::time_point now);

/// Puts a backup's records back into a colony file. The backup is checked
/// first (a colony file, readable by this program, integrity_check ok). When
/// the colony file opens, its current state is itself backed up and the backup
/// is copied in through the online backup interface as one write transaction,
/// so open readers stay consistent and a writing program makes it fail with
/// ColonyFileError::Kind::Busy. When the colony file is missing or damaged,
/// the backup is copied beside it and renamed over it (the damaged file is
/// kept in the backup folder as `NAME-damaged-YYYYMMDD-HHMMSS.hierloom`).
void restoreBackup(const std::string& backupPath, const std::string& colonyPath,
                   std::chrono::system_clock::time_point now);

} // namespace hierloom::core
