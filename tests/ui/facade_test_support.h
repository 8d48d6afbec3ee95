// SPDX-License-Identifier: GPL-3.0-or-later
// A small hand-made colony for the edit facade tests, and the whole content
// of a colony file read back by a fresh connection, as one comparable text.
#pragma once
#include "core/base/civil_date.h"
#include "core/store/colony_import.h"
#include "core/store/colony_store.h"
#include "core/store/saved_scenarios.h"
#include "core/store/setting_values.h"
#include "core/store/stability_settings.h"
#include "core/research/species_profile.h"
#include "tests/core/import_test_support.h"

#include <gtest/gtest.h>

#include <sstream>
#include <string>

namespace hierloom::test {

// Group A: F1, F2, D1, D2; group B: M1, G1 (all resident from their birth).
inline const char* const facadeAnimalsCsv = "id,name,sex,birth_date,mother,entry_type\n"
                                            "F1,Ada,F,2010-03-01,,founder\n"
                                            "F2,Bea,F,2012-05-02,,founder\n"
                                            "D1,Cleo,F,2015-04-03,F1,born\n"
                                            "D2,Dot,F,2017-06-04,D1,born\n"
                                            "M1,Eli,M,2011-01-01,,founder\n"
                                            "G1,Gus,F,2012-01-01,,founder\n";
inline const char* const facadeResidencesCsv = "animal,group,from\n"
                                               "F1,A,2010-03-01\nF2,A,2012-05-02\nD1,A,2015-04-03\nD2,A,2017-06-04\n"
                                               "M1,B,2011-01-01\nG1,B,2012-01-01\n";

inline std::string makeFacadeColony(const TempDir& dir, const std::string& name = "facade.hierloom")
{
    const std::string path = dir.file(name);
    core::ColonyStore store = core::ColonyStore::create(path);
    const core::ImportResult plan =
        core::importFiles(store, {dir.write(name + "-a.csv", facadeAnimalsCsv), dir.write(name + "-r.csv", facadeResidencesCsv), {}},
                          core::today());
    EXPECT_TRUE(plan.ok()) << plan.problems.text();
    return path;
}

inline std::string optionalText(const std::optional<std::string>& v) { return v ? "'" + *v + "'" : "(absent)"; }

/// Every record, list and setting the desktop can write, as read by a new
/// connection: equal texts mean equal files (for these purposes).
inline std::string fileDump(const std::string& path)
{
    const core::ColonyStore store = core::ColonyStore::open(path, core::ColonyStore::Mode::ReadOnly);
    std::ostringstream out;
    for (const core::Animal& a : store.loadAnimals())
        out << "animal " << a.id << '|' << a.name << '|' << static_cast<int>(a.sex) << '|' << a.birth.value_or(-1) << '|'
            << a.mother << '|' << a.father << '|' << a.entry.value_or(-1) << '|' << static_cast<int>(a.entryType) << '|'
            << a.exit.value_or(-1) << '|' << static_cast<int>(a.exitType) << '|' << a.uid << '\n';
    for (const core::Residence& r : store.loadResidences())
        out << "stay " << r.animal << '|' << r.group << '|' << r.from << '|' << r.to.value_or(-1) << '|' << r.uid << '\n';
    for (const core::Encounter& e : store.loadEncounters())
        out << "encounter " << e.seq << '|' << e.uid << '|' << e.date << '|' << e.time.value_or(-1) << '|' << e.winner << '|'
            << e.loser << '|' << static_cast<int>(e.outcome) << '|' << e.behaviour << '|' << e.group << '|' << e.observer
            << '|' << e.note << '\n';
    for (const std::string& o : store.observers()) out << "observer " << o << '\n';
    for (const auto& c : store.behaviourCodes()) out << "code " << c.code << '|' << c.severity << '|' << c.description << '\n';
    core::SettingValues keys = core::stabilityThresholdValues({});
    for (const char* k : {core::kSpeciesSettingKey, core::kGestationSettingKey, core::kMaturitySettingKey}) keys[k];
    for (const std::string& n : core::savedScenarioNames(store)) keys[core::kScenarioKeyPrefix + n];
    for (const auto& [key, value] : core::readSettingValues(store, keys)) out << "setting " << key << '=' << optionalText(value) << '\n';
    return out.str();
}

} // namespace hierloom::test
