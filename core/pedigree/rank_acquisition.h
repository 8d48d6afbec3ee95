// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/compact_encounters.h"
#include "core/ranks/elo_rating.h"
#include "core/pedigree/matriline.h"
#include "core/base/residence_index.h"

#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// When a daughter first rose above one of her older sisters, as youngest
/// ascendancy (Kawamura 1958; Datta 1988) expects her to.
struct SisterOvertaking {
    std::string daughter;
    std::string olderSister;
    std::string mother;
    /// Whether there was any day on which both were present and rated.
    bool compared = false;
    /// First day after whose encounters her Elo rating placed her above the sister;
    /// empty: not (yet) in the record.
    std::optional<Day> firstAbove;
    std::optional<int> ageYears; ///< her whole years of age that day (empty: unknown birth or not yet)
    std::optional<int> ageDays;  ///< her age in days that day
    /// Whether she was still above the sister on the last day both were compared.
    bool aboveAtLastComparison = false;
};

/// Rank acquisition (Datta 1988; youngest ascendancy, Kawamura 1958): for each
/// female with older sisters, the first day in the daily Elo history (Neumann et
/// al. 2011, ratings after each day's last encounter) on which both were present
/// in the colony, both rated, and her rating placed her above the sister (a rating
/// equal within a relative 1e-9 counts by id, as in every ranking). An older sister
/// is one placed after her under the youngest rule: born earlier, of unknown birth
/// date (which counts as the eldest), or born the same day with a larger id.
/// Elo runs over every encounter (of `group` when not empty) up to `to` if given.
/// Rows ordered by mother, then daughter, then sister id.
std::vector<SisterOvertaking> rankAcquisition(const Colony& colony, const ResidenceIndex& where,
                                              const Matrilines& lines, const EloSettings& settings,
                                              const std::string& group = {}, std::optional<Day> to = std::nullopt);
/// The same from compact records; `animals` is the colony's animal list.
std::vector<SisterOvertaking> rankAcquisition(const CompactEncounters& encounters, const std::vector<Animal>& animals,
                                              const ResidenceIndex& where, const Matrilines& lines,
                                              const EloSettings& settings, const std::string& group = {},
                                              std::optional<Day> to = std::nullopt);

} // namespace hierloom::core
