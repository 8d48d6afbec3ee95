// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <array>
#include <optional>
#include <string>

namespace hierloom::core {

/// The first 100 bytes of the SQLite database at `path` (its header), read
/// through a read-only SQLite connection of its own, a shorter file's bytes
/// followed by zeros; nothing when the file cannot be opened.
///
/// Never read a colony file through a descriptor of one's own (std::ifstream,
/// open/close) while this process may hold an SQLite connection to it:
/// closing ANY descriptor of the file drops every POSIX lock the process
/// holds on it, SQLite's included. Another process closing its connection
/// then believes itself the last one, checkpoints and deletes the -wal, and
/// a transaction committed here meanwhile is lost (a test of two processes
/// importing at once lost one import's rows in about one run in forty).
/// SQLite's own unix VFS shares one descriptor per file among a process's
/// connections and defers closing it while locks are held, so a connection
/// of its own is safe.
std::optional<std::array<unsigned char, 100>> readDatabaseHeader(const std::string& path);

} // namespace hierloom::core
