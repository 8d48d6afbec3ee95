// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/demo/demo_colony_file.h"

#include "core/store/colony_csv_export.h"
#include "core/store/colony_import.h"
#include "core/demo/demo_colony.h"

#include <sstream>
#include <stdexcept>

namespace hierloom::core {

ColonyStore createDemoColonyFile(const std::string& path)
{
    const Colony demoColony = generateDemoColony(demo::kDefaultSeed);
    std::ostringstream animals, residences, encounters;
    writeAnimalsCsv(animals, demoColony);
    writeResidencesCsv(residences, demoColony);
    writeEncountersCsv(encounters, demoColony);
    const ImportInput input{ImportSource{"demo animals.csv", animals.str()},
                            ImportSource{"demo residences.csv", residences.str()},
                            ImportSource{"demo encounters.csv", encounters.str()}};
    ImportPlan plan = planImport({}, {}, input, today());
    if (!plan.ok()) throw std::logic_error("the bundled demo colony does not import:\n" + plan.problems.text());
    deriveUids(plan, 0); // every demo file gives its records the same uids, like an import into a new file
    // Built under a partial name and renamed when complete (ColonyStore::create).
    return ColonyStore::create(path, [&](ColonyStore& store) {
        store.append(plan.animals, plan.residences, plan.encounters);
        store.setSetting("species", "rhesus_macaque");
    });
}

} // namespace hierloom::core
