// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/colony_store.h"
#include "core/store/database_header.h"

#include "core/store/colony_schema.h"
#include "core/store/file_identity.h"
#include "core/store/integrity_check.h"
#include "core/store/partial_files.h"
#include "core/store/record_appender.h"
#include "core/store/record_binding.h"
#include "core/store/sqlite_uri.h"
#include "core/store/support_rows.h"
#include "core/store/encounter_row_migration.h"
#include "core/store/encounter_scope_sql.h"
#include "core/store/uid_migration.h"
#include "core/store/write_transaction.h"
#include "core/store/sqlite_statement.h"

#include <sqlite3.h>

#include <algorithm>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <unistd.h>

namespace hierloom::core {

namespace {

using Kind = ColonyFileError::Kind;

// A store's connection is used by one thread at a time (background jobs get
// copies of the records, never the store), so SQLite's per-call locking is
// not needed; it cost a tenth of a bulk import.
constexpr int kOneThreadAtATime = SQLITE_OPEN_NOMUTEX;


// SQLite counts every allocation under a global mutex unless told not to
// (memory statistics this program never reads): a tenth of a bulk import's
// writing thread (perf). Only possible before SQLite's first use in the
// process; later calls change nothing.
void switchOffMemoryStatistics()
{
    static const bool once = [] {
        sqlite3_config(SQLITE_CONFIG_MEMSTATUS, 0);
        return true;
    }();
    (void)once;
}

std::optional<Day> dayOf(const std::optional<std::string>& text)
{
    if (!text) return std::nullopt;
    return parseDate(*text);
}

Day requiredDay(const std::string& text, const std::string& path)
{
    auto d = parseDate(text);
    if (!d) throw ColonyFileError(Kind::Damaged, path + ": holds an impossible date '" + text + "'");
    return *d;
}

int pragmaInt(sqlite3* db, const char* sql, const std::string& path)
{
    sqlite3_stmt* stmt = nullptr;
    int rc = sqlite3_prepare_v2(db, sql, -1, &stmt, nullptr);
    if (rc != SQLITE_OK) {
        sqlite3_finalize(stmt);
        if ((rc & 0xFF) == SQLITE_NOTADB)
            throw ColonyFileError(Kind::NotAColonyFile, path + ": is not a colony file (not an SQLite database)");
        throwSqliteError(db, rc, path);
    }
    rc = sqlite3_step(stmt);
    const int value = rc == SQLITE_ROW ? sqlite3_column_int(stmt, 0) : 0;
    sqlite3_finalize(stmt);
    if (rc != SQLITE_ROW && rc != SQLITE_DONE) {
        if ((rc & 0xFF) == SQLITE_NOTADB)
            throw ColonyFileError(Kind::NotAColonyFile, path + ": is not a colony file (not an SQLite database)");
        throwSqliteError(db, rc, path);
    }
    return value;
}

void execOn(sqlite3* db, const char* sql, const std::string& context)
{
    char* msg = nullptr;
    const int rc = sqlite3_exec(db, sql, nullptr, nullptr, &msg);
    if (rc != SQLITE_OK) {
        const std::string text = msg ? msg : sqlite3_errstr(rc);
        sqlite3_free(msg);
        if ((rc & 0xFF) == SQLITE_BUSY || (rc & 0xFF) == SQLITE_LOCKED)
            throwSqliteError(db, rc, context);
        throw ColonyFileError((rc & 0xFF) == SQLITE_CORRUPT ? Kind::Damaged : Kind::Io, context + ": " + text);
    }
}

void configureConnection(sqlite3* db, const std::string& path)
{
    sqlite3_busy_timeout(db, 5000);
    sqlite3_extended_result_codes(db, 1);
    execOn(db, "PRAGMA foreign_keys = ON", path);
    // FULL: a committed line survives a power cut, not only a crash.
    execOn(db, "PRAGMA synchronous = FULL", path);
}

// Checks the first bytes before SQLite sees the file, so that an empty or
// foreign file gets a plain message and is never modified.
void checkHeader(const std::string& path)
{
    std::error_code ec;
    if (!std::filesystem::exists(path, ec))
        throw ColonyFileError(Kind::Missing, path + ": no such colony file");
    if (std::filesystem::is_directory(path, ec))
        throw ColonyFileError(Kind::NotAColonyFile, path + ": is a folder, not a colony file");
    const auto size = std::filesystem::file_size(path, ec);
    if (ec) throw ColonyFileError(Kind::Io, path + ": cannot be read: " + ec.message());
    if (size == 0) throw ColonyFileError(Kind::NotAColonyFile, path + ": is empty, not a colony file");
    // Read through SQLite, never a descriptor of ours: this process may hold
    // a connection to the file already (database_header.h says why).
    const auto header = readDatabaseHeader(path);
    if (!header) throw ColonyFileError(Kind::Io, path + ": cannot be read");
    const unsigned char* h = header->data();
    if (std::memcmp(h, "SQLite format 3", 16) != 0)
        throw ColonyFileError(Kind::NotAColonyFile, path + ": is not a colony file (not an SQLite database)");
    if (size < 512)
        throw ColonyFileError(Kind::Damaged, path + ": is damaged (shorter than one database page)");
    // The header records the page count when its two change counters agree;
    // a shorter file lost its end (a partial copy). A non-empty -wal file may
    // legitimately finish an interrupted checkpoint, so the check is skipped then.
    auto be32 = [&](int at) {
        return (std::uint32_t{h[at]} << 24) | (std::uint32_t{h[at + 1]} << 16) | (std::uint32_t{h[at + 2]} << 8) |
               std::uint32_t{h[at + 3]};
    };
    const std::uint32_t rawPage = (std::uint32_t{h[16]} << 8) | h[17];
    const std::uint64_t pageSize = rawPage == 1 ? 65536 : rawPage;
    const std::uint64_t pages = be32(28);
    const auto walSize = std::filesystem::file_size(path + "-wal", ec);
    const bool walPending = !ec && walSize > 0;
    if (!walPending && pages > 0 && be32(24) == be32(92) && pageSize >= 512 && pages * pageSize > size)
        throw ColonyFileError(Kind::Damaged, path + ": is damaged: cut short (" + std::to_string(size) + " of " +
                                                 std::to_string(pages * pageSize) +
                                                 " bytes); restore it from a backup");
}

std::string folderOf(const std::string& path)
{
    const std::string parent = std::filesystem::path(path).parent_path().string();
    return parent.empty() ? std::string(".") : parent;
}

bool folderWritable(const std::string& path) { return ::access(folderOf(path).c_str(), W_OK) == 0; }

bool walPending(const std::string& path)
{
    std::error_code ec;
    const auto size = std::filesystem::file_size(path + "-wal", ec);
    return !ec && size > 0;
}

/// Why this program may not write the file at `path`; empty when it may.
std::string whyNotWritable(const std::string& path)
{
    if (::access(path.c_str(), W_OK) != 0) return "the file is read-only";
    if (!folderWritable(path))
        return "its folder is read-only (while writing, SQLite keeps a -wal and a -shm file beside the colony file)";
    return {};
}

/// Opens `path` read-only: with the `immutable` flag when its folder is not
/// writable and no -wal waits beside it, so that SQLite needs no -shm file.
int openForReading(const std::string& path, sqlite3** db, int extraFlags)
{
    if (!folderWritable(path) && !walPending(path))
        return sqlite3_open_v2(sqliteUri(path, "immutable=1").c_str(), db,
                               SQLITE_OPEN_READONLY | SQLITE_OPEN_URI | extraFlags, nullptr);
    return sqlite3_open_v2(path.c_str(), db, SQLITE_OPEN_READONLY | extraFlags, nullptr);
}

std::string cannotOpenMessage(const std::string& path, const std::string& detail)
{
    if (!folderWritable(path) && walPending(path))
        return path + ": has changes waiting in " + path + "-wal and its folder is read-only, so they cannot be read; "
                      "copy the file together with its -wal file into a writable folder";
    return path + ": cannot be opened" + (detail.empty() ? std::string() : ": " + detail);
}

std::string defaultUserName()
{
    for (const char* var : {"HIERLOOM_USER", "USER", "LOGNAME"})
        if (const char* v = std::getenv(var); v && *v) return v;
    return "unknown";
}

} // namespace

ColonyStore ColonyStore::create(const std::string& path, const std::function<void(ColonyStore&)>& fill)
{
    switchOffMemoryStatistics();
    std::error_code ec;
    if (std::filesystem::exists(path, ec))
        throw ColonyFileError(Kind::AlreadyExists, path + ": already exists; choose another name");
    removeAbandonedPartials(folderOf(path), std::filesystem::path(path).filename().string() + ".",
                            std::chrono::system_clock::now());
    const std::string partial = partialPathFor(path);
    try {
        {
            sqlite3* db = nullptr;
            const int rc = sqlite3_open_v2(partial.c_str(), &db,
                                           SQLITE_OPEN_READWRITE | SQLITE_OPEN_CREATE | kOneThreadAtATime, nullptr);
            if (rc != SQLITE_OK) {
                const std::string msg = db ? sqlite3_errmsg(db) : sqlite3_errstr(rc);
                sqlite3_close(db);
                throw ColonyFileError(Kind::Io, path + ": cannot be created: " + msg);
            }
            ColonyStore store(db, partial);
            configureConnection(db, partial);
            // 16 KiB pages rather than SQLite's 4 KiB: a quarter of the page writes
            // and B-tree levels for large colonies (bulk imports ~15 % faster). Set
            // before the first write; WAL keeps it fixed from then on.
            store.exec("PRAGMA page_size = 16384");
            store.exec("PRAGMA journal_mode = WAL");
            {
                WriteTransaction tx(store);
                store.exec(schemaVersion1Sql());
                store.exec(schemaVersion2Sql());
                store.exec(schemaVersion3Sql());
                storeEncounterRows(store); // on empty tables: version 5's tables, view and index
                store.exec(("PRAGMA application_id = " + std::to_string(colonyApplicationId)).c_str());
                store.exec(("PRAGMA user_version = " + std::to_string(currentSchemaVersion)).c_str());
                tx.commit();
            }
            store.startSession();
            if (fill) fill(store);
        } // closing folds the -wal into the file and removes it
        if (!publishPartial(partial, path))
            throw ColonyFileError(Kind::AlreadyExists, path + ": already exists; choose another name");
    } catch (const std::system_error& e) {
        removePartial(partial);
        throw ColonyFileError(Kind::Io, path + ": cannot be created: " + e.code().message());
    } catch (...) {
        removePartial(partial);
        throw;
    }
    removePartial(partial); // a -shm or -wal the close may have left
    syncFolder(folderOf(path));
    return open(path, Mode::ReadWrite);
}

int probeColonyFile(const std::string& path)
{
    switchOffMemoryStatistics();
    checkHeader(path);
    checkWalBelongs(path);
    sqlite3* db = nullptr;
    const int rc = openForReading(path, &db, 0);
    if (rc != SQLITE_OK) {
        sqlite3_close(db);
        throw ColonyFileError(Kind::Io, cannotOpenMessage(path, {}));
    }
    int version = 0;
    try {
        sqlite3_busy_timeout(db, 5000);
        const int appId = pragmaInt(db, "PRAGMA application_id", path);
        version = pragmaInt(db, "PRAGMA user_version", path);
        pragmaInt(db, "SELECT count(*) FROM sqlite_schema", path);
        if (appId != colonyApplicationId)
            throw ColonyFileError(Kind::NotAColonyFile,
                                  path + ": is an SQLite database of another program, not a colony file");
    } catch (...) {
        sqlite3_close(db);
        throw;
    }
    sqlite3_close(db);
    return version;
}

ColonyStore ColonyStore::open(const std::string& path, Mode mode) { return openAs(path, mode, Check::Once); }

ColonyStore ColonyStore::openVerified(const std::string& path) { return openAs(path, Mode::ReadOnly, Check::Fully); }

ColonyStore ColonyStore::openCheckedElsewhere(const std::string& path)
{
    return openAs(path, Mode::ReadOnly, Check::Elsewhere);
}

ColonyStore ColonyStore::openAs(const std::string& path, Mode mode, Check check)
{
    const int version = probeColonyFile(path);
    if (version > currentSchemaVersion)
        throw ColonyFileError(Kind::NewerVersion,
                              path + ": was written by a newer Hierloom (file version " + std::to_string(version) +
                                  ", this program reads up to " + std::to_string(currentSchemaVersion) +
                                  "); update the program to open it");
    if (mode == Mode::ReadWrite)
        if (const std::string why = whyNotWritable(path); !why.empty())
            throw ColonyFileError(Kind::ReadOnly, path + ": cannot be changed: " + why +
                                                      "; it can still be read. Copy it into a writable folder to change it");
    sqlite3* db = nullptr;
    const int rc = mode == Mode::ReadOnly
                       ? openForReading(path, &db, kOneThreadAtATime)
                       : sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READWRITE | kOneThreadAtATime, nullptr);
    if (rc != SQLITE_OK) {
        const std::string msg = db ? sqlite3_errmsg(db) : sqlite3_errstr(rc);
        sqlite3_close(db);
        throw ColonyFileError(Kind::Io, cannotOpenMessage(path, msg));
    }
    ColonyStore store(db, path);
    configureConnection(db, path);
    if (check == Check::Fully) requireIntactFully(db, path);
    else if (mode == Mode::ReadOnly && check == Check::Once) requireIntactOnce(db, path);
    if (version < currentSchemaVersion) {
        if (mode == Mode::ReadOnly)
            throw ColonyFileError(Kind::NewerVersion, path + ": uses an older file version (" + std::to_string(version) +
                                                          "); open it once for writing to update it");
        store.migrate(version);
    }
    if (mode == Mode::ReadWrite) {
        store.startSession();
        store.ensureEncounterIndex();
    }
    return store;
}

