// SPDX-License-Identifier: GPL-3.0-or-later
// One value of a query on a colony file, as text, for the store's tests that
// look at the file as another program would.
#pragma once

#include <sqlite3.h>

#include <string>

namespace hierloom::test {

/// The first column of the first row: "NULL" for NULL, "<none>" when there is
/// no row, "<error: ...>" when the statement does not compile.
inline std::string scalar(sqlite3* db, const std::string& sql)
{
    sqlite3_stmt* q = nullptr;
    sqlite3_prepare_v2(db, sql.c_str(), -1, &q, nullptr);
    if (!q) return "<error: " + std::string(sqlite3_errmsg(db)) + ">";
    std::string out = "<none>";
    if (sqlite3_step(q) == SQLITE_ROW)
        out = sqlite3_column_type(q, 0) == SQLITE_NULL ? "NULL" : reinterpret_cast<const char*>(sqlite3_column_text(q, 0));
    sqlite3_finalize(q);
    return out;
}

/// `scalar` on a read-only connection of its own to the file at `path`.
inline std::string scalarOfFile(const std::string& path, const std::string& sql)
{
    sqlite3* db = nullptr;
    sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr);
    std::string out = scalar(db, sql);
    sqlite3_close(db);
    return out;
}

} // namespace hierloom::test
