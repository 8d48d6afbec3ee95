// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/command_context.h"
#include "core/base/colony.h"
#include "core/base/csv_writer.h"
#include "core/ranks/analysis_settings.h"
#include "core/ranks/encounter_selection.h"
#include "core/base/residence_index.h"

#include <string>

namespace hierloom::cli {

/// A colony read for analysis, with its residence index and stored analysis settings.
struct LoadedColony {
    core::Colony colony;
    core::ResidenceIndex where;
    core::AnalysisSettings settings;
};

/// Opens a colony file read-only and loads everything, its analysis settings included.
LoadedColony loadColony(const std::string& path);

/// Turns the common window options into a selection, checking them; without
/// --draws the colony's draw setting applies.
core::SelectionOptions selectionOf(const WindowOptions& options, const LoadedColony& loaded);

} // namespace hierloom::cli
