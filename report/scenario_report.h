// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/planning/scenario.h"

#include <QString>

#include <vector>

class QPagedPaintDevice;

namespace hierloom::report {

/// A what-if scenario with the name it was saved under.
struct NamedScenario {
    QString name;
    core::Scenario scenario;
};

/// Paints the planner's printout of one scenario, or of several one after the
/// other (a comparison): the changes, the caution, and per resulting group its
/// composition, the observed order next to the predicted one, the predicted
/// moves and the observed relationships that would have to reverse. Returns
/// the number of pages; throws core::ScenarioError for a scenario that cannot run.
/// The encounters are read as compact records; `pedigree`'s animals and
/// residences are read, not its encounters.
int paintScenarioReport(QPagedPaintDevice& device, const core::CompactEncounters& encounters,
                        const core::Colony& pedigree, const std::vector<NamedScenario>& scenarios,
                        const QString& colonyName);

} // namespace hierloom::report
