// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/import_problems.h"

#include <string>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// Which side wins a conflicting edit of the same record: nobody (list the
/// conflicts and write nothing), this colony file, or the other one.
enum class MergePreference { None, Ours, Theirs };

/// One record edited differently in the two files (same uid, different
/// content), or two different animals (different uids) under one id.
struct MergeConflict {
    std::string table;  ///< animal, residence or encounter
    std::string uid;    ///< the record's uid in this colony file
    std::string record; ///< the record as a person knows it (animal id, stay, encounter)
    std::string what;   ///< the fields that differ, both values
};

/// What a merge added, skipped and could not decide.
struct MergeReport {
    std::vector<Animal> addedAnimals;
    std::vector<Residence> addedResidences;
    std::vector<Encounter> addedEncounters; ///< with the seq they were given here
    std::vector<std::string> takenFromOther; ///< conflicts settled with the other file's version
    size_t skippedAnimals = 0;
    size_t skippedResidences = 0;
    size_t skippedEncounters = 0;
    std::vector<MergeConflict> conflicts;
    ImportProblems problems; ///< records to add that break an import rule
    bool written = false;
};

/// Options of mergeColonies.
struct MergeOptions {
    MergePreference prefer = MergePreference::None;
    bool dryRun = false; ///< check and report, write nothing
    Day today = 0;       ///< dates after it are refused, as in an import
};

/// Brings the other colony file's records into this one by uid, all or
/// nothing in one transaction: records present with the same content are
/// skipped; new ones are checked under every import rule (planImport on the
/// records written as import files, so the rules cannot drift apart) and
/// added, new encounters after the existing ones in the other file's
/// chronological order; conflicts stop the merge unless a preference is given.
MergeReport mergeColonies(ColonyStore& target, const ColonyStore& other, const MergeOptions& options);

} // namespace hierloom::core
