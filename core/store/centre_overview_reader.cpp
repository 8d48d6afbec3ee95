// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/centre_overview_reader.h"

#include "core/store/colony_store.h"
#include "core/store/compact_encounter_loader.h"
#include "core/store/stability_settings.h"

#include <algorithm>

namespace hierloom::core {

CentreOverviewReader::CentreOverviewReader(const ColonyStore& store, const EloSettings& elo, int maturityYears)
    : store_(store), maturityYears_(maturityYears)
{
    colony_.animals = store.loadAnimals();
    colony_.residences = store.loadResidences();
    colony_.reindex();
    where_ = ResidenceIndex(colony_.animals, colony_.residences);
    lines_ = std::make_unique<Matrilines>(colony_);
    stability_.elo = elo;
    stability_.thresholds = readStabilityThresholds(store);
    stability_.severity = behaviourSeverities(store);
    groups_ = where_.groups();
    std::sort(groups_.begin(), groups_.end());
}

CentreOverviewReader::~CentreOverviewReader() = default;

std::optional<Day> CentreOverviewReader::lastEncounterDay() const { return store_.lastEncounterDay(); }

GroupOverview CentreOverviewReader::read(const std::string& group, Day at)
{
    EncounterScope scope{group, {}, at};
    scope.uids = false;
    const CompactEncounters encounters = loadCompactEncounters(store_, scope);
    return overviewOfGroup(encounters, colony_, where_, *lines_, group, at, stability_, maturityYears_);
}

} // namespace hierloom::core
