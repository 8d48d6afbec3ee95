// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/demo/demo_colony.h"
#include "core/demo/demo_population.h"

namespace hierloom::core {

Colony generateDemoColony(std::uint64_t seed)
{
    const DemoPopulation pop = generateDemoPopulation(seed);
    Colony colony;
    auto idOf = [&](int i) { return i < 0 ? std::string() : pop.animals[static_cast<size_t>(i)].id; };
    for (const DemoAnimal& d : pop.animals) {
        Animal a;
        a.id = d.id;
        a.name = d.name;
        a.sex = d.sex;
        a.birth = d.birth;
        a.mother = idOf(d.mother);
        a.father = idOf(d.father);
        a.entry = d.entry;
        a.entryType = d.entryType;
        a.exit = d.exit;
        a.exitType = d.exitType;
        colony.animals.push_back(std::move(a));

        Residence r;
        r.animal = d.id;
        r.group = demo::kGroup;
        r.from = d.entry;
        r.to = d.exit;
        colony.residences.push_back(std::move(r));
    }
    colony.encounters = generateDemoEncounters(pop, seed);
    colony.reindex();
    return colony;
}

DemoColonyFacts demoColonyFacts(std::uint64_t seed)
{
    const DemoPopulation pop = generateDemoPopulation(seed);
    auto idOf = [&](int i) { return pop.animals[static_cast<size_t>(i)].id; };
    DemoColonyFacts f;
    for (int l = 0; l < 5; ++l) f.matriarchs[static_cast<char>('A' + l)] = idOf(pop.matriarch[l]);
    for (const DemoAnimal& a : pop.animals)
        if (a.line != 0) f.lineOf[a.id] = a.line;
    f.introducedFemale = idOf(pop.introducedFemale);
    f.removedAnimal = idOf(pop.removed);
    for (int m : pop.founderMales) f.founderMales.push_back(idOf(m));
    for (int m : pop.introducedMales) f.introducedMales.push_back(idOf(m));
    f.observers = demoObservers();
    for (const DemoOverride& o : pop.overrides) {
        PlantedReversal r;
        r.upper = idOf(o.above ? o.moved : o.anchor);
        r.lower = idOf(o.above ? o.anchor : o.moved);
        r.kind = o.kind;
        r.description = o.description;
        f.reversals.push_back(std::move(r));
    }
    return f;
}

const char* toString(PlantedReversalKind kind)
{
    switch (kind) {
    case PlantedReversalKind::SiblingOrder: return "sibling_order";
    case PlantedReversalKind::DaughterOverMother: return "daughter_over_mother";
    case PlantedReversalKind::MaleBelowFemale: return "male_below_female";
    case PlantedReversalKind::CrossMatriline: return "cross_matriline";
    }
    return "";
}

} // namespace hierloom::core
