// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/store/colony_store.h"
#include "core/planning/stability_watch.h"

#include <map>
#include <string>

namespace hierloom::core {

/// Keys of the stability thresholds in the colony file's `setting` table.
namespace stability_keys {
inline constexpr const char* kCounterShare = "stability.counter_share";
inline constexpr const char* kMinDecided = "stability.min_decided";
inline constexpr const char* kLinePairPerWeek = "stability.line_pair_per_week";
inline constexpr const char* kRankChange = "stability.rank_change_per_animal";
inline constexpr const char* kSevereAtLeast = "stability.severe_at_least";
inline constexpr const char* kSevereFactor = "stability.severe_factor";
inline constexpr const char* kMinSevere = "stability.min_severe";
} // namespace stability_keys

/// The thresholds of the stability watch stored in a colony file; a missing or
/// unreadable value takes the default of StabilityThresholds.
StabilityThresholds readStabilityThresholds(const ColonyStore& store);

/// Stores every threshold (one transaction per key, as ColonyStore::setSetting does).
void writeStabilityThresholds(ColonyStore& store, const StabilityThresholds& thresholds);

/// Behaviour code -> severity (0-5) of the file's behaviour codes, for StabilityOptions::severity.
std::map<std::string, int, std::less<>> behaviourSeverities(const ColonyStore& store);

} // namespace hierloom::core