void ColonyStore::startSession()
{
    exec(sessionSql());
    setUserName(defaultUserName());
}

void ColonyStore::setUserName(const std::string& name)
{
    exec("DELETE FROM temp.session_user");
    SqliteStatement q(db_, "INSERT INTO temp.session_user(name) VALUES (?)");
    q.bind(1, name.empty() ? std::string("unknown") : name);
    q.run();
}

std::string ColonyStore::userName() const
{
    SqliteStatement q(db_, "SELECT name FROM temp.session_user LIMIT 1");
    return q.step() ? q.text(0) : std::string();
}

void ColonyStore::setBusyTimeout(int milliseconds) { sqlite3_busy_timeout(db_, milliseconds); }

void ColonyStore::migrate(int fromVersion)
{
    // Keep a consistent copy of the file as it was, before anything changes.
    const std::string backup = path_ + ".v" + std::to_string(fromVersion) + ".bak";
    sqlite3* dest = nullptr;
    if (sqlite3_open(backup.c_str(), &dest) == SQLITE_OK) {
        sqlite3_backup* b = sqlite3_backup_init(dest, "main", db_, "main");
        if (b) {
            sqlite3_backup_step(b, -1);
            sqlite3_backup_finish(b);
        }
    }
    const int brc = sqlite3_errcode(dest);
    sqlite3_close(dest);
    if (brc != SQLITE_OK) throw ColonyFileError(Kind::Io, backup + ": the backup before updating the file failed");

    {
        WriteTransaction tx(*this);
        // Each step takes the file from version v to v + 1.
        for (int v = fromVersion; v < currentSchemaVersion; ++v) {
            if (v == 0) {
                // Version 0: a file stamped as a colony file but without tables.
                exec(schemaVersion1Sql());
            } else if (v == 1) {
                // Version 2 adds the audit trail; existing records keep no history before it.
                exec(schemaVersion2Sql());
            } else if (v == 2) {
                // Version 3 adds the supporters of encounters (none in an older file).
                exec(schemaVersion3Sql());
            } else if (v == 3) {
                // Version 4 stores uids as 16 bytes: a fifth of the file for many encounters.
                storeUidsCompactly(*this);
            } else if (v == 4) {
                // Version 5 stores encounters with day numbers and codes behind a view of the old columns.
                storeEncounterRows(*this);
            }
            exec(("PRAGMA user_version = " + std::to_string(v + 1)).c_str());
        }
        tx.commit();
    }
    exec("PRAGMA journal_mode = WAL");
    // The shorter uids (version 4) and rows (version 5) leave every page of
    // the old tables partly empty; a
    // rewrite gives the space back. VACUUM is all-or-nothing like any
    // transaction: stopped half-way, the file stays as the commit above left it.
    // Only space is at stake: a file another program holds open keeps it for now.
    if (fromVersion <= 4) {
        try {
            exec("VACUUM");
        } catch (const ColonyFileError&) {
        }
    }
}

