// SPDX-License-Identifier: GPL-3.0-or-later
// The centre overview read one group at a time from the file (what `overview`
// and the desktop's Centre Overview show) equals the overview computed from
// the whole colony in memory (identity: the scoped load is a superset of what
// the selection keeps), on a seeded generated centre with a share of
// encounters entered without a group and on several days.
#include "core/pedigree/matriline.h"
#include "core/planning/centre_overview.h"
#include "core/store/centre_overview_reader.h"
#include "core/store/colony_store.h"
#include "core/store/stability_settings.h"
#include "import_test_support.h"
#include "tools/centre_generator.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <set>

using namespace hierloom::core;
using hierloom::test::TempDir;

TEST(CentreOverviewReader, GroupByGroupEqualsTheWholeColonyInMemory)
{
    TempDir dir;
    hierloom::tools::CentreSpec spec;
    spec.groups = 4;
    spec.animalsPerGroup = 14;
    spec.encounters = 8000;
    spec.years = 3;
    spec.seed = 17;
    hierloom::tools::CentrePopulation population = hierloom::tools::generateCentrePopulation(spec);
    Colony whole;
    whole.animals = population.animals;
    whole.residences = population.residences;
    int n = 0;
    hierloom::tools::generateCentreEncounters(spec, population, [&](Encounter& e) {
        if (++n % 5 == 0) e.group.clear(); // counted for the winner's group that day
        whole.encounters.push_back(e);
    });
    const std::string path = dir.file("centre.hierloom");
    {
        ColonyStore store = ColonyStore::create(path);
        store.append(whole.animals, whole.residences, whole.encounters);
    }
    whole.reindex();
    const ResidenceIndex where(whole.animals, whole.residences);
    const Matrilines lines(whole);

    const ColonyStore store = ColonyStore::open(path, ColonyStore::Mode::ReadOnly);
    CentreOverviewReader reader(store, EloSettings{}, 4);
    std::set<std::string> named;
    for (const Residence& r : whole.residences) named.insert(r.group);
    EXPECT_EQ(reader.groups(), std::vector<std::string>(named.begin(), named.end()));
    const Day last = std::max_element(whole.encounters.begin(), whole.encounters.end(), [](const auto& a, const auto& b) {
                         return a.date < b.date;
                     })->date;
    ASSERT_EQ(reader.lastEncounterDay(), last);

    StabilityOptions stability;
    stability.thresholds = readStabilityThresholds(store);
    stability.severity = behaviourSeverities(store);
    int recent = 0;
    for (Day at : {last, last - 200, dayFromCivil(spec.firstYear, 2, 10), dayFromCivil(spec.firstYear - 1, 6, 1)}) {
        for (const std::string& group : reader.groups()) {
            const GroupOverview read = reader.read(group, at);
            const GroupOverview inMemory = overviewOfGroup(whole, where, lines, group, at, stability, 4);
            EXPECT_EQ(read.composition.animals, inMemory.composition.animals) << group;
            EXPECT_EQ(read.composition.adultFemales, inMemory.composition.adultFemales) << group;
            EXPECT_EQ(read.composition.matrilines, inMemory.composition.matrilines) << group;
            EXPECT_EQ(read.lastEncounter, inMemory.lastEncounter) << group;
            EXPECT_EQ(read.recentEncounters, inMemory.recentEncounters) << group;
            EXPECT_EQ(read.watched, inMemory.watched) << group;
            EXPECT_EQ(read.alerts, inMemory.alerts) << group;
            EXPECT_EQ(read.evidence, inMemory.evidence) << group;
            EXPECT_EQ(read.alerts.size(), read.evidence.size());
            recent += read.recentEncounters;
        }
    }
    EXPECT_GT(recent, 0); // the comparison saw encounters, not only empty rows
    // Before the first encounter: nothing to watch.
    EXPECT_FALSE(reader.read(reader.groups().front(), dayFromCivil(spec.firstYear - 1, 6, 1)).watched);
}
