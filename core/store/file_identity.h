// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <string>

namespace hierloom::core {

class ColonyStore;

/// A colony file's identity: the table `file_identity(id, writes)` holding a
/// random 16-byte id made when the file was created (or first written by
/// this version), plus the ids of states a restore replaced. Every write
/// transaction counts itself in `writes`, so every -wal file this program
/// writes carries the identity's page. See checkWalBelongs.

/// Creates the table with a fresh id when it is missing; inside a write transaction.
void ensureFileIdentity(ColonyStore& store);

/// Counts one write (puts the identity's page into this transaction); inside a write transaction.
void countFileWrite(ColonyStore& store);

/// Before SQLite opens `path`: when a non-empty `-wal` file lies beside it,
/// refuses (ColonyFileError::Kind::Damaged) a -wal that cannot be this
/// file's: one whose page size differs from the file's, or one that, laid
/// over the file, shows identities none of which the file alone holds.
/// Nothing is written; files without identities (other tools, older
/// versions) are let through.
void checkWalBelongs(const std::string& path);

} // namespace hierloom::core
