// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_backup.h"

#include "core/base/colony_file_error.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/integrity_check.h"
#include "core/store/partial_files.h"
#include "core/store/sqlite_statement.h"

#include <sqlite3.h>

#include <algorithm>
#include <optional>
#include <cstdio>
#include <ctime>
#include <fcntl.h>
#include <cmath>
#include <filesystem>
#include <system_error>

namespace hierloom::core {

namespace fs = std::filesystem;
using Kind = ColonyFileError::Kind;
using Clock = std::chrono::system_clock;

namespace {

int pageSizeOf(sqlite3* db)
{
    SqliteStatement q(db, "PRAGMA page_size");
    return q.step() ? static_cast<int>(q.integer(0)) : 0;
}

std::string stemOf(const std::string& colonyPath) { return fs::path(colonyPath).stem().string(); }

std::string stamp(Clock::time_point t)
{
    const std::time_t secs = Clock::to_time_t(t);
    std::tm tm{};
    gmtime_r(&secs, &tm);
    char buf[32];
    std::strftime(buf, sizeof buf, "%Y%m%d-%H%M%S", &tm);
    return buf;
}

/// Parses `YYYYMMDD-HHMMSS[-N]` (the part after `NAME-`); false when it is not one.
bool parseStamp(const std::string& text, Clock::time_point& when, int& serial)
{
    if (text.size() < 15 || text[8] != '-') return false;
    for (size_t i = 0; i < 15; ++i)
        if (i != 8 && (text[i] < '0' || text[i] > '9')) return false;
    serial = 1;
    if (text.size() > 15) {
        if (text[15] != '-' || text.size() == 16 || text.size() > 22) return false;
        for (size_t i = 16; i < text.size(); ++i)
            if (text[i] < '0' || text[i] > '9') return false;
        serial = std::stoi(text.substr(16));
    }
    std::tm tm{};
    tm.tm_year = std::stoi(text.substr(0, 4)) - 1900;
    tm.tm_mon = std::stoi(text.substr(4, 2)) - 1;
    tm.tm_mday = std::stoi(text.substr(6, 2));
    tm.tm_hour = std::stoi(text.substr(9, 2));
    tm.tm_min = std::stoi(text.substr(11, 2));
    tm.tm_sec = std::stoi(text.substr(13, 2));
    when = Clock::from_time_t(timegm(&tm));
    return true;
}

struct Found {
    BackupFile file;
    int serial;
};

// A backup named up to this much after "now" is still ordered by its name
// (clocks of two machines sharing a folder differ by seconds).
constexpr auto kClockTolerance = std::chrono::minutes(1);

std::vector<Found> findBackups(const std::string& colonyPath, Clock::time_point now)
{
    std::vector<Found> out;
    const std::string prefix = stemOf(colonyPath) + "-";
    std::error_code ec;
    for (const auto& entry : fs::directory_iterator(backupFolder(colonyPath), ec)) {
        const std::string name = entry.path().filename().string();
        if (entry.path().extension() != ".hierloom" || name.rfind(prefix, 0) != 0) continue;
        const std::string middle = name.substr(prefix.size(), name.size() - prefix.size() - 9);
        Found f{{entry.path().string(), {}}, 1};
        if (!parseStamp(middle, f.file.taken, f.serial)) continue;
        f.file.future = f.file.taken > now + kClockTolerance;
        out.push_back(f);
    }
    std::sort(out.begin(), out.end(), [](const Found& a, const Found& b) {
        if (a.file.future != b.file.future) return !a.file.future;
        return a.file.taken != b.file.taken ? a.file.taken > b.file.taken : a.serial > b.serial;
    });
    return out;
}

struct Connection {
    sqlite3* db = nullptr;
    Connection() = default;
    Connection(const Connection&) = delete;
    Connection& operator=(const Connection&) = delete;
    ~Connection() { close(); }
    void close()
    {
        sqlite3_close(db);
        db = nullptr;
    }
};

std::string integrityOf(sqlite3* db)
{
    SqliteStatement q(db, "PRAGMA integrity_check");
    return q.step() ? q.text(0) : std::string("no answer");
}

/// Copies the whole database behind `source` into a new file at `target`
/// (which must not exist) and checks the copy.
void copyDatabase(sqlite3* source, const std::string& target, const std::string& what)
{
    Connection dest;
    if (sqlite3_open_v2(target.c_str(), &dest.db, SQLITE_OPEN_READWRITE | SQLITE_OPEN_CREATE, nullptr) != SQLITE_OK)
        throw ColonyFileError(Kind::Io, target + ": cannot be created for " + what);
    sqlite3_busy_timeout(source, 5000);
    sqlite3_backup* b = sqlite3_backup_init(dest.db, "main", source, "main");
    if (!b) throw ColonyFileError(Kind::Io, target + ": " + what + " failed: " + sqlite3_errmsg(dest.db));
    const int rc = sqlite3_backup_step(b, -1);
    sqlite3_backup_finish(b);
    if (rc != SQLITE_DONE) {
        dest.close();
        std::error_code ec;
        fs::remove(target, ec);
        if ((rc & 0xFF) == SQLITE_BUSY || (rc & 0xFF) == SQLITE_LOCKED)
            throw ColonyFileError(Kind::Busy, target + ": " + what + " waited too long for another program");
        throw ColonyFileError(Kind::Io, target + ": " + what + " failed: " + sqlite3_errstr(rc));
    }
    // A backup is one self-contained file: no -wal beside it.
    sqlite3_exec(dest.db, "PRAGMA journal_mode = DELETE", nullptr, nullptr, nullptr);
    const std::string check = integrityOf(dest.db);
    if (check != "ok") throw ColonyFileError(Kind::Damaged, target + ": the copy fails its integrity check: " + check);
}

/// Backs up the database behind `db` into the colony's backup folder and rotates.
std::string backupConnection(sqlite3* db, const std::string& colonyPath, Clock::time_point now, int keep,
                             const std::string& kind = {})
{
    const fs::path folder = backupFolder(colonyPath);
    std::error_code ec;
    fs::create_directories(folder, ec);
    if (ec) throw ColonyFileError(Kind::Io, folder.string() + ": cannot create the backup folder: " + ec.message());
    sqlite3_busy_timeout(db, 5000);
    requireIntact(db, colonyPath);
    // Partial files of a killed backup; the real clock, not `now`, dates them.
    removeAbandonedPartials(folder.string(), stemOf(colonyPath) + "-", Clock::now());
    const std::string base = stemOf(colonyPath) + "-" + kind + stamp(now);
    fs::path target = folder / (base + ".hierloom");
    const std::string partial = partialPathFor(target.string());
    try {
        copyDatabase(db, partial, "the backup");
        // Another program may take a backup in the same second: take the next free serial.
        for (int n = 2; !publishPartial(partial, target.string()); ++n)
            target = folder / (base + "-" + std::to_string(n) + ".hierloom");
    } catch (const std::system_error& e) {
        removePartial(partial);
        throw ColonyFileError(Kind::Io, target.string() + ": cannot name the backup: " + e.code().message());
    } catch (...) {
        removePartial(partial);
        throw;
    }
    syncFolder(folder.string());
    // Rotation: the backup just taken always stays, and so do backups named
    // with a future time (their order is unknown; the caller warns about them).
    size_t kept = 1;
    for (const Found& f : findBackups(colonyPath, now)) {
        if (f.file.future || f.file.path == target.string()) continue;
        if (kept < static_cast<size_t>(std::max(keep, 1)))
            ++kept;
        else
            fs::remove(f.file.path, ec);
    }
    return target.string();
}

bool hasTable(sqlite3* db, const char* schema, const char* table)
{
    SqliteStatement q(db, (std::string("SELECT 1 FROM ") + schema + ".sqlite_schema WHERE type = 'table' AND name = ?").c_str());
    q.bind(1, std::string(table));
    return q.step();
}

void execOrThrow(sqlite3* db, const char* sql, const std::string& context)
{
    char* msg = nullptr;
    if (sqlite3_exec(db, sql, nullptr, nullptr, &msg) != SQLITE_OK) {
        const std::string text = msg ? msg : sqlite3_errmsg(db);
        sqlite3_free(msg);
        throw ColonyFileError(Kind::Io, context + ": " + text);
    }
}

/// Copies the backup behind `backupDb` into `partial` and adds, in one
/// transaction, the audit rows of the colony file at `livePath` that the
/// backup lacks (the history of the state being replaced stays readable) and
/// the live file's identities (file_identity.h). Leaves `partial` open in `out`.
void prepareRestore(sqlite3* backupDb, const std::string& livePath, const std::string& partial, Connection& out)
{
    copyDatabase(backupDb, partial, "the restore");
    if (sqlite3_open_v2(partial.c_str(), &out.db, SQLITE_OPEN_READWRITE, nullptr) != SQLITE_OK)
        throw ColonyFileError(Kind::Io, partial + ": cannot be opened for the restore");
    sqlite3_busy_timeout(out.db, 5000);
    {
        SqliteStatement attach(out.db, "ATTACH ?1 AS replaced");
        attach.bind(1, livePath);
        attach.run();
    }
    execOrThrow(out.db, "BEGIN", partial); // deferred: the replaced file is only read, and may have a writer
    if (hasTable(out.db, "main", "audit") && hasTable(out.db, "replaced", "audit"))
        execOrThrow(out.db,
                    "INSERT INTO main.audit(time, user, tbl, uid, action, old_values, new_values) "
                    "SELECT r.time, r.user, r.tbl, r.uid, r.action, r.old_values, r.new_values FROM replaced.audit r "
                    "WHERE NOT EXISTS (SELECT 1 FROM main.audit m WHERE m.uid = r.uid AND m.time = r.time AND "
                    "m.user = r.user AND m.tbl = r.tbl AND m.action = r.action AND m.old_values IS r.old_values AND "
                    "m.new_values IS r.new_values) ORDER BY r.id",
                    partial);
    execOrThrow(out.db, "CREATE TABLE IF NOT EXISTS main.file_identity (id TEXT PRIMARY KEY, writes INTEGER NOT NULL DEFAULT 0)",
                partial);
    if (hasTable(out.db, "replaced", "file_identity"))
        execOrThrow(out.db,
                    "INSERT OR IGNORE INTO main.file_identity(id, writes) SELECT id, writes FROM replaced.file_identity",
                    partial);
    execOrThrow(out.db, "COMMIT", partial);
    execOrThrow(out.db, "DETACH replaced", partial);
}

int settingInt(const ColonyStore& store, const char* key, int fallback)
{
    try {
        return std::stoi(store.setting(key, std::to_string(fallback)));
    } catch (const std::exception&) {
        return fallback;
    }
}

void noteRestore(const std::string& colonyPath, const std::string& backupPath)
{
    ColonyStore store = ColonyStore::open(colonyPath);
    SqliteStatement q(store.handle(),
                      "INSERT INTO audit(tbl, action, new_values) VALUES ('', 'restore', json_object('backup', ?))");
    q.bind(1, backupPath);
    q.run();
}

} // namespace

std::string backupFolder(const std::string& colonyPath)
{
    const fs::path p(colonyPath);
    return (p.parent_path() / (p.stem().string() + ".hierloom-backups")).string();
}

std::vector<BackupFile> listBackups(const std::string& colonyPath, Clock::time_point now)
{
    std::vector<BackupFile> out;
    for (const Found& f : findBackups(colonyPath, now)) out.push_back(f.file);
    return out;
}

std::string backupColony(const ColonyStore& store, Clock::time_point now, int keep)
{
    return backupConnection(store.handle(), store.path(), now, keep);
}

int backupsToKeep(const ColonyStore& store) { return settingInt(store, "backup_keep", defaultBackupsKept); }

bool backupIfDue(const ColonyStore& store, Clock::time_point now)
{
    double hours = defaultBackupIntervalHours;
    try {
        hours = std::stod(store.setting("backup_interval_hours", std::to_string(defaultBackupIntervalHours)));
    } catch (const std::exception&) {
        hours = defaultBackupIntervalHours;
    }
    if (!std::isfinite(hours)) hours = defaultBackupIntervalHours;
    if (!(hours > 0)) return false;
    const auto backups = listBackups(store.path(), now);
    const auto interval = std::chrono::duration_cast<Clock::duration>(std::chrono::duration<double>(hours * 3600.0));
    // A backup named with a future time says nothing about when the last real one was taken.
    if (!backups.empty() && !backups.front().future && now - backups.front().taken < interval) return false;
    backupColony(store, now, backupsToKeep(store));
    return true;
}

void restoreBackup(const std::string& backupPath, const std::string& colonyPath, Clock::time_point now)
{
    const int version = probeColonyFile(backupPath);
    if (version > currentSchemaVersion)
        throw ColonyFileError(Kind::NewerVersion, backupPath + ": was written by a newer Hierloom; update the program");
    Connection backup;
    if (sqlite3_open_v2(backupPath.c_str(), &backup.db, SQLITE_OPEN_READONLY, nullptr) != SQLITE_OK)
        throw ColonyFileError(Kind::Io, backupPath + ": cannot be opened");
    sqlite3_busy_timeout(backup.db, 5000);
    if (const std::string check = integrityOf(backup.db); check != "ok")
        throw ColonyFileError(Kind::Damaged, backupPath + ": the backup is damaged (" + check + "); choose another");

    bool live = true;
    try {
        probeColonyFile(colonyPath);
    } catch (const ColonyFileError& e) {
        if (e.kind() != Kind::Missing && e.kind() != Kind::NotAColonyFile && e.kind() != Kind::Damaged) throw;
        live = false;
    }
    std::optional<ColonyStore> colony;
    if (live) {
        colony.emplace(ColonyStore::open(colonyPath));
        colony->setBusyTimeout(5000);
        // A file failing the quick check is replaced whole and kept aside, like one that does not open.
        if (!quickCheckProblem(colony->handle()).empty()) {
            colony.reset();
            live = false;
        }
    }
    if (live) {
        // SQLite cannot copy pages of one size into a WAL file of another
        // (colony files created by earlier builds use 4 KiB pages, newer ones 16 KiB).
        if (const int from = pageSizeOf(backup.db), to = pageSizeOf(colony->handle()); from != to)
            throw ColonyFileError(Kind::Io, backupPath + ": was made from a colony file with " +
                                                std::to_string(from / 1024) + " KiB pages and cannot be restored over " +
                                                colonyPath + " (" + std::to_string(to / 1024) +
                                                " KiB pages); restore it into a new file instead; " + colonyPath +
                                                " is unchanged");
        // The state being replaced stays recoverable, like any other backup.
        backupConnection(colony->handle(), colonyPath, now, defaultBackupsKept);
        // The backup plus the replaced state's audit trail and identities, made
        // under a partial name, is then copied in as one write transaction.
        const std::string prepared = partialPathFor((fs::path(backupFolder(colonyPath)) /
                                                     (stemOf(colonyPath) + "-restoring-" + stamp(now) + ".hierloom"))
                                                        .string());
        try {
            Connection source;
            prepareRestore(backup.db, colonyPath, prepared, source);
            sqlite3_backup* b = sqlite3_backup_init(colony->handle(), "main", source.db, "main");
            if (!b) throw ColonyFileError(Kind::Io, colonyPath + ": restore failed: " + sqlite3_errmsg(colony->handle()));
            const int rc = sqlite3_backup_step(b, -1);
            sqlite3_backup_finish(b);
            if ((rc & 0xFF) == SQLITE_BUSY || (rc & 0xFF) == SQLITE_LOCKED)
                throw ColonyFileError(Kind::Busy, colonyPath + ": another program is writing to it; close that "
                                                               "program (or wait for it to finish) and restore again");
            if (rc != SQLITE_DONE)
                throw ColonyFileError(Kind::Io, colonyPath + ": restore failed: " + sqlite3_errstr(rc) +
                                                    "; the file is unchanged");
        } catch (...) {
            removePartial(prepared);
            throw;
        }
        removePartial(prepared);
        colony.reset();
    } else {
        const fs::path target(colonyPath);
        const fs::path temp = partialPathFor(target.string());
        std::error_code ec;
        removeAbandonedPartials(target.parent_path().string(), target.filename().string() + ".", Clock::now());
        try {
            copyDatabase(backup.db, temp.string(), "the restore");
        } catch (...) {
            removePartial(temp.string());
            throw;
        }
        if (fs::exists(target, ec)) {
            // Keep the damaged file (and any journal beside it) rather than destroy it.
            const fs::path folder = backupFolder(colonyPath);
            fs::create_directories(folder, ec);
            const fs::path kept = folder / (stemOf(colonyPath) + "-damaged-" + stamp(now) + ".hierloom");
            fs::rename(target, kept, ec);
            if (ec) throw ColonyFileError(Kind::Io, colonyPath + ": cannot move the damaged file aside: " + ec.message());
            for (const char* suffix : {"-wal", "-shm"})
                if (fs::exists(target.string() + suffix, ec)) fs::rename(target.string() + suffix, kept.string() + suffix, ec);
        }
        fs::rename(temp, target, ec);
        if (ec) throw ColonyFileError(Kind::Io, colonyPath + ": cannot put the restored file in place: " + ec.message());
        syncFolder(target.parent_path().string());
    }
    noteRestore(colonyPath, backupPath);
}

} // namespace hierloom::core
