// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/colony.h"
#include "core/base/encounter_records.h"
#include "core/base/residence_index.h"

#include <QStringList>

#include <string>
#include <vector>

namespace hierloom::ui {

class ColonyDocument;

/// Groups that have encounters and a resident today or earlier, by name.
std::vector<std::string> groupsWithEncounters(const core::EncounterRecords& encounters, const core::ResidenceIndex& where);
/// The same for the open document; while a large file is still loading
/// (ColonyDocument::isComplete() false), every group with a resident.
QStringList groupsWithEncounters(ColonyDocument* document);

} // namespace hierloom::ui
