// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/command_context.h"
#include "core/base/colony.h"
#include "core/base/csv_writer.h"
#include "core/ranks/encounter_selection.h"
#include "core/base/residence_index.h"

#include <string>

namespace hierloom::cli {

/// A colony read for analysis, with its residence index.
struct LoadedColony {
    core::Colony colony;
    core::ResidenceIndex where;
};

/// Opens a colony file read-only and loads everything.
LoadedColony loadColony(const std::string& path);

/// Turns the common window options into a selection, checking them.
core::SelectionOptions selectionOf(const WindowOptions& options, const LoadedColony& loaded);

} // namespace hierloom::cli
