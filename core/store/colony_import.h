// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/derived_uid.h"
#include "core/base/import_problems.h"
#include "core/rules/identifier_rules.h"

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <unordered_set>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// One import file's name (used in messages) and its whole text.
struct ImportSource {
    std::string name;
    std::string text;
};

/// The files of one import; any of them may be absent.
struct ImportInput {
    std::optional<ImportSource> animals;
    std::optional<ImportSource> residences;
    std::optional<ImportSource> encounters;
};

/// What an import would add, or the problems that stop it.
struct ImportPlan {
    std::vector<Animal> animals;
    std::vector<Residence> residences;
    std::vector<Encounter> encounters;
    ImportProblems problems;
    bool ok() const { return problems.empty(); }
};

/// Checks import files against the colony's existing animals and residences
/// under every rule of docs/file-formats.md; writes nothing. `today` bounds dates.
/// `encounterUids` holds the uids of the colony's encounters, needed only
/// when the encounters file has a uid column.
ImportPlan planImport(const std::vector<Animal>& existingAnimals, const std::vector<Residence>& existingResidences,
                      const ImportInput& input, Day today, const std::unordered_set<std::string>& encounterUids = {});

/// The part of a derived uid's key that the colony gives (docs/file-formats.md,
/// "Identities"): the highest audit row id, 0 for a file without audit rows.
/// Two copies of a colony with the same history give the same number; any
/// change (also a deletion) raises it, so a record imported again later gets
/// a new uid.
std::int64_t importEpoch(const ColonyStore& store);

/// Gives each animal and residence of `plan` that has no uid one derived
/// from `epoch` and its identity (animal id; animal and first day of a stay),
/// and each encounter one derived from `epoch`, its place among the import's
/// encounters and its fields (encounterUid).
void deriveUids(ImportPlan& plan, std::int64_t epoch);

/// The derived uid of the `row`-th encounter (from 0) of an import into a
/// colony at import epoch `epoch` (derivedRowUid: the uids of one import sort
/// in row order); the text of encounterUidBytes.
std::string encounterUid(const Encounter& e, std::int64_t epoch, std::size_t row);

/// The hash of the place part of the encounter uids of an import at `epoch`
/// (the same for the whole import).
UidBytes encounterUidPlace(std::int64_t epoch);

/// The 16 bytes of encounterUid(e, epoch, row) given `place` =
/// encounterUidPlace(epoch), hashing the fields without joining them into a key.
UidBytes encounterUidBytes(const Encounter& e, const UidBytes& place, std::size_t row);

/// Paths of the files to import; empty means not given.
struct ImportPaths {
    std::string animals;
    std::string residences;
    std::string encounters;
};

/// What an import added, or the problems that stopped it (then nothing was written).
struct ImportResult {
    ImportProblems problems;
    std::size_t animals = 0;
    std::size_t residences = 0;
    std::size_t encounters = 0;
    bool ok() const { return problems.empty(); }
};

/// Reads, checks and, only when every row passes, writes the files in one
/// transaction, checking against the colony as read inside that transaction.
/// Encounters are checked on a second thread while the rows that passed are
/// written; a problem rolls everything back.
ImportResult importFiles(ColonyStore& store, const ImportPaths& paths, Day today);

/// importFiles for files already read (their names are used in messages and
/// in the audit row): the same checks, the same single transaction.
ImportResult importInput(ColonyStore& store, ImportInput input, Day today);

} // namespace hierloom::core
