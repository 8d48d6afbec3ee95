// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/residence_index.h"
#include "core/pedigree/matriline.h"
#include "core/planning/centre_overview.h"
#include "core/ranks/elo_rating.h"

#include <memory>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

class ColonyStore;

/// Reads the centre overview (centre_overview.h) from a colony file one group
/// at a time: every animal and residence, the stability thresholds and the
/// behaviour severities once, then for each row only the encounters the group
/// can use up to the day, through the group index as compact records
/// (compact_encounter_loader.h), so memory follows the largest group, not the centre. The command
/// line's `overview` and the desktop's Centre Overview read through it, so the
/// two show the same figures. Uses the store from one thread at a time.
class CentreOverviewReader {
public:
    /// Reads what every row needs from `store`, which must outlive the reader.
    CentreOverviewReader(const ColonyStore& store, const EloSettings& elo, int maturityYears);
    ~CentreOverviewReader();

    /// Every group any animal lived in, in byte order: the overview's rows.
    const std::vector<std::string>& groups() const { return groups_; }
    /// The file's last encounter day (every group): the overview's default day.
    std::optional<Day> lastEncounterDay() const;
    /// The row of `group` on `at`, read from the file now.
    GroupOverview read(const std::string& group, Day at);

private:
    const ColonyStore& store_;
    Colony colony_; ///< every animal and residence (no encounters)
    ResidenceIndex where_;
    std::unique_ptr<Matrilines> lines_;
    StabilityOptions stability_;
    int maturityYears_;
    std::vector<std::string> groups_;
};

} // namespace hierloom::core
