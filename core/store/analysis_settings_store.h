// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/ranks/analysis_settings.h"
#include "core/store/setting_values.h"

namespace hierloom::core {

class ColonyStore;

/// Keys of the analysis settings in the colony file's `setting` table. The
/// maturity age shares the species settings' key (kMaturitySettingKey), so
/// the file holds it once.
namespace analysis_keys {
inline constexpr const char* kEloK = "analysis.elo_k";
inline constexpr const char* kEloStart = "analysis.elo_start";
inline constexpr const char* kEloCurve = "analysis.elo_curve";
inline constexpr const char* kDraws = "analysis.draws";
inline constexpr const char* kEloStartRule = "analysis.elo_start_rule";
inline constexpr const char* kWindowDays = "analysis.window_days";
} // namespace analysis_keys

/// The colony's analysis settings: a missing or unreadable value (not a
/// finite number, out of range) takes the default; the maturity age is the
/// species setting's (its override, else the species' default, else 4).
AnalysisSettings readAnalysisSettings(const ColonyStore& store);

/// The defaults for this colony: AnalysisSettings{} with the maturity age of its species.
AnalysisSettings defaultAnalysisSettings(const ColonyStore& store);

/// Checks (validateAnalysisSettings, throwing std::invalid_argument before
/// anything is written) and stores every value in one write transaction. A
/// maturity age equal to the species' default is stored as no override.
void writeAnalysisSettings(ColonyStore& store, const AnalysisSettings& settings);

/// The keys and values writeAnalysisSettings stores (validated first, throwing
/// std::invalid_argument), so the desktop's undo history can write them as one step.
SettingValues analysisSettingValues(const ColonyStore& store, const AnalysisSettings& settings);

} // namespace hierloom::core
