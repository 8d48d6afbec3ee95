// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_backup.h"

#include "core/base/colony_file_error.h"
#include "core/store/colony_schema.h"
#include "core/store/colony_store.h"
#include "core/store/sqlite_statement.h"

#include <sqlite3.h>

#include <algorithm>
#include <cstdio>
#include <ctime>
#include <fcntl.h>
#include <filesystem>
#include <unistd.h>

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

std::vector<Found> findBackups(const std::string& colonyPath)
{
    std::vector<Found> out;
    const std::string prefix = stemOf(colonyPath) + "-";
    std::error_code ec;
    for (const auto& entry : fs::directory_iterator(backupFolder(colonyPath), ec)) {
        const std::string name = entry.path().filename().string();
        if (entry.path().extension() != ".hierloom" || name.rfind(prefix, 0) != 0) continue;
        const std::string middle = name.substr(prefix.size(), name.size() - prefix.size() - 9);
        Found f{{entry.path().string(), {}}, 1};
        if (parseStamp(middle, f.file.taken, f.serial)) out.push_back(f);
    }
    std::sort(out.begin(), out.end(), [](const Found& a, const Found& b) {
        return a.file.taken != b.file.taken ? a.file.taken > b.file.taken : a.serial > b.serial;
    });
    return out;
}

/// Flushes a folder's entries (a rename) to disk.
void syncFolder(const fs::path& folder)
{
    const int fd = ::open(folder.c_str(), O_RDONLY | O_DIRECTORY);
    if (fd >= 0) {
        ::fsync(fd);
        ::close(fd);
    }
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
    const std::string base = stemOf(colonyPath) + "-" + kind + stamp(now);
    fs::path target = folder / (base + ".hierloom");
    for (int n = 2; fs::exists(target); ++n) target = folder / (base + "-" + std::to_string(n) + ".hierloom");
    const fs::path partial = target.string() + ".partial";
    fs::remove(partial, ec);
    copyDatabase(db, partial.string(), "the backup");
    fs::rename(partial, target, ec);
    if (ec) throw ColonyFileError(Kind::Io, target.string() + ": cannot name the backup: " + ec.message());
    syncFolder(folder);
    const auto all = findBackups(colonyPath);
    for (size_t i = static_cast<size_t>(std::max(keep, 1)); i < all.size(); ++i) fs::remove(all[i].file.path, ec);
    return target.string();
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

std::vector<BackupFile> listBackups(const std::string& colonyPath)
{
    std::vector<BackupFile> out;
    for (const Found& f : findBackups(colonyPath)) out.push_back(f.file);
    return out;
}

std::string backupColony(const ColonyStore& store, Clock::time_point now, int keep)
{
    return backupConnection(store.handle(), store.path(), now, keep);
}

bool backupIfDue(const ColonyStore& store, Clock::time_point now)
{
    double hours = defaultBackupIntervalHours;
    try {
        hours = std::stod(store.setting("backup_interval_hours", std::to_string(defaultBackupIntervalHours)));
    } catch (const std::exception&) {
        hours = defaultBackupIntervalHours;
    }
    if (!(hours > 0)) return false;
    const auto backups = listBackups(store.path());
    const auto interval = std::chrono::duration_cast<Clock::duration>(std::chrono::duration<double>(hours * 3600.0));
    if (!backups.empty() && now - backups.front().taken < interval) return false;
    backupColony(store, now, settingInt(store, "backup_keep", defaultBackupsKept));
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
    if (live) {
        Connection colony;
        if (sqlite3_open_v2(colonyPath.c_str(), &colony.db, SQLITE_OPEN_READWRITE, nullptr) != SQLITE_OK)
            throw ColonyFileError(Kind::Io, colonyPath + ": cannot be opened for writing");
        sqlite3_busy_timeout(colony.db, 5000);
        // SQLite cannot copy pages of one size into a WAL file of another
        // (colony files created by earlier builds use 4 KiB pages, newer ones 16 KiB).
        if (const int from = pageSizeOf(backup.db), to = pageSizeOf(colony.db); from != to)
            throw ColonyFileError(Kind::Io, backupPath + ": was made from a colony file with " +
                                                std::to_string(from / 1024) + " KiB pages and cannot be restored over " +
                                                colonyPath + " (" + std::to_string(to / 1024) +
                                                " KiB pages); restore it into a new file instead; " + colonyPath +
                                                " is unchanged");
        // The state being replaced stays recoverable, like any other backup.
        backupConnection(colony.db, colonyPath, now, defaultBackupsKept);
        sqlite3_backup* b = sqlite3_backup_init(colony.db, "main", backup.db, "main");
        if (!b) throw ColonyFileError(Kind::Io, colonyPath + ": restore failed: " + sqlite3_errmsg(colony.db));
        const int rc = sqlite3_backup_step(b, -1);
        sqlite3_backup_finish(b);
        if ((rc & 0xFF) == SQLITE_BUSY || (rc & 0xFF) == SQLITE_LOCKED)
            throw ColonyFileError(Kind::Busy, colonyPath + ": another program is writing to it; close that "
                                                           "program (or wait for it to finish) and restore again");
        if (rc != SQLITE_DONE)
            throw ColonyFileError(Kind::Io, colonyPath + ": restore failed: " + sqlite3_errstr(rc) +
                                                "; the file is unchanged");
    } else {
        const fs::path target(colonyPath);
        const fs::path temp = target.string() + ".restoring";
        std::error_code ec;
        fs::remove(temp, ec);
        copyDatabase(backup.db, temp.string(), "the restore");
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
        syncFolder(target.parent_path().empty() ? fs::path(".") : target.parent_path());
    }
    noteRestore(colonyPath, backupPath);
}

} // namespace hierloom::core
