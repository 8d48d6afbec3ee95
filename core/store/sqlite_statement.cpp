// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/sqlite_statement.h"

#include "core/base/colony_file_error.h"
#include "core/store/check_cache.h"
#include "core/store/uid_storage.h"

#include <sqlite3.h>

#include <algorithm>

namespace hierloom::core {

void throwSqliteError(sqlite3* db, int rc, const std::string& context)
{
    const int primary = rc & 0xFF;
    std::string message = context + ": " + (db ? sqlite3_errmsg(db) : sqlite3_errstr(rc));
    using K = ColonyFileError::Kind;
    K kind = K::Io;
    if (primary == SQLITE_BUSY || primary == SQLITE_LOCKED) {
        kind = K::Busy;
        message = context + ": the colony file is being written by another program; try again when it has finished";
    } else if (primary == SQLITE_CORRUPT || primary == SQLITE_NOTADB) {
        kind = K::Damaged;
        if (const char* file = db ? sqlite3_db_filename(db, "main") : nullptr; file && *file) {
            // A damaged page met while reading: whatever an earlier check
            // found, the next open checks the whole file again.
            CheckCache::fromEnvironment().forget(file);
            message = std::string(file) + ": is damaged (" + sqlite3_errmsg(db) + ", met while " + context + ")";
        }
    }
    throw ColonyFileError(kind, message);
}

SqliteStatement::SqliteStatement(sqlite3* db, const char* sql) : db_(db)
{
    const int rc = sqlite3_prepare_v2(db, sql, -1, &stmt_, nullptr);
    if (rc != SQLITE_OK) throwSqliteError(db, rc, "preparing a query");
}

SqliteStatement::~SqliteStatement() { sqlite3_finalize(stmt_); }

void SqliteStatement::bind(int index, std::string_view text)
{
    sqlite3_bind_text(stmt_, index, text.data(), static_cast<int>(text.size()), SQLITE_TRANSIENT);
}

void SqliteStatement::bindStatic(int index, std::string_view text)
{
    sqlite3_bind_text(stmt_, index, text.data(), static_cast<int>(text.size()), SQLITE_STATIC);
}

void SqliteStatement::bindOptional(int index, const std::optional<std::string>& text)
{
    if (text) bind(index, *text);
    else bindNull(index);
}

void SqliteStatement::bindNullableText(int index, std::string_view text)
{
    if (text.empty()) bindNull(index);
    else bind(index, text);
}

void SqliteStatement::bind(int index, std::int64_t value) { sqlite3_bind_int64(stmt_, index, value); }

void SqliteStatement::bindNull(int index) { sqlite3_bind_null(stmt_, index); }

void SqliteStatement::bindUid(int index, std::string_view uid)
{
    if (const auto bytes = compactUid(uid))
        sqlite3_bind_blob(stmt_, index, bytes->data(), static_cast<int>(bytes->size()), SQLITE_TRANSIENT);
    else
        bind(index, uid);
}

void SqliteStatement::bindStaticUid(int index, const std::array<unsigned char, 16>& bytes)
{
    sqlite3_bind_blob(stmt_, index, bytes.data(), static_cast<int>(bytes.size()), SQLITE_STATIC);
}

bool SqliteStatement::step()
{
    const int rc = sqlite3_step(stmt_);
    if (rc == SQLITE_ROW) return true;
    if (rc == SQLITE_DONE) return false;
    throwSqliteError(db_, rc, "reading or writing the colony file");
    return false;
}

void SqliteStatement::run()
{
    const int rc = sqlite3_step(stmt_);
    sqlite3_reset(stmt_);
    if (rc != SQLITE_DONE && rc != SQLITE_ROW) throwSqliteError(db_, rc, "writing the colony file");
}

void SqliteStatement::reset() { sqlite3_reset(stmt_); }

std::string SqliteStatement::text(int column) const
{
    const auto* p = sqlite3_column_text(stmt_, column);
    return p ? std::string(reinterpret_cast<const char*>(p), static_cast<size_t>(sqlite3_column_bytes(stmt_, column)))
             : std::string();
}

std::string SqliteStatement::uid(int column) const
{
    if (sqlite3_column_type(stmt_, column) == SQLITE_BLOB && sqlite3_column_bytes(stmt_, column) == 16)
        return uidText(static_cast<const unsigned char*>(sqlite3_column_blob(stmt_, column)));
    return text(column);
}

std::optional<std::array<unsigned char, 16>> SqliteStatement::uidBytes(int column) const
{
    if (sqlite3_column_type(stmt_, column) != SQLITE_BLOB || sqlite3_column_bytes(stmt_, column) != 16) return std::nullopt;
    std::array<unsigned char, 16> out{};
    const auto* p = static_cast<const unsigned char*>(sqlite3_column_blob(stmt_, column));
    std::copy(p, p + 16, out.begin());
    return out;
}

std::string_view SqliteStatement::textView(int column) const
{
    const auto* p = sqlite3_column_text(stmt_, column);
    return p ? std::string_view(reinterpret_cast<const char*>(p), static_cast<size_t>(sqlite3_column_bytes(stmt_, column)))
             : std::string_view();
}

std::optional<std::string> SqliteStatement::optionalText(int column) const
{
    if (isNull(column)) return std::nullopt;
    return text(column);
}

std::int64_t SqliteStatement::integer(int column) const { return sqlite3_column_int64(stmt_, column); }

bool SqliteStatement::isNull(int column) const { return sqlite3_column_type(stmt_, column) == SQLITE_NULL; }

bool hasTable(sqlite3* db, const char* name)
{
    SqliteStatement q(db, "SELECT 1 FROM sqlite_master WHERE type = 'table' AND name = ?");
    q.bind(1, std::string(name));
    return q.step();
}

} // namespace hierloom::core