void ColonyStore::ensureEncounterIndex()
{
    SqliteStatement q(db_, "SELECT 1 FROM sqlite_schema WHERE type = 'index' AND name = ?");
    q.bind(1, std::string_view(kEncounterIndexName));
    if (q.step()) return;
    // Files made before the index: built once, a few seconds for millions of
    // encounters. The index only saves time: a file another program is
    // writing, or a damaged one (refused at its first real write), opens
    // without it, as before.
    try {
        WriteTransaction tx(*this);
        exec(encounterIndexSql());
        tx.commit();
    } catch (const ColonyFileError& e) {
        if (e.kind() != Kind::Busy && e.kind() != Kind::Damaged) throw;
    }
}

ColonyStore::ColonyStore(ColonyStore&& other) noexcept
    : db_(other.db_), path_(std::move(other.path_)), intactAtVersion_(other.intactAtVersion_),
      checkedElsewhereAt_(other.checkedElsewhereAt_), vouched_(other.vouched_)
{
    other.db_ = nullptr;
}

ColonyStore& ColonyStore::operator=(ColonyStore&& other) noexcept
{
    if (this != &other) {
        close();
        db_ = other.db_;
        path_ = std::move(other.path_);
        intactAtVersion_ = other.intactAtVersion_;
        checkedElsewhereAt_ = other.checkedElsewhereAt_;
        vouched_ = other.vouched_;
        other.db_ = nullptr;
    }
    return *this;
}

