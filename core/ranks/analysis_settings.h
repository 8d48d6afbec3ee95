// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/ranks/elo_rating.h"
#include "core/ranks/informed_elo.h"

#include <optional>
#include <string>
#include <string_view>

namespace hierloom::core {

/// Maturity age default of docs/methods.md (a whole number of years); a species
/// profile may give another.
inline constexpr int kDefaultMaturityYears = 4;

/// Accepted ranges of the settings, shared by the file, the command line and the dialog.
inline constexpr double kMaxEloK = 100000;
inline constexpr double kMaxAbsEloStart = 1000000;
inline constexpr int kMaxMaturityYears = 50;
inline constexpr int kMaxWindowDays = 36500;

/// The settings every analysis starts from: the Elo rating (k, start value,
/// curve, draw policy; defaults in EloSettings; the start rule), the maturity age and the
/// default window. Views, reports and the command line read one of these
/// from the colony file (core/store/analysis_settings_store.h), so they agree.
struct AnalysisSettings {
    EloSettings elo;
    /// Where daughters enter the Elo ranking (docs/methods.md "Rule-informed Elo"); off by default.
    EloStartRule startRule = EloStartRule::None;
    int maturityYears = kDefaultMaturityYears;
    /// Default window: 0 = all data, else the last N days up to the last encounter.
    int windowDays = 0;

    bool operator==(const AnalysisSettings& o) const
    {
        return elo.k == o.elo.k && elo.start == o.elo.start && elo.curve == o.elo.curve &&
               elo.draws == o.elo.draws && startRule == o.startRule && maturityYears == o.maturityYears && windowDays == o.windowDays;
    }
};

/// Throws std::invalid_argument naming the first value out of range: k finite
/// in [0, 100000], start finite within +-1,000,000, maturity 0-50 years,
/// window 0-36,500 days.
void validateAnalysisSettings(const AnalysisSettings& settings);

/// "logistic" / "normal" and back (nullopt for anything else).
const char* toString(EloCurve curve);
std::optional<EloCurve> parseEloCurve(std::string_view text);
/// "half" / "ignore" and back.
const char* toString(DrawPolicy draws);
std::optional<DrawPolicy> parseDrawPolicy(std::string_view text);

/// One line for people: "k 100, start 1000, start rule none, curve logistic,
/// draws half, maturity 4 years, window all data".
std::string describeAnalysisSettings(const AnalysisSettings& settings);

/// First day of the default window ending on `lastDay`; nullopt for all data.
std::optional<Day> defaultWindowStart(const AnalysisSettings& settings, std::optional<Day> lastDay);

} // namespace hierloom::core
