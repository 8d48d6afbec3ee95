// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/command_context.h"

#include <functional>

namespace hierloom::cli {

/// What a command runs once its options are parsed.
using CommandAction = std::function<void()>;

// Each adds one subcommand and sets `action` when that subcommand is chosen.
void addInitCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addImportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addExportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addDemoCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addRanksCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addMatrixCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addMetricsCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addSexRatioCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addMaternalRanksCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addExportTablesCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addSupportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addInheritCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addDynamicsCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addScenarioCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addStabilityCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addReportCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addBackupCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addCheckCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addRestoreCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addMergeCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addHistoryCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addOverviewCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);
void addHealthCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);

} // namespace hierloom::cli