ColonyStore::~ColonyStore() { close(); }

void ColonyStore::close() noexcept
{
    if (!db_) return;
    // The last connection to close copies the -wal into the file and deletes
    // it: a change this program can vouch for when nobody else has written
    // since its last commit.
    std::optional<ColonyFileState> before;
    try {
        if (vouched_ && dataVersion() == vouched_->dataVersion) before = colonyFileState(path_);
    } catch (...) {
    }
    sqlite3_close(db_);
    db_ = nullptr;
    if (!before || *before != vouched_->state) return;
    // A -wal still holding transactions after the close is another connection's
    // (ours was either left as it was or copied and deleted).
    if (const auto after = colonyFileState(path_); after && (*after == *before || !after->wal))
        carryCheckOver(path_, *before, *after);
}

void ColonyStore::exec(const char* sql) const { execOn(db_, sql, path_); }

void ColonyStore::checkBeforeWrite()
{
    const std::int64_t version = dataVersion();
    const bool checkedAlready = (intactAtVersion_ && *intactAtVersion_ == version) ||
                                (checkedElsewhereAt_ && *checkedElsewhereAt_ == version);
    vouched_.reset();
    if (const auto state = requireIntactBeforeWrite(db_, path_, checkedAlready)) vouched_ = {*state, version};
    checkedElsewhereAt_.reset();
    ensureFileIdentity(*this);
    intactAtVersion_ = version;
}

