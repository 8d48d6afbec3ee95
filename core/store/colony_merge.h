// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/import_problems.h"

#include <chrono>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// Which side wins a field edited differently in both files since their
/// common state: nobody (list the conflicts and write nothing), this colony
/// file, or the other one. It decides nothing else.
enum class MergePreference { None, Ours, Theirs };

/// One field of a record changed on both sides to different values.
struct FieldConflict {
    std::string field;  ///< the column, as in the colony file (`name`, `grp`, ...)
    std::string ours;   ///< the value here (`(deleted)` when the record was deleted here)
    std::string theirs; ///< the value in the other file (`(deleted)` likewise)
    std::optional<std::string> base; ///< the value in the common state; nullopt when none is known
};

/// One record changed on both sides in ways that contradict each other:
/// fields edited to different values, an edit against a deletion, or two
/// records (two uids) claiming one identity (an animal id, a stay's start).
struct MergeConflict {
    std::string table;  ///< animal, residence or encounter
    std::string uid;    ///< the record's uid in this colony file
    std::string record; ///< the record as a person knows it (animal id, stay, encounter)
    std::string what;   ///< the fields that differ, both values, as one line
    std::vector<FieldConflict> fields; ///< the same, field by field
};

/// One record a merge changed, kept or recognised, for the report.
struct MergeChange {
    std::string table;
    std::string uid;    ///< the uid here
    std::string record; ///< as a person knows it
    std::string detail; ///< the fields taken, or why
};

/// What a merge added, changed, deleted, skipped and could not decide.
struct MergeReport {
    std::vector<Animal> addedAnimals;
    std::vector<Residence> addedResidences;
    std::vector<Encounter> addedEncounters; ///< with the seq they were given here
    /// Edits made only in the other file since the common state, taken.
    std::vector<MergeChange> updated;
    /// Records the other file deleted (and this one left as they were), deleted here.
    std::vector<MergeChange> deleted;
    /// Records deleted here that the other file still holds unchanged: they stay deleted.
    std::vector<MergeChange> keptDeleted;
    /// Records of the other file recognised here under another uid by their
    /// content (the same animal id, the same stay, an identical encounter).
    std::vector<MergeChange> matched;
    std::vector<std::string> takenFromOther; ///< conflicts settled with the other file's version
    size_t skippedAnimals = 0;
    size_t skippedResidences = 0;
    size_t skippedEncounters = 0;
    std::vector<MergeConflict> conflicts;
    ImportProblems problems; ///< records to add that break an import rule
    std::string backup;      ///< the backup taken before writing; empty when none was needed
    bool written = false;

    /// True when the merge changes this colony file (or would, in a dry run).
    bool changes() const;
};

/// Options of mergeColonies.
struct MergeOptions {
    MergePreference prefer = MergePreference::None;
    bool dryRun = false; ///< check and report, write nothing
    Day today = 0;       ///< dates after it are refused, as in an import
    /// Take a backup (backupColony, keeping `backup_keep`) before a merge
    /// that changes anything is written: after a first look that writes
    /// nothing, just before the write transaction begins.
    bool backup = true;
    std::chrono::system_clock::time_point now = std::chrono::system_clock::now(); ///< names the backup
};

/// Brings the other colony file's records into this one, all or nothing in
/// one transaction (docs/file-formats.md, "Merging"). Records are the same
/// when they have the same uid, or failing that the same content. For a
/// record in both files, the common state is the newest state this file's
/// audit trail knows that the other file's also knows; a field changed on
/// one side only since then takes that side's value, a field changed on both
/// sides to different values is a conflict. A record deleted on one side
/// (an audit `delete` row: a tombstone) and left unchanged on the other is
/// deleted, or stays deleted; deleted against edited is a conflict. New
/// records are checked under every import rule (planImport on the records
/// written as import files) and added, new encounters after the existing
/// ones in the other file's chronological order. Conflicts stop the merge
/// unless a preference is given.
MergeReport mergeColonies(ColonyStore& target, const ColonyStore& other, const MergeOptions& options);

} // namespace hierloom::core
