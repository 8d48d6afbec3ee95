// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/compact_encounters.h"
#include "core/base/encounter_records.h"
#include "core/store/colony_store.h"

namespace hierloom::core {

/// The encounters of a scope as compact records (core/base/compact_encounters.h):
/// the same rows as ColonyStore::loadEncounters(scope), in seq order, with
/// their supporters, read without a std::string per row (texts are interned
/// straight from SQLite's row buffer) and without uids or notes. Throws
/// ColonyFileError(Damaged) for an impossible date, and when the rows use
/// more than CompactEncounters::kMaxCodes groups, behaviours or observers.
CompactEncounters loadCompactEncounters(const ColonyStore& store, const EncounterScope& scope);

/// The same rows with every field (core/base/encounter_records.h): the
/// compact records with each uid as its 16 stored bytes and the notes; what
/// the desktop holds. EncounterRecords::at(i) equals
/// ColonyStore::loadEncounters(scope)[i], uid and note included.
EncounterRecords loadEncounterRecords(const ColonyStore& store, const EncounterScope& scope);

} // namespace hierloom::core
