// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/file_identity.h"
#include "core/store/database_header.h"

#include "core/base/colony_file_error.h"
#include "core/store/colony_store.h"
#include "core/store/sqlite_uri.h"

#include <sqlite3.h>

#include <cstdint>
#include <filesystem>
#include <fstream>
#include <optional>
#include <set>

namespace hierloom::core {

namespace fs = std::filesystem;

namespace {

constexpr std::uint32_t kWalMagic = 0x377f0682; // the low bit says the checksums' byte order

std::uint32_t be32(const unsigned char* p)
{
    return (std::uint32_t{p[0]} << 24) | (std::uint32_t{p[1]} << 16) | (std::uint32_t{p[2]} << 8) | p[3];
}

struct Identities {
    std::set<std::string> ids;
    int error = SQLITE_OK; ///< the SQLite result when they could not be read
};

/// The identities the database shows when opened with `uri`.
Identities identitiesVia(const std::string& uri)
{
    Identities out;
    sqlite3* db = nullptr;
    int rc = sqlite3_open_v2(uri.c_str(), &db, SQLITE_OPEN_READONLY | SQLITE_OPEN_URI, nullptr);
    sqlite3_stmt* q = nullptr;
    if (rc == SQLITE_OK) {
        sqlite3_busy_timeout(db, 2000);
        sqlite3_extended_result_codes(db, 1);
        // The table itself, not the index on id: only the table's page is
        // rewritten by every write (the `writes` counter), so only it is in every -wal.
        rc = sqlite3_prepare_v2(db, "SELECT id, writes FROM file_identity NOT INDEXED", -1, &q, nullptr);
        if (rc == SQLITE_ERROR && sqlite3_errmsg(db) == std::string("no such table: file_identity")) rc = SQLITE_OK;
    }
    while (rc == SQLITE_OK && q) {
        const int step = sqlite3_step(q);
        if (step == SQLITE_ROW) {
            const auto* text = sqlite3_column_text(q, 0);
            if (text) out.ids.insert(reinterpret_cast<const char*>(text));
        } else {
            if (step != SQLITE_DONE) rc = step;
            break;
        }
    }
    sqlite3_finalize(q);
    sqlite3_close(db);
    out.error = rc & 0xFF;
    return out;
}

[[noreturn]] void refuse(const std::string& path, const std::string& why)
{
    throw ColonyFileError(ColonyFileError::Kind::Damaged,
                          path + ": the journal " + path + "-wal beside it " + why +
                              "; SQLite would show that file's records instead of this one's. Nothing was opened "
                              "or changed: move " + path + "-wal away (or put back the colony file it belongs to) "
                              "and open the file again");
}

} // namespace

void ensureFileIdentity(ColonyStore& store)
{
    store.exec("CREATE TABLE IF NOT EXISTS file_identity (id TEXT PRIMARY KEY, writes INTEGER NOT NULL DEFAULT 0);"
               "INSERT INTO file_identity(id) SELECT lower(hex(randomblob(16))) "
               "WHERE NOT EXISTS (SELECT 1 FROM file_identity)");
}

void countFileWrite(ColonyStore& store) { store.exec("UPDATE file_identity SET writes = writes + 1"); }

void checkWalBelongs(const std::string& path)
{
    const std::string wal = path + "-wal";
    std::error_code ec;
    const auto walSize = fs::file_size(wal, ec);
    if (ec || walSize < 32) return;
    unsigned char walHead[32] = {};
    {
        // SQLite holds no lock on the -wal itself: a descriptor of ours is safe there.
        std::ifstream w(wal, std::ios::binary);
        w.read(reinterpret_cast<char*>(walHead), sizeof walHead);
        if (w.gcount() < 32) return;
    }
    // The file itself only through SQLite (database_header.h).
    const auto header = readDatabaseHeader(path);
    if (!header) return;
    const unsigned char* dbHead = header->data();
    // SQLite ignores a -wal without its magic number or without one whole frame.
    if ((be32(walHead) & 0xFFFFFFFEu) != kWalMagic) return;
    const std::uint32_t walPage = be32(walHead + 8);
    if (walSize < 32 + 24 + static_cast<std::uintmax_t>(walPage)) return;
    const std::uint32_t rawPage = (std::uint32_t{dbHead[16]} << 8) | dbHead[17];
    const std::uint32_t dbPage = rawPage == 1 ? 65536 : rawPage;
    // A database in WAL mode cannot change its page size, so its own -wal always has its size.
    if (walPage != dbPage)
        refuse(path, "has " + std::to_string(walPage) + "-byte pages and the file " + std::to_string(dbPage) +
                         "-byte pages, so it was written for another file");

    const Identities alone = identitiesVia(sqliteUri(path, "immutable=1"));
    if (alone.error != SQLITE_OK || alone.ids.empty()) return; // no identity to compare (or the file is being checkpointed)
    const Identities withWal = identitiesVia(sqliteUri(path, "mode=ro"));
    if (withWal.error == SQLITE_CORRUPT || withWal.error == SQLITE_NOTADB)
        refuse(path, "does not fit the file (laid over it, the file reads as damaged), so it was written for another file");
    if (withWal.error != SQLITE_OK) return;
    for (const std::string& id : withWal.ids)
        if (alone.ids.count(id)) return;
    refuse(path, "was written by another colony file (file identity " +
                     (withWal.ids.empty() ? std::string("none") : *withWal.ids.begin()) + ", this file " +
                     *alone.ids.begin() + ")");
}

} // namespace hierloom::core
