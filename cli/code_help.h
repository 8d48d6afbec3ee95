// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/commands.h"
#include "core/base/display_names.h"

#include <string>
#include <vector>

namespace hierloom::cli {

/// Help text mapping machine codes to the names people read in the desktop
/// program and the reports: "Metric codes:\n  births_used  births used\n...".
std::string codesHelp(core::CodeKind kind, const std::vector<std::string>& codes);
/// Every code of one kind, in the table's order.
std::vector<std::string> codesOf(core::CodeKind kind);
/// The codes of the sex-ratio table's metric column, in its order.
std::vector<std::string> sexRatioCodes();
/// The left-out reasons of the per-birth table.
std::vector<std::string> reasonCodes();

/// `codes`: the whole table of codes and names as CSV (kind,code,name).
void addCodesCommand(CLI::App& app, CommandContext& ctx, CommandAction& action);

} // namespace hierloom::cli
