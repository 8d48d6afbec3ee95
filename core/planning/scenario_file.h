// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/planning/scenario.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace hierloom::core {

/// A scenario file read all or nothing: the scenario, or every problem found.
struct ScenarioFileResult {
    std::optional<Scenario> scenario; ///< empty when there are errors
    std::vector<std::string> errors;  ///< `FILE:LINE: what is wrong` (`FILE: ...` for the file as a whole)
};

/// Parses the line-based what-if format of docs/scenario-files.md (one directive a
/// line: date, group, rule, maturity, window, newborns, matrilines, remove, birth,
/// introduce, split; `#` comments) and checks it against the colony
/// (checkScenario), so that unknown animals are reported with their line.
/// Settings the text does not give (maturity, Elo...) come from `defaults`,
/// normally the colony's analysis settings.
ScenarioFileResult parseScenarioText(std::string_view text, const std::string& fileName, const Colony& colony,
                                     const Scenario& defaults = Scenario{});
/// The same checked against compact records and the pedigree (its encounters not read).
ScenarioFileResult parseScenarioText(std::string_view text, const std::string& fileName,
                                     const CompactEncounters& encounters, const Colony& pedigree,
                                     const Scenario& defaults = Scenario{});

/// Writes a scenario in the format parseScenarioText reads (docs/scenario-files.md):
/// every setting spelled out, then the changes in order, so that parsing the text
/// gives the same scenario back (line numbers aside). Elo settings are not part
/// of the format and are not written.
std::string formatScenarioText(const Scenario& scenario);

/// Reads and parses a scenario file; an unreadable file is an error of the result.
ScenarioFileResult readScenarioFile(const std::string& path, const Colony& colony,
                                    const Scenario& defaults = Scenario{});

} // namespace hierloom::core
