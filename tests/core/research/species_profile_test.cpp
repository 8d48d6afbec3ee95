// SPDX-License-Identifier: GPL-3.0-or-later
#include "core/research/species_profile.h"
#include "core/store/species_settings.h"

#include "core/store/colony_store.h"
#include "import_test_support.h"

#include <gtest/gtest.h>

#include <stdexcept>

using namespace hierloom::core;

TEST(SpeciesProfile, DefaultsAreTheRhesusValues)
{
    // docs/methods.md: maturity age default 4 years; rhesus gestation ~165 days [from memory].
    const SpeciesSettings s = resolveSpeciesSettings("", "", "");
    EXPECT_EQ(s.species, "rhesus_macaque");
    EXPECT_EQ(s.gestationDays, 165);
    EXPECT_EQ(s.maturityYears, 4);
    EXPECT_FALSE(s.gestationOverridden);
    EXPECT_EQ(knownSpecies().size(), 6U);
    for (const SpeciesProfile& p : knownSpecies()) {
        EXPECT_GT(p.gestationDays, 0) << p.key;
        EXPECT_GT(p.maturityYears, 0) << p.key;
    }
}

TEST(SpeciesProfile, NamesAreMatchedLoosely)
{
    // The demo colony stores "rhesus macaque"; keys, common and scientific names all work.
    EXPECT_EQ(findSpecies("rhesus macaque"), findSpecies("rhesus_macaque"));
    EXPECT_EQ(findSpecies("Crocuta crocuta")->key, "spotted_hyena");
    EXPECT_EQ(findSpecies("axolotl"), nullptr);
    EXPECT_THROW(resolveSpeciesSettings("axolotl", "", ""), std::invalid_argument);
    EXPECT_THROW(resolveSpeciesSettings("vervet", "0", ""), std::invalid_argument);
    EXPECT_THROW(resolveSpeciesSettings("vervet", "", "4.5"), std::invalid_argument);
}

TEST(SpeciesProfile, StoredSettingsAndOverridesRoundTrip)
{
    hierloom::test::TempDir dir;
    {
        ColonyStore store = ColonyStore::create(dir.file("c.hierloom"));
        EXPECT_EQ(readSpeciesSettings(store).species, kDefaultSpeciesKey);
        writeSpeciesSettings(store, "spotted_hyena", std::nullopt, 2);
        EXPECT_THROW(writeSpeciesSettings(store, "axolotl", std::nullopt, std::nullopt), std::invalid_argument);
    }
    const ColonyStore store = ColonyStore::open(dir.file("c.hierloom"), ColonyStore::Mode::ReadOnly);
    const SpeciesSettings s = readSpeciesSettings(store);
    EXPECT_EQ(s.species, "spotted_hyena");
    EXPECT_EQ(s.gestationDays, findSpecies("spotted_hyena")->gestationDays); // species default
    EXPECT_FALSE(s.gestationOverridden);
    EXPECT_EQ(s.maturityYears, 2); // override kept
    EXPECT_TRUE(s.maturityOverridden);
    EXPECT_EQ(store.setting(kMaturitySettingKey), "2");
}
