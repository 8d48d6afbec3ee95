// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <array>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

struct sqlite3;
struct sqlite3_stmt;

namespace hierloom::core {

/// A prepared SQLite statement that finalises itself; errors become
/// ColonyFileError carrying SQLite's message.
class SqliteStatement {
public:
    SqliteStatement(sqlite3* db, const char* sql);
    ~SqliteStatement();
    SqliteStatement(const SqliteStatement&) = delete;
    SqliteStatement& operator=(const SqliteStatement&) = delete;

    void bind(int index, std::string_view text);
    /// Binds text that stays alive and unchanged until the statement is stepped (no copy).
    void bindStatic(int index, std::string_view text);
    void bindOptional(int index, const std::optional<std::string>& text);
    void bindNullableText(int index, std::string_view text); // empty -> NULL
    void bind(int index, std::int64_t value);
    void bindNull(int index);
    /// Binds a record uid in its stored form (core/store/uid_storage.h):
    /// 16 bytes for a canonical uid, the text otherwise.
    void bindUid(int index, std::string_view uid);
    /// Binds the 16 bytes of a canonical uid (its stored form) without a copy:
    /// they must stay alive and unchanged until the statement is stepped.
    void bindStaticUid(int index, const std::array<unsigned char, 16>& bytes);

    /// Steps once: true when a row is available.
    bool step();
    /// Steps a statement that returns no rows and resets it for reuse.
    void run();
    void reset();

    std::string text(int column) const;
    /// The text of a column without a copy; valid until the next step or reset.
    std::string_view textView(int column) const;
    std::optional<std::string> optionalText(int column) const;
    std::int64_t integer(int column) const;
    /// A record uid column as text, whichever way it is stored.
    std::string uid(int column) const;
    /// A record uid column's 16 bytes when it holds a canonical uid (a BLOB of 16); nothing otherwise.
    std::optional<std::array<unsigned char, 16>> uidBytes(int column) const;
    bool isNull(int column) const;

private:
    sqlite3* db_;
    sqlite3_stmt* stmt_ = nullptr;
};

/// Throws ColonyFileError for an SQLite result code that is not OK.
void throwSqliteError(sqlite3* db, int rc, const std::string& context);

/// True when the file holds a table of that name (older schema versions lack some).
bool hasTable(sqlite3* db, const char* name);

} // namespace hierloom::core
