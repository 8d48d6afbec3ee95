// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/uid_storage.h"

#include "core/base/derived_uid.h"

#include <sqlite3.h>

namespace hierloom::core {

namespace {

void compactUidFunction(sqlite3_context* ctx, int, sqlite3_value** argv)
{
    if (sqlite3_value_type(argv[0]) == SQLITE_TEXT) {
        const auto* p = reinterpret_cast<const char*>(sqlite3_value_text(argv[0]));
        const auto bytes = compactUid(std::string_view(p, static_cast<size_t>(sqlite3_value_bytes(argv[0]))));
        if (bytes) {
            sqlite3_result_blob(ctx, bytes->data(), static_cast<int>(bytes->size()), SQLITE_TRANSIENT);
            return;
        }
    }
    sqlite3_result_value(ctx, argv[0]);
}

} // namespace

std::optional<UidBytes> compactUid(std::string_view uid) { return canonicalUidBytes(uid); }

std::string uidText(const unsigned char* b) { return uuidTextOf(b); }

std::string uidSqlLiteral(std::string_view uid)
{
    if (const auto bytes = compactUid(uid)) {
        std::string hex;
        for (char c : uid)
            if (c != '-') hex += c;
        return "X'" + hex + "'";
    }
    std::string out = "'";
    for (char c : uid) out += c == '\'' ? std::string("''") : std::string(1, c);
    return out + "'";
}

std::string uidTextSql(const std::string& c)
{
    const std::string h = "hex(" + c + ")";
    return "CASE WHEN typeof(" + c + ") = 'blob' AND length(" + c + ") = 16 THEN lower(substr(" + h + ", 1, 8) || '-' || substr(" +
           h + ", 9, 4) || '-' || substr(" + h + ", 13, 4) || '-' || substr(" + h + ", 17, 4) || '-' || substr(" + h +
           ", 21)) ELSE " + c + " END";
}

void registerCompactUidFunction(sqlite3* db)
{
    sqlite3_create_function(db, "hierloom_compact_uid", 1, SQLITE_UTF8 | SQLITE_DETERMINISTIC, nullptr,
                            compactUidFunction, nullptr, nullptr);
}

} // namespace hierloom::core
