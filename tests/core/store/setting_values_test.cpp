// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/store/setting_values.h"

#include "core/research/species_profile.h"
#include "core/store/colony_store.h"
#include "core/store/saved_scenarios.h"
#include "core/store/species_settings.h"
#include "core/store/stability_settings.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <stdexcept>

using namespace hierloom::core;
using hierloom::test::TempDir;

TEST(SettingValues, WrittenTogetherReadBackAndAnEmptyValueRemovesTheKey)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("s.hierloom"));
    writeSettingValues(store, {{"a", "1"}, {"b", ""}, {"c", "three"}});
    EXPECT_EQ(readSettingValues(store, {{"a", {}}, {"b", {}}, {"c", {}}, {"d", {}}}),
              (SettingValues{{"a", "1"}, {"b", ""}, {"c", "three"}, {"d", std::nullopt}}));
    writeSettingValues(store, {{"a", std::nullopt}, {"c", "3"}});
    EXPECT_EQ(readSettingValues(store, {{"a", {}}, {"c", {}}}), (SettingValues{{"a", std::nullopt}, {"c", "3"}}));
    EXPECT_EQ(store.setting("a", "gone"), "gone");
}

// The values the desktop stores for thresholds are those writeStabilityThresholds stores, and read back the same.
TEST(SettingValues, StabilityThresholdsMatchTheirOwnWriter)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("s.hierloom"));
    StabilityThresholds t;
    t.counterShare = 0.375;
    t.minDecided = 31;
    t.linePairPerWeek = 2.5;
    t.rankChangePerAnimal = 1.25;
    t.severeAtLeast = 3;
    t.severeFactor = 4.5;
    t.minSevere = 9;
    writeStabilityThresholds(store, t);
    const SettingValues values = stabilityThresholdValues(t);
    EXPECT_EQ(values.size(), 7u);
    EXPECT_EQ(readSettingValues(store, values), values);

    ColonyStore other = ColonyStore::create(dir.file("t.hierloom"));
    writeSettingValues(other, values);
    const StabilityThresholds back = readStabilityThresholds(other);
    EXPECT_DOUBLE_EQ(back.counterShare, 0.375);
    EXPECT_EQ(back.minDecided, 31);
    EXPECT_DOUBLE_EQ(back.linePairPerWeek, 2.5);
    EXPECT_DOUBLE_EQ(back.rankChangePerAnimal, 1.25);
    EXPECT_EQ(back.severeAtLeast, 3);
    EXPECT_DOUBLE_EQ(back.severeFactor, 4.5);
    EXPECT_EQ(back.minSevere, 9);
}

TEST(SettingValues, SpeciesValuesAreCheckedAndAMissingOverrideRemovesIt)
{
    const SpeciesProfile& other = knownSpecies().at(1);
    const SettingValues v = speciesSettingValues(other.key, std::nullopt, 7);
    EXPECT_EQ(v.at(kSpeciesSettingKey), other.key);
    EXPECT_EQ(v.at(kGestationSettingKey), std::nullopt);
    EXPECT_EQ(v.at(kMaturitySettingKey), "7");
    EXPECT_THROW(speciesSettingValues("no_such_species", std::nullopt, std::nullopt), std::invalid_argument);

    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("s.hierloom"));
    writeSettingValues(store, v);
    const SpeciesSettings s = readSpeciesSettings(store);
    EXPECT_EQ(s.species, other.key);
    EXPECT_EQ(s.gestationDays, other.gestationDays);
    EXPECT_EQ(s.maturityYears, 7);
}

TEST(SettingValues, ASavedScenarioIsOneKeyAndNeedsAName)
{
    TempDir dir;
    ColonyStore store = ColonyStore::create(dir.file("s.hierloom"));
    writeSettingValues(store, savedScenarioValue("plan", "remove X\n"));
    EXPECT_EQ(savedScenarioNames(store), std::vector<std::string>{"plan"});
    EXPECT_EQ(savedScenarioText(store, "plan"), "remove X\n");
    writeSettingValues(store, savedScenarioValue("plan", std::nullopt));
    EXPECT_TRUE(savedScenarioNames(store).empty());
    EXPECT_THROW(savedScenarioValue("", "x"), std::invalid_argument);
}
