// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/database_header.h"

#include <sqlite3.h>

namespace hierloom::core {

std::optional<std::array<unsigned char, 100>> readDatabaseHeader(const std::string& path)
{
    sqlite3* db = nullptr;
    std::optional<std::array<unsigned char, 100>> out;
    // Opening reads nothing yet; the header is read through SQLite's own file
    // handle (the VFS's shared descriptor), not a descriptor of ours.
    if (sqlite3_open_v2(path.c_str(), &db, SQLITE_OPEN_READONLY, nullptr) == SQLITE_OK) {
        sqlite3_file* file = nullptr;
        if (sqlite3_file_control(db, "main", SQLITE_FCNTL_FILE_POINTER, &file) == SQLITE_OK && file &&
            file->pMethods) {
            std::array<unsigned char, 100> h{};
            // A shorter file reads as its bytes followed by zeros (SQLite fills the rest).
            const int rc = file->pMethods->xRead(file, h.data(), static_cast<int>(h.size()), 0);
            if (rc == SQLITE_OK || rc == SQLITE_IOERR_SHORT_READ) out = h;
        }
    }
    sqlite3_close(db);
    return out;
}

} // namespace hierloom::core
