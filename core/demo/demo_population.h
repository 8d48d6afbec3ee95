// SPDX-License-Identifier: GPL-3.0-or-later
#pragma once
#include "core/base/civil_date.h"
#include "core/base/colony.h"
#include "core/demo/demo_colony.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace hierloom::core {

/// One animal of the demo population, with links by index (internal to the
/// demo generator, see demo_colony.h).
struct DemoAnimal {
    std::string id;
    std::string name;
    Sex sex = Sex::Female;
    Day birth = 0;
    int mother = -1;
    int father = -1;
    Day entry = 0;
    EntryType entryType = EntryType::Born;
    std::optional<Day> exit;
    ExitType exitType = ExitType::None;
    char line = 0; // matriline letter, 0 for unrelated immigrant males
    Day rise = 0;  // day a daughter takes her place above her elder sisters
    std::vector<int> children;
};

/// A persistent individual departure from the latent matrilineal order:
/// `moved` is placed directly above (or below) `anchor` whenever both are present.
struct DemoOverride {
    int moved = -1;
    int anchor = -1;
    bool above = true;
    PlantedReversalKind kind = PlantedReversalKind::SiblingOrder;
    std::string description;
};

/// The demo pedigree and life histories, plus the indices the latent order needs.
struct DemoPopulation {
    std::vector<DemoAnimal> animals; // in row order of animals.csv
    int matriarch[5] = {-1, -1, -1, -1, -1}; // lines A..E
    std::vector<int> maleOrder; // unrelated males by precedence (best first)
    std::vector<int> founderMales;
    std::vector<int> introducedMales;
    int introducedFemale = -1;
    int removed = -1;
    std::vector<DemoOverride> overrides;

    /// Alive and in the group on day d (entry and exit day included).
    bool resident(int i, Day d) const
    {
        const DemoAnimal& a = animals[static_cast<size_t>(i)];
        return a.entry <= d && (!a.exit || d <= *a.exit);
    }
};

/// Builds the demo pedigree: founders, seasonal births, deaths, the one
/// introduction and the one removal (the population half of generateDemoColony).
DemoPopulation generateDemoPopulation(std::uint64_t seed);

/// The observers of the demo record (invented initials).
std::vector<std::string> demoObservers();

/// Simulates the observed encounters of the demo record in entry order
/// (the encounter half of generateDemoColony).
std::vector<Encounter> generateDemoEncounters(const DemoPopulation& population, std::uint64_t seed);

} // namespace hierloom::core
