// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>

namespace hierloom::core {

/// An SQLite URI (`file:///...`) for the file at `path`, with `query` (such as
/// "immutable=1") appended; for sqlite3_open_v2 with SQLITE_OPEN_URI.
std::string sqliteUri(const std::string& path, const std::string& query);

} // namespace hierloom::core
