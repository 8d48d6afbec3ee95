// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/derived_uid.h"

#include <array>
#include <optional>
#include <string>
#include <string_view>

struct sqlite3;

namespace hierloom::core {

// How a record's uid is kept in the colony file from version 4 on
// (docs/file-formats.md, "Identities"): a uid in the canonical UUID form
// (36 characters, lower-case hex, dashes at 8-13-18-23) is stored as its
// 16 bytes (a BLOB); any other uid (upper-case hex, a hand-made value) stays
// text as given, so every uid reads back exactly as it was written.

/// The 16 bytes of a canonical uid; nothing for any other text.
std::optional<UidBytes> compactUid(std::string_view uid);
/// The canonical text of 16 stored bytes.
std::string uidText(const unsigned char* bytes);

/// An SQL literal matching the stored form of `uid`: X'<32 hex digits>' for a
/// canonical uid, the quoted text otherwise (for statements typed by hand).
std::string uidSqlLiteral(std::string_view uid);

/// An SQL expression giving the uid text of `column` whichever way it is stored
/// (used by the audit triggers, whose JSON cannot hold a BLOB, so that audit
/// rows keep text uids as before).
std::string uidTextSql(const std::string& column);

/// Registers `hierloom_compact_uid(x)` on the connection: x's stored form
/// (the BLOB of a canonical uid text, anything else unchanged). For the
/// migration to version 4 only; the schema itself never calls it, so the
/// file stays usable with the plain sqlite3 shell.
void registerCompactUidFunction(sqlite3* db);

} // namespace hierloom::core