void ColonyStore::commitWrite()
{
    // A write transaction in WAL mode writes only the -wal: a change of the
    // file itself meanwhile is another program's.
    if (vouched_) {
        const auto now = colonyFileState(path_);
        if (!now || now->file != vouched_->state.file) vouched_.reset();
    }
    try {
        exec("COMMIT");
    } catch (...) {
        vouched_.reset();
        throw;
    }
    if (!vouched_) return;
    // Read after the file's state: another connection committing after this
    // commit (or during its checkpoint) moves data_version.
    const auto after = colonyFileState(path_);
    const bool alone = dataVersion() == vouched_->dataVersion;
    if (after && alone && carryCheckOver(path_, vouched_->state, *after)) vouched_->state = *after;
    else vouched_.reset();
}

std::int64_t ColonyStore::dataVersion() const
{
    SqliteStatement q(db_, "PRAGMA data_version");
    return q.step() ? q.integer(0) : -1;
}

int ColonyStore::schemaVersion() const { return pragmaInt(db_, "PRAGMA user_version", path_); }

std::vector<Animal> ColonyStore::loadAnimals() const
{
    SqliteStatement q(db_, "SELECT uid, id, name, sex, birth_date, mother, father, entry_date, entry_type, "
                           "exit_date, exit_type FROM animal ORDER BY id");
    std::vector<Animal> out;
    while (q.step()) {
        Animal a;
        a.uid = q.uid(0);
        a.id = q.text(1);
        a.name = q.text(2);
        a.sex = parseSex(q.text(3)).value_or(Sex::Unknown);
        a.birth = dayOf(q.optionalText(4));
        a.mother = q.text(5);
        a.father = q.text(6);
        a.entry = dayOf(q.optionalText(7));
        a.entryType = parseEntryType(q.text(8)).value_or(EntryType::None);
        a.exit = dayOf(q.optionalText(9));
        a.exitType = parseExitType(q.text(10)).value_or(ExitType::None);
        out.push_back(std::move(a));
    }
    return out;
}

