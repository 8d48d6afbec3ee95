// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/compact_encounters.h"
#include "core/store/colony_store.h"

namespace hierloom::core {

/// The encounters of a scope as compact records (core/base/compact_encounters.h):
/// the same rows as ColonyStore::loadEncounters(scope), in seq order, with
/// their supporters, read without a std::string per row (texts are interned
/// straight from SQLite's row buffer) and without uids or notes. Throws
/// ColonyFileError(Damaged) for an impossible date, and when the rows use
/// more than CompactEncounters::kMaxCodes groups, behaviours or observers.
CompactEncounters loadCompactEncounters(const ColonyStore& store, const EncounterScope& scope);

} // namespace hierloom::core
