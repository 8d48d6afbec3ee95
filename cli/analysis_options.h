// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/colony_loading.h"
#include "core/ranks/analysis_settings.h"

#include <string>

namespace CLI {
class App;
class Option;
} // namespace CLI

namespace hierloom::cli {

/// This run's overrides of the colony's analysis settings (--k, --start,
/// --curve, --maturity-years; --draws is one of the WindowOptions). An
/// option not given leaves the colony's setting in force.
struct AnalysisOverrides {
    double k = 0;
    double start = 0;
    std::string curve;
    std::string startRule; ///< --start-rule; empty: the colony's setting
    int maturityYears = 0;
    CLI::Option* kOption = nullptr;
    CLI::Option* startOption = nullptr;
    CLI::Option* maturityOption = nullptr;
};

/// Adds --k, --start and --curve (`prefix` starts their help, e.g. "elo: ").
void addEloOptions(CLI::App& command, AnalysisOverrides& options, const std::string& prefix = "Elo: ");
/// Adds --start-rule none|youngest|eldest (rule-informed Elo, docs/methods.md).
void addStartRuleOption(CLI::App& command, AnalysisOverrides& options, const std::string& prefix = "Elo: ");
/// Adds --maturity-years.
void addMaturityOption(CLI::App& command, AnalysisOverrides& options);
/// Adds --draws alone, for commands without the window options.
void addDrawsOption(CLI::App& command, std::string& draws);

/// The colony's stored analysis settings (loaded.settings) with this run's
/// overrides; `draws` is the --draws text (empty: the colony's setting).
core::AnalysisSettings analysisSettingsOf(const LoadedColony& loaded, const AnalysisOverrides& overrides,
                                          const std::string& draws);

/// The one standard-error line naming the settings a command used:
/// "COMMAND: settings: k 100, start 1000, ... (the colony's settings; --k given)".
void reportAnalysisSettings(CommandContext& ctx, const char* command, const core::AnalysisSettings& settings,
                            const AnalysisOverrides* overrides, const std::string& draws);

/// The selection's window with the default window of the settings applied
/// when neither --from nor --to was given.
core::SelectionOptions withDefaultWindow(core::SelectionOptions selection, const core::AnalysisSettings& settings,
                                         const LoadedColony& loaded);

} // namespace hierloom::cli