std::vector<Residence> ColonyStore::loadResidences() const
{
    SqliteStatement q(db_, "SELECT uid, animal, grp, from_date, to_date FROM residence ORDER BY animal, from_date");
    std::vector<Residence> out;
    while (q.step()) {
        Residence r;
        r.uid = q.uid(0);
        r.animal = q.text(1);
        r.group = q.text(2);
        r.from = requiredDay(q.text(3), path_);
        r.to = dayOf(q.optionalText(4));
        out.push_back(std::move(r));
    }
    return out;
}

std::vector<Encounter> ColonyStore::loadEncounters() const
{
    SqliteStatement q(db_, (std::string("SELECT ") + kEncounterColumnsSql + " FROM encounter_row ORDER BY seq").c_str());
    const EncounterTermTexts terms(db_, path_);
    std::vector<Encounter> out;
    // Growing a vector of a million records by doubling moved each several
    // times; the headroom keeps an evening's new entries from moving them all.
    out.reserve(static_cast<size_t>(encounterCount()) + 4096);
    while (q.step()) out.push_back(readEncounterRow(q, terms, path_));
    loadSupportRows(db_, out);
    return out;
}

std::vector<Encounter> ColonyStore::loadEncounterRangeWithoutSupporters(std::int64_t first, std::int64_t last) const
{
    SqliteStatement q(db_, (std::string("SELECT ") + kEncounterColumnsSql +
                            " FROM encounter_row WHERE seq BETWEEN ?1 AND ?2 ORDER BY seq").c_str());
    q.bind(1, first);
    q.bind(2, last);
    const EncounterTermTexts terms(db_, path_);
    std::vector<Encounter> out;
    while (q.step()) out.push_back(readEncounterRow(q, terms, path_));
    return out;
}

void ColonyStore::loadSupporters(std::vector<Encounter>& encounters) const { loadSupportRows(db_, encounters); }

void ColonyStore::loadSupporters(EncounterRecords& records) const { loadSupportRows(db_, records); }

std::optional<std::pair<std::int64_t, std::int64_t>> ColonyStore::encounterSeqRange() const
{
    SqliteStatement q(db_, "SELECT min(seq), max(seq) FROM encounter_row");
    if (!q.step() || q.isNull(0)) return std::nullopt;
    return std::pair{q.integer(0), q.integer(1)};
}

std::string encounterScopeSql(const EncounterScope& scope)
{
    std::string sql;
    if (!scope.group.empty())
        sql += " AND grp IN (0, (SELECT code FROM encounter_term WHERE text = ?1)) AND (grp <> 0 OR "
               "winner IN (SELECT animal FROM residence WHERE grp = ?1))";
    if (scope.from) sql += " AND day >= ?2";
    if (scope.to) sql += " AND day <= ?3";
    return sql;
}

void bindEncounterScope(SqliteStatement& q, const EncounterScope& scope)
{
    if (!scope.group.empty()) q.bind(1, scope.group);
    if (scope.from) q.bind(2, static_cast<std::int64_t>(*scope.from));
    if (scope.to) q.bind(3, static_cast<std::int64_t>(*scope.to));
}

std::vector<Encounter> ColonyStore::loadEncounters(const EncounterScope& scope) const
{
    if (scope.everything() && scope.uids) return loadEncounters();
    // No ORDER BY: SQLite would copy every row through its sorter (a sixth of
    // a one-group command). The rows come in index order, which is entry order
    // within each of the two ranges whenever entries were made in date order;
    // they are put in entry order below.
    SqliteStatement q(db_, (std::string("SELECT ") + (scope.uids ? kEncounterColumnsSql : kEncounterColumnsWithoutUidSql) +
                            " FROM encounter_row WHERE 1" + encounterScopeSql(scope))
                               .c_str());
    bindEncounterScope(q, scope);
    const EncounterTermTexts terms(db_, path_);
    std::vector<Encounter> out;
    if (scope.everything()) out.reserve(static_cast<size_t>(encounterCount()) + 4096);
    while (q.step()) out.push_back(readEncounterRow(q, terms, path_));
    const auto bySeq = [](const Encounter& a, const Encounter& b) { return a.seq < b.seq; };
    if (!std::is_sorted(out.begin(), out.end(), bySeq)) std::sort(out.begin(), out.end(), bySeq);
    loadSupportRows(db_, out); // by seq, so a selection gets its own supporters
    return out;
}

