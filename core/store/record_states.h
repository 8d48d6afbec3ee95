// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include <optional>
#include <string>
#include <unordered_map>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// The columns of one kind of record that a merge compares, as stored
/// (`grp`, `from_date`, ...), without `uid` and `seq`: the uid is the
/// identity and seq only the entry order in one file.
struct RecordTable {
    const char* name; ///< animal, residence or encounter
    std::vector<const char*> columns;
};

/// animal, residence, encounter, in the order a merge takes them.
const std::vector<RecordTable>& recordTables();

/// One state of a record: its columns' values as text, nullopt for NULL,
/// in the order of RecordTable::columns.
using RecordValues = std::vector<std::optional<std::string>>;

/// What one colony file knows about the records of one table (docs/file-formats.md, "Merging").
struct RecordStates {
    /// The records there now, by uid.
    std::unordered_map<std::string, RecordValues> current;
    /// Every earlier state of a record named in the audit trail (the values
    /// before and after each insert, update and delete), oldest first, by uid.
    /// A record loaded by a bulk import has no rows until it is first edited.
    std::unordered_map<std::string, std::vector<RecordValues>> history;
    /// Tombstones: records the audit trail shows deleted and that are not
    /// there now, with their values when they were deleted.
    std::unordered_map<std::string, RecordValues> deleted;

    /// True when the record `uid` had exactly `values` at some time in this file.
    bool knew(const std::string& uid, const RecordValues& values) const;
};

/// Reads the current records and the audit trail of one table.
RecordStates readRecordStates(const ColonyStore& store, const RecordTable& table);

} // namespace hierloom::core
