// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "cli/command_context.h"
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/base/csv_writer.h"
#include "core/ranks/analysis_settings.h"
#include "core/ranks/encounter_selection.h"
#include "core/base/residence_index.h"
#include "core/store/colony_store.h"

#include <optional>
#include <string>

namespace hierloom::cli {

/// A colony read for analysis, with its residence index and stored analysis
/// settings. Animals and residences are always whole; the encounters are
/// those of the scope it was loaded with.
struct LoadedColony {
    core::Colony colony;
    core::ResidenceIndex where;
    core::AnalysisSettings settings;
    /// The file's latest encounter day (every group): known when everything was
    /// loaded, when the settings have a default window, or when asked for.
    std::optional<core::Day> lastDay;
    /// The scope's encounters as compact records, filled by loadCompactColony
    /// only (then colony.encounters stays empty).
    core::CompactEncounters compact;
};

/// Opens a colony file read-only for a command: when the checked-files cache
/// does not vouch for it, its whole-file check runs alongside on a thread of
/// its own and the command's output waits for it (cli/checked_output.h).
core::ColonyStore openColony(CommandContext& ctx, const std::string& path);

/// Opens a colony file read-only (openColony) and loads everything but the
/// encounters' uids, its analysis settings included.
LoadedColony loadColony(CommandContext& ctx, const std::string& path);

/// Same, with only the encounters a question needs (core::EncounterScope);
/// `needLastDay` also finds the file's latest encounter day.
/// Encounters are read without their uids (no analysis uses them).
LoadedColony loadColony(CommandContext& ctx, const std::string& path, core::EncounterScope scope,
                        bool needLastDay = false);

/// Same as loadColony(path, scope, needLastDay), but the encounters are read
/// as compact records into `compact` (core/store/compact_encounter_loader.h;
/// about 32 bytes per encounter instead of one string per field), for the
/// commands whose engines take them (`ranks`).
LoadedColony loadCompactColony(CommandContext& ctx, const std::string& path, core::EncounterScope scope,
                               bool needLastDay = false);

/// The scope of the common window options: the group and the dates as given.
/// A date that does not parse is left open here; selectionOf reports it.
core::EncounterScope scopeOf(const WindowOptions& options);

/// Turns the common window options into a selection, checking them; without
/// --draws the colony's draw setting applies.
core::SelectionOptions selectionOf(const WindowOptions& options, const LoadedColony& loaded);

} // namespace hierloom::cli