std::optional<Day> ColonyStore::lastEncounterDay() const
{
    // max(day) alone walks the whole encounter_by_group index (a fifth of a
    // second at 3,000,000 encounters); the latest day of each group is one
    // seek at the end of its range, and the groups are found by seeking past
    // each one (a few dozen seeks). A file without the index (made before it,
    // opened read-only) is scanned once instead.
    SqliteStatement has(db_, "SELECT 1 FROM sqlite_schema WHERE type = 'index' AND name = ?");
    has.bind(1, std::string_view(kEncounterIndexName));
    SqliteStatement q(db_, has.step() ? "WITH RECURSIVE g(grp) AS (SELECT min(grp) FROM encounter_row UNION ALL "
                                        "SELECT (SELECT min(grp) FROM encounter_row WHERE grp > g.grp) FROM g "
                                        "WHERE g.grp IS NOT NULL) "
                                        "SELECT max((SELECT max(day) FROM encounter_row e WHERE e.grp = g.grp)) FROM g "
                                        "WHERE grp IS NOT NULL"
                                      : "SELECT max(day) FROM encounter_row");
    if (!q.step() || q.isNull(0)) return std::nullopt;
    return storedDay(q.integer(0), path_);
}

Colony ColonyStore::load() const
{
    Colony c;
    c.animals = loadAnimals();
    c.residences = loadResidences();
    c.encounters = loadEncounters();
    c.reindex();
    return c;
}

std::int64_t ColonyStore::encounterCount() const
{
    SqliteStatement q(db_, "SELECT count(*) FROM encounter_row");
    q.step();
    return q.integer(0);
}

std::unordered_set<std::string> ColonyStore::encounterUids() const
{
    SqliteStatement q(db_, "SELECT uid FROM encounter_row");
    std::unordered_set<std::string> out;
    while (q.step()) out.insert(q.uid(0));
    return out;
}

void ColonyStore::append(std::vector<Animal>& animals, std::vector<Residence>& residences,
                         std::vector<Encounter>& encounters, const std::string& source)
{
    WriteTransaction tx(*this, encounters.size() > kBulkEncounters ? WriteTransaction::Size::Bulk
                                                                   : WriteTransaction::Size::Small);
    insertAnimals(*this, animals);
    insertResidences(*this, residences);
    if (!encounters.empty()) {
        EncounterAppender out(*this, tx);
        for (Encounter& e : encounters) out.add(e);
        out.finish(source);
    }
    tx.commit();
}

std::vector<std::string> ColonyStore::observers() const
{
    SqliteStatement q(db_, "SELECT name FROM observer ORDER BY name");
    std::vector<std::string> out;
    while (q.step()) out.push_back(q.text(0));
    return out;
}

void ColonyStore::addObserver(const std::string& name)
{
    WriteTransaction tx(*this); // checked, counted, and the checked-files cache's pass kept, like every write
    {
        SqliteStatement q(db_, "INSERT OR IGNORE INTO observer(name) VALUES (?)");
        q.bind(1, name);
        q.run();
    }
    tx.commit();
}

std::vector<ColonyStore::BehaviourCode> ColonyStore::behaviourCodes() const
{
    SqliteStatement q(db_, "SELECT code, severity, description FROM behaviour_code ORDER BY severity, code");
    std::vector<BehaviourCode> out;
    while (q.step()) out.push_back({q.text(0), static_cast<int>(q.integer(1)), q.text(2)});
    return out;
}

std::string ColonyStore::setting(const std::string& key, const std::string& fallback) const
{
    SqliteStatement q(db_, "SELECT value FROM setting WHERE key = ?");
    q.bind(1, key);
    return q.step() ? q.text(0) : fallback;
}

void ColonyStore::setSetting(const std::string& key, const std::string& value)
{
    WriteTransaction tx(*this);
    {
        SqliteStatement q(db_, "INSERT INTO setting(key, value) VALUES (?, ?) "
                               "ON CONFLICT(key) DO UPDATE SET value = excluded.value");
        q.bind(1, key);
        q.bind(2, value);
        q.run();
    }
    tx.commit();
}

} // namespace hierloom::core
